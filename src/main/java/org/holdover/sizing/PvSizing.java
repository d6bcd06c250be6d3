package org.holdover.sizing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.holdover.battery.BankDesign;
import org.holdover.catalog.ControllerItem;
import org.holdover.catalog.PvModuleItem;
import org.holdover.project.ProjectInput;
import org.holdover.pv.ArrayCandidate;
import org.holdover.pv.ArrayChecks;
import org.holdover.pv.ArrayChooser;
import org.holdover.pv.ArrayDcSeries;
import org.holdover.pv.BackupRefillSizing;
import org.holdover.pv.ChargeController;
import org.holdover.pv.ColdVoc;
import org.holdover.pv.ControllerSeries;
import org.holdover.pv.ControllerSimulation;
import org.holdover.pv.ControllerType;
import org.holdover.pv.MonthlySizingResult;
import org.holdover.pv.PvArray;
import org.holdover.pv.StringDesignConditions;
import org.holdover.pv.TiltSearch;
import org.holdover.pv.WorstMonthSizing;
import org.holdover.solar.PlaneOfArray;
import org.holdover.solar.PoaSeries;
import org.holdover.solar.SurfaceOrientation;

/**
 * Sizes the PV array and charge controller(s) for the battery bank chosen at the chosen bus:
 * <ol>
 *   <li>the battery conditions from the bank: nominal voltage, charging (absorption) voltage, a typical voltage
 *       while charging half way between them (our choice, no source), and the round-trip efficiency of the
 *       chemistry;</li>
 *   <li>for every catalog module: the tilt (the project's, or the one needing the smallest array for the month
 *       that decides, {@link TiltSearch}), the plane-of-array peak sun hours and the DC performance ratio by
 *       month at that tilt;</li>
 *   <li>for every controller of the allowed type that suits the bus: the monthly requirement (off grid the
 *       worst month, {@link WorstMonthSizing}; backup the refill, {@link BackupRefillSizing}), and the wiring
 *       ({@link ArrayChooser}: modules per string × strings × controllers, every NEC 690 check);</li>
 *   <li>the year hour by hour through the chosen controllers ({@link ControllerSimulation}); if some month's
 *       output falls short of its need (PWM operating point, clipping), the requirement is raised by the
 *       shortfall and the wiring chosen again (at most {@value #MAX_TOP_UPS} times);</li>
 *   <li>the pair that passes every check, with fewest advisory failures, at the lowest demo price.</li>
 * </ol>
 */
public final class PvSizing {

    /** Share of the way from nominal to charging voltage taken as the typical voltage while charging (our choice, no source). */
    public static final double OPERATING_SHARE = 0.5;
    /** Largest share of the year's DC energy the controllers may clip before it is flagged, % (common practice, no source). */
    public static final double CLIPPED_LIMIT_PCT = 3.0;
    /** Largest share of the year's DC energy a PWM controller may give up before it is flagged, % (our rule, no source). */
    public static final double PWM_GIVEN_UP_LIMIT_PCT = 30.0;
    /** Times the requirement is raised after the hourly check. */
    public static final int MAX_TOP_UPS = 4;
    /** Added to a shortfall's ratio when raising the requirement, so the next array does reach it. */
    static final double TOP_UP_SLACK = 1e-6;
    /** Output ÷ need of a month that needs nothing. */
    public static final double NO_NEED_RATIO = 1000.0;

    public static final String COLD_VOC = "pv.coldVoc";
    public static final String RECORD_LOW_IN_TABLE = "pv.recordLowInTable";
    public static final String SYSTEM_VOLTAGE = "pv.systemVoltage";
    public static final String HOT_VMP = "pv.hotVmp";
    public static final String INPUT_CURRENT = "pv.inputCurrent";
    public static final String OUTPUT_CURRENT = "pv.outputCurrent";
    public static final String ARRAY_POWER = "pv.arrayPower";
    public static final String ENERGY = "pv.energy";
    public static final String CLIPPED = "pv.clipped";
    public static final String PWM_GIVEN_UP = "pv.pwmGivenUp";
    public static final String CONTROLLERS = "pv.controllers";
    public static final String SUN = "pv.sun";

