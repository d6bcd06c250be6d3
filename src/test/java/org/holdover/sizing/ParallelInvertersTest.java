package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.holdover.catalog.Catalog;
import org.holdover.inverter.InverterSpec;
import org.holdover.inverter.LossModel;
import org.holdover.sizing.SearchResult.Evaluated;
import org.junit.jupiter.api.Test;

/**
 * Identical inverters in parallel as a dimension of the sizing and the search, on the whole-shop variant of the farm
 * demo (demo data): its running demand is more than any single catalog unit carries at 30 °C. Equal sharing of load
 * and surge among paralleled units is common practice, no source.
 */
class ParallelInvertersTest {

    static final String WHOLE_SHOP = "examples/variants/farm-shop-whole-shop.yaml";

    private static SizingInput shop() {
        return Demos.input(WHOLE_SHOP);
    }

    /** The three 48 V split-phase units and two battery modules of the demo catalog. */
    private static SizingInput shopSmallCatalog() {
        SizingInput in = shop();
        Catalog c = in.catalog();
        Set<String> inv = Set.of("DEMO-INV-48-4000S", "DEMO-INV-48-6000S", "DEMO-INV-48-8000S");
        Set<String> bat = Set.of("DEMO-LFP-48-100", "DEMO-LFP-48-280");
        return in.withCatalog(new Catalog("small demo", "test", true, "", c.inverters().stream().filter(i -> inv.contains(i.id())).toList(),
                c.batteryModules().stream().filter(m -> bat.contains(m.id())).toList()));
    }

    @Test
    void threeFourKilowattUnitsAgainstTheDemandByHand() {
        SizingInput in = shop();
        InverterSpec three = Sizing.assessAll(in).stream().map(InverterAssessment::spec)
                .filter(s -> s.id().equals("DEMO-INV-48-4000S") && s.units() == 3).findFirst().orElseThrow();
        InverterAssessment a = Sizing.assess(three, in);
        // Unit (demo catalog): 4,000 W and VA, 2,400 VA a leg, surge 8,000 VA for 5 s and 10,000 VA for 0.2 s,
        // derating from 25 °C at 1.2 %/°C, 28 W idle, cutoff 42 V. At 30 °C: 1 − 5 × 0.012 = 0.94.
        assertThat(a.deratingFactor()).isCloseTo(0.94, within(1e-12));
        assertThat(InvertersCheck.value(a, "inverter.continuousW")).isCloseTo(3 * 4000 * 0.94, within(1e-9));
        assertThat(InvertersCheck.value(a, "inverter.continuousVa")).isCloseTo(3 * 4000 * 0.94, within(1e-9));
        assertThat(InvertersCheck.value(a, "inverter.legVa")).isCloseTo(3 * 2400 * 0.94, within(1e-9));
        // The 1.5 s start falls under the 5 s rating: 3 × 8,000 VA; a leg takes its share 2,400 / 4,000 of it.
        assertThat(InvertersCheck.value(a, "inverter.surgeVa")).isCloseTo(24_000, within(1e-9));
        assertThat(InvertersCheck.value(a, "inverter.legSurgeVa")).isCloseTo(24_000 * 2400 / 4000.0, within(1e-9));
        // DC current at the cutoff: (P + 12,000 × (p0 + k1·x + k2·x²)) ÷ 42 V, x = P ÷ 12,000, p0 = 28 ÷ 4,000.
        LossModel unit = three.catalogUnit().loss();
        double p = in.loads().figures().runningPeakW();
        double x = p / 12_000;
        double byHand = (p + 12_000 * (28 / 4000.0 + unit.k1() * x + unit.k2() * x * x)) / 42.0;
        assertThat(a.continuousDcA()).isCloseTo(byHand, within(1e-9 * byHand));
        assertThat(a.passes()).isTrue();
        // Two units are not enough: 2 × 4,000 × 0.94 = 7,520 W < 1.25 × the running demand.
        assertThat(Sizing.assess(three.catalogUnit().inParallel(2), in).passes()).isFalse();
        assertThat(2 * 4000 * 0.94).isLessThan(in.inverterMargin() * p);
    }

    @Test
    void onlyUnitsInParallelCarryTheWholeShopAndTheSearchPutsThemThere() {
        SizingInput in = shop();
        SizingResult single = Sizing.run(in.withMaxInvertersInParallel(1));
        assertThat(single.chosen()).as("no single catalog unit carries the whole shop").isNull();
        SizingResult r = Sizing.run(in);
        assertThat(r.passes()).isTrue();
        InverterSpec chosen = r.inverter().spec();
        assertThat(chosen.units()).isGreaterThan(1);
        assertThat(r.search().chosen().candidate().pin().inverters()).isEqualTo(chosen.units());
        assertThat(r.search().chosen().candidate().pin().inverterId()).isEqualTo(chosen.id());
        // The pinned system's price: units × the unit's price + the bank, as the search costed it.
        assertThat(r.search().chosen().candidate().cost())
                .isCloseTo(chosen.units() * chosen.catalogUnit().price() + r.bank().price(), within(1e-9));
        // The simulated year runs with the units' idle draw: the year's inverter no-load loss is units × 28 W.
        assertThat(r.year().metrics().reliability().unmetWh()).isLessThanOrEqualTo(1e-6);
        assertThat(chosen.loss().inputW(0)).isCloseTo(chosen.units() * 28.0, within(1e-9));
    }

