package org.holdover.inverter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Weighted efficiencies. CEC points 10/20/30/50/75/100 % with weights 0.04/0.05/0.12/0.21/0.53/0.05
 * (Sandia PVPMC "CEC Inverter Test Protocol"; Bower et al. 2004); European points 5/10/20/30/50/100 %
 * with weights 0.03/0.06/0.13/0.10/0.48/0.20 (REFERENCES.md section 6).
 */
class WeightedEfficiencyTest {

    @Test
    void weightsAreThePublishedOnes() {
        assertThat(WeightedEfficiency.CEC.loadFractions()).containsExactly(0.10, 0.20, 0.30, 0.50, 0.75, 1.00);
        assertThat(WeightedEfficiency.CEC.weights()).containsExactly(0.04, 0.05, 0.12, 0.21, 0.53, 0.05);
        assertThat(WeightedEfficiency.EURO.loadFractions()).containsExactly(0.05, 0.10, 0.20, 0.30, 0.50, 1.00);
        assertThat(WeightedEfficiency.EURO.weights()).containsExactly(0.03, 0.06, 0.13, 0.10, 0.48, 0.20);
    }

    @Test
    void aFlatCurveGivesItsOwnValue() {
        // Both weight sets sum to 1, so a flat curve returns its constant (REFERENCES.md section 6 convention).
        EfficiencyCurve flat = x -> 0.95;
        assertThat(WeightedEfficiency.CEC.of(flat)).isCloseTo(0.95, within(1e-15));
        assertThat(WeightedEfficiency.EURO.of(flat)).isCloseTo(0.95, within(1e-15));
    }

    @Test
    void aKnownCurveGivesTheHandSum() {
        // A tabulated curve with a point at every weighting load: the weighted sum by hand.
        List<EfficiencyPoint> pts = List.of(new EfficiencyPoint(0.05, 0.80), new EfficiencyPoint(0.10, 0.88),
                new EfficiencyPoint(0.20, 0.92), new EfficiencyPoint(0.30, 0.935), new EfficiencyPoint(0.50, 0.945),
                new EfficiencyPoint(0.75, 0.94), new EfficiencyPoint(1.00, 0.93));
        TabulatedCurve c = new TabulatedCurve(pts, LossModel.fit(1000, 5, pts));
        double cec = 0.04 * 0.88 + 0.05 * 0.92 + 0.12 * 0.935 + 0.21 * 0.945 + 0.53 * 0.94 + 0.05 * 0.93;
        double euro = 0.03 * 0.80 + 0.06 * 0.88 + 0.13 * 0.92 + 0.10 * 0.935 + 0.48 * 0.945 + 0.20 * 0.93;
        assertThat(WeightedEfficiency.CEC.of(c)).isCloseTo(cec, within(1e-12));
        assertThat(WeightedEfficiency.EURO.of(c)).isCloseTo(euro, within(1e-12));
        assertThat(cec).isCloseTo(0.93655, within(1e-12));
        assertThat(euro).isCloseTo(0.9295, within(1e-12));
    }
}