    private static final String[] MONTHS = {"January", "February", "March", "April", "May", "June", "July", "August",
        "September", "October", "November", "December"};

    /** Best first: passes every rejecting check, fewest advisory failures, lowest price, then the chooser's order. */
    public static final Comparator<PvOption> ORDER = Comparator.comparing((PvOption o) -> !o.passes())
            .thenComparingLong(PvOption::advisoryFailures)
            .thenComparingDouble(PvOption::price)
            .thenComparing(PvOption::candidate, ArrayChooser.ORDER);

    private PvSizing() {
    }

    /**
     * @param in     the sizing input (its {@code solar()} must not be null)
     * @param chosen the chosen bus option (with its bank)
     * @param energy the energy basis with the chosen inverter
     */
    public static SolarDesign size(SizingInput in, BusOption chosen, EnergyBasis energy) {
        return size(in, chosen, energy, null);
    }

    /**
     * As {@link #size(SizingInput, BusOption, EnergyBasis)}, with the layout of one module and controller pair fixed
     * (a system search's choice): that pair's option uses the pinned layout and is the one chosen.
     *
     * @param pin the fixed layout, or null for the sizing's own choice
     */
    public static SolarDesign size(SizingInput in, BusOption chosen, EnergyBasis energy, SystemPin.PvPin pin) {
        Pairs p = pairs(in, chosen, energy);
        if (p.failure != null) {
            return p.failure;
        }
        List<PvOption> options = new ArrayList<>();
        PvOption pinned = null;
        for (Pair pair : p.pairs) {
            PvOption o = pair.option();
            if (pin != null && pin.moduleId().equals(pair.mi.id()) && pin.controllerId().equals(pair.ci.id())) {
                o = pair.variant(o, pin.modulesPerString(), pin.stringsPerController(), pin.controllers());
                pinned = o;
            }
            options.add(o);
        }
        if (pin != null && pinned == null) {
            throw new IllegalArgumentException("pinned PV pair " + pin.moduleId() + " / " + pin.controllerId() + " was not sized");
        }
        options.sort(ORDER);
        PvOption best = pinned != null ? pinned : options.get(0);
        return new SolarDesign(p.s, p.method, p.rte, p.load, p.refill, p.cond, p.bus, options, best, best.checks(),
                best.advisories(), "");
    }

    /**
     * Every module and controller pair for the bank at the bus option, ready to build the sizing's own layout or a
     * fixed one; or the design saying why none can be sized.
     */
    public static Pairs pairs(SizingInput in, BusOption chosen, EnergyBasis energy) {
        return pairs(in, chosen, energy, null);
    }

