package org.holdover.inverter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The peak of a sine wave is √2 × its RMS value, a fact of the trade (REFERENCES.md section 11, exact
 * arithmetic): 120 V → 169.706 V, 230 V → 325.269 V, 240 V → 339.411 V.
 */
class AcPeakTest {

    /** The reference values are printed to three decimals. */
    private static final double PRINTED = 0.0005;

    @ParameterizedTest
    @CsvSource({"120,169.706", "230,325.269", "240,339.411", "208,294.156", "277,391.737"})
    void peakIsRootTwoTimesRms(double rms, double peak) {
        AcOutput ac = new AcOutput(rms, List.of(60.0), false);
        assertThat(ac.peakV()).isCloseTo(peak, within(PRINTED));
    }

    @ParameterizedTest
    @CsvSource({"230,1.0,325.269", "230,0.9,361.41", "240,0.95,357.275"})
    void transformerlessBridgeNeedsThePeakOverTheModulationIndex(double rms, double index, double expectedMinDc) {
        // REFERENCES.md section 11: for 230 V rms from a full bridge, V_dc >= 325.27 V at m_a = 1, 361.41 V at 0.9.
        InverterSpec s = Inverters.spec(InverterSpec.Topology.TRANSFORMERLESS_DIRECT, rms, index);
        assertThat(s.minDcForAcPeakV()).isCloseTo(expectedMinDc, within(0.005));
        InverterSpec boosted = Inverters.spec(InverterSpec.Topology.TRANSFORMERLESS_BOOST, rms, index);
        assertThat(boosted.minDcForAcPeakV()).as("a boost stage removes the constraint").isZero();
    }
}
