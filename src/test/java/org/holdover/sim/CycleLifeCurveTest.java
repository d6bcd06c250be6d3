package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class CycleLifeCurveTest {

    /** Interpolation is one log and one exp: agreement to 1e-12 relative is rounding only. */
    private static final double RELATIVE = 1e-12;

    /** Demo data: an invented lithium curve, not any product's. */
    private final CycleLifeCurve curve = new CycleLifeCurve(new double[] {0.2, 0.5, 0.8, 1.0},
            new double[] {12000, 6000, 3500, 2500});

    @Test
    void returnsTheTableAtItsPoints() {
        assertThat(curve.cyclesToFailure(0.5)).isCloseTo(6000, within(6000 * RELATIVE));
        assertThat(curve.cyclesToFailure(1.0)).isCloseTo(2500, within(2500 * RELATIVE));
    }

    @Test
    void interpolatesLinearlyInLogLog() {
        // Between (0.2, 12000) and (0.5, 6000): ln N = ln 12000 + (ln 6000 - ln 12000)/(ln 0.5 - ln 0.2)
        // * (ln 0.3 - ln 0.2). Worked here, not taken from the implementation.
        double slope = (Math.log(6000) - Math.log(12000)) / (Math.log(0.5) - Math.log(0.2));
        double expected = Math.exp(Math.log(12000) + slope * (Math.log(0.3) - Math.log(0.2)));
        assertThat(curve.cyclesToFailure(0.3)).isCloseTo(expected, within(expected * RELATIVE));
        // A log-log line is a power law: the geometric mean of depths maps to the geometric mean of cycles.
        double gm = Math.sqrt(0.2 * 0.5);
        assertThat(curve.cyclesToFailure(gm)).isCloseTo(Math.sqrt(12000 * 6000.0), within(8485.3 * RELATIVE));
    }

    @Test
    void extendsTheEndSegmentsAsPowerLaws() {
        // Below 0.2 the first segment's exponent continues: N(0.02) = 12000 * (0.02/0.2)^slope.
        double slope = (Math.log(6000) - Math.log(12000)) / (Math.log(0.5) - Math.log(0.2));
        double expected = 12000 * Math.pow(0.1, slope);
        assertThat(curve.cyclesToFailure(0.02)).isCloseTo(expected, within(expected * RELATIVE));
        assertThat(curve.cyclesToFailure(0.02)).isGreaterThan(12000);
    }

    @Test
    void rejectsATableThatIsNotACurve() {
        assertThatThrownBy(() -> new CycleLifeCurve(new double[] {0.5, 0.2}, new double[] {100, 200}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("increase");
        assertThatThrownBy(() -> new CycleLifeCurve(new double[] {0.2, 0.5}, new double[] {100, 200}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("must not increase");
        assertThatThrownBy(() -> new CycleLifeCurve(new double[] {0.5}, new double[] {100}))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