    /** As above, with the irradiance and performance ratios from a memo made for the project's solar setup (or null). */
    public static Pairs pairs(SizingInput in, BusOption chosen, EnergyBasis energy, org.holdover.pv.PlaneMemo memo) {
        SolarSetup s = in.solar();
        BankDesign bank = chosen.bank();
        double rte = bank.module().chemistry().roundTripEfficiency();
        double nominal = bank.bankNominalV();
        double charge = bank.absorptionV();
        double operating = nominal + OPERATING_SHARE * (charge - nominal);
        StringDesignConditions cond = new StringDesignConditions(s.recordLowC(), s.designHighC(), s.designIrradianceWm2(),
                nominal, operating, charge, OptionalDouble.of(s.systemVoltageLimitV()));
        boolean offGrid = in.mode() == ProjectInput.Mode.OFF_GRID;
        SolarDesign.Method method = offGrid ? SolarDesign.Method.WORST_MONTH : SolarDesign.Method.REFILL;
        double[] load = energy.monthlyDailyDcWh().clone();
        double refill = offGrid ? 0.0 : energy.energyDcWh();
        double days = s.refillDays();
        double[] forTilt = new double[12];
        for (int m = 0; m < 12; m++) {
            forTilt[m] = offGrid ? load[m] : load[m] + refill / days;
        }
        double bus = chosen.busClassV();
        List<ControllerItem> controllers = in.catalog().chargeControllers().stream()
                .filter(c -> c.suits(bus) && (s.controllerType() == null || c.controller().type() == s.controllerType()))
                .toList();
        if (controllers.isEmpty()) {
            String what = (s.controllerType() == null ? "" : s.controllerType().name() + " ") + "charge controllers for a "
                    + fmt(bus) + " V bank";
            Check none = new Check(CONTROLLERS, "Catalog " + what, 0, 1, "units", Check.Sense.AT_LEAST,
                    "catalog: chargeControllers whose batteryV lists " + fmt(bus)
                            + (s.controllerType() == null ? "" : " (solar.controller: " + s.controllerType().name().toLowerCase(Locale.ROOT) + ")"));
            return new Pairs(null, null, 0, null, null, 0, 0, List.of(), new SolarDesign(s, method, rte, load, refill, cond,
                    bus, List.of(), null, List.of(none), List.of(), "no " + what + " in the catalog"));
        }
        double[] air = s.weather().airTempC();
        List<Pair> pairs = new ArrayList<>();
        int infeasible = 0;
        int sunlessMonths = 0;
        List<PvModuleItem> modules = in.catalog().pvModules();
        List<TiltSearch.Result> searches = tilts(s, modules, forTilt, rte, memo);
        for (int mIndex = 0; mIndex < modules.size(); mIndex++) {
            PvModuleItem mi = modules.get(mIndex);
            TiltSearch.Result tr = searches.get(mIndex);
            double tilt = tr.chosen().tiltDeg();
            org.holdover.solar.PoaSettings at = s.settings().withOrientation(
                    new SurfaceOrientation(tilt, s.settings().orientation().azimuthDeg()));
            PoaSeries poa = memo == null ? PlaneOfArray.hourly(s.weather(), s.sunPath(), at) : memo.poa(at);
            double[] psh = memo == null ? poa.monthlyPeakSunHours(false) : memo.peakSunHours(at);
            double[] prRaw = memo == null
                    ? ArrayDcSeries.compute(new PvArray(mi.module(), 1, 1), poa, air, s.losses()).monthlyDcPerformanceRatio()
                    : memo.monthlyPerformanceRatio(at, mi.module());
            double[] pr = new double[12];
            for (int m = 0; m < 12; m++) {
                pr[m] = Double.isNaN(prRaw[m]) || prRaw[m] <= 0 ? 0.0 : prRaw[m];
            }
            for (ControllerItem ci : controllers) {
                double eta = ci.controller().efficiency();
                double[] derate = new double[12];
                for (int m = 0; m < 12; m++) {
                    derate[m] = pr[m] > 0 ? pr[m] * eta : 1.0;
                }
                MonthlySizingResult sizing = offGrid
                        ? WorstMonthSizing.size(new WorstMonthSizing.Input(load, psh, derate, rte))
                        : BackupRefillSizing.size(new BackupRefillSizing.Input(refill, days, load, psh, derate, rte, rte));
                if (!sizing.feasible()) {
                    infeasible++;
                    int bad = 0;
                    for (double w : sizing.requiredStcWByMonth()) {
                        bad += Double.isInfinite(w) ? 1 : 0;
                    }
                    sunlessMonths = Math.max(sunlessMonths, bad);
                    continue;
                }
                double[] byTilt = new double[tr.options().size()];
                for (int i = 0; i < byTilt.length; i++) {
                    byTilt[i] = tr.options().get(i).sizing().requiredStcW() / eta;
                }
                double[] tried = tr.options().stream().mapToDouble(TiltSearch.Option::tiltDeg).toArray();
                pairs.add(new Pair(s, mi, ci, tilt, tried, byTilt, psh, pr, derate, sizing, poa, air, cond, load, refill, days, rte,
                        offGrid));
            }
        }
        if (pairs.isEmpty()) {
            Check sun = new Check(SUN, "Months whose load the sun at the site can meet", 12 - sunlessMonths, 12, "months",
                    Check.Sense.AT_LEAST, "a month with load but no sunshine on the array cannot be met by any array");
            return new Pairs(null, null, 0, null, null, 0, 0, List.of(), new SolarDesign(s, method, rte, load, refill, cond,
                    bus, List.of(), null, List.of(sun), List.of(),
                    "some month has load but no sun on the array (" + infeasible + " module and controller pairs)"));
        }
        return new Pairs(s, method, rte, load, cond, refill, bus, pairs, null);
    }

