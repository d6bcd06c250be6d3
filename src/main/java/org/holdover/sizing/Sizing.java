package org.holdover.sizing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.holdover.battery.BankDesign;
import org.holdover.battery.BankRequirement;
import org.holdover.battery.BankSizing;
import org.holdover.battery.BatteryModule;
import org.holdover.battery.Chemistry;
import org.holdover.inverter.InverterSpec;
import org.holdover.inverter.LossModel;
import org.holdover.inverter.WeightedEfficiency;
import org.holdover.load.LoadAnalysis;
import org.holdover.load.YearCalendar;
import org.holdover.project.ProjectInput;

/**
 * The sizing rules: inverters against the demand, one bus class at a time from the lowest, the battery
 * bank for the inverter chosen at each class, and the lowest class that gives a passing system.
 */
public final class Sizing {

    /** Residential energy-storage limits, kWh: 2021 IRC R328 (from memory; NFPA 855 has similar limits). */
    public static final double IRC_UNIT_LIMIT_KWH = 20;
    public static final double IRC_UTILITY_SPACE_LIMIT_KWH = 40;
    public static final double IRC_GARAGE_OUTDOOR_LIMIT_KWH = 80;
    public static final String IRC_BASIS = "2021 IRC R328 / NFPA 855-2020 residential limits (from memory; check the edition your jurisdiction adopted)";

    private Sizing() {
    }

    /** The system search's choice, written out in full, with the search's findings. */
    public static SizingResult run(SizingInput in) {
        return run(in, SystemSearch.Options.defaults());
    }

    /** As {@link #run(SizingInput)} with search options (alternatives, sensitivity cases, progress, stop). */
    public static SizingResult run(SizingInput in, SystemSearch.Options options) {
        SearchResult search = SystemSearch.run(in, options);
        SystemPin pin = search.chosen() == null ? null : search.chosen().candidate().pin();
        return rules(in, pin).withSearch(search);
    }

