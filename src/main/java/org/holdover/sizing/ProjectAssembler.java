package org.holdover.sizing;

import java.nio.file.Path;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import org.holdover.battery.Chemistry;
import org.holdover.catalog.Catalog;
import org.holdover.catalog.CatalogReader;
import org.holdover.load.Appliance;
import org.holdover.load.Leg;
import org.holdover.load.LoadAnalysis;
import org.holdover.load.LoadModel;
import org.holdover.load.LockedRotor;
import org.holdover.load.MeasuredProfile;
import org.holdover.load.Motor;
import org.holdover.load.NemaCodeLetter;
import org.holdover.load.ProfileCsvReader;
import org.holdover.load.YearCalendar;
import org.holdover.project.InputException;
import org.holdover.project.Problem;
import org.holdover.project.Project;
import org.holdover.project.ProjectInput;
import org.holdover.project.ProjectInput.ApplianceInput;
import org.holdover.project.ProjectInput.MotorInput;
import org.holdover.project.ProjectValidator;

/**
 * Turns a validated project into the sizing input: defaults applied (each recorded as an assumption
 * with its source), the load profile read, appliances placed on legs, the catalog loaded.
 */
public final class ProjectAssembler {

    /** Defaults and their sources. */
    public static final double DEFAULT_MARGIN = 1.25;
    public static final double DEFAULT_MAX_BATTERY_A = 150;
    public static final double DEFAULT_PF_RESISTIVE = 1.0;
    public static final double DEFAULT_PF_MOTOR = 0.8;
    public static final double DEFAULT_PF_PROFILE = 0.9;
    public static final double DEFAULT_LR_PF = 0.5;
    public static final double DEFAULT_START_S = 1.0;
    public static final double DEFAULT_SOFT_FACTOR = 0.5;
    public static final double DEFAULT_VFD_FACTOR = 0.25;
    public static final double DEFAULT_TEMP_C = 25;
    public static final int DEFAULT_YEAR = 2025;
    static final String PRACTICE = "common practice, no source";

    private ProjectAssembler() {
    }

