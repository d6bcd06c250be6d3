package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.holdover.catalog.Catalog;
import org.holdover.sizing.SearchResult.Evaluated;
import org.junit.jupiter.api.Test;

/**
 * The system search against brute force over every combination of a small catalog (demo data), the chosen system
 * against every check, and the reliability target's monotonicity.
 */
class SystemSearchTest {

    /** Two 48 V inverters, two battery modules, two PV modules and two controllers from the demo catalog. */
    static Catalog small(Catalog c) {
        Set<String> inv = Set.of("DEMO-INV-48-5000", "DEMO-INV-48-8000");
        Set<String> bat = Set.of("DEMO-LFP-48-100", "DEMO-LFP-48-280");
        Set<String> pvm = Set.of("DEMO-PV-330-60", "DEMO-PV-400-72");
        Set<String> cc = Set.of("DEMO-MPPT-150-60", "DEMO-MPPT-250-100");
        return new Catalog("small demo", "test", true, "", c.inverters().stream().filter(i -> inv.contains(i.id())).toList(),
                c.batteryModules().stream().filter(i -> bat.contains(i.id())).toList(),
                c.pvModules().stream().filter(i -> pvm.contains(i.id())).toList(),
                c.chargeControllers().stream().filter(i -> cc.contains(i.id())).toList());
    }

    /**
     * The cabin demo with a small catalog, fewer days of autonomy (so the bank the chain asks for cannot carry every
     * night of the simulated year and the search must trade battery against PV) and a reliability target.
     */
    static SizingInput tight(double autonomyDays, double maxUnmetFraction) {
        SizingInput in = Demos.input(Demos.CABIN);
        return new SizingInput(in.name(), in.mode(), in.acVoltsRms(), in.frequencyHz(), in.splitPhase(), in.inverterAmbientC(),
                in.batteryColdestC(), in.inverterMargin(), in.maxBatteryCurrentA(), in.maxParallelRule(), in.chemistry(),
                in.depthOfDischarge(), in.endOfLife(), in.location(), in.outageHours(), autonomyDays, in.loads(),
                small(in.catalog()), in.assumptions(), in.warnings(), in.notes(), in.measuredW(), in.profileScale(),
                in.profileServed(), in.wiring(), maxUnmetFraction, in.batteryDesignC(), in.solar());
    }

    @Test
    void theSearchFindsWhatBruteForceFinds() {
        for (double[] c : new double[][] {{0.5, 0.0}, {0.3, 0.01}}) {
            SizingInput in = tight(c[0], c[1]);
            List<Evaluated> all = SystemSearch.bruteForce(in, SearchResult.Objective.CAPITAL);
            // Brute force: every candidate simulated, least cost first; the answer is the first that passes, and the
            // next best are the first passing system of each further family.
            Map<String, Evaluated> firstOfFamily = new LinkedHashMap<>();
            for (Evaluated e : all) {
                if (e.passes()) {
                    firstOfFamily.putIfAbsent(e.candidate().family(), e);
                }
            }
            List<Evaluated> expected = new ArrayList<>(firstOfFamily.values());
            assertThat(expected).isNotEmpty();
            // The reliability target binds: the cheapest system passing the cheap checks fails the simulated year.
            assertThat(all.get(0).passes()).isFalse();
            SearchResult s = SystemSearch.run(in, SystemSearch.Options.defaults());
            assertThat(s.chosen().candidate().pin()).isEqualTo(expected.get(0).candidate().pin());
            assertThat(s.chosen().candidate().cost()).isEqualTo(expected.get(0).candidate().cost());
            assertThat(s.chosen().unmetWh()).isCloseTo(expected.get(0).unmetWh(), within(1e-6));
            int n = Math.min(SystemSearch.DEFAULT_ALTERNATIVES, expected.size() - 1);
            assertThat(s.alternatives()).hasSize(n);
            for (int i = 0; i < n; i++) {
                assertThat(s.alternatives().get(i).candidate().pin()).isEqualTo(expected.get(i + 1).candidate().pin());
            }
            // The search simulates far fewer years than brute force.
            assertThat(s.stats().simulated()).isLessThan(all.size());
        }
    }

