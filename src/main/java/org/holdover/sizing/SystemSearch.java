package org.holdover.sizing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.BooleanSupplier;
import java.util.stream.IntStream;
import org.holdover.battery.BankDesign;
import org.holdover.battery.BankSizing;
import org.holdover.battery.BatteryModule;
import org.holdover.inverter.InverterSpec;
import org.holdover.project.ProjectInput;
import org.holdover.pv.ArrayChooser;
import org.holdover.pv.ControllerType;
import org.holdover.pv.PwmOperatingPoint;
import org.holdover.sim.HourlyConditions;
import org.holdover.sim.SimulationMetrics;
import org.holdover.sizing.SearchResult.Candidate;
import org.holdover.sizing.SearchResult.Evaluated;
import org.holdover.sizing.SearchResult.Rejection;
import org.holdover.sizing.SearchResult.Sensitivity;

/**
 * The search for the least-cost system that passes every check.
 *
 * <p>Candidates are every combination the catalog allows: bus class × inverter × identical inverters in parallel (1 up to
 * the smaller of the unit's catalog limit and the project's {@code rules.maxInvertersInParallel}) × battery module × parallel strings
 * (from what the battery sizing asks for up to the most allowed) × PV module × charge controller × modules per
 * string × strings × controllers (from what the PV sizing asks for up to {@value #EXTRA_PV_SHARE} more, at least
 * {@value #EXTRA_PV_MIN} more strings) × generator (none, or, when the project allows one, each catalog set that suits the
 * service and covers the charger and the running loads; with a generator, PV layouts from one string up, since the
 * generator may cover what a smaller array leaves short: the worst-month PV checks do not reject those systems). The design requirements stay hard checks: the bank covers the outage or the
 * days of autonomy after its derating, the array refills it in the worst month, every voltage, current, conductor
 * and motor-start check passes.
 *
 * <ol>
 *   <li>Cheap checks first, per component: inverters against the demand; each bank at each string count against
 *       the currents, the charging voltage and the motor start; each PV layout against the string and controller
 *       checks and the monthly need. A system passes the cheap checks when its parts do.</li>
 *   <li>The systems that pass are put in order of demo capital cost (ties by bus, names and counts) and simulated
 *       over the year in that order, in batches across all cores; the first that leaves no more unmet energy than
 *       the project accepts is the least-cost system. A system is not simulated when a larger one of the same family
 *       (as many or more battery strings and PV strings, same parts otherwise) already failed: more battery and more
 *       PV never leave more unmet (the simulation's property tests check this). Systems with a generator are never
 *       skipped this way (see {@code dominated}).</li>
 *   <li>The search goes on until the next best systems of other families are found, then simulates smaller systems
 *       of the chosen family (fewer strings than the design checks allow) for the cost-versus-unmet frontier, and the
 *       chosen system under more load and a poorer solar year.</li>
 * </ol>
 *
 * <p>The PV output of a layout is the output of one string of its length × the strings (the array's DC output is
 * linear in parallel strings; the controllers' limit is applied in the simulation).
 */
public final class SystemSearch {

    /** Load growth of the sensitivity case, % (our choice, no source). */
    public static final double DEFAULT_LOAD_GROWTH_PCT = 10;
    /** Solar shortfall of the sensitivity case, % (our choice, no source). */
    public static final double DEFAULT_POORER_SOLAR_PCT = 10;
    /** Alternatives shown. */
    public static final int DEFAULT_ALTERNATIVES = 3;
    /** Extra PV strings searched, as a share of what the PV sizing asks for (our choice). */
    public static final double EXTRA_PV_SHARE = 0.5;
    /** Fewest extra PV strings searched (our choice). */
    public static final int EXTRA_PV_MIN = 2;
    /** Candidates simulated together. */
    static final int BATCH = 64;

    /** Reports progress: candidates done out of those in order. */
    public interface Progress {
        Progress NONE = (done, total) -> { };

        void report(long done, long total);
    }

    /**
     * @param alternatives   next best systems to show
     * @param loadGrowthPct  load growth of the sensitivity case, %
     * @param poorerSolarPct solar shortfall of the sensitivity case, %
     * @param cancelled      asked to stop (the best found so far is returned)
     * @param progress       progress reports
     */
    public record Options(int alternatives, double loadGrowthPct, double poorerSolarPct, BooleanSupplier cancelled,
                          Progress progress, SearchResult.Objective objective) {
        public Options {
            if (alternatives < 0 || alternatives > 50) {
                throw new IllegalArgumentException("alternatives must be 0–50");
            }
            cancelled = cancelled == null ? () -> false : cancelled;
            progress = progress == null ? Progress.NONE : progress;
            objective = objective == null ? SearchResult.Objective.CAPITAL : objective;
        }

        /** Least capital cost. */
        public Options(int alternatives, double loadGrowthPct, double poorerSolarPct, BooleanSupplier cancelled,
                       Progress progress) {
            this(alternatives, loadGrowthPct, poorerSolarPct, cancelled, progress, SearchResult.Objective.CAPITAL);
        }

        public static Options defaults() {
            return new Options(DEFAULT_ALTERNATIVES, DEFAULT_LOAD_GROWTH_PCT, DEFAULT_POORER_SOLAR_PCT, null, null);
        }

        public Options withObjective(SearchResult.Objective o) {
            return new Options(alternatives, loadGrowthPct, poorerSolarPct, cancelled, progress, o);
        }
    }

    private SystemSearch() {
    }

    /** One inverter and battery module at a bus class, with the bank string counts and PV layouts that pass. */
    record Group(double busClassV, InverterAssessment inverter, EnergyBasis energy, BankDesign base, List<BankPart> banks,
                 List<PvPart> pvs) {
    }

    record BankPart(BankDesign design, double margin) {
    }

    /**
     * A catalog generator and the generator the simulation runs ({@code full} in {@link PvPart} says whether a PV layout
     * passes the PV sizing on its own; with a generator, smaller arrays are searched too).
     */
    record GenPart(org.holdover.catalog.GeneratorItem item, org.holdover.sim.Generator sim, double margin) {
    }