    /**
     * The sizing rules alone (per bus class, from the lowest: the cheapest passing inverter and bank), or, with a pin,
     * the pinned system written out with every check.
     */
    public static SizingResult rules(SizingInput in, SystemPin pin) {
        LoadAnalysis.Figures f = in.loads().figures();
        List<InverterAssessment> assessments = assessAll(in);
        TreeSet<Double> classes = new TreeSet<>();
        in.catalog().inverters().forEach(s -> classes.add(s.busClassV()));
        if (in.wiring().busVoltageV() > 0) {
            classes.removeIf(c -> c != in.wiring().busVoltageV());
        }
        if (pin != null) {
            classes.removeIf(c -> c != pin.busClassV());
        }
        List<BusOption> buses = new ArrayList<>();
        BusOption chosen = null;
        EnergyBasis chosenEnergy = null;
        for (double cls : classes) {
            List<Double> higher = new ArrayList<>(classes.tailSet(cls, false));
            in.catalog().inverters().stream().map(InverterSpec::busClassV).filter(c -> c > cls && !higher.contains(c))
                    .distinct().sorted().forEach(higher::add);
            BusWork w = busOption(cls, assessments, in, higher.isEmpty() ? List.of() : List.of(higher.get(0)), pin);
            BusOption option = w.option;
            if (option.passes() && chosen == null) {
                chosen = new BusOption(option.busClassV(), option.inverter(), option.currentCheck(), option.energyDcWh(),
                        option.banks(), option.bank(), true, pin != null
                        ? "the system search's choice: least demo cost passing every check and the simulated year"
                        : "lowest bus voltage that passes every check");
                chosenEnergy = w.energy;
                option = chosen;
            } else if (option.passes()) {
                option = new BusOption(option.busClassV(), option.inverter(), option.currentCheck(), option.energyDcWh(),
                        option.banks(), option.bank(), true, "passes, but a lower bus voltage also passes");
            }
            buses.add(option);
        }
        if (chosen == null) {
            return new SizingResult(in, assessments, buses, null, null, null, List.of(), List.of(), 0, 0, null, null, null, null);
        }
        InverterAssessment inv = chosen.inverter();
        BankDesign bank = chosen.bank();
        List<Check> checks = new ArrayList<>(inv.checks());
        checks.add(chosen.currentCheck());
        checks.addAll(bankChecks(bank, inv.spec(), chosenEnergy));
        DcDesign dc = chosen.banks().stream().filter(b -> b.design() == bank).findFirst().orElseThrow().dc();
        checks.addAll(dcChecks(dc));
        List<Check> advisories = new ArrayList<>(fireCode(bank, in.location()));
        advisories.add(new Check("dc.shortCircuit", "Prospective short-circuit current at the battery terminals",
                dc.shortCircuit().atBatteryTerminalsA(), org.holdover.dc.ShortCircuit.COMMON_ORDINARY_DEVICE_LIMIT_A, "A",
                Check.Sense.AT_MOST, "above this, use a DC device rated to interrupt it (common practice, no source)"));
        SolarDesign solar = in.solar() == null ? null : PvSizing.size(in, chosen, chosenEnergy, pin == null ? null : pin.pv());
        org.holdover.catalog.GeneratorItem generator = pin == null || pin.generatorId() == null ? null
                : GeneratorPlan.find(in, pin.generatorId());
        if (generator != null) {
            checks.addAll(GeneratorPlan.checks(in, generator, bank));
        }
        if (solar != null) {
            for (Check c : solar.checks()) {
                // With a generator the PV array need not carry the worst month alone: the generator covers the shortfall
                // (the simulated year checks it), so the monthly energy and array-power checks become advisories. The
                // battery's outage or autonomy check stays a check.
                if (generator != null && (c.id().equals(PvSizing.ENERGY) || c.id().equals(PvSizing.ARRAY_POWER))) {
                    advisories.add(new Check(c.id(), c.label() + " (advisory: the generator covers a shortfall)", c.value(),
                            c.limit(), c.unit(), c.sense(), c.basis()));
                } else {
                    checks.add(c);
                }
            }
            advisories.addAll(solar.advisories());
        }
        PvCircuits pvCircuits = solar != null && solar.chosen() != null
                ? PvCircuits.size(in, solar.chosen().candidate(), bank.bankNominalV()) : null;
        if (pvCircuits != null) {
            checks.addAll(pvCircuits.checks());
        }
        InverterLeads leads = dc.leads();
        if (leads != null) {
            checks.addAll(leads.checks());
        }
        LossModel loss = inv.spec().loss();
        double[] batteryTemp = new double[in.loads().calendar().hours()];
        java.util.Arrays.fill(batteryTemp, in.batteryDesignC());
        YearCheck year = null;
        double[] pvW = null;
        double ccEff = 1.0;
        double ccLimit = YearCheck.NO_PV_LIMIT_W;
        if (solar != null && solar.chosen() != null) {
            PvOption o = solar.chosen();
            int n = in.loads().calendar().hours();
            pvW = new double[n];
            for (int h = 0; h < n; h++) {
                // What the controller can draw from the array (a PWM controller gives up the rest).
                pvW[h] = o.output().availableDcW(h) - o.output().pwmGivenUpW(h);
            }
            ccEff = o.controller().controller().efficiency();
            ccLimit = o.output().maxOutputW();
        }
        if (in.mode() == ProjectInput.Mode.BACKUP || pvW != null || generator != null) {
            // Without PV or a generator an off-grid year has nothing to recharge the bank, so it is not simulated.
            year = YearCheck.run(in, bank, loss, chosenEnergy, pvW, ccEff, ccLimit, in.maxUnmetFraction(), batteryTemp,
                    generator == null ? java.util.Optional.empty() : java.util.Optional.of(GeneratorPlan.simulated(in, generator)));
            checks.add(new Check("sim.unmet", "Unmet energy over the simulated year", year.metrics().reliability().unmetWh(),
                    year.unmetLimitWh(), "Wh", Check.Sense.AT_MOST, "project reliability target; hour-by-hour energy balance"));
        }
        return new SizingResult(in, assessments, buses, chosen, chosenEnergy, bank.requirement(), checks, advisories,
                WeightedEfficiency.CEC.of(loss), WeightedEfficiency.EURO.of(loss), year, solar, pvCircuits, null, generator, leads);
    }

    /**
     * Every catalog inverter against the demand, each followed by its units in parallel (2 up to the smaller of its catalog
     * limit and the project's), in catalog order.
     */
    public static List<InverterAssessment> assessAll(SizingInput in) {
        List<InverterAssessment> out = new ArrayList<>();
        for (InverterSpec s : in.catalog().inverters()) {
            for (int n = 1; n <= in.invertersInParallelFor(s); n++) {
                out.add(assess(s.inParallel(n), in));
            }
        }
        return out;
    }