    @Test
    void tighteningTheReliabilityTargetNeverLowersTheCost() {
        double last = 0;
        for (double f : new double[] {0.10, 0.05, 0.02, 0.01, 0.005, 0.0}) {
            SearchResult s = SystemSearch.run(tight(0.3, f), SystemSearch.Options.defaults());
            assertThat(s.chosen()).isNotNull();
            double cost = s.chosen().candidate().cost();
            assertThat(cost).as("cost at %s", f).isGreaterThanOrEqualTo(last);
            assertThat(s.chosen().unmetWh()).isLessThanOrEqualTo(s.unmetLimitWh() + 1e-6);
            last = cost;
        }
    }

    @Test
    void theChosenSystemPassesEveryCheckWrittenOutInFull() {
        for (SizingInput in : List.of(tight(0.3, 0.0), tight(0.5, 0.01), Demos.input(Demos.CABIN), Demos.input(Demos.FARM))) {
            SizingResult r = Sizing.run(in);
            assertThat(r.search()).isNotNull();
            assertThat(r.passes()).isTrue();
            assertThat(r.checks()).isNotEmpty().allSatisfy(c -> assertThat(c.passes()).as(c.label()).isTrue());
            SystemPin pin = r.search().chosen().candidate().pin();
            // The full result is the pinned system, and its simulated year is the search's.
            assertThat(r.inverter().spec().id()).isEqualTo(pin.inverterId());
            assertThat(r.bank().module().id()).isEqualTo(pin.batteryModuleId());
            assertThat(r.bank().strings()).isEqualTo(pin.strings());
            var cand = r.solar().chosen().candidate();
            assertThat(cand.module().name()).isNotEmpty();
            assertThat(cand.modulesPerString()).isEqualTo(pin.pv().modulesPerString());
            assertThat(cand.stringsPerController()).isEqualTo(pin.pv().stringsPerController());
            assertThat(cand.controllerCount()).isEqualTo(pin.pv().controllers());
            // One string's output × strings against the whole array's own simulation: the same to rounding.
            assertThat(r.year().metrics().reliability().unmetWh())
                    .isCloseTo(r.search().chosen().unmetWh(), within(1e-6 * Math.max(1, r.search().chosen().unmetWh())));
            double price = r.inverter().spec().price() + r.bank().price() + r.solar().chosen().price();
            assertThat(r.search().chosen().candidate().cost()).isCloseTo(price, within(1e-9));
        }
    }

    @Test
    void theFrontierIsLeastCostFirstWithLessUnmetEachStep() {
        SearchResult s = SystemSearch.run(tight(0.3, 0.0), SystemSearch.Options.defaults());
        List<Evaluated> f = s.frontier();
        assertThat(f.size()).isGreaterThan(2);
        for (int i = 1; i < f.size(); i++) {
            assertThat(f.get(i).candidate().cost()).isGreaterThanOrEqualTo(f.get(i - 1).candidate().cost());
            assertThat(f.get(i).unmetWh()).isLessThan(f.get(i - 1).unmetWh());
        }
        // The chosen system (least cost with nothing unmet) sits on the frontier or a cheaper one with nothing unmet
        // fails a design check.
        Evaluated last = f.get(f.size() - 1);
        assertThat(last.unmetWh()).isLessThanOrEqualTo(1e-6);
        assertThat(last.candidate().cost()).isLessThanOrEqualTo(s.chosen().candidate().cost());
        if (last.candidate().cost() < s.chosen().candidate().cost()) {
            assertThat(last.designNote()).isNotEmpty();
        }
    }