    /**
     * A PV layout: {@code unit} is one string's output to the controller each hour (null without PV).
     */
    record PvPart(SystemPin.PvPin pin, double price, int modules, double stcW, double[] unit, double efficiency,
                  double limitW, double margin, int neededStrings, PvSizing.Pair pair, PvOption own, boolean full) {
        static final PvPart NONE = new PvPart(null, 0, 0, 0, null, 1.0, YearCheck.NO_PV_LIMIT_W, Double.NaN, 0, null, null, true);

        double[] seriesW(int strings) {
            if (unit == null) {
                return null;
            }
            double[] out = new double[unit.length];
            for (int h = 0; h < out.length; h++) {
                out[h] = unit[h] * strings;
            }
            return out;
        }
    }

    /**
     * A system passing the cheap checks, with the least its objective can be: its capital cost, plus, for a lifetime
     * objective, the replacements its battery would need if it lasted its calendar life (the simulated life is never
     * longer, and a shorter life never costs less).
     */
    record Cand(Group g, BankPart bank, PvPart pv, Candidate candidate, double bound, GenPart gen) {
        Cand withBound(SearchResult.Objective o) {
            double life = bank.design().module().chemistry().calendarLifeYears();
            return new Cand(g, bank, pv, candidate, o.of(candidate, life), gen);
        }
    }

    /**
     * Whether a candidate is checked against a simulated year: always in backup mode, with PV or with a generator; off grid
     * with neither, nothing recharges the bank and the battery sizing alone decides.
     */
    static boolean simulated(SizingInput in, Cand c) {
        return in.mode() == ProjectInput.Mode.BACKUP || c.pv.pin() != null || c.gen != null;
    }

    public static SearchResult run(SizingInput in, Options o) {
        long t0 = System.nanoTime();
        Work w = cheap(in);
        double cheapMs = (System.nanoTime() - t0) / 1e6;
        SearchResult.Objective objective = o.objective();
        List<Cand> all = new ArrayList<>(w.candidates.size());
        for (Cand c : w.candidates) {
            all.add(c.withBound(objective));
        }
        all.sort(ORDER);
        long t1 = System.nanoTime();
        boolean simulate = in.mode() == ProjectInput.Mode.BACKUP || in.solar() != null || in.generator().allowed();
        double[] batteryTemp = new double[in.loads().calendar().hours()];
        java.util.Arrays.fill(batteryTemp, in.batteryDesignC());
        double limitWh = in.maxUnmetFraction() * sum(in.loads().loadW());
        // The best passing system of each family found so far, with its place in the order (ties go to the earlier).
        Map<String, Found> best = new LinkedHashMap<>();
        List<Evaluated> simulatedAll = new ArrayList<>();
        Map<String, List<int[]>> failed = new HashMap<>();
        Map<String, Double> leastUnmetOfFamily = new LinkedHashMap<>();
        long simulated = 0;
        long pruned = 0;
        boolean stopped = false;
        int wanted = 1 + o.alternatives();
        Conditions cache = new Conditions();
        if (simulate) {
            // The largest system of each family and layout first: when it fails, every smaller one fails too.
            Map<String, Cand> corners = new LinkedHashMap<>();
            for (Cand c : all) {
                if (c.gen == null && simulated(in, c)) {
                    corners.merge(domKey(c), c, SystemSearch::corner);
                }
            }
            List<Cand> tops = new ArrayList<>(corners.values());
            Evaluated[] r = simulateBatch(in, tops, batteryTemp, objective, cache);
            simulated += tops.size();
            for (int k = 0; k < tops.size(); k++) {
                Cand c = tops.get(k);
                if (!r[k].passes()) {
                    failed.computeIfAbsent(domKey(c), x -> new ArrayList<>()).add(new int[] {c.bank.design().strings(), sPer(c)});
                    leastUnmetOfFamily.merge(c.candidate.family(), r[k].unmetWh(), Math::min);
                    simulatedAll.add(r[k]);
                }
            }
        }
        int i = 0;
        while (i < all.size() && !enough(best, wanted, all.get(i).bound)) {
            if (o.cancelled().getAsBoolean()) {
                stopped = true;
                break;
            }
            List<Cand> batch = new ArrayList<>();
            List<Integer> index = new ArrayList<>();
            while (i < all.size() && batch.size() < BATCH && !enough(best, wanted, all.get(i).bound)) {
                Cand c = all.get(i++);
                Found f = best.get(c.candidate.family());
                if (f != null && c.bound >= f.e.objective()) {
                    continue; // this family already has a system at least as good
                }
                if (dominated(failed, c)) {
                    pruned++;
                    continue;
                }
                batch.add(c);
                index.add(i - 1);
            }
            if (batch.isEmpty()) {
                continue;
            }
            Evaluated[] results = simulateBatch(in, batch, batteryTemp, objective, cache);
            for (int k = 0; k < batch.size(); k++) {
                Evaluated e = results[k];
                Cand c = batch.get(k);
                if (simulated(in, c)) {
                    simulatedAll.add(e);
                    simulated++;
                }
                String fam = c.candidate.family();
                if (e.passes()) {
                    Found f = best.get(fam);
                    if (f == null || e.objective() < f.e.objective()) {
                        best.put(fam, new Found(e, index.get(k)));
                    }
                } else {
                    failed.computeIfAbsent(domKey(c), x -> new ArrayList<>()).add(new int[] {c.bank.design().strings(), sPer(c)});
                    leastUnmetOfFamily.merge(fam, e.unmetWh(), Math::min);
                }
            }
            o.progress().report(i, all.size());
        }
        o.progress().report(i, all.size());
        List<Found> ranked = new ArrayList<>(best.values());
        ranked.sort(Comparator.comparingDouble((Found f) -> f.e.objective()).thenComparingInt(f -> f.index));
        Evaluated chosen = ranked.isEmpty() ? null : ranked.get(0).e;
        Cand chosenCand = ranked.isEmpty() ? null : all.get(ranked.get(0).index);
        List<Evaluated> alternatives = new ArrayList<>();
        for (int k = 1; k < ranked.size() && alternatives.size() < o.alternatives(); k++) {
            alternatives.add(ranked.get(k).e);
        }
        List<Rejection> rejected = new ArrayList<>(w.rejected);
        boolean exhausted = !stopped && i >= all.size();
        for (Map.Entry<String, Double> f : leastUnmetOfFamily.entrySet()) {
            if (!best.containsKey(f.getKey()) && exhausted) {
                rejected.add(new Rejection(f.getKey(), String.format(Locale.ROOT,
                        "every size searched leaves more unmet than accepted over the simulated year (least %.0f Wh, accepted %.0f Wh)",
                        f.getValue(), limitWh)));
            }
        }
        List<Evaluated> frontier = new ArrayList<>(simulatedAll);
        List<Sensitivity> sensitivity = new ArrayList<>();
        if (chosenCand != null && simulated(in, chosenCand) && !stopped) {
            List<Evaluated> smaller = smaller(in, chosenCand, batteryTemp);
            frontier.addAll(smaller);
            simulated += smaller.size();
        }
        if (chosenCand != null && !stopped) {
            sensitivity.addAll(sensitivity(in, chosenCand, o, batteryTemp, simulated(in, chosenCand)));
        }
        double simMs = (System.nanoTime() - t1) / 1e6;
        SearchResult.Stats stats = new SearchResult.Stats(w.families, w.cheapChecks, all.size(), simulated, pruned, cheapMs, simMs,
                stopped);
        return new SearchResult(chosen, alternatives, pareto(frontier), rejected, sensitivity, stats, limitWh, simulate, objective);
    }