    /**
     * The pairs of one bank, with what the design needs to be written (or, in {@code failure}, why none).
     */
    public record Pairs(SolarSetup s, SolarDesign.Method method, double rte, double[] load, StringDesignConditions cond,
                        double refill, double bus, List<Pair> pairs, SolarDesign failure) {
    }

    /** One module and controller pair at its tilt, with its monthly sizing. */
    public record Pair(SolarSetup s, PvModuleItem mi, ControllerItem ci, double tilt, double[] tried, double[] byTilt,
                       double[] psh, double[] pr, double[] derate, MonthlySizingResult sizing, PoaSeries poa, double[] air,
                       StringDesignConditions cond, double[] load, double refill, double days, double rte, boolean offGrid) {

        /** The sizing's own layout: the requirement raised until the hourly check meets every month's need. */
        public PvOption option() {
            return PvSizing.option(s, mi, ci, tilt, tried, byTilt, psh, pr, derate, sizing, poa, air, cond, load, refill, days,
                    rte, offGrid);
        }

        /**
         * A fixed layout, checked against the same requirement as the sizing's own.
         *
         * @param base this pair's own option ({@link #option()}), whose requirement and top-up are kept
         */
        public PvOption variant(PvOption base, int modulesPerString, int stringsPerController, int controllers) {
            return PvSizing.variant(this, base, modulesPerString, stringsPerController, controllers);
        }

        /** The string lengths the controller's window allows at these conditions (empty when none). */
        public StringWindowRange window() {
            org.holdover.pv.StringWindow w = org.holdover.pv.StringWindow.of(mi.module(), ci.controller(), cond);
            return w.isEmpty() ? new StringWindowRange(1, 0) : new StringWindowRange(w.minModules(), w.maxModules());
        }
    }

    /** Modules per string from {@code min} to {@code max} (empty when max &lt; min). */
    public record StringWindowRange(int min, int max) {
    }

    /** Coarse tilt step of the search, in steps of the setup's tilt list (every 5th: 5° with 1° steps). */
    public static final int COARSE_EVERY = 5;

    /**
     * The tilt search for every module: every {@value #COARSE_EVERY}th tilt of the setup's list first, then every
     * tilt within {@value #COARSE_EVERY} − 1 steps of each module's best (our choice: the array needed changes
     * smoothly with tilt). Each result lists every tilt tried, in increasing order; its best is the tilt needing the
     * smallest array, ties to the lower tilt.
     */
    static List<TiltSearch.Result> tilts(SolarSetup s, List<PvModuleItem> items, double[] dailyWh, double rte,
                                         org.holdover.pv.PlaneMemo memo) {
        double[] all = s.tiltsDeg();
        List<org.holdover.pv.PvModule> modules = items.stream().map(PvModuleItem::module).toList();
        if (all.length <= 2 * COARSE_EVERY) {
            return TiltSearch.searchAll(input(s, all, modules.get(0), dailyWh, rte), modules, memo);
        }
        java.util.TreeSet<Integer> coarse = new java.util.TreeSet<>();
        for (int i = 0; i < all.length; i += COARSE_EVERY) {
            coarse.add(i);
        }
        coarse.add(all.length - 1);
        List<TiltSearch.Result> first = TiltSearch.searchAll(input(s, pick(all, coarse), modules.get(0), dailyWh, rte), modules, memo);
        java.util.TreeSet<Integer> fine = new java.util.TreeSet<>();
        for (TiltSearch.Result r : first) {
            int centre = indexOf(all, r.chosen().tiltDeg());
            for (int i = Math.max(0, centre - COARSE_EVERY + 1); i <= Math.min(all.length - 1, centre + COARSE_EVERY - 1); i++) {
                if (!coarse.contains(i)) {
                    fine.add(i);
                }
            }
        }
        if (fine.isEmpty()) {
            return first;
        }
        List<TiltSearch.Result> second = TiltSearch.searchAll(input(s, pick(all, fine), modules.get(0), dailyWh, rte), modules, memo);
        List<TiltSearch.Result> merged = new ArrayList<>();
        for (int k = 0; k < modules.size(); k++) {
            List<TiltSearch.Option> opts = new ArrayList<>(first.get(k).options());
            opts.addAll(second.get(k).options());
            opts.sort(Comparator.comparingDouble(TiltSearch.Option::tiltDeg));
            int best = 0;
            for (int i = 1; i < opts.size(); i++) {
                if (opts.get(i).sizing().requiredStcW() < opts.get(best).sizing().requiredStcW()) {
                    best = i;
                }
            }
            merged.add(new TiltSearch.Result(opts, best));
        }
        return merged;
    }

