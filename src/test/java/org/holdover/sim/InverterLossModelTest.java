package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class InverterLossModelTest {

    /** Closed-form root against a textbook root: agreement is to rounding, far below a milliwatt. */
    private static final double W_ROUNDING = 1e-9;

    /** Demo data: 2 kW, 1 % no-load, 2 % linear, 6 % quadratic (invented, typical magnitudes). */
    private final InverterLossModel inv = new InverterLossModel(2000, 0.01, 0.02, 0.06);

    @Test
    void inputFollowsTheThreeTermModel() {
        // Schmidt & Sauer (1996) form as stated in the brief: P_in = P_out + P_r (p0 + k1 p + k2 p^2).
        // 1000 W out, p = 0.5: 1000 + 2000 * (0.01 + 0.01 + 0.015) = 1070 W.
        assertThat(inv.inputW(1000)).isCloseTo(1070, within(W_ROUNDING));
        // No load: the no-load loss alone, 2000 * 0.01 = 20 W.
        assertThat(inv.inputW(0)).isCloseTo(20, within(W_ROUNDING));
        assertThat(inv.noLoadLossW()).isCloseTo(20, within(W_ROUNDING));
    }

    @ParameterizedTest
    @ValueSource(doubles = {20.5, 100, 1070, 2500, 6000})
    void outputIsTheTextbookRootOfTheQuadratic(double inputW) {
        // k2 p^2 + (1 + k1) p + (p0 - P_in/P_r) = 0, larger root by the textbook formula.
        double a = 0.06;
        double bq = 1.02;
        double c = 0.01 - inputW / 2000;
        double p = (-bq + Math.sqrt(bq * bq - 4 * a * c)) / (2 * a);
        assertThat(inv.outputW(inputW)).isCloseTo(2000 * p, within(1e-9 * Math.max(1, inputW)));
        assertThat(inv.inputW(inv.outputW(inputW))).isCloseTo(inputW, within(1e-9 * inputW));
    }

    @Test
    void deliversNothingBelowTheNoLoadLossAndIsLinearWithoutTheSquareTerm() {
        assertThat(inv.outputW(19.9)).isZero();
        assertThat(inv.outputW(20)).isZero();
        InverterLossModel linear = new InverterLossModel(1000, 0.01, 0.05, 0);
        // P_in = 1.05 P_out + 10: 115 W in gives 100 W out.
        assertThat(linear.outputW(115)).isCloseTo(100, within(W_ROUNDING));
    }
}
