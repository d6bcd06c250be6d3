package org.holdover.sizing;

import java.util.Arrays;
import java.util.Locale;
import org.holdover.battery.BankDesign;
import org.holdover.battery.BatteryModule;
import org.holdover.battery.Chemistry;
import org.holdover.inverter.LossModel;
import org.holdover.load.LoadAnalysis;
import org.holdover.project.ProjectInput;
import org.holdover.sim.AnalysisOptions;
import org.holdover.sim.BatteryBank;
import org.holdover.sim.ChargeController;
import org.holdover.sim.Charger;
import org.holdover.sim.HourlyConditions;
import org.holdover.sim.InverterLossModel;
import org.holdover.sim.SimulationMetrics;
import org.holdover.sim.SystemDesign;
import org.holdover.sim.TracedYear;
import org.holdover.sim.YearSimulation;

/**
 * The chosen system over a simulated year, hour by hour, and how it compares with the daily-energy chain.
 *
 * <p>The bank is simulated as designed for: at end of life and at its coldest (rated energy ÷ (temperature
 * factor × aging factor)), between the floor set by the depth of discharge and full charge. Capacity
 * ratings are measured on discharge, so the round-trip loss is charged on the way in (charge efficiency =
 * round trip, discharge efficiency = 1), our own modelling choice. The year starts from the state of
 * charge it ends with (one warm-up year), so the result does not depend on a guessed starting point.
 * Backup: the grid carries the loads and recharges the bank (charger efficiency
 * {@value #GRID_CHARGER_EFFICIENCY}, common practice, no source) except during the outage window the chain
 * found hardest. Off-grid: the PV array and the battery alone.
 *
 * @param bank            the bank as simulated
 * @param controller      the charge controller as simulated (efficiency 1 and no output without PV)
 * @param inverter        the inverter loss model
 * @param charger         the grid charger (none off grid)
 * @param loadW           the served AC load each hour, W
 * @param pvArrayW        the PV array's DC output each hour, W (zeros without PV)
 * @param gridAvailable   the grid each hour (backup)
 * @param chargeForbidden charging forbidden each hour (LiFePO4 below 0 °C)
 * @param traced          the simulated year, hour by hour
 * @param unmetLimitWh    the unmet energy the project accepts over the year, Wh
 * @param bankScaleNeeded smallest multiple of the simulated bank that leaves no more than the limit unmet (NaN when
 *                        no bank up to {@value #MAX_SCALE} × does)
 * @param generator       the engine generator as simulated (empty without one); with one, the charger is the
 *                        generator's ({@link GeneratorPlan#chargerAcW}), also used by the grid in backup mode
 */