    private static TiltSearch.Input input(SolarSetup s, double[] tilts, org.holdover.pv.PvModule m, double[] dailyWh,
                                          double rte) {
        return new TiltSearch.Input(s.weather(), s.sunPath(), s.settings(), tilts, m, s.losses(), 1.0, dailyWh, rte);
    }

    private static double[] pick(double[] all, java.util.SortedSet<Integer> at) {
        return at.stream().mapToDouble(i -> all[i]).toArray();
    }

    private static int indexOf(double[] all, double v) {
        for (int i = 0; i < all.length; i++) {
            if (all[i] == v) {
                return i;
            }
        }
        throw new IllegalStateException("tilt " + v + " not in the list");
    }

    private static PvOption option(SolarSetup s, PvModuleItem mi, ControllerItem ci, double tilt, double[] tiltsTried,
                                   double[] byTilt,
                                   double[] psh, double[] pr, double[] derate, MonthlySizingResult sizing, PoaSeries poa,
                                   double[] air, StringDesignConditions cond, double[] load, double refill, double days,
                                   double rte, boolean offGrid) {
        double[] need = new double[12];
        for (int m = 0; m < 12; m++) {
            need[m] = offGrid ? load[m] / rte : (refill / rte + days * load[m] / rte) / days;
        }
        double topUp = 1.0;
        Built b = null;
        for (int i = 0; i <= MAX_TOP_UPS; i++) {
            double required = Math.max(sizing.requiredStcW() * topUp, Double.MIN_NORMAL);
            ArrayChooser.Input chooserIn = new ArrayChooser.Input(required, List.of(mi.module()), List.of(ci.controller()), cond,
                    s.maxControllers());
            ArrayCandidate cand = ArrayChooser.choose(chooserIn).get(0);
            b = build(cand, poa, air, s, cond, need, required, topUp);

            if (b.ratio >= 1.0 || !cand.passesRequired() || i == MAX_TOP_UPS) {
                break;
            }
            topUp = topUp / b.ratio * (1 + TOP_UP_SLACK);
        }
        return finish(s, mi, ci, tilt, tiltsTried, byTilt, psh, pr, derate, sizing, poa, cond, need, topUp, b, offGrid);
    }

    static PvOption variant(Pair p, PvOption base, int n, int strings, int k) {
        double[] need = base.needWhPerDay();
        ArrayChooser.Input chooserIn = new ArrayChooser.Input(base.requiredStcW(), List.of(p.mi.module()),
                List.of(p.ci.controller()), p.cond, Math.max(k, p.s.maxControllers()));
        ArrayCandidate f = ArrayChooser.fixed(p.mi.module(), p.ci.controller(), n, strings, k, chooserIn);
        Built b = build(f, base.poa(), p.air, p.s, p.cond, need, base.requiredStcW(), base.topUp());
        return finish(p.s, p.mi, p.ci, p.tilt, p.tried, p.byTilt, p.psh, p.pr, p.derate, p.sizing, base.poa(), p.cond, need,
                base.topUp(), b, p.offGrid);
    }