    @Test
    void theLoadGrowthCaseMatchesTheBankByHand() {
        SizingResult r = Demos.farm();
        var bank = r.bank();
        // Usable energy after depth of discharge, temperature, aging and rate, against the chain's DC energy × 1.10.
        double usable = bank.bankAh() * bank.bankNominalV() * bank.requirement().depthOfDischarge()
                / (bank.temperatureFactor() * bank.agingFactor() * bank.rateFactor());
        boolean enough = usable >= 1.10 * r.energy().energyDcWh();
        SearchResult.Sensitivity load = r.search().sensitivity().get(0);
        assertThat(load.changePct()).isEqualTo(SystemSearch.DEFAULT_LOAD_GROWTH_PCT);
        if (!enough) {
            assertThat(load.passes()).isFalse();
            assertThat(load.detail()).contains("usable battery energy");
        }
        // Off grid the second case is the poorer solar year.
        assertThat(Demos.cabin().search().sensitivity()).extracting(SearchResult.Sensitivity::label)
                .containsExactly("Load higher by", "Solar resource lower by");
    }

    @Test
    void stoppingEarlyReturnsTheBestFoundSoFar() {
        SearchResult s = SystemSearch.run(tight(0.3, 0.0), new SystemSearch.Options(3, 10, 10, () -> true, null));
        assertThat(s.stats().stoppedEarly()).isTrue();
        assertThat(s.chosen()).isNull();
        assertThat(s.sensitivity()).isEmpty();
    }

    @Test
    void replacementsAreDiscountedByHand() {
        // Present value of a future payment: P ÷ (1 + r)^t (the standard discounting formula; common practice).
        SearchResult.Objective o = new SearchResult.Objective(25, 0.05);
        assertThat(o.replacements(15)).isEqualTo(1);    // bought again at 15 years
        assertThat(o.replacements(10)).isEqualTo(2);    // at 10 and 20 years
        assertThat(o.replacements(12.5)).isEqualTo(1);  // at 12.5 years; the second would fall on the horizon
        assertThat(o.replacements(30)).isZero();
        assertThat(o.replacementCost(1000, 15)).isCloseTo(1000 / 2.0789281794113688, within(1e-9)); // 1.05^15
        assertThat(o.replacementCost(1000, 10)).isCloseTo(1000 / 1.628894626777442 + 1000 / 2.653297705144422, within(1e-9));
        assertThat(new SearchResult.Objective(25, 0).replacementCost(1000, 10)).isEqualTo(2000);
        // Ordinary annuity factor (1 − (1 + r)^−n) ÷ r: 25 years at 5 % = 14.0939 (engineering-economics tables;
        // 1.05^−25 = 0.295303), and n itself without discounting.
        assertThat(o.annuityFactor()).isCloseTo((1 - 1 / 3.3863549408993885) / 0.05, within(1e-12));
        assertThat(o.annuityFactor()).isCloseTo(14.0939, within(1e-4));
        assertThat(new SearchResult.Objective(25, 0).annuityFactor()).isEqualTo(25);
        assertThat(SearchResult.Objective.CAPITAL.replacementCost(1000, 1)).isZero();
    }

    @Test
    void theLifetimeObjectiveFindsWhatBruteForceFinds() {
        SizingInput in = tight(0.5, 0.0);
        SearchResult.Objective obj = new SearchResult.Objective(25, 0.05);
        List<Evaluated> all = SystemSearch.bruteForce(in, obj);
        Evaluated best = null;
        for (Evaluated e : all) {
            if (e.passes() && (best == null || e.objective() < best.objective())) {
                best = e;
            }
        }
        assertThat(best).isNotNull();
        SearchResult s = SystemSearch.run(in, SystemSearch.Options.defaults().withObjective(obj));
        assertThat(s.chosen().candidate().pin()).isEqualTo(best.candidate().pin());
        assertThat(s.chosen().objective()).isCloseTo(best.objective(), within(1e-6));
        // The chosen system's lifetime cost by hand from its simulated battery life.
        SearchResult.Candidate c = s.chosen().candidate();
        double life = s.chosen().lifeYears();
        assertThat(life).isGreaterThan(0).isLessThanOrEqualTo(15.0 + 1e-9); // LiFePO4 calendar life, from memory
        double bank = c.bankModules() * c.bankModulePrice();
        double expected = c.cost();
        for (int k = 1; k * life < 25 - 1e-9; k++) {
            expected += bank / Math.pow(1.05, k * life);
        }
        assertThat(s.chosen().objective()).isCloseTo(expected, within(1e-6));
        // Capital cost alone never exceeds the lifetime cost, and the lifetime choice costs no less up front than the
        // capital choice.
        SearchResult capital = SystemSearch.run(in, SystemSearch.Options.defaults());
        assertThat(s.chosen().objective()).isGreaterThanOrEqualTo(c.cost());
        assertThat(c.cost()).isGreaterThanOrEqualTo(capital.chosen().candidate().cost());
    }

