package org.holdover.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;
import org.holdover.battery.BatteryModule;
import org.holdover.battery.Chemistry;
import org.holdover.catalog.CatalogFile.EfficiencyEntry;
import org.holdover.catalog.CatalogFile.InverterEntry;
import org.holdover.catalog.CatalogFile.ControllerEntry;
import org.holdover.catalog.CatalogFile.FuelEntry;
import org.holdover.catalog.CatalogFile.FuelPointEntry;
import org.holdover.catalog.CatalogFile.GeneratorEntry;
import org.holdover.sim.FuelCurve;
import org.holdover.catalog.CatalogFile.ModuleEntry;
import org.holdover.catalog.CatalogFile.PvModuleEntry;
import org.holdover.catalog.CatalogFile.SurgeEntry;
import org.holdover.inverter.AcOutput;
import org.holdover.inverter.EfficiencyPoint;
import org.holdover.inverter.InverterSpec;
import org.holdover.inverter.LossModel;
import org.holdover.inverter.SurgeRating;
import org.holdover.project.InputException;
import org.holdover.pv.ChargeController;
import org.holdover.pv.ControllerType;
import org.holdover.pv.PvModule;
import org.holdover.pv.StcRatings;
import org.holdover.pv.TemperatureCoefficients;
import org.holdover.project.Problem;
import org.holdover.project.SourceLocation;
import org.holdover.project.StructuredFile;

/** Reads and validates catalogs: the built-in demo catalog and user catalog files. */
public final class CatalogReader {

    /** Name of the built-in catalog resource. */
    public static final String BUILTIN_RESOURCE = "demo-catalog.yaml";
    /** Display name of the built-in catalog. */
    public static final String BUILTIN_DISPLAY = "<built-in demo catalog>";
    /** Largest count of one inverter in parallel a catalog may allow. */
    public static final int MAX_INVERTERS_IN_PARALLEL = 12;
    /** Most surge ratings per inverter (the workbook has three slots). */
    public static final int MAX_SURGE_RATINGS = 3;

    private final Function<String, SourceLocation> locator;
    private final List<Problem> problems = new ArrayList<>();

    private CatalogReader(Function<String, SourceLocation> locator) {
        this.locator = locator;
    }

    /** The built-in demo catalog. */
    public static Catalog builtin() {
        try (InputStream in = CatalogReader.class.getResourceAsStream(BUILTIN_RESOURCE)) {
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            return parse(text, BUILTIN_DISPLAY, false);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InputException e) {
            throw new IllegalStateException("the built-in catalog is invalid: " + e.getMessage(), e);
        }
    }

    /** Reads a user catalog file. */
    public static Catalog read(Path file, String display) throws InputException {
        StructuredFile.Parsed<CatalogFile> parsed = StructuredFile.read(file, display, CatalogFile.class);
        return new CatalogReader(parsed.locator()).build(parsed.value(), display);
    }

    static Catalog parse(String text, String display, boolean json) throws InputException {
        StructuredFile.Parsed<CatalogFile> parsed = StructuredFile.parse(text, display, json, CatalogFile.class);
        return new CatalogReader(parsed.locator()).build(parsed.value(), display);
    }