    public static SizingInput assemble(Project project) throws InputException {
        ProjectInput p = project.input();
        List<Assumption> assumptions = new ArrayList<>();
        List<Problem> warnings = new ArrayList<>(project.warnings());
        ProjectInput.SiteInput site = p.site();
        boolean split = site.ac().wiring() == ProjectInput.AcWiring.SPLIT_PHASE;
        double volts = site.ac().voltsRms();

        ZoneId zone;
        if (site.timeZone() != null) {
            zone = ZoneId.of(site.timeZone());
        } else if (site.utcOffsetHours() != null) {
            zone = ZoneOffset.ofTotalSeconds((int) Math.round(site.utcOffsetHours() * 3600));
        } else {
            zone = ZoneOffset.ofHours((int) Math.round(site.longitudeDeg() / 15.0));
        }

        MeasuredProfile measured = null;
        ProjectInput.ProfileInput pr = p.loads().profile();
        if (pr != null) {
            Path file = project.resolve(pr.file());
            measured = ProfileCsvReader.read(file, project.displayOf(pr.file()), site.year(), zone,
                    pr.maxGapHours() == null ? 0 : pr.maxGapHours());
            warnings.addAll(measured.warnings());
        }
        int year = site.year() != null ? site.year() : measured != null ? measured.year() : DEFAULT_YEAR;
        assumptions.add(new Assumption("Calendar year of the hourly series", year, "", site.year() != null ? "project"
                : "default", "weekdays and leap year follow this year"));
        YearCalendar cal = new YearCalendar(year);

        boolean backup = p.mode() == ProjectInput.Mode.BACKUP;
        List<Appliance> appliances = new ArrayList<>();
        List<ApplianceInput> ins = p.loads().appliances() == null ? List.of() : p.loads().appliances();
        List<Leg> legs = assignLegs(ins, split);
        boolean anyMotor = false;
        for (int i = 0; i < ins.size(); i++) {
            ApplianceInput a = ins.get(i);
            appliances.add(appliance(a, legs.get(i), backup, volts, split));
            anyMotor |= a.motor() != null;
        }
        double[] profileW = null;
        double profilePf = DEFAULT_PF_PROFILE;
        double scale = 1.0;
        boolean served = false;
        if (measured != null) {
            served = !backup || pr.critical() == null || pr.critical();
            scale = pr.scale() == null ? 1.0 : pr.scale();
            double factor = served ? scale : 0.0;
            profileW = measured.hourlyW().clone();
            for (int h = 0; h < profileW.length; h++) {
                profileW[h] = profileW[h] * factor;
            }
            profilePf = pr.powerFactor() == null ? DEFAULT_PF_PROFILE : pr.powerFactor();
            assumptions.add(new Assumption("Power factor of the measured profile", profilePf, "", given(pr.powerFactor()),
                    pr.powerFactor() == null ? PRACTICE : "project"));
            assumptions.add(new Assumption("Profile scale factor", scale, "×", given(pr.scale()), "project"));
        }
        if (ins.stream().anyMatch(a -> a.powerFactor() == null)) {
            assumptions.add(new Assumption("Running power factor, resistive loads (when not given)", DEFAULT_PF_RESISTIVE, "",
                    "default", PRACTICE));
            if (anyMotor) {
                assumptions.add(new Assumption("Running power factor, motor loads (when not given)", DEFAULT_PF_MOTOR, "",
                        "default", PRACTICE));
            }
        }
        if (anyMotor) {
            assumptions.add(new Assumption("Locked-rotor power factor (when not given)", DEFAULT_LR_PF, "", "default", PRACTICE));
            assumptions.add(new Assumption("Start duration (when not given)", DEFAULT_START_S, "s", "default", PRACTICE));
            assumptions.add(new Assumption("Soft starter: share of direct-on-line starting demand (when not given)",
                    DEFAULT_SOFT_FACTOR, "", "default", PRACTICE));
            assumptions.add(new Assumption("Variable-frequency drive: share of direct-on-line starting demand (when not given)",
                    DEFAULT_VFD_FACTOR, "", "default", PRACTICE));
        }

        ProjectInput.RulesInput rules = p.rules();
        int together = rules != null && rules.motorsStartingTogether() != null ? rules.motorsStartingTogether() : 1;
        if (anyMotor) {
            assumptions.add(new Assumption("Motors starting at the same moment (largest first)", together, "",
                    rules != null && rules.motorsStartingTogether() != null ? "project" : "default", PRACTICE));
        }
        LoadAnalysis loads = LoadModel.analyse(cal, appliances, profileW, profilePf, together, split);

        double margin = rules != null && rules.inverterMargin() != null ? rules.inverterMargin() : DEFAULT_MARGIN;
        assumptions.add(new Assumption("Inverter margin over coincident running demand", margin, "×",
                rules != null && rules.inverterMargin() != null ? "project" : "default", PRACTICE));
        double maxA = rules != null && rules.maxBatteryCurrentA() != null ? rules.maxBatteryCurrentA() : DEFAULT_MAX_BATTERY_A;
        assumptions.add(new Assumption("Largest continuous battery current for the bus choice", maxA, "A",
                rules != null && rules.maxBatteryCurrentA() != null ? "project" : "default",
                PRACTICE + "; 150 A × 1.25 = 187.5 A fits one 3/0 AWG copper conductor (NEC 2023 Table 310.16, 75 °C: 200 A)"));
        int maxParallel = rules != null && rules.maxParallelStrings() != null ? rules.maxParallelStrings() : 0;
        int maxInverters = rules != null && rules.maxInvertersInParallel() != null ? rules.maxInvertersInParallel()
                : SizingInput.DEFAULT_MAX_INVERTERS_IN_PARALLEL;
        assumptions.add(new Assumption("Most identical inverters in parallel", maxInverters, "",
                rules != null && rules.maxInvertersInParallel() != null ? "project" : "default",
                "bounds the search; each unit's own catalog limit applies too (1 when its maker does not allow parallel units)"));

        double invAmbient = site.inverterAmbientC() != null ? site.inverterAmbientC() : DEFAULT_TEMP_C;
        assumptions.add(new Assumption("Ambient around the inverter", invAmbient, "°C", given(site.inverterAmbientC()),
                site.inverterAmbientC() != null ? "project" : PRACTICE));
        double cold = DEFAULT_TEMP_C;
        if (site.batteryAmbientC() != null && site.batteryAmbientC().coldest() != null) {
            cold = site.batteryAmbientC().coldest();
        } else {
            warnings.add(project.problemAt("site.batteryAmbientC.coldest", "not given; the battery is taken to be at "
                    + (int) DEFAULT_TEMP_C + " °C", "give the coldest battery temperature: capacity falls in the cold"));
        }
        assumptions.add(new Assumption("Coldest battery temperature", cold, "°C",
                site.batteryAmbientC() != null && site.batteryAmbientC().coldest() != null ? "project" : "default",
                "capacity temperature correction is taken at this temperature"));

        ProjectInput.BatteryInput b = p.battery();
        Chemistry chem = b != null && b.chemistry() != null ? Chemistry.fromWord(b.chemistry()) : null;
        Double dod = b != null && b.maxDepthOfDischargePct() != null ? b.maxDepthOfDischargePct() / 100.0 : null;
        Double eol = b != null && b.endOfLifeCapacityPct() != null ? b.endOfLifeCapacityPct() / 100.0 : null;
        if (dod != null) {
            assumptions.add(new Assumption("Deepest design discharge (all chemistries)", dod, "", "project", "project"));
        }
        if (eol != null) {
            assumptions.add(new Assumption("Capacity at end of life (all chemistries)", eol, "", "project", "project"));
        }

        Catalog catalog;
        if (p.catalog() == null || p.catalog().equals("builtin")) {
            catalog = CatalogReader.builtin();
        } else {
            catalog = CatalogReader.read(project.resolve(p.catalog()), project.displayOf(p.catalog()));
        }
        if (catalog.demoData()) {
            warnings.add(new Problem(org.holdover.project.SourceLocation.of(catalog.source()), "",
                    "the components are invented demo data", "use your own catalog for a real quote"));
        }
        WiringRules wiring = wiring(p, assumptions, warnings, project);
        double outage = backup ? p.backup().outageHours() : 0;
        double days = backup ? 0 : p.offGrid().autonomyDays();
        SolarSetup solar = p.solar() == null ? null : SolarAssembler.assemble(project, year, catalog, assumptions, warnings);
        return new SizingInput(p.name(), p.mode(), volts, site.ac().frequencyHz(), split, invAmbient, cold, margin, maxA,
                maxParallel, chem, dod, eol, b == null ? null : b.location(), outage, days, loads, catalog, assumptions,
                warnings, p.notes() == null ? List.of() : p.notes(), measured == null ? null : measured.hourlyW(), scale,
                served, wiring, unmet(p, assumptions), designTemp(site, cold), solar, generator(p, assumptions), maxInverters);
    }