    private record Found(Evaluated e, int index) {
    }

    /** A candidate that is not simulated (off grid without PV or generator): it passes on its design checks. */
    private static Evaluated unsimulated(Cand c, SearchResult.Objective objective) {
        double life = c.bank.design().module().chemistry().calendarLifeYears();
        return new Evaluated(c.candidate, Double.NaN, 0, Double.NaN, true, "", objective.lifetime() ? life : Double.NaN,
                objective.of(c.candidate, life), 0);
    }

    /** Enough found: {@code wanted} families have a passing system, and no later candidate can beat the last of them. */
    private static boolean enough(Map<String, Found> best, int wanted, double nextBound) {
        if (best.size() < wanted) {
            return false;
        }
        double[] values = best.values().stream().mapToDouble(f -> f.e.objective()).sorted().toArray();
        return nextBound > values[wanted - 1];
    }

    /** Every candidate simulated, least cost first (for tests: the search must agree with it). */
    static List<Evaluated> bruteForce(SizingInput in, SearchResult.Objective objective) {
        Work w = cheap(in);
        List<Cand> all = new ArrayList<>();
        for (Cand c : w.candidates) {
            all.add(c.withBound(objective));
        }
        all.sort(ORDER);
        double[] batteryTemp = new double[in.loads().calendar().hours()];
        java.util.Arrays.fill(batteryTemp, in.batteryDesignC());
        return all.parallelStream().map(c -> simulated(in, c) ? simulate(in, c, batteryTemp, "", objective)
                : unsimulated(c, objective)).toList();
    }

    /** Every system passing the cheap checks, least cost first (for the benchmark and tests). */
    static List<Cand> candidates(SizingInput in) {
        List<Cand> all = new ArrayList<>();
        for (Cand c : cheap(in).candidates) {
            all.add(c.withBound(SearchResult.Objective.CAPITAL));
        }
        all.sort(ORDER);
        return all;
    }

    static final Comparator<Cand> ORDER = Comparator.comparingDouble((Cand c) -> c.bound)
            .thenComparingDouble(c -> c.candidate.cost())
            .thenComparingDouble(c -> c.g.busClassV())
            .thenComparing(c -> c.candidate.pin().inverterId())
            .thenComparingInt(c -> c.candidate.pin().inverters())
            .thenComparing(c -> c.candidate.pin().batteryModuleId())
            .thenComparingInt(c -> c.candidate.pin().strings())
            .thenComparing(c -> c.pv.pin() == null ? "" : c.pv.pin().moduleId())
            .thenComparing(c -> c.pv.pin() == null ? "" : c.pv.pin().controllerId())
            .thenComparingInt(c -> c.pv.pin() == null ? 0 : c.pv.pin().modulesPerString())
            .thenComparingInt(c -> c.pv.pin() == null ? 0 : c.pv.pin().controllers())
            .thenComparingInt(c -> c.pv.pin() == null ? 0 : c.pv.pin().stringsPerController())
            .thenComparing(c -> c.gen == null ? "" : c.gen.item().id());

    private static int sPer(Cand c) {
        return c.pv.pin() == null ? 0 : c.pv.pin().stringsPerController();
    }

    /** The candidate with the most battery strings, or, when the most strings and the most PV strings are in
     *  different candidates, the one with the most PV strings among those with the most battery strings. */
    private static Cand corner(Cand x, Cand y) {
        int px = x.bank.design().strings();
        int py = y.bank.design().strings();
        if (px != py) {
            return px > py ? x : y;
        }
        return sPer(x) >= sPer(y) ? x : y;
    }

    private static String domKey(Cand c) {
        SystemPin.PvPin p = c.pv.pin();
        return c.candidate.family() + "|" + (p == null ? "" : p.modulesPerString() + "x" + p.controllers());
    }

    /**
     * A system is skipped when a larger one of its family and layout (as many or more battery strings and PV strings, the
     * same parts otherwise, the same generator or none) already failed: more battery and more PV never leave more unmet
     * without a generator (the simulation's property tests check this). The family names the generator, so a failure
     * with one generator never prunes a system with another or without one. With a generator the property is not proved
     * (a larger bank moves the generator's starts and stops, and under cycle charging the hours it charges), so systems
     * with a generator are never pruned: each is simulated, as brute force does.
     */
    private static boolean dominated(Map<String, List<int[]>> failed, Cand c) {
        if (c.gen != null) {
            return false;
        }
        List<int[]> f = failed.get(domKey(c));
        if (f == null) {
            return false;
        }
        int p = c.bank.design().strings();
        int s = c.pv.pin() == null ? 0 : c.pv.pin().stringsPerController();
        for (int[] x : f) {
            if (p <= x[0] && s <= x[1]) {
                return true;
            }
        }
        return false;
    }