    private Catalog build(CatalogFile f, String display) throws InputException {
        if (f.name() == null || f.name().isBlank()) {
            problem("name", "is missing", "give the catalog a name");
        }
        List<InverterSpec> inverters = new ArrayList<>();
        List<BatteryModule> modules = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        if (f.inverters() != null) {
            for (int i = 0; i < f.inverters().size(); i++) {
                InverterSpec s = inverter(f.inverters().get(i), "inverters[" + i + "]", ids);
                if (s != null) {
                    inverters.add(s);
                }
            }
        }
        if (f.batteryModules() != null) {
            for (int i = 0; i < f.batteryModules().size(); i++) {
                BatteryModule m = module(f.batteryModules().get(i), "batteryModules[" + i + "]", ids);
                if (m != null) {
                    modules.add(m);
                }
            }
        }
        List<PvModuleItem> pvModules = new ArrayList<>();
        if (f.pvModules() != null) {
            for (int i = 0; i < f.pvModules().size(); i++) {
                PvModuleItem m = pvModule(f.pvModules().get(i), "pvModules[" + i + "]", ids);
                if (m != null) {
                    pvModules.add(m);
                }
            }
        }
        List<ControllerItem> controllers = new ArrayList<>();
        if (f.chargeControllers() != null) {
            for (int i = 0; i < f.chargeControllers().size(); i++) {
                ControllerItem c = controller(f.chargeControllers().get(i), "chargeControllers[" + i + "]", ids);
                if (c != null) {
                    controllers.add(c);
                }
            }
        }
        List<GeneratorItem> generators = new ArrayList<>();
        if (f.generators() != null) {
            for (int i = 0; i < f.generators().size(); i++) {
                GeneratorItem g = generator(f.generators().get(i), "generators[" + i + "]", ids);
                if (g != null) {
                    generators.add(g);
                }
            }
        }
        if (problems.isEmpty() && inverters.isEmpty()) {
            problem("inverters", "the catalog has no inverters", "list at least one");
        }
        if (problems.isEmpty() && modules.isEmpty()) {
            problem("batteryModules", "the catalog has no battery modules", "list at least one");
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        return new Catalog(f.name(), display, Boolean.TRUE.equals(f.demoData()), f.note() == null ? "" : f.note(),
                inverters, modules, pvModules, controllers, generators);
    }

    /** Largest generator rating accepted, W (a plausibility bound for a set on a house or farm system). */
    static final double MAX_GENERATOR_W = 1e6;
    /** Largest fuel coefficient accepted (L/h per rated kW, or L/kWh): diesel sets are near 0.08 and 0.25. */
    static final double MAX_FUEL_COEFFICIENT = 2.0;

    private GeneratorItem generator(GeneratorEntry e, String p, Set<String> ids) {
        if (e == null) {
            problem(p, "is empty", "");
            return null;
        }
        int before = problems.size();
        String id = id(e.id(), p, ids);
        Double rated = positive(p + ".ratedW", e.ratedW(), MAX_GENERATOR_W);
        AcOutput ac = null;
        if (e.ac() == null) {
            problem(p + ".ac", "is missing", "give voltsRms, frequenciesHz and splitPhase");
        } else {
            Double v = positive(p + ".ac.voltsRms", e.ac().voltsRms(), 1000);
            List<Double> freqs = e.ac().frequenciesHz();
            boolean freqOk = true;
            if (freqs == null || freqs.isEmpty()) {
                problem(p + ".ac.frequenciesHz", "is missing", "e.g. [60] or [50]");
                freqOk = false;
            } else {
                for (int i = 0; i < freqs.size(); i++) {
                    Double fq = freqs.get(i);
                    if (fq == null || fq != 50.0 && fq != 60.0) {
                        problem(p + ".ac.frequenciesHz[" + i + "]", "must be 50 or 60, got " + fq, "");
                        freqOk = false;
                    }
                }
            }
            boolean split = Boolean.TRUE.equals(e.ac().splitPhase());
            if (split && v != null && v != 240.0) {
                problem(p + ".ac.voltsRms", "a split-phase set is 120/240 V, got " + fmt(v) + " V", "voltsRms: 240");
            } else if (v != null && freqOk) {
                ac = new AcOutput(v, freqs, split);
            }
        }
        Double minLoad = null;
        if (e.minLoadRatio() == null) {
            problem(p + ".minLoadRatio", "is missing", "the smallest load while running as a fraction of the rating, e.g. 0.3");
        } else if (!(e.minLoadRatio() >= 0 && e.minLoadRatio() < 1)) {
            problem(p + ".minLoadRatio", "must be 0 or more and below 1, got " + e.minLoadRatio(),
                    "a fraction of the rating, e.g. 0.3");
        } else {
            minLoad = e.minLoadRatio();
        }
        FuelCurve fuel = fuel(e.fuel(), p + ".fuel", rated);
        Double price = nonNegative(p + ".price", e.price(), 1e8);
        if (problems.size() > before || id == null || rated == null || ac == null || minLoad == null || fuel == null
                || price == null) {
            return null;
        }
        return new GeneratorItem(id, e.description() == null ? id : e.description(), rated, ac, minLoad, fuel, price);
    }

    /** The fuel curve: both coefficients, or two points fitted to the line; null (with problems) when bad. */
    private FuelCurve fuel(FuelEntry f, String p, Double ratedW) {
        String expected = "either noLoadLPerHPerRatedKw and slopeLPerKwh, or points: two { outputW, litresPerHour }";
        if (f == null) {
            problem(p, "is missing", expected);
            return null;
        }
        boolean coefficients = f.noLoadLPerHPerRatedKw() != null || f.slopeLPerKwh() != null;
        if (coefficients && f.points() != null) {
            problem(p, "gives both the coefficients and points", expected);
            return null;
        }
        if (coefficients) {
            Double f0 = nonNegative(p + ".noLoadLPerHPerRatedKw", f.noLoadLPerHPerRatedKw(), MAX_FUEL_COEFFICIENT);
            Double f1 = nonNegative(p + ".slopeLPerKwh", f.slopeLPerKwh(), MAX_FUEL_COEFFICIENT);
            return f0 == null || f1 == null ? null : new FuelCurve(f0, f1);
        }
        if (f.points() == null || f.points().size() != 2) {
            problem(p + ".points", f.points() == null ? "is missing" : "lists " + f.points().size() + " points", expected);
            return null;
        }
        int before = problems.size();
        double[] w = new double[2];
        double[] l = new double[2];
        for (int i = 0; i < 2; i++) {
            String pp = p + ".points[" + i + "]";
            FuelPointEntry e = f.points().get(i);
            if (e == null) {
                problem(pp, "is empty", "{ outputW, litresPerHour }");
                continue;
            }
            Double out = nonNegative(pp + ".outputW", e.outputW(), ratedW == null ? MAX_GENERATOR_W : ratedW);
            Double lph = positive(pp + ".litresPerHour", e.litresPerHour(), 1000);
            if (out != null && lph != null) {
                w[i] = out;
                l[i] = lph;
            }
        }
        if (problems.size() > before || ratedW == null) {
            return null;
        }
        if (w[0] == w[1]) {
            problem(p + ".points", "both points are at " + fmt(w[0]) + " W", "two different outputs, e.g. 25 % and 100 % load");
            return null;
        }
        double slope = (l[1] - l[0]) / ((w[1] - w[0]) / 1000);
        double f0 = (l[0] - slope * w[0] / 1000) / (ratedW / 1000);
        if (slope < 0 || f0 < 0) {
            problem(p + ".points", String.format(java.util.Locale.ROOT,
                    "fit to a line with %s, got %.4f L/kWh and %.4f L/h per rated kW", slope < 0
                            ? "fuel falling as output rises" : "a negative no-load fuel rate", slope, f0),
                    "fuel that rises with output and is 0 or more at no load");
            return null;
        }
        return FuelCurve.fitTwoPoints(ratedW, w[0], l[0], w[1], l[1]);
    }

    /** Largest module power accepted, W (a plausibility bound for one module). */
    static final double MAX_MODULE_W = 1000;

    private PvModuleItem pvModule(PvModuleEntry e, String p, Set<String> ids) {
        if (e == null) {
            problem(p, "is empty", "");
            return null;
        }
        int before = problems.size();
        String id = id(e.id(), p, ids);
        Double w = positive(p + ".powerW", e.powerW(), MAX_MODULE_W);
        Double vmp = positive(p + ".vmpV", e.vmpV(), 500);
        Double imp = positive(p + ".impA", e.impA(), 50);
        Double voc = positive(p + ".vocV", e.vocV(), 500);
        Double isc = positive(p + ".iscA", e.iscA(), 50);
        if (vmp != null && voc != null && vmp >= voc) {
            problem(p + ".vmpV", vmp + " V is not below the open-circuit " + voc + " V", "V_mp < V_oc");
        }
        if (imp != null && isc != null && imp >= isc) {
            problem(p + ".impA", imp + " A is not below the short-circuit " + isc + " A", "I_mp < I_sc");
        }
        if (w != null && vmp != null && imp != null && Math.abs(vmp * imp - w) > STC_POWER_CONSISTENCY * w) {
            problem(p + ".powerW", w + " W disagrees with vmpV × impA = " + String.format(Locale.ROOT, "%.1f", vmp * imp) + " W",
                    "P_mp within 5 % of V_mp × I_mp (check the datasheet figures)");
        }
        Double pmax = coefficient(p + ".pmaxPctPerC", e.pmaxPctPerC(), true, -1.0, 0.0, true);
        Double vocC = coefficient(p + ".vocPctPerC", e.vocPctPerC(), false, -1.0, 0.0, true);
        Double iscC = coefficient(p + ".iscPctPerC", e.iscPctPerC(), false, 0.0, 0.2, false);
        Double vmpC = coefficient(p + ".vmpPctPerC", e.vmpPctPerC(), false, -1.0, 0.0, true);
        Double noct = null;
        if (e.noctC() == null) {
            problem(p + ".noctC", "is missing", "the nominal operating cell temperature from the datasheet, °C (30–70)");
        } else if (!(e.noctC() >= 30 && e.noctC() <= 70)) {
            problem(p + ".noctC", "must be 30–70 °C, got " + e.noctC(), "");
        } else {
            noct = e.noctC();
        }
        Double area = positive(p + ".areaM2", e.areaM2(), 9.99);
        if (w != null && area != null && w / area > 400) {
            problem(p + ".areaM2", w + " W on " + area + " m² is above 40 % efficiency", "the module's area in m²");
        }
        Double price = nonNegative(p + ".price", e.price(), 1e8);
        if (problems.size() > before || id == null || w == null || vmp == null || imp == null || voc == null
                || isc == null || pmax == null || noct == null || area == null || price == null) {
            return null;
        }
        TemperatureCoefficients tc = new TemperatureCoefficients(pmax / 100.0, optional(vocC), optional(iscC),
                optional(vmpC));
        PvModule m = new PvModule(id, new StcRatings(w, vmp, imp, voc, isc), tc, noct, area);
        return new PvModuleItem(id, e.description() == null ? id : e.description(), m, price);
    }

    /** V_mp × I_mp must be within this fraction of P_mp (the engine's own consistency bound). */
    static final double STC_POWER_CONSISTENCY = 0.05;
    /** Headroom above the battery an MPPT controller needs when the catalog does not say, V (common practice, no source). */
    public static final double DEFAULT_MPPT_HEADROOM_V = 5.0;

    private ControllerItem controller(ControllerEntry e, String p, Set<String> ids) {
        if (e == null) {
            problem(p, "is empty", "");
            return null;
        }
        int before = problems.size();
        String id = id(e.id(), p, ids);
        ControllerType type = null;
        if (e.type() == null) {
            problem(p + ".type", "is missing", "mppt or pwm");
        } else if (e.type().strip().equalsIgnoreCase("mppt")) {
            type = ControllerType.MPPT;
        } else if (e.type().strip().equalsIgnoreCase("pwm")) {
            type = ControllerType.PWM;
        } else {
            problem(p + ".type", "unknown controller type \"" + e.type() + "\"", "mppt or pwm");
        }
        List<Double> classes = new ArrayList<>();
        if (e.batteryV() == null || e.batteryV().isEmpty()) {
            problem(p + ".batteryV", "is missing", "the nominal battery voltages it charges, e.g. [12, 24, 48]");
        } else {
            for (int i = 0; i < e.batteryV().size(); i++) {
                Double v = positive(p + ".batteryV[" + i + "]", e.batteryV().get(i), 1000);
                if (v != null && !classes.contains(v)) {
                    classes.add(v);
                }
            }
        }
        Double maxV = positive(p + ".maxPvInputV", e.maxPvInputV(), 2000);
        Double inA = positive(p + ".maxInputCurrentA", e.maxInputCurrentA(), 1000);
        Double outA = positive(p + ".ratedOutputCurrentA", e.ratedOutputCurrentA(), 1000);
        Double eff = positive(p + ".efficiencyPct", e.efficiencyPct(), 100);
        if (eff != null && eff < 50) {
            problem(p + ".efficiencyPct", "must be 50–100 %, got " + eff, "");
        }
        double headroom = type == ControllerType.PWM ? 0.0 : DEFAULT_MPPT_HEADROOM_V;
        if (e.minHeadroomV() != null) {
            if (!(e.minHeadroomV() >= 0) || maxV != null && e.minHeadroomV() >= maxV) {
                problem(p + ".minHeadroomV", "must be 0 or more and below maxPvInputV, got " + e.minHeadroomV(), "");
            } else {
                headroom = e.minHeadroomV();
            }
        }
        if (maxV != null) {
            for (double v : classes) {
                if (v >= maxV) {
                    problem(p + ".batteryV", fmt(v) + " V is not below the maximum PV input " + fmt(maxV) + " V",
                            "battery classes below the PV input limit");
                    break;
                }
            }
        }
        Double price = nonNegative(p + ".price", e.price(), 1e8);
        if (problems.size() > before || id == null || type == null || classes.isEmpty() || maxV == null || inA == null
                || outA == null || eff == null || price == null) {
            return null;
        }
        ChargeController c = new ChargeController(id, type, maxV, inA, outA, eff / 100.0, headroom);
        return new ControllerItem(id, e.description() == null ? id : e.description(), c, classes, price);
    }

    /** A temperature coefficient in %/°C within (lo, hi) (lo inclusive when not open); null when absent or bad. */
    private Double coefficient(String path, Double v, boolean required, double lo, double hi, boolean negative) {
        if (v == null) {
            if (required) {
                problem(path, "is missing", "the datasheet's temperature coefficient in %/°C, e.g. -0.35");
            }
            return null;
        }
        boolean ok = negative ? v > lo && v < hi : v >= lo && v <= hi;
        if (!ok) {
            problem(path, (negative ? "must be between " + fmt(lo) + " and 0 %/°C (negative)" : "must be "
                    + fmt(lo) + "–" + fmt(hi) + " %/°C") + ", got " + v, "as printed on the datasheet, in %/°C");
            return null;
        }
        return v;
    }

    private static OptionalDouble optional(Double pctPerC) {
        return pctPerC == null ? OptionalDouble.empty() : OptionalDouble.of(pctPerC / 100.0);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }

    private InverterSpec inverter(InverterEntry e, String p, Set<String> ids) {
        if (e == null) {
            problem(p, "is empty", "");
            return null;
        }
        int before = problems.size();
        String id = id(e.id(), p, ids);
        Double bus = positive(p + ".busClassV", e.busClassV(), 1e4);
        Double min = null;
        Double max = null;
        if (e.dcWindowV() == null) {
            problem(p + ".dcWindowV", "is missing", "give { min: …, max: … } in volts");
        } else {
            min = positive(p + ".dcWindowV.min", e.dcWindowV().min(), 2e3);
            max = positive(p + ".dcWindowV.max", e.dcWindowV().max(), 2e3);
            if (min != null && max != null && min >= max) {
                problem(p + ".dcWindowV", "min " + min + " V is not below max " + max + " V", "");
            }
        }
        AcOutput ac = null;
        if (e.ac() == null) {
            problem(p + ".ac", "is missing", "give voltsRms, frequenciesHz and splitPhase");
        } else {
            Double v = positive(p + ".ac.voltsRms", e.ac().voltsRms(), 1000);
            List<Double> freqs = e.ac().frequenciesHz();
            if (freqs == null || freqs.isEmpty()) {
                problem(p + ".ac.frequenciesHz", "is missing", "e.g. [60] or [50, 60]");
            } else {
                for (int i = 0; i < freqs.size(); i++) {
                    Double fq = freqs.get(i);
                    if (fq == null || fq != 50.0 && fq != 60.0) {
                        problem(p + ".ac.frequenciesHz[" + i + "]", "must be 50 or 60, got " + fq, "");
                    }
                }
            }
            if (v != null && freqs != null && !freqs.isEmpty() && problems.size() == before) {
                ac = new AcOutput(v, freqs, Boolean.TRUE.equals(e.ac().splitPhase()));
            }
        }
        Double w = positive(p + ".continuousW", e.continuousW(), 1e6);
        Double va = e.continuousVa() == null ? w : positive(p + ".continuousVa", e.continuousVa(), 1e6);
        if (w != null && va != null && va < w) {
            problem(p + ".continuousVa", va + " VA is below the continuous " + w + " W", "VA ≥ W");
        }
        double perLeg = 0;
        if (e.ac() != null && Boolean.TRUE.equals(e.ac().splitPhase())) {
            Double leg = positive(p + ".perLegVa", e.perLegVa(), 1e6);
            perLeg = leg == null ? 0 : leg;
        } else if (e.perLegVa() != null) {
            problem(p + ".perLegVa", "is only for split-phase outputs", "remove it or set ac.splitPhase: true");
        }
        List<SurgeRating> surge = new ArrayList<>();
        if (e.surge() == null || e.surge().isEmpty()) {
            problem(p + ".surge", "is missing", "list at least one { seconds, va } rating");
        } else if (e.surge().size() > MAX_SURGE_RATINGS) {
            problem(p + ".surge", "lists " + e.surge().size() + " ratings", "at most " + MAX_SURGE_RATINGS);
        } else {
            for (int i = 0; i < e.surge().size(); i++) {
                SurgeEntry s = e.surge().get(i);
                String sp = p + ".surge[" + i + "]";
                if (s == null) {
                    problem(sp, "is empty", "");
                    continue;
                }
                Double sec = positive(sp + ".seconds", s.seconds(), 3600);
                Double sva = positive(sp + ".va", s.va(), 1e7);
                if (sva != null && va != null && sva < va) {
                    problem(sp + ".va", sva + " VA is below the continuous " + va + " VA", "a surge rating at least the continuous VA");
                }
                if (sec != null && sva != null) {
                    surge.add(new SurgeRating(sec, sva));
                }
            }
            List<SurgeRating> sorted = surge.stream().sorted(java.util.Comparator.comparingDouble(SurgeRating::durationS)).toList();
            for (int i = 1; i < sorted.size(); i++) {
                if (sorted.get(i).durationS() == sorted.get(i - 1).durationS()) {
                    problem(p + ".surge", "two ratings have the same duration", "one rating per duration");
                } else if (sorted.get(i).va() > sorted.get(i - 1).va()) {
                    problem(p + ".surge", "a longer rating has more VA than a shorter one", "VA must not rise with duration");
                }
            }
        }
        double deratingStart = 25;
        double deratingPct = 0;
        if (e.derating() != null) {
            Double ds = e.derating().startC();
            Double dp = e.derating().pctPerC();
            if (ds == null || ds < -20 || ds > 70) {
                problem(p + ".derating.startC", "must be −20–70 °C, got " + ds, "");
            } else {
                deratingStart = ds;
            }
            if (dp == null || dp < 0 || dp > 20) {
                problem(p + ".derating.pctPerC", "must be 0–20 %/°C, got " + dp, "");
            } else {
                deratingPct = dp;
            }
        }
        List<EfficiencyPoint> points = new ArrayList<>();
        if (e.efficiency() == null || e.efficiency().size() < 3) {
            problem(p + ".efficiency", "needs at least 3 points, got " + (e.efficiency() == null ? 0 : e.efficiency().size()),
                    "list { loadPct, pct } points from light to full load");
        } else {
            double last = 0;
            for (int i = 0; i < e.efficiency().size(); i++) {
                EfficiencyEntry pt = e.efficiency().get(i);
                String ep = p + ".efficiency[" + i + "]";
                if (pt == null || pt.loadPct() == null || pt.pct() == null) {
                    problem(ep, "needs loadPct and pct", "");
                    continue;
                }
                if (!(pt.loadPct() > 0 && pt.loadPct() <= 150)) {
                    problem(ep + ".loadPct", "must be in (0, 150] %, got " + pt.loadPct(), "");
                    continue;
                }
                if (!(pt.pct() > 50 && pt.pct() < 100)) {
                    problem(ep + ".pct", "must be between 50 and 100 %, got " + pt.pct(), "");
                    continue;
                }
                if (pt.loadPct() <= last) {
                    problem(ep + ".loadPct", "points must be in increasing load", "");
                    continue;
                }
                last = pt.loadPct();
                points.add(new EfficiencyPoint(pt.loadPct() / 100.0, pt.pct() / 100.0));
            }
        }
        Double noLoad = nonNegative(p + ".noLoadW", e.noLoadW(), 1e4);
        InverterSpec.Topology topology = InverterSpec.Topology.TRANSFORMER;
        if (e.topology() != null) {
            String t = e.topology().toUpperCase(Locale.ROOT).replace('-', '_');
            try {
                topology = InverterSpec.Topology.valueOf(t);
            } catch (IllegalArgumentException ex) {
                problem(p + ".topology", "unknown topology \"" + e.topology() + "\"",
                        "transformer, transformerless-boost or transformerless-direct");
            }
        }
        double mod = 0.95;
        if (e.maxModulationIndex() != null) {
            if (!(e.maxModulationIndex() > 0 && e.maxModulationIndex() <= 1.2)) {
                problem(p + ".maxModulationIndex", "must be in (0, 1.2], got " + e.maxModulationIndex(), "");
            } else {
                mod = e.maxModulationIndex();
            }
        }
        Double price = nonNegative(p + ".price", e.price(), 1e8);
        int inParallel = 1;
        if (e.maxInParallel() != null) {
            if (e.maxInParallel() < 1 || e.maxInParallel() > MAX_INVERTERS_IN_PARALLEL) {
                problem(p + ".maxInParallel", "must be 1–" + MAX_INVERTERS_IN_PARALLEL + ", got " + e.maxInParallel(),
                        "1 when the unit cannot share its output with others");
            } else {
                inParallel = e.maxInParallel();
            }
        }
        if (problems.size() > before || id == null || bus == null || min == null || max == null || ac == null
                || w == null || va == null || noLoad == null || price == null) {
            return null;
        }
        LossModel loss = LossModel.fit(w, noLoad, points);
        if (!loss.physical()) {
            problem(p + ".efficiency", "the points give a loss that falls as output rises (k1 = "
                    + String.format(Locale.ROOT, "%.4g", loss.k1()) + ", k2 = " + String.format(Locale.ROOT, "%.4g", loss.k2()) + ")",
                    "check the efficiency points and the no-load draw");
            return null;
        }
        return new InverterSpec(id, e.description() == null ? id : e.description(), bus, min, max, ac, w, va, perLeg,
                surge, deratingStart, deratingPct, points, noLoad, topology, mod, price, loss, inParallel);
    }

    private BatteryModule module(ModuleEntry e, String p, Set<String> ids) {
        if (e == null) {
            problem(p, "is empty", "");
            return null;
        }
        int before = problems.size();
        String id = id(e.id(), p, ids);
        Chemistry chem = null;
        if (e.chemistry() == null) {
            problem(p + ".chemistry", "is missing", "lifepo4, agm, gel or flooded");
        } else {
            chem = Chemistry.fromWord(e.chemistry());
            if (chem == null) {
                problem(p + ".chemistry", "unknown chemistry \"" + e.chemistry() + "\"", "lifepo4, agm, gel or flooded");
            }
        }
        Double v = positive(p + ".nominalV", e.nominalV(), 2000);
        Double ah = positive(p + ".capacityAh", e.capacityAh(), 1e5);
        Double h = positive(p + ".rateHours", e.rateHours(), 1000);
        Double r = positive(p + ".internalResistanceMilliohm", e.internalResistanceMilliohm(), 1e5);
        Double cont = positive(p + ".maxContinuousA", e.maxContinuousA(), 1e5);
        Double surge = e.maxSurgeA() == null ? cont : positive(p + ".maxSurgeA", e.maxSurgeA(), 1e5);
        Double surgeS = e.surgeSeconds() == null ? Double.valueOf(1.0) : positive(p + ".surgeSeconds", e.surgeSeconds(), 3600);
        Double charge = positive(p + ".maxChargeA", e.maxChargeA(), 1e5);
        int parallel = 1;
        if (e.maxParallel() == null || e.maxParallel() < 1 || e.maxParallel() > 64) {
            problem(p + ".maxParallel", "must be 1–64, got " + e.maxParallel(), "");
        } else {
            parallel = e.maxParallel();
        }
        int series = chem == null || chem.leadAcid() ? 1000 : 1;
        if (e.maxSeries() != null) {
            if (e.maxSeries() < 1 || e.maxSeries() > 1000) {
                problem(p + ".maxSeries", "must be 1–1000, got " + e.maxSeries(), "");
            } else {
                series = e.maxSeries();
            }
        }
        Double price = nonNegative(p + ".price", e.price(), 1e8);
        if (surge != null && cont != null && surge < cont) {
            problem(p + ".maxSurgeA", surge + " A is below the continuous " + cont + " A", "");
        }
        if (chem != null && v != null) {
            double cells = v / chem.cellNominalV();
            if (Math.abs(cells - Math.rint(cells)) > 0.05 * cells || Math.rint(cells) < 1) {
                problem(p + ".nominalV", v + " V is not a whole number of " + chem.cellNominalV() + " V " + chem.word() + " cells", "");
            }
        }
        if (problems.size() > before || id == null || chem == null || v == null || ah == null || h == null || r == null
                || cont == null || surge == null || surgeS == null || charge == null || price == null) {
            return null;
        }
        return new BatteryModule(id, e.description() == null ? id : e.description(), chem, v, ah, h, r / 1000.0, cont,
                surge, surgeS, charge, parallel, series, price);
    }

    private String id(String id, String p, Set<String> ids) {
        if (id == null || id.isBlank()) {
            problem(p + ".id", "is missing", "give each component an id");
            return null;
        }
        if (!ids.add(id)) {
            problem(p + ".id", "\"" + id + "\" is used twice", "ids must be unique in a catalog");
            return null;
        }
        return id;
    }

    private Double positive(String path, Double v, double max) {
        if (v == null) {
            problem(path, "is missing", "");
            return null;
        }
        if (!(v > 0) || v > max) {
            problem(path, "must be greater than 0 and at most " + max + ", got " + v, "");
            return null;
        }
        return v;
    }

    private Double nonNegative(String path, Double v, double max) {
        if (v == null) {
            problem(path, "is missing", "");
            return null;
        }
        if (!(v >= 0) || v > max) {
            problem(path, "must be 0–" + max + ", got " + v, "");
            return null;
        }
        return v;
    }

    private void problem(String path, String message, String expected) {
        problems.add(new Problem(locator.apply(path), path, message, expected));
    }
}