    static InverterAssessment assess(InverterSpec s, SizingInput in) {
        LoadAnalysis.Figures f = in.loads().figures();
        List<String> mismatch = new ArrayList<>();
        if (s.ac().voltsRms() != in.acVoltsRms()) {
            mismatch.add(fmt(s.ac().voltsRms()) + " V output, the service is " + fmt(in.acVoltsRms()) + " V");
        }
        if (s.ac().splitPhase() != in.splitPhase()) {
            mismatch.add(s.ac().splitPhase() ? "split-phase output on a single-phase service"
                    : "single-phase output, the service is 120/240 V split phase");
        }
        if (!s.ac().frequenciesHz().contains(in.frequencyHz())) {
            mismatch.add("no " + fmt(in.frequencyHz()) + " Hz setting");
        }
        double derate = s.deratingFactor(in.inverterAmbientC());
        List<Check> checks = new ArrayList<>();
        String marginBasis = "margin " + in.inverterMargin() + " × coincident running demand";
        checks.add(new Check("inverter.continuousW", "Continuous output (W) at " + fmt(in.inverterAmbientC()) + " °C",
                derate * s.continuousW(), in.inverterMargin() * f.runningPeakW(), "W", Check.Sense.AT_LEAST, marginBasis));
        checks.add(new Check("inverter.continuousVa", "Continuous output (VA) at " + fmt(in.inverterAmbientC()) + " °C",
                derate * s.continuousVa(), in.inverterMargin() * f.runningPeakVa(), "VA", Check.Sense.AT_LEAST, marginBasis));
        boolean motors = !in.loads().starting().isEmpty();
        if (motors) {
            checks.add(new Check("inverter.surgeVa", "Surge output for a " + fmt(f.surgeS()) + " s motor start",
                    s.surgeVa(f.surgeS()), f.surgeVa(), "VA", Check.Sense.AT_LEAST,
                    "running demand of everything else + starting demand of the motors starting together"));
        }
        if (in.splitPhase() && s.ac().splitPhase()) {
            checks.add(new Check("inverter.legVa", "Continuous output of one leg (VA)", derate * s.perLegVa(),
                    in.inverterMargin() * Math.max(f.legL1PeakVa(), f.legL2PeakVa()), "VA", Check.Sense.AT_LEAST,
                    marginBasis + " on the more loaded leg"));
            if (motors) {
                checks.add(new Check("inverter.legSurgeVa", "Surge output of one leg (VA)",
                        s.surgeVa(f.surgeS()) * s.perLegVa() / s.continuousVa(), Math.max(f.surgeL1Va(), f.surgeL2Va()),
                        "VA", Check.Sense.AT_LEAST, "per-leg surge taken in proportion to the per-leg continuous rating"));
            }
        }
        LossModel loss = s.loss();
        double contA = loss.inputW(f.runningPeakW()) / s.dcMinV();
        double surgeA = loss.inputW(motors ? f.surgeW() : f.runningPeakW()) / s.dcMinV();
        return new InverterAssessment(s, mismatch.isEmpty(), String.join("; ", mismatch), derate, checks, contA, surgeA);
    }

    private record BusWork(BusOption option, EnergyBasis energy) {
    }

    /** The continuous battery current at the inverter's cutoff against the project's rule. */
    static Check currentCheck(SizingInput in, InverterAssessment inv) {
        return new Check("bus.continuousA", "Continuous battery current at the low-voltage cutoff",
                inv.continuousDcA(), in.maxBatteryCurrentA(), "A", Check.Sense.AT_MOST,
                "project rule: largest continuous battery current (keeps cables and fuses practical)");
    }