    static Evaluated simulate(SizingInput in, Cand c, double[] batteryTemp, String designNote, SearchResult.Objective objective) {
        return simulate(in, c, batteryTemp, designNote, objective, null);
    }

    /**
     * As above; with a cache, the year (load, grid hours, cold hours) of each inverter and battery module is built
     * once and shared, not copied, by every system simulated over it.
     */
    static Evaluated simulate(SizingInput in, Cand c, double[] batteryTemp, String designNote, SearchResult.Objective objective,
                              Conditions cache) {
        int strings = c.pv.pin() == null ? 0 : c.pv.pin().totalStrings();
        if (cache == null) {
            return simulate(in, c.g, c.bank.design(), c.pv, strings, c.candidate, batteryTemp, designNote, 1.0, 1.0, objective,
                    c.gen);
        }
        YearCheck.Year y = cache.year(in, c.g, batteryTemp);
        YearCheck.Prepared p = YearCheck.prepare(y, in, c.bank.design(), c.g.inverter().spec().loss(), c.pv.seriesW(strings),
                c.pv.efficiency(), c.pv.limitW(), c.gen == null ? java.util.Optional.empty() : java.util.Optional.of(c.gen.sim()));
        return evaluate(p, c.bank.design(), c.candidate, designNote, y.unmetLimitWh(), objective, fuelPrice(in));
    }

    /**
     * A batch of candidates on all cores, results in the batch's order. The candidates are handed to the threads grouped
     * by inverter and battery module (first appearance first): each thread then works through one group's shared year at a
     * time, which keeps its arrays in the processor's cache (measured: with the batch in cost order, where groups
     * interleave, the cabin's candidates ran at about 60 % of the grouped rate).
     */
    static Evaluated[] simulateBatch(SizingInput in, List<Cand> batch, double[] batteryTemp, SearchResult.Objective objective,
                                     Conditions cache) {
        Map<Group, Integer> groupOrder = new java.util.IdentityHashMap<>();
        for (Cand c : batch) {
            groupOrder.putIfAbsent(c.g, groupOrder.size());
        }
        Integer[] order = new Integer[batch.size()];
        for (int k = 0; k < order.length; k++) {
            order[k] = k;
        }
        java.util.Arrays.sort(order, Comparator.comparingInt((Integer k) -> groupOrder.get(batch.get(k).g)));
        Evaluated[] results = new Evaluated[batch.size()];
        IntStream.range(0, order.length).parallel().forEach(j -> {
            int k = order[j];
            Cand c = batch.get(k);
            results[k] = simulated(in, c) ? simulate(in, c, batteryTemp, "", objective, cache) : unsimulated(c, objective);
        });
        return results;
    }

    /** The shared year of each group (inverter and battery module). */
    static final class Conditions {
        private final Map<Group, YearCheck.Year> years = new java.util.IdentityHashMap<>();

        synchronized YearCheck.Year year(SizingInput in, Group g, double[] batteryTemp) {
            return years.computeIfAbsent(g, x -> YearCheck.year(in, g.base().module().chemistry(), g.energy(), in.maxUnmetFraction(),
                    batteryTemp));
        }
    }

    private static Evaluated simulate(SizingInput in, Group g, BankDesign bank, PvPart pv, int pvStrings, Candidate cand,
                                      double[] batteryTemp, String designNote, double loadFactor, double solarFactor,
                                      SearchResult.Objective objective, GenPart gen) {
        double[] pvW = pv.seriesW(pvStrings);
        YearCheck.Prepared p = YearCheck.prepare(in, bank, g.inverter().spec().loss(), g.energy(), pvW, pv.efficiency(),
                pv.limitW(), in.maxUnmetFraction(), batteryTemp,
                gen == null ? java.util.Optional.empty() : java.util.Optional.of(gen.sim()));
        double limit = p.unmetLimitWh();
        if (loadFactor != 1.0 || solarFactor != 1.0) {
            double[] load = p.loadW().clone();
            for (int h = 0; h < load.length; h++) {
                load[h] *= loadFactor;
            }
            double[] sun = p.pvArrayW().clone();
            for (int h = 0; h < sun.length; h++) {
                sun[h] *= solarFactor;
            }
            HourlyConditions cond = HourlyConditions.offGrid(load, sun).withGridAvailable(p.gridAvailable())
                    .withChargeForbidden(p.chargeForbidden());
            p = p.withConditions(cond, load, sun);
            limit = in.maxUnmetFraction() * sum(load);
        }
        return evaluate(p, bank, cand, designNote, limit, objective, fuelPrice(in));
    }

    /** The project's fuel price per litre (0 when not given). */
    private static double fuelPrice(SizingInput in) {
        return in.generator() == null ? 0 : in.generator().fuelPricePerL();
    }

    private static Evaluated evaluate(YearCheck.Prepared p, BankDesign bank, Candidate cand, String designNote, double limit,
                                      SearchResult.Objective objective, double fuelPricePerL) {
        org.holdover.battery.Chemistry chem = bank.module().chemistry();
        SimulationMetrics m;
        double life = Double.NaN;
        if (objective.lifetime()) {
            double[][] curve = chem.cycleLife();
            m = p.quick(new org.holdover.sim.AnalysisOptions(List.of(), java.util.Optional.of(new org.holdover.sim.BatteryAging(
                    new org.holdover.sim.CycleLifeCurve(curve[0], curve[1]), chem.calendarLifeYears()))));
            life = m.battery().life().map(org.holdover.sim.BatteryLife::lifeYears).orElse(chem.calendarLifeYears());
        } else {
            m = p.quick();
        }
        double unmet = m.reliability().unmetWh();
        boolean passes = designNote.isEmpty() && unmet <= limit + 1e-6;
        double fuelCost = m.generator().fuelL() * fuelPricePerL;
        return new Evaluated(cand, unmet, m.reliability().unmetHours(), m.battery().lowestSoc(), passes, designNote, life,
                objective.of(cand, life, fuelCost), fuelCost);
    }