public record YearCheck(BatteryBank bank, ChargeController controller, InverterLossModel inverter, Charger charger,
                        double[] loadW, double[] pvArrayW, boolean[] gridAvailable, boolean[] chargeForbidden,
                        TracedYear traced, double unmetLimitWh, double bankScaleNeeded,
                        java.util.Optional<org.holdover.sim.Generator> generator) {

    public static final double GRID_CHARGER_EFFICIENCY = 0.90;
    public static final double MAX_SCALE = 20;
    /** Controller output limit used when there is no PV array (it limits nothing), W. */
    public static final double NO_PV_LIMIT_W = 1e6;

    public SimulationMetrics metrics() {
        return traced.metrics();
    }

    /** Monthly sums, Wh, rows in this order. */
    public static final java.util.List<String> MONTHLY_ROWS = java.util.List.of("load", "served", "unmet", "pvArray", "pvOut",
            "pvCurtailed", "intoBank", "outOfBank", "gridToLoad");

    /**
     * The year's flows by month, Wh: one row per entry of {@link #MONTHLY_ROWS}, twelve months each.
     *
     * @param cal the year's calendar
     */
    public double[][] monthlyWh(org.holdover.load.YearCalendar cal) {
        org.holdover.sim.HourlyTrace t = traced.trace();
        double[][] series = {loadW, null, t.unmetW(), pvArrayW, t.pvControllerW(), t.pvCurtailedW(), t.batteryChargeW(),
            t.batteryToInverterW(), t.gridToLoadW()};
        double[][] out = new double[series.length][12];
        for (int k = 0; k < series.length; k++) {
            if (series[k] == null) {
                continue;
            }
            for (int h = 0; h < cal.hours(); h++) {
                out[k][cal.month(h) - 1] += series[k][h];
            }
        }
        for (int m = 0; m < 12; m++) {
            out[1][m] = out[0][m] - out[2][m];
        }
        return out;
    }

    /** The simulated year leaves no more unmet energy than the project accepts. */
    public boolean passes() {
        return metrics().reliability().unmetWh() <= unmetLimitWh + 1e-6;
    }

    /** The battery's expected life in words (rainflow counting of the year, ASTM E1049-85; curves from memory). */
    public String life() {
        return metrics().battery().life().map(l -> String.format(Locale.ROOT,
                "battery life about %.1f years, limited by %s (cycling alone %.1f years, rainflow counting of the simulated year"
                        + " against the chemistry's cycle-life curve, from memory; calendar %.0f years, from memory)",
                l.lifeYears(), l.limitedBy().name().toLowerCase(Locale.ROOT), l.cycleLifeYears(), l.calendarLifeYears())).orElse("");
    }

    /** The chain-versus-simulation comparison in words. */
    public String comparison(BankDesign chain) {
        double usableChain = bank.nominalEnergyWh() * (bank.ceilingSoc() - bank.floorSoc());
        String year = String.format(Locale.ROOT, "the chain chose %.1f kWh of battery (%.1f kWh usable at end of life, cold); "
                + "the simulated year with it leaves %.0f Wh unmet in %d h", chain.bankEnergyWh() / 1000.0, usableChain / 1000.0,
                metrics().reliability().unmetWh(), metrics().reliability().unmetHours());
        if (Double.isNaN(bankScaleNeeded)) {
            return year + "; no battery up to " + (long) MAX_SCALE + " times larger removes it: more PV (or a generator) is needed";
        }
        return year + String.format(Locale.ROOT, "; %.1f kWh of battery (%.2f ×) is the least that leaves %s",
                chain.bankEnergyWh() * bankScaleNeeded / 1000.0, bankScaleNeeded,
                unmetLimitWh > 0 ? String.format(Locale.ROOT, "at most %.0f Wh unmet", unmetLimitWh) : "none unmet");
    }

    /**
     * @param in        the sizing input
     * @param bankDesign the chosen bank
     * @param loss      the chosen inverter's loss model
     * @param energy    the chain's energy basis (outage window)
     * @param pvArrayW  the PV array's DC output each hour, or null without PV
     * @param controllerEfficiency controller efficiency (1 without PV)
     * @param controllerLimitW controller output limit, W (0 without PV)
     * @param unmetLimitFraction accepted unmet energy as a fraction of the load
     * @param batteryTempC battery temperature each hour, °C (null: no charging limit applies)
     */
    public static YearCheck run(SizingInput in, BankDesign bankDesign, LossModel loss, EnergyBasis energy, double[] pvArrayW,
                                double controllerEfficiency, double controllerLimitW, double unmetLimitFraction,
                                double[] batteryTempC) {
        return run(in, bankDesign, loss, energy, pvArrayW, controllerEfficiency, controllerLimitW, unmetLimitFraction, batteryTempC,
                java.util.Optional.empty());
    }

    /** As {@link #run(SizingInput, BankDesign, LossModel, EnergyBasis, double[], double, double, double, double[])} with a generator. */
    public static YearCheck run(SizingInput in, BankDesign bankDesign, LossModel loss, EnergyBasis energy, double[] pvArrayW,
                                double controllerEfficiency, double controllerLimitW, double unmetLimitFraction,
                                double[] batteryTempC, java.util.Optional<org.holdover.sim.Generator> generator) {
        Prepared p = prepare(in, bankDesign, loss, energy, pvArrayW, controllerEfficiency, controllerLimitW, unmetLimitFraction,
                batteryTempC, generator);
        SystemDesign design = p.warmed();
        Chemistry c = bankDesign.module().chemistry();
        double[][] curve = c.cycleLife();
        AnalysisOptions life = new AnalysisOptions(java.util.List.of(), java.util.Optional.of(new org.holdover.sim.BatteryAging(
                new org.holdover.sim.CycleLifeCurve(curve[0], curve[1]), c.calendarLifeYears())));
        TracedYear traced = YearSimulation.runTraced(design, p.conditions(), life);
        double scale = scaleNeeded(design, p.conditions(), p.unmetLimitWh());
        return new YearCheck(design.battery(), design.controller(), design.inverter(), design.charger(), p.loadW(), p.pvArrayW(),
                p.gridAvailable(), p.chargeForbidden(), traced, p.unmetLimitWh(), scale, generator);
    }

    /**
     * A system ready to simulate: the design (bank full at the start), the year's conditions, and the unmet energy
     * the project accepts.
     */
    public record Prepared(SystemDesign design, HourlyConditions conditions, double[] loadW, double[] pvArrayW,
                           boolean[] gridAvailable, boolean[] chargeForbidden, double unmetLimitWh) {

        /** The design starting from the state of charge one warm-up year ends with. */
        public SystemDesign warmed() {
            BatteryBank b = design.battery();
            double start = YearSimulation.run(design, conditions, AnalysisOptions.NONE).battery().finalSoc();
            start = Math.min(1.0, Math.max(b.floorSoc(), start));
            return design.withBattery(new BatteryBank(b.nominalEnergyWh(), b.floorSoc(), b.ceilingSoc(), start,
                    b.chargeEfficiency(), b.dischargeEfficiency(), b.maxChargeW(), b.maxDischargeW()));
        }

        /** The year's metrics after the warm-up year (no life analysis): two simulated years. */
        public SimulationMetrics quick() {
            return quick(AnalysisOptions.NONE);
        }

        /** As {@link #quick()}, with analyses of the measured year (battery life, for one). */
        public SimulationMetrics quick(AnalysisOptions options) {
            return YearSimulation.run(warmed(), conditions, options);
        }

        /** The same system under other conditions (load or PV scaled for a sensitivity case). */
        public Prepared withConditions(HourlyConditions c, double[] load, double[] pv) {
            return new Prepared(design, c, load, pv, gridAvailable, chargeForbidden, unmetLimitWh);
        }
    }

    /** The bank as simulated: rated energy ÷ (temperature × aging factors), floor from the depth of discharge, full. */
    public static BatteryBank bank(BankDesign bankDesign) {
        BatteryModule m = bankDesign.module();
        Chemistry c = m.chemistry();
        double nominal = bankDesign.bankEnergyWh() / (bankDesign.temperatureFactor() * bankDesign.agingFactor());
        double floor = 1.0 - bankDesign.requirement().depthOfDischarge();
        double maxCharge = bankDesign.strings() * m.maxChargeA() * bankDesign.bankNominalV();
        double maxDischarge = bankDesign.strings() * m.maxContinuousA() * bankDesign.bankNominalV();
        return new BatteryBank(nominal, floor, 1.0, 1.0, c.roundTripEfficiency(), 1.0, maxCharge, maxDischarge);
    }

    /**
     * The year a system is simulated over, apart from its PV: the served load, the grid hours, the hours the bank may
     * not be charged and the unmet energy accepted. Its arrays are shared by every {@link #prepare(Year, BankDesign,
     * LossModel, double[], double, double)} built on it and must not be changed.
     */
    public record Year(double[] loadW, boolean[] gridAvailable, boolean[] chargeForbidden, double unmetLimitWh, boolean backup) {
    }

    /** The year of a project for banks of one chemistry (the cold-charging limit is the chemistry's). */
    public static Year year(SizingInput in, Chemistry c, EnergyBasis energy, double unmetLimitFraction, double[] batteryTempC) {
        LoadAnalysis la = in.loads();
        int n = la.calendar().hours();
        boolean backup = in.mode() == ProjectInput.Mode.BACKUP;
        boolean[] grid = new boolean[n];
        if (backup) {
            Arrays.fill(grid, true);
            for (int h = energy.windowStartHour(); h < energy.windowStartHour() + energy.windowHours(); h++) {
                grid[h] = false;
            }
        }
        // A chemistry without a cold-charging limit (lead-acid: −∞) is never stopped from charging.
        boolean[] forbidden = batteryTempC == null || !Double.isFinite(c.noChargeBelowC()) ? new boolean[n]
                : HourlyConditions.chargeForbiddenBelow(batteryTempC, c.noChargeBelowC());
        double[] load = la.loadW().clone();
        return new Year(load, grid, forbidden, unmetLimitFraction * sum(load), backup);
    }

    /**
     * A system over a shared year (no copies: the search's path). The same design as
     * {@link #prepare(SizingInput, BankDesign, LossModel, EnergyBasis, double[], double, double, double, double[])}.
     *
     * @param pvArrayW  the PV array's DC output each hour (kept, not copied), or null without PV
     * @param generator the engine generator (empty without one)
     */
    public static Prepared prepare(Year y, SizingInput in, BankDesign bankDesign, LossModel loss, double[] pvArrayW,
                                   double controllerEfficiency, double controllerLimitW,
                                   java.util.Optional<org.holdover.sim.Generator> generator) {
        BatteryBank first = bank(bankDesign);
        InverterLossModel inv = new InverterLossModel(loss.ratedW(), loss.p0(), loss.k1(), loss.k2());
        ChargeController cc = new ChargeController(controllerEfficiency, controllerLimitW);
        Charger charger = generator.isPresent() ? new Charger(GeneratorPlan.chargerAcW(in, bankDesign), GRID_CHARGER_EFFICIENCY)
                : y.backup() ? new Charger(first.maxChargeW() / GRID_CHARGER_EFFICIENCY, GRID_CHARGER_EFFICIENCY) : Charger.NONE;
        double[] pv = pvArrayW == null ? new double[y.loadW().length] : pvArrayW;
        HourlyConditions cond = HourlyConditions.sharing(y.loadW(), pv, y.gridAvailable(), y.chargeForbidden());
        SystemDesign design = new SystemDesign(cc, inv, first, charger, generator);
        return new Prepared(design, cond, y.loadW(), pv, y.gridAvailable(), y.chargeForbidden(), y.unmetLimitWh());
    }

    /** See {@link #run}; the same system, ready to simulate. */
    public static Prepared prepare(SizingInput in, BankDesign bankDesign, LossModel loss, EnergyBasis energy, double[] pvArrayW,
                                   double controllerEfficiency, double controllerLimitW, double unmetLimitFraction,
                                   double[] batteryTempC) {
        return prepare(in, bankDesign, loss, energy, pvArrayW, controllerEfficiency, controllerLimitW, unmetLimitFraction,
                batteryTempC, java.util.Optional.empty());
    }

    /** As {@link #prepare(SizingInput, BankDesign, LossModel, EnergyBasis, double[], double, double, double, double[])} with a generator. */
    public static Prepared prepare(SizingInput in, BankDesign bankDesign, LossModel loss, EnergyBasis energy, double[] pvArrayW,
                                   double controllerEfficiency, double controllerLimitW, double unmetLimitFraction,
                                   double[] batteryTempC, java.util.Optional<org.holdover.sim.Generator> generator) {
        // The same year the search shares, built afresh, with the caller's PV series copied.
        Year y = year(in, bankDesign.module().chemistry(), energy, unmetLimitFraction, batteryTempC);
        return prepare(y, in, bankDesign, loss, pvArrayW == null ? null : pvArrayW.clone(), controllerEfficiency, controllerLimitW,
                generator);
    }

    /** Smallest bank multiple (bisection, 1 % resolution) leaving at most the limit unmet; NaN when none up to the maximum. */
    static double scaleNeeded(SystemDesign design, HourlyConditions cond, double limitWh) {
        BatteryBank b = design.battery();
        if (unmet(design, cond, MAX_SCALE) > limitWh + 1e-6) {
            return Double.NaN;
        }
        double lo = 0.0, hi = MAX_SCALE;
        while (hi - lo > 0.005) {
            double mid = (lo + hi) / 2;
            if (mid > 0 && unmet(design, cond, mid) <= limitWh + 1e-6) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return Math.ceil(hi * 100) / 100;
    }

    private static double unmet(SystemDesign design, HourlyConditions cond, double scale) {
        BatteryBank b = design.battery();
        BatteryBank s = new BatteryBank(b.nominalEnergyWh() * scale, b.floorSoc(), b.ceilingSoc(), b.ceilingSoc(),
                b.chargeEfficiency(), b.dischargeEfficiency(), b.maxChargeW() * Math.max(1, scale), b.maxDischargeW() * Math.max(1, scale));
        SystemDesign d = design.withBattery(s);
        double start = YearSimulation.run(d, cond, AnalysisOptions.NONE).battery().finalSoc();
        s = new BatteryBank(s.nominalEnergyWh(), s.floorSoc(), s.ceilingSoc(), Math.min(1.0, Math.max(s.floorSoc(), start)),
                s.chargeEfficiency(), s.dischargeEfficiency(), s.maxChargeW(), s.maxDischargeW());
        return YearSimulation.run(design.withBattery(s), cond, AnalysisOptions.NONE).reliability().unmetWh();
    }

    private static double sum(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s;
    }
}
