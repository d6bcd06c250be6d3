package org.holdover.inverter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Identical inverters in parallel sharing one output equally. The check values are worked by hand from the unit's
 * ratings; equal sharing of load and surge among paralleled units is common practice, no source (makers state their
 * own stacking limits and derates, which a real catalog must carry).
 */
class InParallelTest {

    /** A 5 kW unit allowed to run with up to 4 identical units (test data). */
    private static InverterSpec unit() {
        InverterSpec s = Inverters.spec(InverterSpec.Topology.TRANSFORMERLESS_BOOST, 230, 0.95);
        return new InverterSpec(s.id(), s.description(), s.busClassV(), s.dcMinV(), s.dcMaxV(), s.ac(), s.continuousW(),
                s.continuousVa(), s.perLegVa(), s.surge(), s.deratingStartC(), s.deratingPctPerC(), s.efficiencyPoints(),
                s.noLoadW(), s.topology(), s.maxModulationIndex(), 1234.5, s.loss(), 4);
    }

    @Test
    void everyRatingTheNoLoadDrawAndThePriceScaleWithTheUnits() {
        InverterSpec u = unit();
        InverterSpec three = u.inParallel(3);
        assertThat(three.units()).isEqualTo(3);
        assertThat(three.catalogUnit()).isSameAs(u);
        assertThat(three.label()).isEqualTo("3 × T");
        // By hand: 3 × 5,000 W; surge 3 × 10,000 VA for 5 s and 3 × 15,000 VA for 0.2 s; 3 × 30 W idle; 3 × 1,234.5.
        assertThat(three.continuousW()).isEqualTo(15_000);
        assertThat(three.continuousVa()).isEqualTo(15_000);
        assertThat(three.surgeVa(1.0)).isEqualTo(30_000);
        assertThat(three.surgeVa(0.1)).isEqualTo(45_000);
        assertThat(three.noLoadW()).isEqualTo(90);
        assertThat(three.price()).isEqualTo(3703.5);
        // The DC window, derating and modulation limit are the unit's: at 35 °C, 1 − 10 × 1.5 % = 0.85 of each rating.
        assertThat(three.deratingFactor(35)).isEqualTo(u.deratingFactor(35)).isCloseTo(0.85, within(1e-12));
        assertThat(three.dcMinV()).isEqualTo(u.dcMinV());
        assertThat(three.minDcForAcPeakV()).isEqualTo(u.minDcForAcPeakV());
        assertThat(u.inParallel(1)).isSameAs(u);
    }

    @Test
    void theLossOfUnitsSharingTheLoadIsEachUnitsLossAtItsShare() {
        InverterSpec u = unit();
        for (int n = 2; n <= 4; n++) {
            LossModel stack = u.inParallel(n).loss();
            for (double p : new double[] {0, 250, 1_000, 4_000, 9_000, 14_000}) {
                // Each of the n units carries p / n: the DC input of all of them is n × the unit's input at that share.
                double byUnits = n * u.loss().inputW(p / n);
                assertThat(stack.inputW(p)).as("%d units at %.0f W", n, p).isCloseTo(byUnits, within(1e-9 * Math.max(1, byUnits)));
            }
            // At no load every unit draws its idle power (none sleeps): n × 30 W.
            assertThat(stack.inputW(0)).isCloseTo(n * 30.0, within(1e-9));
            // Efficiency at the same share of the rating is the unit's.
            assertThat(stack.efficiency(0.5)).isCloseTo(u.loss().efficiency(0.5), within(1e-15));
        }
    }

    @Test
    void moreUnitsThanTheCatalogAllowsAreRefused() {
        InverterSpec u = unit();
        assertThatThrownBy(() -> u.inParallel(5)).isInstanceOf(IllegalArgumentException.class).hasMessageContaining("1 to 4");
        assertThatThrownBy(() -> u.inParallel(0)).isInstanceOf(IllegalArgumentException.class);
        InverterSpec single = Inverters.spec(InverterSpec.Topology.TRANSFORMER, 230, 0.95);
        assertThat(single.maxInParallel()).isEqualTo(1);
        assertThatThrownBy(() -> single.inParallel(2)).isInstanceOf(IllegalArgumentException.class);
        assertThat(List.of(u.inParallel(2).inParallel(3).units())).containsExactly(3);
    }
}
