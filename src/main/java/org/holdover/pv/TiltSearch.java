package org.holdover.pv;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.holdover.solar.PlaneOfArray;
import org.holdover.solar.PoaSeries;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.SunPath;
import org.holdover.solar.SurfaceOrientation;
import org.holdover.solar.WeatherYear;

/**
 * Chooses the tilt that favours the worst month: for each candidate tilt, the hourly plane-of-array
 * irradiance and DC output of one reference module give each month's peak sun hours and derate,
 * the worst-month method gives the array needed, and the tilt needing the smallest array wins (ties
 * go to the lower tilt).
 */
public final class TiltSearch {

    private TiltSearch() {
    }

    /**
     * @param weather             hourly weather
     * @param sunPath             sun positions for the same hours
     * @param settings            sky model, albedo, IAM and the array azimuth (its tilt is replaced)
     * @param tiltsDeg            tilts to try, degrees in [0, 90]
     * @param module              the module (temperature behaviour)
     * @param losses              DC losses
     * @param controllerEfficiency controller efficiency, in (0, 1]
     * @param dailyEnergyWh       energy needed per day by month at the battery terminals, Wh/day
     * @param batteryRoundTripEfficiency in (0, 1]
     */
    public record Input(WeatherYear weather, SunPath sunPath, PoaSettings settings, double[] tiltsDeg, PvModule module,
            DcLosses losses, double controllerEfficiency, double[] dailyEnergyWh, double batteryRoundTripEfficiency) {
        public Input {
            Objects.requireNonNull(weather, "weather");
            Objects.requireNonNull(sunPath, "sunPath");
            Objects.requireNonNull(settings, "settings");
            Objects.requireNonNull(module, "module");
            Objects.requireNonNull(losses, "losses");
            if (tiltsDeg == null || tiltsDeg.length == 0) {
                throw new IllegalArgumentException("need at least one tilt");
            }
            tiltsDeg = tiltsDeg.clone();
            if (!(controllerEfficiency > 0 && controllerEfficiency <= 1)) {
                throw new IllegalArgumentException("controllerEfficiency must be in (0, 1]");
            }
            dailyEnergyWh = WorstMonthSizing.twelve("dailyEnergyWh", dailyEnergyWh, 0, Double.MAX_VALUE);
        }

        @Override
        public double[] tiltsDeg() {
            return tiltsDeg.clone();
        }

        @Override
        public double[] dailyEnergyWh() {
            return dailyEnergyWh.clone();
        }
    }

    /**
     * One tilt's result.
     *
     * @param tiltDeg      the tilt
     * @param peakSunHours plane-of-array kWh/m²/day by month (before reflection loss)
     * @param derate       DC performance ratio × controller efficiency by month
     * @param sizing       the worst-month sizing at this tilt
     */
    public record Option(double tiltDeg, double[] peakSunHours, double[] derate, MonthlySizingResult sizing) {
        public Option {
            peakSunHours = peakSunHours.clone();
            derate = derate.clone();
            Objects.requireNonNull(sizing, "sizing");
        }

        @Override
        public double[] peakSunHours() {
            return peakSunHours.clone();
        }

        @Override
        public double[] derate() {
            return derate.clone();
        }
    }

    /**
     * @param options every tilt tried, in the order given
     * @param best    index of the chosen tilt in {@code options}
     */
    public record Result(List<Option> options, int best) {
        public Result {
            options = List.copyOf(options);
            if (best < 0 || best >= options.size()) {
                throw new IllegalArgumentException("best out of range");
            }
        }

        public Option chosen() {
            return options.get(best);
        }
    }

    /** Evenly spaced tilts from {@code fromDeg} to {@code toDeg} inclusive. */
    public static double[] tilts(double fromDeg, double toDeg, double stepDeg) {
        if (!(stepDeg > 0 && fromDeg <= toDeg)) {
            throw new IllegalArgumentException("need step > 0 and from <= to");
        }
        int n = (int) Math.floor((toDeg - fromDeg) / stepDeg + 1e-9) + 1;
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = fromDeg + i * stepDeg;
        }
        return t;
    }

    public static Result search(Input in) {
        return searchAll(in, List.of(in.module())).get(0);
    }

    /**
     * The search for several modules at once, each exactly as {@link #search} with that module in place of
     * {@code in.module()}; the plane-of-array irradiance of each tilt is computed once for all of them.
     *
     * @param in      the search (its module is not used)
     * @param modules the modules, not empty
     * @return one result per module, in the same order
     */
    public static List<Result> searchAll(Input in, List<PvModule> modules) {
        return searchAll(in, modules, null);
    }

    /**
     * As {@link #searchAll(Input, List)}, with the irradiance and performance ratios taken from a memo made for the
     * same weather, sun path and losses (null: computed here).
     */
    public static List<Result> searchAll(Input in, List<PvModule> modules, PlaneMemo memo) {
        if (memo != null && !memo.isFor(in.weather(), in.sunPath(), in.losses())) {
            throw new IllegalArgumentException("the memo was made for another weather year, sun path or losses");
        }
        if (modules.isEmpty()) {
            throw new IllegalArgumentException("need at least one module");
        }
        double[] air = in.weather().airTempC();
        List<List<Option>> options = new ArrayList<>();
        int[] best = new int[modules.size()];
        for (int i = 0; i < modules.size(); i++) {
            options.add(new ArrayList<>());
        }
        for (double tilt : in.tiltsDeg()) {
            PoaSettings s = in.settings().withOrientation(
                    new SurfaceOrientation(tilt, in.settings().orientation().azimuthDeg()));
            PoaSeries poa = memo == null ? PlaneOfArray.hourly(in.weather(), in.sunPath(), s) : null;
            double[] psh = memo == null ? poa.monthlyPeakSunHours(false) : memo.peakSunHours(s);
            for (int i = 0; i < modules.size(); i++) {
                double[] pr = memo == null
                        ? ArrayDcSeries.compute(new PvArray(modules.get(i), 1, 1), poa, air, in.losses()).monthlyDcPerformanceRatio()
                        : memo.monthlyPerformanceRatio(s, modules.get(i));
                double[] derate = new double[12];
                for (int m = 0; m < 12; m++) {
                    // A month without sun has no derate; any positive value gives +∞ need when there is load.
                    derate[m] = Double.isNaN(pr[m]) || pr[m] <= 0 ? 1.0 : pr[m] * in.controllerEfficiency();
                }
                MonthlySizingResult r = WorstMonthSizing.size(new WorstMonthSizing.Input(in.dailyEnergyWh(), psh, derate,
                        in.batteryRoundTripEfficiency()));
                List<Option> mine = options.get(i);
                mine.add(new Option(tilt, psh, derate, r));
                if (r.requiredStcW() < mine.get(best[i]).sizing().requiredStcW()) {
                    best[i] = mine.size() - 1;
                }
            }
        }
        List<Result> results = new ArrayList<>();
        for (int i = 0; i < modules.size(); i++) {
            results.add(new Result(options.get(i), best[i]));
        }
        return results;
    }
}