    private record Work(List<Cand> candidates, List<Rejection> rejected, int families, long cheapChecks) {
    }

    /** The cheap checks of every component and the systems whose parts all pass. */
    private static Work cheap(SizingInput in) {
        List<Rejection> rejected = new ArrayList<>();
        List<Cand> out = new ArrayList<>();
        List<Pending> pending = new ArrayList<>();
        long checks = 0;
        int families = 0;
        TreeSet<Double> classes = new TreeSet<>();
        in.catalog().inverters().forEach(s -> classes.add(s.busClassV()));
        if (in.wiring().busVoltageV() > 0) {
            classes.removeIf(c -> c != in.wiring().busVoltageV());
        }
        for (InverterSpec unit : in.catalog().inverters()) {
            if (!classes.contains(unit.busClassV())) {
                continue;
            }
            int most = in.invertersInParallelFor(unit);
            // The inverter's own checks at each count of units in parallel; a count that fails is reported once per unit:
            // every count failing, or the counts below the first that passes.
            String lastWhy = null;
            int failFrom = 0;
            for (int units = 1; units <= most; units++) {
                InverterSpec spec = unit.inParallel(units);
                double cls = spec.busClassV();
                InverterAssessment a = Sizing.assess(spec, in);
                checks++;
                String invFamily = fmt(cls) + " V, " + spec.label();
                if (!a.acMatch()) {
                    rejected.add(new Rejection(fmt(cls) + " V, " + unit.id(), a.acMismatch()));
                    break;
                }
                Check current = a.passes() ? Sizing.currentCheck(in, a) : null;
                String why = !a.passes() ? failure(a.firstFailure()) : !current.passes() ? failure(current) : null;
                if (why != null) {
                    lastWhy = why;
                    failFrom = failFrom == 0 ? units : failFrom;
                    if (units == most) {
                        rejected.add(unitsRejection(cls, unit, failFrom, units, most, why));
                    }
                    continue;
                }
                if (lastWhy != null) {
                    rejected.add(unitsRejection(cls, unit, failFrom, units - 1, most, lastWhy));
                    lastWhy = null;
                    failFrom = 0;
                }
                EnergyBasis energy = Sizing.energy(in, spec.loss());
                for (BatteryModule m : in.catalog().batteryModules()) {
                    if (in.chemistry() != null && m.chemistry() != in.chemistry()) {
                        continue;
                    }
                    if (m.seriesFor(cls) == 0) {
                        continue;
                    }
                    String bankFamily = invFamily + ", " + m.id();
                    BankDesign base = BankSizing.size(m, Sizing.requirement(in, m.chemistry(), cls, energy, a));
                    checks++;
                    if (!base.feasible()) {
                        rejected.add(new Rejection(bankFamily, base.limit()));
                        continue;
                    }
                    String inc = Sizing.incompatibility(base, spec);
                    if (!inc.isEmpty()) {
                        rejected.add(new Rejection(bankFamily, inc));
                        continue;
                    }
                    List<BankPart> banks = new ArrayList<>();
                    String last = "";
                    for (int p = base.strings(); p <= base.maxParallel(); p++) {
                        BankDesign d = base.withStrings(p);
                        checks++;
                        DcDesign dc = DcSide.evaluate(in, spec, d, List.of());
                        if (!dc.problem().isEmpty()) {
                            last = dc.problem();
                            continue;
                        }
                        List<Check> cs = new ArrayList<>(Sizing.bankChecks(d, spec, energy));
                        cs.addAll(Sizing.dcChecks(dc));
                        if (dc.leads() != null) {
                            cs.addAll(dc.leads().checks());
                        }
                        Check f = cs.stream().filter(x -> !x.passes()).findFirst().orElse(null);
                        if (f != null) {
                            last = failure(f);
                            continue;
                        }
                        banks.add(new BankPart(d, cs.stream().mapToDouble(Check::margin).min().orElse(Double.NaN)));
                    }
                    if (banks.isEmpty()) {
                        rejected.add(new Rejection(bankFamily, "no string count from " + base.strings() + " to "
                                + base.maxParallel() + " passes: " + last));
                        continue;
                    }
                    pending.add(new Pending(cls, a, current, energy, base, banks, bankFamily));
                }
            }
        }
        // The PV layouts of each inverter and module, on all cores (each is independent); gathered in order.
        // Every inverter and battery module asks for the same orientations: their irradiance is computed once.
        org.holdover.pv.PlaneMemo memo = in.solar() == null ? null
                : new org.holdover.pv.PlaneMemo(in.solar().weather(), in.solar().sunPath(), in.solar().losses());
        List<PvWork> pv = pending.parallelStream().map(x -> pvWork(in, x, memo)).toList();
        for (int k = 0; k < pending.size(); k++) {
            Pending x = pending.get(k);
            PvWork w = pv.get(k);
            rejected.addAll(w.rejected);
            checks += w.checks;
            families += w.families;
            if (w.parts.isEmpty()) {
                continue;
            }
            List<PvPart> pvs = w.parts;
            List<BankPart> banks = x.banks;
            String bankFamily = x.bankFamily;
            Group g = new Group(x.cls, x.a, x.energy, x.base, banks, pvs);
            List<org.holdover.catalog.GeneratorItem> gens = new ArrayList<>();
            if (in.generator().allowed()) {
                for (org.holdover.catalog.GeneratorItem gi : in.catalog().generators()) {
                    checks++;
                    String why = GeneratorPlan.acMismatch(in, gi);
                    if (why.isEmpty()) {
                        gens.add(gi);
                    } else {
                        rejected.add(new Rejection(bankFamily + ", generator " + gi.id(), why));
                    }
                }
            }
            for (BankPart b : banks) {
                for (PvPart part : pvs) {
                    if (part.full()) {
                        out.add(new Cand(g, b, part, candidate(g, b, part, null), 0, null));
                    }
                }
                for (org.holdover.catalog.GeneratorItem gi : gens) {
                    checks++;
                    List<Check> gc = GeneratorPlan.checks(in, gi, b.design());
                    Check bad = gc.stream().filter(c -> !c.passes()).findFirst().orElse(null);
                    if (bad != null) {
                        if (b == banks.get(0)) {
                            rejected.add(new Rejection(bankFamily + ", generator " + gi.id(), failure(bad)));
                        }
                        continue;
                    }
                    GenPart gp = new GenPart(gi, GeneratorPlan.simulated(in, gi),
                            gc.stream().mapToDouble(Check::margin).min().orElse(Double.NaN));
                    for (PvPart part : pvs) {
                        out.add(new Cand(g, b, part, candidate(g, b, part, gp), 0, gp));
                    }
                }
            }
        }
        return new Work(out, rejected, families, checks);
    }

