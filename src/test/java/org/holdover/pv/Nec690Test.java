package org.holdover.pv;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** NEC 690.7(A) voltage correction and 690.8 current multipliers (REFERENCES.md §5a, §5b, confidence C). */
class Nec690Test {

    private static final double EXACT = 1e-12;

    @ParameterizedTest
    @CsvFileSource(resources = "nec-690-7-a.csv")
    void tableFactorsAcrossEachRow(int warmestC, int middleC, int coldestC, double factor) {
        // NFPA 70 Table 690.7(A): every temperature in the row's range takes the row's factor.
        assertThat(Nec690.vocCorrectionFactor(warmestC)).isEqualTo(factor);
        assertThat(Nec690.vocCorrectionFactor(middleC)).isEqualTo(factor);
        assertThat(Nec690.vocCorrectionFactor(coldestC)).isEqualTo(factor);
    }

    @Test
    void betweenRowsTheColderRowApplies() {
        // The table lists whole degrees; −0.5 °C lies between the rows "4 to 0" (1.10) and "−1 to −5"
        // (1.12): the colder row is the safe choice (our rule, stated in Nec690).
        assertThat(Nec690.vocCorrectionFactor(-0.5)).isEqualTo(1.12);
        assertThat(Nec690.vocCorrectionFactor(24.5)).isEqualTo(1.02);
        assertThat(Nec690.vocCorrectionFactor(25.0)).isEqualTo(1.0);
        assertThat(Nec690.vocCorrectionFactor(-40.0)).isEqualTo(1.25);
        assertThat(Nec690.isBelowTable(-40.0)).isFalse();
        assertThat(Nec690.isBelowTable(-40.5)).isTrue();
        assertThat(Nec690.vocTableRow(-41)).isEmpty();
    }

    @Test
    void factorsNeverDecreaseAsItGetsColder() {
        double previous = 1.0;
        for (double t = 30; t >= -40; t -= 0.25) {
            double f = Nec690.vocCorrectionFactor(t);
            assertThat(f).as("at %.2f °C", t).isGreaterThanOrEqualTo(previous);
            previous = f;
        }
    }

    @Test
    void coefficientMethodOnTheDemoModule() {
        // 690.7(A)(1) coefficient method, recomputed here (D): Voc × (1 + βVoc (Tmin − 25 °C)).
        PvModule m = DemoEquipment.MODULE_400;
        double recordLowC = -25;
        double beta = m.coefficients().vocPerC().getAsDouble();
        double expected = m.stc().vocV() * (1 + beta * (recordLowC - 25));
        ColdVoc cold = ColdVoc.of(m, recordLowC);
        assertThat(cold).isInstanceOf(ColdVoc.ByCoefficient.class);
        assertThat(cold.moduleVocV()).isCloseTo(expected, within(EXACT));
        assertThat(cold.moduleVocV()).isCloseTo(49.2 * 1.135, within(EXACT));
        // The table's factor at −25 °C (1.20) is more conservative than this module's coefficient (1.135).
        assertThat(cold.moduleVocV()).isLessThan(m.stc().vocV() * Nec690.vocCorrectionFactor(recordLowC));
    }

    @Test
    void tableMethodWhenTheModuleHasNoCoefficient() {
        PvModule m = DemoEquipment.MODULE_100_NO_VOC_COEFF;
        ColdVoc cold = ColdVoc.of(m, -18);
        assertThat(cold).isInstanceOfSatisfying(ColdVoc.ByNecTable.class, t -> {
            assertThat(t.factor()).isEqualTo(1.18);
            assertThat(t.row()).isEqualTo("-16 to -20 °C");
            assertThat(t.belowTable()).isFalse();
        });
        assertThat(cold.moduleVocV()).isCloseTo(22.3 * 1.18, within(EXACT));
    }

    @Test
    void currentMultipliers() {
        // 690.8(A)(1): 1.25 × Isc; 690.8(B): 1.25 × that = 1.5625 × Isc (REFERENCES.md §5b, C).
        assertThat(Nec690.maxCircuitCurrentA(10.35)).isCloseTo(12.9375, within(EXACT));
        assertThat(Nec690.conductorSizingCurrentA(10.35)).isCloseTo(10.35 * 1.5625, within(EXACT));
        PvArray three = new PvArray(DemoEquipment.MODULE_400, 3, 3);
        ArrayCheckReport r = ArrayChecks.evaluate(three, DemoEquipment.MPPT_250_100, DemoEquipment.cold48V(-20));
        assertThat(r.maxCircuitCurrentA()).isCloseTo(3 * 10.35 * 1.25, within(EXACT));
        assertThat(r.conductorSizingCurrentA()).isCloseTo(3 * 10.35 * 1.5625, within(EXACT));
    }
}
