package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.holdover.sim.GeneratorSizing.AltitudeDerating;
import org.holdover.sim.GeneratorSizing.ChargerConnection;
import org.holdover.sim.GeneratorSizing.Demand;
import org.junit.jupiter.api.Test;

class GeneratorSizingTest {

    private static final double FT = 0.3048;
    /** Linear arithmetic on a few values: rounding only. */
    private static final double ROUNDING = 1e-9;

    @Test
    void altitudeRuleReproducesThePrintedWorkedExample() {
        // Source: agricultural-engineering text on engine power, "Altitude" (progressivegardening.com):
        // naturally aspirated engines lose 3 % per 1,000 ft above 500 ft; worked problem: a 225 hp diesel at
        // 4,500 ft. Recomputed here: (4500 - 500)/1000 * 3 % = 12 % -> 225 * 0.88 = 198 hp.
        double factor = AltitudeDerating.TRADE_RULE.factorAt(4500 * FT);
        assertThat(factor).isCloseTo(1 - (4500 - 500) / 1000.0 * 0.03, within(ROUNDING));
        assertThat(225 * factor).isCloseTo(198, within(1e-9));
        assertThat(AltitudeDerating.TRADE_RULE.factorAt(100)).isEqualTo(1.0);
    }

    @Test
    void oneLegOfASplitPhaseSetGovernsA120VoltCharger() {
        // A 120 V charger drawing 3,000 W on one leg, with 500 W of loads on that leg and 1,500 W of loads in
        // all while charging. Total 4,500 W; leg 3,500 W, and a leg carries half the set's rating, so the
        // set must give 7,000 W at the site (common practice, no source: each leg of a 120/240 V set is
        // half its rating). At sea level the nameplate is 7,000 W.
        GeneratorSizing.Result r = GeneratorSizing.size(new Demand(3000, 1500, 500,
                ChargerConnection.ONE_LEG_OF_SPLIT_PHASE, 0, AltitudeDerating.TRADE_RULE));
        assertThat(r.totalDemandW()).isEqualTo(4500);
        assertThat(r.legDemandW()).isEqualTo(3500);
        assertThat(r.oneLegGoverns()).isTrue();
        assertThat(r.requiredOutputW()).isEqualTo(7000);
        assertThat(r.requiredRatedW()).isCloseTo(7000, within(ROUNDING));
    }

    @Test
    void fullOutputConnectionAtAltitude() {
        // Same loads with a 240 V charger at 2,000 m: 4,500 W at the site; derating 3 %/1,000 ft above
        // 500 ft -> factor 1 - (2000 - 152.4) * 0.03 / 304.8 = 0.81815...; nameplate 4,500 / factor.
        GeneratorSizing.Result r = GeneratorSizing.size(new Demand(3000, 1500, 0, ChargerConnection.FULL_OUTPUT,
                2000, AltitudeDerating.TRADE_RULE));
        double factor = 1 - (2000 - 152.4) * 0.03 / 304.8;
        assertThat(r.oneLegGoverns()).isFalse();
        assertThat(r.requiredOutputW()).isEqualTo(4500);
        assertThat(r.deratingFactor()).isCloseTo(factor, within(ROUNDING));
        assertThat(r.requiredRatedW()).isCloseTo(4500 / factor, within(ROUNDING));
        assertThat(r.requiredRatedW()).isCloseTo(5500.2, within(0.1));
    }

    @Test
    void totalGovernsWhenTheOtherLegIsHeavilyLoaded() {
        // Charger 1,000 W on leg A with 200 W; 4,000 W of loads in all: total 5,000 W > 2 x 1,200 W.
        GeneratorSizing.Result r = GeneratorSizing.size(new Demand(1000, 4000, 200,
                ChargerConnection.ONE_LEG_OF_SPLIT_PHASE, 0, AltitudeDerating.TRADE_RULE));
        assertThat(r.oneLegGoverns()).isFalse();
        assertThat(r.requiredOutputW()).isEqualTo(5000);
    }
}