    /**
     * An invented 6 kW 230 V 50 Hz set priced low (test data, demo data style: no real product), so that a small array with
     * it is cheaper than the array the PV sizing asks for.
     */
    static final org.holdover.catalog.GeneratorItem CHEAP_SET = new org.holdover.catalog.GeneratorItem("TEST-GEN-230-6000",
            "Invented cheap 6 kW 230 V set (test data)", 6000, new org.holdover.inverter.AcOutput(230, List.of(50.0), false), 0.3,
            new org.holdover.sim.FuelCurve(0.085, 0.25), 250);

    /** The tight cabin with a generator allowed (cycle charging 30 % to 80 %, site at 1,450 m, a 2 kW charger). */
    static SizingInput withGenerator(double autonomyDays, double maxUnmetFraction, org.holdover.catalog.GeneratorItem set) {
        SizingInput in = tight(autonomyDays, maxUnmetFraction);
        GeneratorRules rules = new GeneratorRules(true, new org.holdover.sim.DispatchStrategy.CycleCharging(0.8), 0.3,
                1450, org.holdover.sim.GeneratorSizing.AltitudeDerating.TRADE_RULE, 2000, 1.6);
        return in.withCatalog(in.catalog().withGenerators(List.of(set))).withGenerator(rules);
    }

    @Test
    void aCheapGeneratorWithASmallArrayBeatsTheLargeArrayAndTheSearchAgreesWithBruteForce() {
        SizingInput in = withGenerator(0.5, 0.0, CHEAP_SET);
        List<Evaluated> all = SystemSearch.bruteForce(in, SearchResult.Objective.CAPITAL);
        Map<String, Evaluated> firstOfFamily = new LinkedHashMap<>();
        for (Evaluated e : all) {
            if (e.passes()) {
                firstOfFamily.putIfAbsent(e.candidate().family(), e);
            }
        }
        List<Evaluated> expected = new ArrayList<>(firstOfFamily.values());
        Evaluated best = expected.get(0);
        // The same project without a generator: its least-cost passing system costs more, with a larger array.
        Evaluated without = SystemSearch.bruteForce(tight(0.5, 0.0), SearchResult.Objective.CAPITAL).stream()
                .filter(Evaluated::passes).findFirst().orElseThrow();
        assertThat(best.candidate().pin().generatorId()).isEqualTo(CHEAP_SET.id());
        assertThat(best.candidate().cost()).isLessThan(without.candidate().cost());
        assertThat(best.candidate().pvKw()).isLessThan(without.candidate().pvKw());
        // Systems without the generator are still candidates (the search may choose none).
        assertThat(all).anyMatch(e -> e.candidate().pin().generatorId() == null);
        SearchResult s = SystemSearch.run(in, SystemSearch.Options.defaults());
        assertThat(s.chosen().candidate().pin()).isEqualTo(best.candidate().pin());
        assertThat(s.chosen().candidate().cost()).isEqualTo(best.candidate().cost());
        assertThat(s.chosen().unmetWh()).isCloseTo(best.unmetWh(), within(1e-6));
        int n = Math.min(SystemSearch.DEFAULT_ALTERNATIVES, expected.size() - 1);
        assertThat(s.alternatives()).hasSize(n);
        for (int i = 0; i < n; i++) {
            assertThat(s.alternatives().get(i).candidate().pin()).isEqualTo(expected.get(i + 1).candidate().pin());
        }
        // Capital cost includes the generator's price.
        SearchResult.Candidate c = s.chosen().candidate();
        assertThat(c.cost()).isCloseTo(c.inverterPrice() + c.bankModules() * c.bankModulePrice() + c.pvModules() * c.pvModulePrice()
                + c.controllers() * c.controllerPrice() + CHEAP_SET.price(), within(1e-9));
    }