    @Test
    void allowingMoreUnitsNeverRaisesTheCost() {
        SizingInput in = shopSmallCatalog();
        double last = Double.POSITIVE_INFINITY;
        for (int cap = 1; cap <= 4; cap++) {
            SearchResult s = SystemSearch.run(in.withMaxInvertersInParallel(cap), SystemSearch.Options.defaults());
            double cost = s.chosen() == null ? Double.POSITIVE_INFINITY : s.chosen().candidate().cost();
            assertThat(cost).as("cost with up to %d units", cap).isLessThanOrEqualTo(last);
            if (s.chosen() != null) {
                assertThat(s.chosen().candidate().pin().inverters()).isLessThanOrEqualTo(cap);
            }
            last = cost;
        }
        assertThat(last).isFinite();
    }

    @Test
    void theSearchFindsWhatBruteForceFindsWithUnitsInParallel() {
        SizingInput in = shopSmallCatalog();
        List<Evaluated> all = SystemSearch.bruteForce(in, SearchResult.Objective.CAPITAL);
        // Every count of each unit that passes its own checks and has a bank is a candidate: 3 and 4 × 4 kW, 2 to 4 × 6 kW,
        // 2 and 3 × 8 kW.
        Set<String> stacks = new java.util.TreeSet<>();
        all.forEach(e -> stacks.add(e.candidate().pin().inverters() + "x" + e.candidate().pin().inverterId()));
        assertThat(stacks).containsExactlyInAnyOrder("3xDEMO-INV-48-4000S", "4xDEMO-INV-48-4000S", "2xDEMO-INV-48-6000S",
                "3xDEMO-INV-48-6000S", "4xDEMO-INV-48-6000S", "2xDEMO-INV-48-8000S", "3xDEMO-INV-48-8000S");
        // Four 8 kW units are left out: their rated input at the 42 V cutoff (32 kW ÷ 42 V, about 800 A) is more than any
        // battery cable in the tables carries with the larger module, and the smaller module needs more strings than allowed.
        List<SearchResult.Rejection> why = SystemSearch.run(in, SystemSearch.Options.defaults()).rejected().stream()
                .filter(j -> j.family().contains("4 × DEMO-INV-48-8000S")).toList();
        assertThat(why).extracting(SearchResult.Rejection::reason).anyMatch(r -> r.contains("no conductor carries"))
                .anyMatch(r -> r.contains("parallel strings needed"));
        // Counts that fail their own checks are reported once per run of counts, with the reason at the largest:
        // 2 × 4 kW × 0.94 = 7,520 W and 6 kW × (1 − 5 × 0.010) = 5,700 W fall short of 1.25 × the running demand.
        List<SearchResult.Rejection> rej = SystemSearch.run(in, SystemSearch.Options.defaults()).rejected();
        assertThat(rej).filteredOn(j -> j.family().equals("48 V, DEMO-INV-48-4000S (1 to 2 in parallel)")).singleElement()
                .satisfies(j -> assertThat(j.reason()).startsWith("2 in parallel: Continuous output (W)").contains("7520 W"));
        assertThat(rej).filteredOn(j -> j.family().equals("48 V, DEMO-INV-48-6000S alone")).singleElement()
                .satisfies(j -> assertThat(j.reason()).startsWith("Continuous output (W)").contains("5700 W"));
        Evaluated best = all.stream().filter(Evaluated::passes).findFirst().orElseThrow();
        SearchResult s = SystemSearch.run(in, SystemSearch.Options.defaults());
        assertThat(s.chosen().candidate().pin()).isEqualTo(best.candidate().pin());
        assertThat(s.chosen().candidate().cost()).isEqualTo(best.candidate().cost());
        // The cheapest passing system is 3 × 4 kW (3 × 1,800 = 5,400) rather than 2 × 6 kW (5,800) with the same bank.
        assertThat(best.candidate().pin().inverterId()).isEqualTo("DEMO-INV-48-4000S");
        assertThat(best.candidate().pin().inverters()).isEqualTo(3);
    }

    /** A check's design value by id. */
    static final class InvertersCheck {
        static double value(InverterAssessment a, String id) {
            return a.checks().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow().value();
        }
    }
}