    /** The generator rules: none without a {@code generator:} section; otherwise its values or the defaults. */
    private static GeneratorRules generator(ProjectInput p, List<Assumption> assumptions) {
        ProjectInput.GeneratorInput g = p.generator();
        if (g == null || g.use() == ProjectInput.GeneratorUse.NEVER) {
            return GeneratorRules.NONE;
        }
        boolean loadFollowing = g.strategy() == ProjectInput.GeneratorStrategy.LOAD_FOLLOWING;
        double start = (g.startSocPct() != null ? g.startSocPct()
                : org.holdover.project.ProjectValidator.DEFAULT_GENERATOR_START_PCT) / 100.0;
        assumptions.add(new Assumption("Generator starts below this state of charge", start, "", given(g.startSocPct()),
                g.startSocPct() != null ? "project" : PRACTICE));
        org.holdover.sim.DispatchStrategy strategy;
        if (loadFollowing) {
            strategy = new org.holdover.sim.DispatchStrategy.LoadFollowing();
        } else {
            double set = (g.setPointSocPct() != null ? g.setPointSocPct()
                    : org.holdover.project.ProjectValidator.DEFAULT_GENERATOR_SET_POINT_PCT) / 100.0;
            assumptions.add(new Assumption("Generator runs on until this state of charge (cycle charging)", set, "",
                    given(g.setPointSocPct()), g.setPointSocPct() != null ? "project" : PRACTICE));
            strategy = new org.holdover.sim.DispatchStrategy.CycleCharging(set);
        }
        assumptions.add(new Assumption("Generator dispatch: " + (loadFollowing ? "load following" : "cycle charging"),
                loadFollowing ? 0 : 1, "", g.strategy() != null ? "project" : "default", g.strategy() != null ? "project"
                : "cycle charging by default; the strategies as named by Barley and Winn, Solar Energy 58, 1996 (from memory)"));
        double altitude = p.site() != null && p.site().elevationM() != null ? p.site().elevationM() : 0.0;
        var derating = org.holdover.sim.GeneratorSizing.AltitudeDerating.TRADE_RULE;
        assumptions.add(new Assumption("Generator altitude derating, fraction of the rating lost per 1,000 ft above 500 ft",
                derating.fractionPerM() * 304.8, "", "default",
                "trade rule for naturally aspirated engines (common practice, no standard); turbocharged sets derate less"));
        double charger = g.chargerAcW() != null ? g.chargerAcW() : Double.NaN;
        assumptions.add(new Assumption(g.chargerAcW() != null ? "Charger AC input from the generator"
                : "Generator charger: charging rate as a fraction of the bank's rated energy per hour (within its charge limit)",
                g.chargerAcW() != null ? charger : GeneratorRules.CHARGE_RATE_PER_H, g.chargerAcW() != null ? "W" : "/h",
                given(g.chargerAcW()), g.chargerAcW() != null ? "project" : PRACTICE));
        double price = g.fuelPricePerL() != null ? g.fuelPricePerL() : 0.0;
        assumptions.add(new Assumption("Fuel price", price, "per litre", given(g.fuelPricePerL()),
                g.fuelPricePerL() != null ? "project" : "not given: fuel not costed"));
        return new GeneratorRules(true, strategy, start, altitude, derating, charger, price);
    }