    @Test
    void theChosenGeneratorSystemWrittenOutPassesItsChecksAndRunsTheGenerator() {
        SizingInput in = withGenerator(0.5, 0.0, CHEAP_SET);
        SizingResult r = Sizing.run(in);
        assertThat(r.generator()).isNotNull();
        assertThat(r.passes()).isTrue();
        assertThat(r.checks()).extracting(Check::id).contains(GeneratorPlan.RATED).doesNotContain(PvSizing.ENERGY);
        // The small array fails the worst-month energy check on its own: it is kept, as an advisory.
        assertThat(r.advisories()).anyMatch(a -> a.id().equals(PvSizing.ENERGY) && !a.passes());
        var g = r.year().metrics().generator();
        assertThat(g.hours()).isPositive();
        assertThat(g.starts()).isPositive().isLessThanOrEqualTo(g.hours());
        assertThat(r.year().metrics().reliability().unmetWh())
                .isCloseTo(r.search().chosen().unmetWh(), within(1e-6 * Math.max(1, r.search().chosen().unmetWh())));
        // Fuel: the linear form (no-load term × rated kW + slope × output kWh) summed over the running hours, by hand from
        // the year's generator output (FuelCurve's form, Skarstein and Uhlen 1989 as usually quoted, from memory).
        double byHand = g.hours() * CHEAP_SET.fuel().noLoadLPerHPerRatedKw() * CHEAP_SET.ratedW() / 1000
                + CHEAP_SET.fuel().slopeLPerKwh() * g.outputWh() / 1000;
        assertThat(g.fuelL()).isCloseTo(byHand, within(1e-9 * byHand));
        assertThat(r.fuelCostPerYear()).isCloseTo(1.6 * g.fuelL(), within(1e-9 * g.fuelL()));
    }

    @Test
    void theLifetimeObjectiveCountsTheGeneratorsFuelAndAgreesWithBruteForce() {
        SizingInput in = withGenerator(0.5, 0.0, CHEAP_SET);
        SearchResult.Objective obj = new SearchResult.Objective(20, 0.06);
        List<Evaluated> all = SystemSearch.bruteForce(in, obj);
        Evaluated best = null;
        for (Evaluated e : all) {
            if (e.passes() && (best == null || e.objective() < best.objective())) {
                best = e;
            }
        }
        SearchResult s = SystemSearch.run(in, SystemSearch.Options.defaults().withObjective(obj));
        assertThat(s.chosen().candidate().pin()).isEqualTo(best.candidate().pin());
        assertThat(s.chosen().objective()).isCloseTo(best.objective(), within(1e-6));
        // Every system with the generator that burns fuel carries its fuel over the horizon in the objective, by hand.
        double annuity = (1 - Math.pow(1.06, -20)) / 0.06;
        Evaluated burning = all.stream().filter(e -> e.fuelCostPerYear() > 0).findFirst().orElseThrow();
        SearchResult.Candidate c = burning.candidate();
        double replacements = 0;
        for (int k = 1; k * burning.lifeYears() < 20 - 1e-9; k++) {
            replacements += c.bankModules() * c.bankModulePrice() / Math.pow(1.06, k * burning.lifeYears());
        }
        assertThat(burning.objective()).isCloseTo(c.cost() + replacements + burning.fuelCostPerYear() * annuity, within(1e-6));
        // With fuel priced in, the lifetime choice is never cheaper over the years than the capital choice is.
        SearchResult capital = SystemSearch.run(in, SystemSearch.Options.defaults());
        Evaluated capitalAsLifetime = all.stream().filter(e -> e.candidate().pin().equals(capital.chosen().candidate().pin()))
                .findFirst().orElseThrow();
        assertThat(s.chosen().objective()).isLessThanOrEqualTo(capitalAsLifetime.objective() + 1e-6);
    }
}