    /**
     * A unit left out at the counts {@code from} to {@code to} in parallel, with the reason at {@code to} (a failure of
     * the power checks at the larger count holds for the smaller ones too: every rating is × units).
     */
    private static Rejection unitsRejection(double cls, InverterSpec unit, int from, int to, int most, String why) {
        String name = most == 1 ? unit.id() : from == to ? (to == 1 ? unit.id() + " alone" : to + " × " + unit.id())
                : unit.id() + " (" + from + " to " + to + " in parallel)";
        String at = most == 1 || from == to ? "" : to + " in parallel: ";
        return new Rejection(fmt(cls) + " V, " + name, at + why);
    }

    private record Layouts(List<PvPart> parts, long checked, String last) {
    }

    /** An inverter and battery module whose banks pass, waiting for its PV layouts. */
    private record Pending(double cls, InverterAssessment a, Check current, EnergyBasis energy, BankDesign base,
                           List<BankPart> banks, String bankFamily) {
    }

    private record PvWork(List<PvPart> parts, List<Rejection> rejected, long checks, int families) {
    }

    private static PvWork pvWork(SizingInput in, Pending x, org.holdover.pv.PlaneMemo memo) {
        List<Rejection> rejected = new ArrayList<>();
        if (in.solar() == null) {
            return new PvWork(List.of(PvPart.NONE), rejected, 0, 1);
        }
        List<PvPart> pvs = new ArrayList<>();
        long checks = 0;
        int families = 0;
        BusOption stub = new BusOption(x.cls, x.a, x.current, x.energy.energyDcWh(), List.of(), x.base, true, "");
        PvSizing.Pairs pairs = PvSizing.pairs(in, stub, x.energy, memo);
        if (pairs.failure() != null) {
            rejected.add(new Rejection(x.bankFamily, pairs.failure().reason()));
            return new PvWork(pvs, rejected, checks, families);
        }
        for (PvSizing.Pair pair : pairs.pairs()) {
            families++;
            String pvFamily = x.bankFamily + ", " + pair.mi().id() + " on " + pair.ci().id();
            PvOption own = pair.option();
            checks++;
            if (!own.passes()) {
                rejected.add(new Rejection(pvFamily, failure(own.firstFailure())));
                continue;
            }
            Layouts l = layouts(in, pair, own, in.generator().allowed());
            checks += l.checked;
            if (l.parts.isEmpty()) {
                rejected.add(new Rejection(pvFamily, "no layout passes: " + l.last));
            }
            pvs.addAll(l.parts);
        }
        return new PvWork(pvs, rejected, checks, families);
    }