    private static double unmet(ProjectInput p, List<Assumption> assumptions) {
        Double pct = p.rules() == null ? null : p.rules().maxUnmetPct();
        double v = pct == null ? 0.0 : pct;
        assumptions.add(new Assumption("Unmet energy the simulated year may leave", v, "% of served energy",
                pct == null ? "default" : "project", pct == null ? "none: every served hour must be carried" : "project"));
        return v / 100.0;
    }

    private static double designTemp(ProjectInput.SiteInput site, double cold) {
        return site.batteryAmbientC() != null && site.batteryAmbientC().design() != null ? site.batteryAmbientC().design() : Math.max(cold, DEFAULT_TEMP_C);
    }

    /** Default battery-cable run when the project gives none, m (common practice, no source). */
    public static final double DEFAULT_BATTERY_CABLE_M = 3.0;
    /** Default DC voltage-drop limit, % (common practice, no source; NEC informational notes suggest 3 % for branch circuits). */
    public static final double DEFAULT_DC_DROP_PCT = 2.0;
    /** Default conductor ambient, °C (the base of NEC Table 310.16). */
    public static final double DEFAULT_CONDUCTOR_AMBIENT_C = 30.0;

    private static WiringRules wiring(ProjectInput p, List<Assumption> assumptions, List<Problem> warnings, Project project) {
        ProjectInput.WiringInput w = p.wiring();
        Double len = w == null ? null : w.batteryToInverterM();
        if (len == null) {
            warnings.add(project.problemAt("wiring.batteryToInverterM", "not given; a " + (int) DEFAULT_BATTERY_CABLE_M
                    + " m battery cable is assumed", "give the one-way cable length: the voltage at the inverter during a motor start depends on it"));
        }
        double length = len == null ? DEFAULT_BATTERY_CABLE_M : len;
        assumptions.add(new Assumption("Battery–inverter cable, one way", length, "m", len == null ? "default" : "project",
                len == null ? PRACTICE : "project"));
        Double drop = w == null ? null : w.maxVoltageDropPct();
        double dropPct = drop == null ? DEFAULT_DC_DROP_PCT : drop;
        assumptions.add(new Assumption("DC voltage-drop limit at the continuous current", dropPct, "%",
                drop == null ? "default" : "project", drop == null ? PRACTICE : "project"));
        Double amb = w == null ? null : w.conductorAmbientC();
        double ambient = amb == null ? DEFAULT_CONDUCTOR_AMBIENT_C : amb;
        assumptions.add(new Assumption("Ambient around the conductors", ambient, "°C", amb == null ? "default" : "project",
                amb == null ? "base ambient of NEC 2023 Table 310.16" : "project"));
        ProjectInput.ConductorStandard std = w == null || w.standard() == null
                ? (p.site().ac().frequencyHz() == 50.0 ? ProjectInput.ConductorStandard.IEC : ProjectInput.ConductorStandard.NEC)
                : w.standard();
        boolean fine = w != null && Boolean.TRUE.equals(w.fineStranded());
        double bus = p.rules() != null && p.rules().busVoltageV() != null ? p.rules().busVoltageV() : 0;
        Double ctl = w == null ? null : w.batteryToControllerM();
        Double pvRun = w == null ? null : w.pvToControllerM();
        if (p.solar() != null) {
            assumptions.add(new Assumption("Controller-to-battery cable, one way", ctl == null ? PvCircuits.DEFAULT_CONTROLLER_RUN_M : ctl, "m",
                    ctl == null ? "default" : "project", ctl == null ? PRACTICE : "project"));
            assumptions.add(new Assumption("PV output circuit, one way", pvRun == null ? PvCircuits.DEFAULT_PV_RUN_M : pvRun, "m",
                    pvRun == null ? "default" : "project", pvRun == null ? PRACTICE : "project"));
        }
        Double lead = w == null ? null : w.busBarToInverterM();
        assumptions.add(new Assumption("Each inverter's leads from the common DC bus bar, one way (inverters in parallel)",
                lead == null ? InverterLeads.DEFAULT_LEAD_M : lead, "m", lead == null ? "default" : "project",
                lead == null ? PRACTICE : "project"));
        return new WiringRules(length, ctl == null ? PvCircuits.DEFAULT_CONTROLLER_RUN_M : ctl,
                pvRun == null ? PvCircuits.DEFAULT_PV_RUN_M : pvRun, dropPct, ambient,
                std == ProjectInput.ConductorStandard.NEC ? org.holdover.dc.TableSystem.NEC : org.holdover.dc.TableSystem.IEC,
                fine, bus, lead == null ? InverterLeads.DEFAULT_LEAD_M : lead);
    }

