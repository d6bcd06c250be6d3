package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.holdover.catalog.CatalogReader;
import org.holdover.catalog.GeneratorItem;
import org.holdover.sim.DispatchStrategy;
import org.holdover.sim.GeneratorSizing;
import org.junit.jupiter.api.Test;

/**
 * A catalog generator against the charger and the loads, the altitude derating, the one-leg limit of a 120 V charger on
 * a 120/240 V set, and the built-in demo generators' fuel curves.
 */
class GeneratorPlanTest {

    /** Floating-point agreement of the same arithmetic in another order, relative. */
    static final double ROUNDING = 1e-12;
    /** Metres per international foot (exact by definition, 1959). */
    static final double M_PER_FT = 0.3048;

    static GeneratorItem demo(String id) {
        return CatalogReader.builtin().generators().stream().filter(g -> g.id().equals(id)).findFirst().orElseThrow();
    }

    static SizingInput cabin(double altitudeM, double chargerAcW) {
        return Demos.input(Demos.CABIN).withGenerator(new GeneratorRules(true, new DispatchStrategy.CycleCharging(0.8), 0.3,
                altitudeM, GeneratorSizing.AltitudeDerating.TRADE_RULE, chargerAcW, 0));
    }

    @Test
    void theBuiltInDemoGeneratorsAreMarkedAndTheirFuelLinesPassThroughTheirPoints() {
        List<GeneratorItem> gens = CatalogReader.builtin().generators();
        assertThat(gens).hasSizeBetween(3, 4);
        assertThat(gens).allSatisfy(g -> assertThat(g.description()).contains("demo data"));
        // The set given by two rows of a fuel table: the fitted line (fuel = F0 × rated kW + F1 × output kW, the linear
        // form of Skarstein and Uhlen 1989 as usually quoted, from memory) gives back both rows.
        GeneratorItem two = demo("DEMO-GEN-SP-7000");
        assertThat(two.fuel().litresPerHour(two.ratedW(), 1750)).isCloseTo(1.25, within(1.25 * ROUNDING));
        assertThat(two.fuel().litresPerHour(two.ratedW(), 7000)).isCloseTo(2.6, within(2.6 * ROUNDING));
        assertThat(two.fullLoadLitresPerHour()).isCloseTo(2.6, within(2.6 * ROUNDING));
    }

    @Test
    void altitudeDeratingByTheTradeRuleInFeet() {
        // Trade rule (common practice, no standard): 3 % of the rating per 1,000 ft above 500 ft. Worked in feet here,
        // the engine works in metres.
        double altitudeM = 1450;
        double ft = altitudeM / M_PER_FT;
        double factor = 1 - 0.03 * (ft - 500) / 1000;
        SizingInput in = cabin(altitudeM, 2000);
        GeneratorItem set = demo("DEMO-GEN-230-6000");
        GeneratorSizing.Result r = GeneratorPlan.demand(in, set, null);
        assertThat(r.deratingFactor()).isCloseTo(factor, within(ROUNDING));
        assertThat(GeneratorPlan.simulated(in, set).availableW()).isCloseTo(6000 * factor, within(6000 * ROUNDING));
        // No derating at or below 500 ft.
        assertThat(GeneratorPlan.demand(cabin(500 * M_PER_FT, 2000), set, null).deratingFactor()).isEqualTo(1.0);
    }

    @Test
    void theRatingMustCoverTheChargerAndTheRunningLoadsAfterDerating() {
        SizingInput in = cabin(1450, 2000);
        double loads = in.loads().figures().runningPeakW();
        double factor = 1 - 0.03 * (1450 / M_PER_FT - 500) / 1000;
        GeneratorItem set = demo("DEMO-GEN-230-6000");
        List<Check> checks = GeneratorPlan.checks(in, set, null);
        assertThat(checks).extracting(Check::id).containsExactly(GeneratorPlan.RATED);
        Check rated = checks.get(0);
        assertThat(rated.value()).isEqualTo(6000);
        assertThat(rated.limit()).isCloseTo((2000 + loads) / factor, within(rated.limit() * ROUNDING));
        assertThat(rated.passes()).isEqualTo(6000 * factor >= 2000 + loads);
        // The 3 kW set cannot carry a 2 kW charger and the cabin's running loads.
        assertThat(GeneratorPlan.checks(in, demo("DEMO-GEN-230-3000"), null).get(0).passes()).isFalse();
    }

    @Test
    void theDefaultChargerChargesAtAFifthOfTheRatedEnergyPerHourWithinTheBankLimit() {
        SizingResult cabin = Demos.cabin();
        var bank = cabin.bank();
        SizingInput in = cabin(0, Double.NaN);
        double limitW = bank.strings() * bank.module().maxChargeA() * bank.bankNominalV();
        double expected = Math.min(limitW, 0.2 * bank.bankEnergyWh()) / 0.9;  // C/5 and 90 %: common practice, no source
        assertThat(GeneratorPlan.chargerAcW(in, bank)).isCloseTo(expected, within(expected * ROUNDING));
    }

    @Test
    void aOneHundredTwentyVoltChargerOnASplitPhaseSetUsesOneLeg() {
        SizingInput base = cabin(0, 1500);
        SizingInput in = new SizingInput(base.name(), base.mode(), 120, 60, false, base.inverterAmbientC(), base.batteryColdestC(),
                base.inverterMargin(), base.maxBatteryCurrentA(), base.maxParallelRule(), base.chemistry(), base.depthOfDischarge(),
                base.endOfLife(), base.location(), base.outageHours(), base.autonomyDays(), base.loads(), base.catalog(),
                base.assumptions(), base.warnings(), base.notes(), base.measuredW(), base.profileScale(), base.profileServed(),
                base.wiring(), base.maxUnmetFraction(), base.batteryDesignC(), base.solar(), base.generator());
        GeneratorItem split = demo("DEMO-GEN-SP-7000");
        assertThat(GeneratorPlan.acMismatch(in, split)).isEmpty();
        assertThat(GeneratorPlan.connection(in, split)).isEqualTo(GeneratorSizing.ChargerConnection.ONE_LEG_OF_SPLIT_PHASE);
        double loads = in.loads().figures().runningPeakW();
        List<Check> checks = GeneratorPlan.checks(in, split, null);
        assertThat(checks).extracting(Check::id).containsExactly(GeneratorPlan.RATED, GeneratorPlan.LEG);
        // One leg carries at most half the rating: the whole 120 V demand sits on it, so the set needs twice that.
        assertThat(checks.get(0).limit()).isCloseTo(2 * (1500 + loads), within(ROUNDING * 2 * (1500 + loads)));
        assertThat(checks.get(1).value()).isEqualTo(3500);
        assertThat(checks.get(1).limit()).isCloseTo(1500 + loads, within(ROUNDING * (1500 + loads)));
        // A 230 V 50 Hz set does not suit this service; a split-phase set does not suit a 230 V one.
        assertThat(GeneratorPlan.acMismatch(in, demo("DEMO-GEN-230-3000"))).contains("no 60 Hz output").contains("230 V output");
        assertThat(GeneratorPlan.acMismatch(base, split)).contains("no 50 Hz output").contains("split-phase output on a 230 V service");
        assertThat(GeneratorPlan.connection(base, demo("DEMO-GEN-230-3000"))).isEqualTo(GeneratorSizing.ChargerConnection.FULL_OUTPUT);
    }
}