    /** Every layout of a module and controller pair from what the sizing asks for to the most searched. */
    private static Layouts layouts(SizingInput in, PvSizing.Pair pair, PvOption own, boolean smallerToo) {
        PvSizing.StringWindowRange win = pair.window();
        int lo = win.max() >= win.min() ? win.min() : own.candidate().modulesPerString();
        int hi = win.max() >= win.min() ? win.max() : own.candidate().modulesPerString();
        int maxK = in.solar().maxControllers();
        record Job(int n, int k, int s, int needed) {
        }
        List<Job> jobs = new ArrayList<>();
        Map<Integer, double[]> units = new HashMap<>();
        boolean pwm = pair.ci().controller().type() == ControllerType.PWM;
        for (int n = lo; n <= hi; n++) {
            double ratio = pwm ? PwmOperatingPoint.stringPowerRatio(pair.mi().module(), n, pair.cond().batteryOperatingV(), 25.0) : 1.0;
            int needed = ArrayChooser.stringsNeeded(own.requiredStcW(), ArrayChooser.effectiveStringW(pair.mi().module(), n, ratio));
            int most = needed + Math.max(EXTRA_PV_MIN, (int) Math.ceil(EXTRA_PV_SHARE * needed));
            for (int k = 1; k <= maxK; k++) {
                int first = (int) Math.ceil((double) needed / k);
                int last = (int) Math.ceil((double) most / k);
                // With a generator allowed, smaller arrays too: the generator may cover what they leave short.
                for (int s = smallerToo ? 1 : first; s <= last; s++) {
                    jobs.add(new Job(n, k, s, needed));
                }
            }
        }
        for (int n = lo; n <= hi; n++) {
            PvOption one = pair.variant(own, n, 1, 1);
            double[] u = new double[one.output().hours()];
            for (int h = 0; h < u.length; h++) {
                u[h] = one.output().availableDcW(h) - one.output().pwmGivenUpW(h);
            }
            units.put(n, u);
        }
        PvPart[] parts = new PvPart[jobs.size()];
        String[] why = new String[jobs.size()];
        org.holdover.pv.ChargeController ctl = pair.ci().controller();
        double vb = pair.cond().batteryOperatingV();
        double[] need = own.needWhPerDay();
        org.holdover.solar.HourCalendar cal = org.holdover.solar.HourCalendar.ofHours(units.values().iterator().next().length);
        IntStream.range(0, jobs.size()).parallel().forEach(j -> {
            Job job = jobs.get(j);
            ArrayChooser.Input chooserIn = new ArrayChooser.Input(own.requiredStcW(), List.of(pair.mi().module()), List.of(ctl),
                    pair.cond(), Math.max(job.k, maxK));
            org.holdover.pv.ArrayCandidate f = ArrayChooser.fixed(pair.mi().module(), ctl, job.n, job.s, job.k, chooserIn);
            org.holdover.pv.Check bad = f.checks().stream()
                    .filter(c -> !c.passes() && c.severity() == org.holdover.pv.Check.Severity.REQUIRED)
                    .filter(c -> !(smallerToo && c.id().equals(ARRAY_POWER_ID))).findFirst().orElse(null);
            boolean full = job.s >= (int) Math.ceil((double) job.needed / job.k) && f.checks().stream()
                    .noneMatch(c -> !c.passes() && c.severity() == org.holdover.pv.Check.Severity.REQUIRED);
            if (bad != null) {
                why[j] = String.format(Locale.ROOT, "%s %s %s %s", bad.description(), num(bad.value(), bad.unit()),
                        bad.bound() == org.holdover.pv.Check.Bound.MIN ? "<" : ">", num(bad.limit(), bad.unit()));
                return;
            }
            // The controllers' output each hour, as the controller simulation gives it: min(η × P, rated A × V).
            double[] u = units.get(job.n);
            int strings = job.s * job.k;
            double eta = ctl.efficiency();
            double maxOut = ctl.ratedOutputCurrentA() * job.k * vb;
            double[] out = new double[u.length];
            for (int h = 0; h < u.length; h++) {
                out[h] = Math.min(u[h] * strings * eta, maxOut);
            }
            double[] perDay = cal.monthlyMeanDailySum(out);
            double margin = f.checks().stream().filter(c -> c.severity() == org.holdover.pv.Check.Severity.REQUIRED)
                    .mapToDouble(org.holdover.pv.Check::margin).min().orElse(Double.NaN);
            for (int m = 0; m < 12; m++) {
                if (need[m] > 0) {
                    margin = Math.min(margin, perDay[m] / need[m] - 1);
                    if (perDay[m] < need[m]) {
                        why[j] = String.format(Locale.ROOT, "PV energy to the battery in month %d %.0f Wh/day < %.0f Wh/day", m + 1,
                                perDay[m], need[m]);
                        full = false;
                        if (!smallerToo) {
                            return;
                        }
                    }
                }
            }
            int modules = job.n * strings;
            parts[j] = new PvPart(new SystemPin.PvPin(pair.mi().id(), pair.ci().id(), job.n, job.s, job.k),
                    modules * pair.mi().price() + job.k * pair.ci().price(), modules, f.totalStcW(), u, eta, maxOut, margin,
                    job.needed, pair, own, full);
        });
        List<PvPart> ok = new ArrayList<>();
        String last = "";
        for (int j = 0; j < parts.length; j++) {
            if (parts[j] != null) {
                ok.add(parts[j]);
            } else {
                last = why[j];
            }
        }
        return new Layouts(ok, jobs.size() + (hi - lo + 1), last);
    }

    private static Candidate candidate(Group g, BankPart b, PvPart pv, GenPart gen) {
        BankDesign d = b.design();
        InverterSpec inv = g.inverter().spec();
        SystemPin pin = new SystemPin(g.busClassV(), inv.id(), inv.units(), d.module().id(), d.strings(), pv.pin(),
                gen == null ? null : gen.item().id());
        String family = fmt(g.busClassV()) + " V, " + inv.label() + ", " + d.module().id()
                + (pv.pin() == null ? "" : ", " + pv.pin().moduleId() + " on " + pv.pin().controllerId())
                + (gen == null ? "" : ", generator " + gen.item().id());
        double margin = Double.isNaN(pv.margin()) ? b.margin() : Math.min(b.margin(), pv.margin());
        if (gen != null && !Double.isNaN(gen.margin())) {
            margin = Double.isNaN(margin) ? gen.margin() : Math.min(margin, gen.margin());
        }
        return new Candidate(pin, family, inv.catalogUnit().price(), d.modules(), d.module().price(), pv.modules(),
                pv.pair() == null ? 0 : pv.pair().mi().price(), pv.pin() == null ? 0 : pv.pin().controllers(),
                pv.pair() == null ? 0 : pv.pair().ci().price(), d.bankEnergyWh() / 1000.0, pv.stcW() / 1000.0, margin,
                gen == null ? 0 : gen.item().price());
    }

    /** Smaller systems of the chosen family, below what the design checks allow, for the frontier. */
    private static List<Evaluated> smaller(SizingInput in, Cand c, double[] batteryTemp) {
        List<Evaluated> out = new ArrayList<>();
        BankDesign base = c.g.base();
        int p0 = base.strings();
        record Job(int p, int s) {
        }
        List<Job> jobs = new ArrayList<>();
        int chosenS = c.pv.pin() == null ? 0 : c.pv.pin().stringsPerController();
        for (int p = 1; p <= c.bank.design().strings(); p++) {
            for (int s = c.pv.pin() == null ? 0 : 1; s <= chosenS; s++) {
                if (p == c.bank.design().strings() && s == chosenS) {
                    continue;
                }
                jobs.add(new Job(p, s));
            }
        }
        Evaluated[] r = new Evaluated[jobs.size()];
        IntStream.range(0, jobs.size()).parallel().forEach(j -> {
            Job job = jobs.get(j);
            BankDesign d = base.withStrings(job.p);
            PvPart pv = c.pv;
            SystemPin.PvPin pin = pv.pin() == null ? null
                    : new SystemPin.PvPin(pv.pin().moduleId(), pv.pin().controllerId(), pv.pin().modulesPerString(), job.s,
                    pv.pin().controllers());
            int modules = pin == null ? 0 : pin.modulesPerString() * pin.totalStrings();
            double stc = pin == null ? 0 : modules * pv.pair().mi().module().stc().powerW();
            List<String> notes = new ArrayList<>();
            if (job.p < p0) {
                notes.add("fewer battery strings than the battery sizing asks for (" + p0 + ")");
            }
            if (pin != null && pin.totalStrings() < pv.neededStrings()) {
                notes.add("less PV than the PV sizing asks for (" + pv.neededStrings() + " strings)");
            }
            Candidate cand = new Candidate(new SystemPin(c.g.busClassV(), c.candidate.pin().inverterId(),
                    c.candidate.pin().inverters(), d.module().id(), job.p, pin, c.candidate.pin().generatorId()),
                    c.candidate.family(), c.candidate.inverterPrice(), d.modules(), d.module().price(), modules,
                    c.candidate.pvModulePrice(), c.candidate.controllers(), c.candidate.controllerPrice(), d.bankEnergyWh() / 1000.0,
                    stc / 1000.0, Double.NaN, c.candidate.generatorPrice());
            String note = notes.isEmpty() ? "a smaller system of the chosen family (its own checks not repeated here)"
                    : String.join("; ", notes);
            r[j] = simulate(in, c.g, d, pv, pin == null ? 0 : pin.totalStrings(), cand, batteryTemp, note, 1.0, 1.0,
                    SearchResult.Objective.CAPITAL, c.gen);
        });
        out.addAll(List.of(r));
        return out;
    }