    private static BusWork busOption(double cls, List<InverterAssessment> all, SizingInput in, List<Double> higher,
                                     SystemPin pin) {
        List<InverterAssessment> atClass = all.stream().filter(a -> a.spec().busClassV() == cls).toList();
        List<InverterAssessment> passing = atClass.stream().filter(InverterAssessment::passes)
                .filter(a -> pin == null || pin.isInverter(a.spec()))
                .sorted(Comparator.comparingDouble((InverterAssessment a) -> a.spec().price())
                        .thenComparingDouble(a -> a.spec().continuousW()))
                .toList();
        if (passing.isEmpty()) {
            return new BusWork(new BusOption(cls, null, null, 0, List.of(), null, false,
                    "no inverter at " + fmt(cls) + " V passes: " + closestFailure(atClass)), null);
        }
        BusWork best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        BusWork firstTried = null;
        for (InverterAssessment inv : passing) {
            Check current = currentCheck(in, inv);
            EnergyBasis energy = energy(in, inv.spec().loss());
            List<BankOption> banks = new ArrayList<>();
            for (BatteryModule m : in.catalog().batteryModules()) {
                if (in.chemistry() != null && m.chemistry() != in.chemistry()) {
                    continue;
                }
                if (m.seriesFor(cls) == 0) {
                    continue;
                }
                BankDesign d = BankSizing.size(m, requirement(in, m.chemistry(), cls, energy, inv));
                if (pin != null && m.id().equals(pin.batteryModuleId()) && pin.strings() > d.strings()) {
                    d = d.withStrings(pin.strings());
                }
                String incompatible = incompatibility(d, inv.spec());
                DcDesign dc = d.feasible() && incompatible.isEmpty() ? DcSide.evaluate(in, inv.spec(), d, higher) : null;
                banks.add(new BankOption(d, incompatible, dc));
            }
            BankOption bank = banks.stream().filter(BankOption::usable)
                    .filter(b -> pin == null || b.design().module().id().equals(pin.batteryModuleId()))
                    .min(Comparator.comparingDouble((BankOption b) -> b.design().price())
                            .thenComparingDouble(b -> b.design().bankEnergyWh()))
                    .orElse(null);
            boolean passes = current.passes() && bank != null;
            String reason;
            if (!current.passes()) {
                reason = String.format(Locale.ROOT, "continuous battery current %.0f A exceeds the %.0f A rule",
                        current.value(), current.limit());
            } else if (bank == null) {
                BankOption closest = banks.stream().filter(b -> b.dc() != null).findFirst()
                        .orElse(banks.isEmpty() ? null : banks.get(0));
                reason = closest == null ? "no battery module in the catalog makes a " + fmt(cls) + " V bank"
                        : "no battery bank works: " + closest.design().module().id() + ": " + closest.reason();
                if (closest != null && closest.dc() != null && !closest.dc().workingFixes().isEmpty()) {
                    reason += "; any one of these would fix it: " + String.join("; ", closest.dc().workingFixes());
                }
            } else {
                reason = "passes";
            }
            BusWork w = new BusWork(new BusOption(cls, inv, current, energy.energyDcWh(), banks,
                    bank == null ? null : bank.design(), passes, reason), energy);
            if (bank == null && firstTried != null && firstTried.option.banks().stream().noneMatch(b -> b.dc() != null)
                    && banks.stream().anyMatch(b -> b.dc() != null)) {
                firstTried = w;
            }
            if (firstTried == null) {
                firstTried = w;
            }
            double cost = inv.spec().price() + (bank == null ? 0 : bank.design().price());
            if (passes && cost < bestCost) {
                best = w;
                bestCost = cost;
            }
        }
        return best != null ? best : firstTried;
    }

    private static String closestFailure(List<InverterAssessment> atClass) {
        if (atClass.isEmpty()) {
            return "none in the catalog";
        }
        List<InverterAssessment> matching = atClass.stream().filter(InverterAssessment::acMatch).toList();
        if (matching.isEmpty()) {
            return atClass.get(0).spec().id() + ": " + atClass.get(0).acMismatch();
        }
        InverterAssessment biggest = matching.stream().max(Comparator.comparingDouble(a -> a.spec().continuousW())).get();
        Check c = biggest.firstFailure();
        return String.format(Locale.ROOT, "largest, %s: %s %.0f %s < %.0f %s", biggest.spec().label(), c.label(),
                c.value(), c.unit(), c.limit(), c.unit());
    }

    static BankRequirement requirement(SizingInput in, Chemistry c, double cls, EnergyBasis e, InverterAssessment inv) {
        double dod = in.depthOfDischarge() != null ? in.depthOfDischarge() : c.defaultDepthOfDischarge();
        double eol = in.endOfLife() != null ? in.endOfLife() : c.defaultEndOfLife();
        return new BankRequirement(cls, e.energyDcWh(), e.dischargeHours(), dod, eol, in.batteryColdestC(),
                inv.continuousDcA(), inv.surgeDcA(), in.loads().figures().surgeS(), in.maxParallelRule());
    }