    private static String given(Object o) {
        return o != null ? "project" : "default";
    }

    static Appliance appliance(ApplianceInput a, Leg leg, boolean backup, double siteVolts, boolean split) {
        boolean[] hours = new boolean[24];
        if (a.hours() == null) {
            java.util.Arrays.fill(hours, true);
        } else {
            for (String w : a.hours()) {
                Matcher m = ProjectValidator.WINDOW.matcher(w);
                if (!m.matches()) {
                    throw new IllegalStateException("unvalidated window " + w);
                }
                int start = Integer.parseInt(m.group(1));
                int end = Integer.parseInt(m.group(2)) % 24;
                int h = start;
                do {
                    hours[h] = true;
                    h = (h + 1) % 24;
                } while (h != end);
            }
        }
        int windowHours = 0;
        for (boolean h : hours) {
            windowHours += h ? 1 : 0;
        }
        double duty;
        if (a.dutyCycle() != null) {
            duty = a.dutyCycle();
        } else if (a.hoursPerDay() != null) {
            duty = a.hoursPerDay() / windowHours;
        } else {
            duty = 1.0;
        }
        boolean[] months = new boolean[12];
        if (a.months() == null) {
            java.util.Arrays.fill(months, true);
        } else {
            for (int m : a.months()) {
                months[m - 1] = true;
            }
        }
        ProjectInput.DaySet days = a.days() == null ? ProjectInput.DaySet.ALL : a.days();
        boolean served = !backup || a.critical() == null || a.critical();
        Motor motor = a.motor() == null ? null : motor(a.motor(), leg, siteVolts);
        double pf = a.powerFactor() != null ? a.powerFactor() : a.motor() != null ? DEFAULT_PF_MOTOR : DEFAULT_PF_RESISTIVE;
        return new Appliance(a.name().strip(), a.quantity() == null ? 1 : a.quantity(), a.watts(), pf, Math.min(1.0, duty),
                hours, days != ProjectInput.DaySet.WEEKENDS, days != ProjectInput.DaySet.WEEKDAYS, months, served, leg,
                Boolean.TRUE.equals(a.inProfile()), motor);
    }