    /** The chosen system with more load and with less sun. */
    private static List<Sensitivity> sensitivity(SizingInput in, Cand c, Options o, double[] batteryTemp, boolean simulate) {
        List<Sensitivity> out = new ArrayList<>();
        double g = o.loadGrowthPct() / 100.0;
        InverterAssessment a = c.g.inverter();
        List<String> fails = new ArrayList<>();
        var f = in.loads().figures();
        double contW = a.deratingFactor() * a.spec().continuousW();
        if (contW < in.inverterMargin() * f.runningPeakW() * (1 + g)) {
            fails.add(String.format(Locale.ROOT, "inverter continuous %.0f W < %.2f × %.0f W", contW, in.inverterMargin(),
                    f.runningPeakW() * (1 + g)));
        }
        BankDesign b = c.bank.design();
        double usable = b.usableWh();
        double needWh = c.g.energy().energyDcWh() * (1 + g);
        if (usable < needWh) {
            fails.add(String.format(Locale.ROOT, "usable battery energy %.0f Wh < %.0f Wh (the chain's DC energy scaled with the load)",
                    usable, needWh));
        }
        Evaluated e = simulate ? simulate(in, c.g, b, c.pv, c.pv.pin() == null ? 0 : c.pv.pin().totalStrings(), c.candidate,
                batteryTemp, "", 1 + g, 1.0, SearchResult.Objective.CAPITAL, c.gen) : null;
        double limit = in.maxUnmetFraction() * sum(in.loads().loadW()) * (1 + g);
        if (e != null && e.unmetWh() > limit + 1e-6) {
            fails.add(String.format(Locale.ROOT, "the simulated year leaves %.0f Wh unmet", e.unmetWh()));
        }
        out.add(new Sensitivity("Load higher by", o.loadGrowthPct(), e == null ? Double.NaN : e.unmetWh(), limit, fails.isEmpty(),
                fails.isEmpty() ? "inverter, battery energy" + (e == null ? "" : " and the simulated year") + " still pass"
                        : String.join("; ", fails)));
        if (c.pv.pin() != null) {
            double s = o.poorerSolarPct() / 100.0;
            List<String> sf = new ArrayList<>();
            Evaluated es = simulate(in, c.g, b, c.pv, c.pv.pin().totalStrings(), c.candidate, batteryTemp, "", 1.0, 1 - s,
                    SearchResult.Objective.CAPITAL, c.gen);
            double lim = in.maxUnmetFraction() * sum(in.loads().loadW());
            if (es.unmetWh() > lim + 1e-6) {
                sf.add(String.format(Locale.ROOT, "the simulated year leaves %.0f Wh unmet", es.unmetWh()));
            }
            PvOption v = c.pv.pair().variant(c.pv.own(), c.pv.pin().modulesPerString(), c.pv.pin().stringsPerController(),
                    c.pv.pin().controllers());
            int t = v.tightestMonth();
            double outWh = v.outputWhPerDay()[t] * (1 - s);
            if (outWh < v.needWhPerDay()[t] && c.gen == null) {
                sf.add(String.format(Locale.ROOT, "PV energy in the tightest month %.0f Wh/day < %.0f Wh/day needed", outWh,
                        v.needWhPerDay()[t]));
            }
            out.add(new Sensitivity("Solar resource lower by", o.poorerSolarPct(), es.unmetWh(), lim, sf.isEmpty(),
                    sf.isEmpty() ? "the tightest month's PV energy and the simulated year still pass" : String.join("; ", sf)));
        }
        return out;
    }

    /** The id of the PV array-power check (an advisory when a generator may cover the shortfall). */
    private static final String ARRAY_POWER_ID = "array-power-vs-required";

    /** Least cost first, each with less unmet energy than every cheaper one. */
    static List<Evaluated> pareto(List<Evaluated> all) {
        List<Evaluated> sorted = new ArrayList<>(all);
        sorted.removeIf(e -> Double.isNaN(e.unmetWh()));
        sorted.sort(Comparator.comparingDouble((Evaluated e) -> e.candidate().cost()).thenComparingDouble(Evaluated::unmetWh));
        List<Evaluated> out = new ArrayList<>();
        double best = Double.POSITIVE_INFINITY;
        for (Evaluated e : sorted) {
            if (e.unmetWh() < best - 1e-6) {
                out.add(e);
                best = e.unmetWh();
            }
        }
        return out;
    }

    private static String failure(Check c) {
        if (c == null) {
            return "";
        }
        return String.format(Locale.ROOT, "%s %s %s %s", c.label(), num(c.value(), c.unit()),
                c.sense() == Check.Sense.AT_LEAST ? "<" : ">", num(c.limit(), c.unit()));
    }

    private static String num(double v, String unit) {
        String s = Math.abs(v) >= 100 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.2f", v);
        return unit.isEmpty() ? s : s + " " + unit;
    }

    static double sum(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s;
    }

    static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }
}