    static String incompatibility(BankDesign d, InverterSpec s) {
        if (d.series() == 0) {
            return "";
        }
        if (d.absorptionV() > s.dcMaxV()) {
            return String.format(Locale.ROOT, "charging voltage %.1f V is above the inverter's %.1f V DC maximum",
                    d.absorptionV(), s.dcMaxV());
        }
        if (d.bankNominalV() < s.dcMinV()) {
            return String.format(Locale.ROOT, "nominal %.1f V is below the inverter's %.1f V cutoff", d.bankNominalV(), s.dcMinV());
        }
        double lowest = Math.max(s.dcMinV(), d.endV());
        if (lowest < s.minDcForAcPeakV()) {
            return String.format(Locale.ROOT, "lowest battery voltage %.1f V is below the %.1f V the bridge needs for the AC peak",
                    lowest, s.minDcForAcPeakV());
        }
        return "";
    }

    /** The DC energy basis of the battery sizing with a given inverter. */
    public static EnergyBasis energy(SizingInput in, LossModel loss) {
        LoadAnalysis la = in.loads();
        YearCalendar cal = la.calendar();
        int n = cal.hours();
        double[] dc = new double[n];
        double[] monthly = new double[12];
        for (int h = 0; h < n; h++) {
            dc[h] = loss.inputW(la.loadW()[h]);
            monthly[cal.month(h) - 1] += dc[h];
        }
        for (int m = 1; m <= 12; m++) {
            monthly[m - 1] /= cal.daysInMonth(m);
        }
        int worst = org.holdover.load.Picks.firstNearMax(monthly) + 1;
        if (in.mode() == ProjectInput.Mode.OFF_GRID) {
            double e = in.autonomyDays() * monthly[worst - 1];
            double ac = in.autonomyDays() * la.figures().monthlyDailyEnergyWh()[worst - 1];
            return new EnergyBasis(dc, monthly, worst, 0, new double[0], -1, e, in.autonomyDays() * 24.0, ac);
        }
        int window = Math.min(n, (int) Math.ceil(in.outageHours() - 1e-9));
        double[] sums = new double[n - window + 1];
        for (int s = 0; s + window <= n; s++) {
            double sum = 0;
            for (int h = s; h < s + window; h++) {
                sum += dc[h];
            }
            sums[s] = sum;
        }
        int bestStart = org.holdover.load.Picks.firstNearMax(sums);
        double best = 0;
        for (double v : sums) {
            best = Math.max(best, v);
        }
        double ac = 0;
        for (int h = bestStart; h < bestStart + window; h++) {
            ac += la.loadW()[h];
        }
        return new EnergyBasis(dc, monthly, worst, window, sums, bestStart, best, window, ac);
    }

    static List<Check> bankChecks(BankDesign b, InverterSpec s, EnergyBasis e) {
        List<Check> checks = new ArrayList<>();
        BatteryModule m = b.module();
        checks.add(new Check("bank.strings", "Parallel strings", b.strings(), b.maxParallel(), "strings", Check.Sense.AT_MOST,
                "module management-system limit / chemistry practice / project rule"));
        checks.add(new Check("bank.continuousA", "Continuous current per string", b.continuousPerStringA(), m.maxContinuousA(),
                "A", Check.Sense.AT_MOST, "module continuous discharge limit"));
        double surgeLimit = b.requirement().surgeS() <= m.surgeS() ? m.maxSurgeA() : m.maxContinuousA();
        checks.add(new Check("bank.surgeA", "Surge current per string", b.surgePerStringA(), surgeLimit, "A", Check.Sense.AT_MOST,
                "module short-time discharge limit for the start duration"));
        checks.add(new Check("bank.chargeV", "Bank charging voltage", b.absorptionV(), s.dcMaxV(), "V", Check.Sense.AT_MOST,
                "inverter DC input maximum"));
        if (s.minDcForAcPeakV() > 0) {
            checks.add(new Check("inverter.acPeak", "Lowest battery voltage for the AC peak",
                    Math.max(s.dcMinV(), b.endV()), s.minDcForAcPeakV(), "V", Check.Sense.AT_LEAST,
                    "√2 × AC RMS ÷ maximum modulation index (transformerless bridge)"));
        }
        double usable = b.usableWh();
        checks.add(new Check("bank.energy", "Usable energy after depth of discharge, temperature, aging and rate",
                usable, e.energyDcWh(), "Wh", Check.Sense.AT_LEAST, "battery sizing chain"));
        return checks;
    }