    static Motor motor(MotorInput m, Leg leg, double siteVolts) {
        LockedRotor lr;
        if (m.lockedRotorAmps() != null) {
            double v = m.volts() != null ? m.volts() : leg == Leg.L1 || leg == Leg.L2 ? 120.0 : siteVolts;
            lr = new LockedRotor.ByNameplateAmps(m.lockedRotorAmps(), v);
        } else if (m.horsepower() != null && m.codeLetter() != null) {
            lr = new LockedRotor.ByCodeLetter(m.horsepower(),
                    NemaCodeLetter.valueOf(m.codeLetter().strip().toUpperCase(Locale.ROOT)));
        } else {
            lr = new LockedRotor.ByMultiple(m.startMultiple());
        }
        Motor.Starter starter = m.starter() == null ? Motor.Starter.DIRECT : Motor.Starter.valueOf(m.starter().name());
        double factor = switch (starter) {
            case DIRECT -> 1.0;
            case SOFT -> m.starterFactor() != null ? m.starterFactor() : DEFAULT_SOFT_FACTOR;
            case VFD -> m.starterFactor() != null ? m.starterFactor() : DEFAULT_VFD_FACTOR;
        };
        return new Motor(lr, m.startSeconds() != null ? m.startSeconds() : DEFAULT_START_S, starter, factor,
                m.lockedRotorPowerFactor() != null ? m.lockedRotorPowerFactor() : DEFAULT_LR_PF);
    }

    /**
     * Legs for each appliance: as written, 240 V loads across both, and the rest placed largest first on
     * the leg carrying less running VA so far.
     */
    static List<Leg> assignLegs(List<ApplianceInput> ins, boolean split) {
        List<Leg> legs = new ArrayList<>();
        for (int i = 0; i < ins.size(); i++) {
            legs.add(Leg.LINE);
        }
        if (!split) {
            return legs;
        }
        double l1 = 0;
        double l2 = 0;
        List<Integer> auto = new ArrayList<>();
        for (int i = 0; i < ins.size(); i++) {
            ApplianceInput a = ins.get(i);
            double va = runningVa(a);
            ProjectInput.Leg leg = a.leg() == null ? ProjectInput.Leg.AUTO : a.leg();
            switch (leg) {
                case L1 -> { legs.set(i, Leg.L1); l1 += va; }
                case L2 -> { legs.set(i, Leg.L2); l2 += va; }
                case L1L2 -> { legs.set(i, Leg.BOTH); l1 += va / 2; l2 += va / 2; }
                case AUTO -> auto.add(i);
            }
        }
        auto.sort(Comparator.comparingDouble((Integer i) -> -runningVa(ins.get(i))).thenComparingInt(i -> i));
        for (int i : auto) {
            double va = runningVa(ins.get(i));
            if (l1 <= l2) {
                legs.set(i, Leg.L1);
                l1 += va;
            } else {
                legs.set(i, Leg.L2);
                l2 += va;
            }
        }
        return legs;
    }

    private static double runningVa(ApplianceInput a) {
        double pf = a.powerFactor() != null ? a.powerFactor() : a.motor() != null ? DEFAULT_PF_MOTOR : DEFAULT_PF_RESISTIVE;
        return a.watts() / pf * (a.quantity() == null ? 1 : a.quantity());
    }

    /**
     * The search's options from the project's rules (defaults where not given).
     *
     * @param p         the project
     * @param cancelled asked to stop (null: never)
     * @param progress  progress reports (null: none)
     */
    public static SystemSearch.Options searchOptions(ProjectInput p, java.util.function.BooleanSupplier cancelled,
                                                     SystemSearch.Progress progress) {
        ProjectInput.RulesInput r = p.rules();
        int alternatives = r != null && r.alternatives() != null ? r.alternatives() : SystemSearch.DEFAULT_ALTERNATIVES;
        double growth = r != null && r.loadGrowthPct() != null ? r.loadGrowthPct() : SystemSearch.DEFAULT_LOAD_GROWTH_PCT;
        double solar = r != null && r.poorerSolarPct() != null ? r.poorerSolarPct() : SystemSearch.DEFAULT_POORER_SOLAR_PCT;
        SearchResult.Objective objective = r != null && r.costHorizonYears() != null
                ? new SearchResult.Objective(r.costHorizonYears(), r.discountRatePct() == null ? 0 : r.discountRatePct() / 100.0)
                : SearchResult.Objective.CAPITAL;
        return new SystemSearch.Options(alternatives, growth, solar, cancelled, progress, objective);
    }
}