    private static PvOption finish(SolarSetup s, PvModuleItem mi, ControllerItem ci, double tilt, double[] tried,
                                   double[] byTilt, double[] psh, double[] pr, double[] derate, MonthlySizingResult sizing,
                                   PoaSeries poa, StringDesignConditions cond, double[] need, double topUp, Built b,
                                   boolean offGrid) {
        ArrayCandidate cand = b.candidate;
        boolean pwm = ci.controller().type() == ControllerType.PWM;
        List<Check> checks = new ArrayList<>();
        List<Check> advisories = new ArrayList<>();
        for (org.holdover.pv.Check c : cand.checks()) {
            Check converted = convert(c, cand, cond);
            if (c.severity() == org.holdover.pv.Check.Severity.ADVISORY) {
                advisories.add(converted);
            } else {
                checks.add(converted);
            }
        }
        int t = b.tightest;
        checks.add(new Check(ENERGY, "PV energy to the battery per day in the tightest month (" + MONTHS[t] + ")",
                b.outWhPerDay[t], need[t], "Wh/day", Check.Sense.AT_LEAST, offGrid
                        ? "hourly simulation of the controllers; need = the loads' DC energy ÷ battery round trip"
                        : "hourly simulation of the controllers; need = (refill + refill days × the loads' DC energy) ÷ round trip ÷ refill days"));
        ControllerSeries out = b.output;
        double avail = out.annualAvailableDcWh();
        advisories.add(new Check(CLIPPED, "PV energy the controllers clip, share of the year's DC energy",
                avail > 0 ? 100.0 * out.annualClippedDcWh() / avail : 0.0, CLIPPED_LIMIT_PCT, "%", Check.Sense.AT_MOST,
                "hourly simulation: output held at rated current × battery voltage; limit " + PRACTICE));
        if (pwm) {
            advisories.add(new Check(PWM_GIVEN_UP, "PV energy given up by running at battery voltage (PWM), share of the year's DC energy",
                    avail > 0 ? 100.0 * out.annualPwmGivenUpWh() / avail : 0.0, PWM_GIVEN_UP_LIMIT_PCT, "%", Check.Sense.AT_MOST,
                    "hourly simulation, two-line I–V curve at the cell temperature; limit our rule, no source"));
        }
        double price = cand.totalModules() * mi.price() + cand.controllerCount() * ci.price();
        return new PvOption(mi, ci, tilt, tried, byTilt, psh, pr, derate, sizing, topUp, b.required, cand, poa, b.dc,
                out, b.outWhPerDay, need, t, checks, advisories, price);
    }

    static final String PRACTICE = ProjectAssembler.PRACTICE;

    private record Built(ArrayCandidate candidate, double required, ArrayDcSeries dc, ControllerSeries output,
                         double[] outWhPerDay, int tightest, double ratio) {
    }

    private static Built build(ArrayCandidate cand, PoaSeries poa, double[] air, SolarSetup s, StringDesignConditions cond,
                               double[] need, double required, double topUp) {
        int k = cand.controllerCount();
        PvArray whole = new PvArray(cand.module(), cand.modulesPerString(), cand.stringsPerController() * k);
        ArrayDcSeries dc = ArrayDcSeries.compute(whole, poa, air, s.losses());
        ControllerSeries out = ControllerSimulation.run(together(cand.controller(), k), dc, cond);
        double[] perDay = out.monthlyMeanDailyOutputWh();
        int tightest = 0;
        double worst = Double.POSITIVE_INFINITY;
        for (int m = 0; m < 12; m++) {
            double r = ratio(perDay[m], need[m]);
            if (r < worst) {
                worst = r;
                tightest = m;
            }
        }
        return new Built(cand, required, dc, out, perDay, tightest, worst);
    }