    static List<Check> dcChecks(DcDesign dc) {
        List<Check> out = new ArrayList<>();
        org.holdover.dc.ConductorSelection.Sized cable = (org.holdover.dc.ConductorSelection.Sized) dc.cable();
        org.holdover.dc.AmpacityStep a = cable.chosen().ampacity();
        org.holdover.dc.VoltageDropStep v = cable.chosen().voltageDrop();
        boolean nec = cable.chosen().size().system() == org.holdover.dc.TableSystem.NEC;
        String size = cable.chosen().size().label() + (cable.chosen().parallelSets() > 1 ? " × " + cable.chosen().parallelSets() : "");
        out.add(new Check("dc.cableTerminal", "Battery cable " + size + ": ampacity at the terminal rating", a.uncorrectedLimitA(),
                a.designCurrentA(), "A", Check.Sense.AT_LEAST, nec ? "NEC 2023 110.14(C), 210.19(A)(1)(a): 1.25 × continuous current"
                        : "IEC 60364-5-52: Iz ≥ Ib"));
        out.add(new Check("dc.cableCorrected", "Battery cable " + size + ": ampacity after ambient correction",
                a.correctedAmpacityA(), a.conditionsOfUseCurrentA(), "A", Check.Sense.AT_LEAST,
                nec ? "NEC 2023 Table 310.16 × 310.15(B)(1)(1) ambient factor" : "IEC 60364-5-52 method C × B.52.14 × B.52.17"));
        out.add(new Check("dc.cableDrop", "Battery cable voltage drop at the continuous current", v.dropPct(), v.limitPct(), "%",
                Check.Sense.AT_MOST, "project limit (drop at the conductor's rated temperature)"));
        org.holdover.dc.OvercurrentDevice.Rated d = cable.device();
        out.add(new Check("dc.fuseRating", "Battery fuse or breaker rating", d.ratingA(), a.designCurrentA(), "A",
                Check.Sense.AT_LEAST, nec ? "next standard rating, NEC 2023 240.6(A), at or above 1.25 × continuous current"
                        : "IEC 60364-4-43: Ib ≤ In"));
        out.add(new Check("dc.fuseProtects", "Fuse or breaker protects the battery cable", d.ratingA(), deviceLimit(d), "A",
                Check.Sense.AT_MOST, nec ? "NEC 2023 240.4 (next size up, 240.4(B), only to 800 A)" : "IEC 60364-4-43: In ≤ Iz"));
        org.holdover.dc.SurgeResult.Operating o = (org.holdover.dc.SurgeResult.Operating) dc.surge();
        out.add(new Check("dc.surgeV", "Inverter DC voltage during the motor start (lowest charge, coldest battery)",
                o.inverterTerminalV(), o.input().lowVoltageCutoffV(), "V", Check.Sense.AT_LEAST,
                "inverter low-voltage cutoff; bank open-circuit voltage at the floor − current × (bank + cable resistance)"));
        out.add(new Check("dc.surgeA", "Battery current during the motor start", o.currentA(), dc.peakLimitA(), "A",
                Check.Sense.AT_MOST, "module short-time limit × strings"));
        return out;
    }

    /** The largest rating that still protects the conductor: the allowable ampacity, or the next size up (≤ 800 A). */
    public static double deviceLimit(org.holdover.dc.OvercurrentDevice.Rated d) {
        return d.basis() == org.holdover.dc.OvercurrentDevice.Basis.NEXT_SIZE_UP ? d.ratingA() : d.allowableAmpacityA();
    }

    static List<Check> fireCode(BankDesign b, ProjectInput.BatteryLocation location) {
        List<Check> out = new ArrayList<>();
        double bankKwh = b.bankEnergyWh() / 1000.0;
        out.add(new Check("code.unitKwh", "Energy of one battery module", b.module().energyWh() / 1000.0,
                IRC_UNIT_LIMIT_KWH, "kWh", Check.Sense.AT_MOST, IRC_BASIS + ": individual units"));
        if (location == null || location == ProjectInput.BatteryLocation.UTILITY_SPACE) {
            out.add(new Check("code.utilityKwh", "Bank energy in a utility closet, basement or storage space", bankKwh,
                    IRC_UTILITY_SPACE_LIMIT_KWH, "kWh", Check.Sense.AT_MOST, IRC_BASIS));
        }
        if (location == null || location == ProjectInput.BatteryLocation.GARAGE || location == ProjectInput.BatteryLocation.OUTDOORS) {
            out.add(new Check("code.garageKwh", "Bank energy in a garage or outdoors", bankKwh,
                    IRC_GARAGE_OUTDOOR_LIMIT_KWH, "kWh", Check.Sense.AT_MOST, IRC_BASIS));
        }
        return out;
    }

    static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }
}