    /** Output ÷ need of one month; {@value #NO_NEED_RATIO} when the month needs nothing. */
    public static double ratio(double outputWh, double needWh) {
        return needWh > 0 ? outputWh / needWh : NO_NEED_RATIO;
    }

    /** {@code k} identical controllers in parallel as one with the summed current ratings. */
    public static ChargeController together(ChargeController c, int k) {
        if (k == 1) {
            return c;
        }
        return new ChargeController(c.name() + " × " + k, c.type(), c.maxPvInputV(), c.maxInputCurrentA() * k,
                c.ratedOutputCurrentA() * k, c.efficiency(), c.minHeadroomV());
    }

    private static Check convert(org.holdover.pv.Check c, ArrayCandidate cand, StringDesignConditions cond) {
        String method = cand.perController().window().coldVoc() instanceof ColdVoc.ByCoefficient b
                ? String.format(Locale.ROOT, "coefficient method, %.3f %%/°C", 100 * b.vocPerC())
                : "Table 690.7(A) factor";
        String controller = cand.controller().name();
        Check.Sense sense = c.bound() == org.holdover.pv.Check.Bound.MAX ? Check.Sense.AT_MOST : Check.Sense.AT_LEAST;
        return switch (c.id()) {
            case ArrayChecks.COLD_VOC -> new Check(COLD_VOC, "PV string open-circuit voltage at the record low "
                    + fmt(cond.recordLowC()) + " °C", c.value(), c.limit(), "V", sense,
                    "NEC 690.7(A), " + method + "; limit: " + controller + " maximum PV input");
            case ArrayChecks.RECORD_LOW_IN_TABLE -> new Check(RECORD_LOW_IN_TABLE, "Record low within NEC Table 690.7(A) (kelvin)",
                    c.value() + 273.15, c.limit() + 273.15, "K", Check.Sense.AT_LEAST,
                    "Table 690.7(A) ends at −40 °C; colder sites need the module's V_oc coefficient");
            case ArrayChecks.SYSTEM_VOLTAGE -> new Check(SYSTEM_VOLTAGE, "PV string open-circuit voltage against the code's system limit",
                    c.value(), c.limit(), "V", sense, "NEC 690.7: " + fmt(c.limit()) + " V (one- and two-family dwellings)");
            case ArrayChecks.HOT_VMP -> new Check(HOT_VMP, "PV string maximum-power voltage with hot cells", c.value(), c.limit(),
                    "V", sense, String.format(Locale.ROOT, "must reach the charging voltage + the controller's headroom;"
                            + " cells at %.1f °C (NOCT model, %s °C air, %.0f W/m²)",
                            cand.perController().window().hotCellTempC(), fmt(cond.designHighAirC()), cond.designIrradianceWm2()));
            case ArrayChecks.INPUT_CURRENT -> new Check(INPUT_CURRENT, "PV circuit current 1.25 × Isc, each controller",
                    c.value(), c.limit(), "A", sense, "NEC 690.8(A)(1); limit: " + controller + " maximum input current");
            case ArrayChecks.OUTPUT_CURRENT -> cand.controller().type() == ControllerType.MPPT
                    ? new Check(OUTPUT_CURRENT, "Controller output current at the array's STC power, each controller", c.value(),
                    c.limit(), "A", sense, "STC power × efficiency ÷ nominal battery voltage; above the rating the controller"
                            + " clips (energy lost is checked below)")
                    : new Check(OUTPUT_CURRENT, "PWM controller current 1.25 × Isc, each controller", c.value(), c.limit(), "A",
                    sense, "a PWM controller passes the array current: " + PRACTICE);
            case "array-power-vs-required" -> new Check(ARRAY_POWER, cand.controller().type() == ControllerType.PWM
                    ? "PV array power (STC × PWM ratio) against the sizing" : "PV array STC power against the sizing",
                    c.value(), c.limit(), "W", sense, "the monthly sizing's requirement");
            default -> throw new IllegalStateException("unknown PV check " + c.id());
        };
    }

    static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }
}
