package org.holdover.load;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;

/** Code-letter ranges against NEMA MG 1-10.37.2 (EASA handbook table), from a CSV that names its source. */
class NemaCodeLetterTest {

    /** Table values are printed to two decimals. */
    private static final double TABLE = 1e-9;

    @ParameterizedTest(name = "{0}: {1}–{2} kVA/hp")
    @CsvFileSource(resources = "nema-code-letters.csv", numLinesToSkip = 1)
    void rangesMatchTheStandardTable(String letter, double from, Double below) {
        NemaCodeLetter l = NemaCodeLetter.valueOf(letter);
        assertThat(l.lowKvaPerHp()).isCloseTo(from, within(TABLE));
        if (below == null) {
            assertThat(l.highKvaPerHp()).isInfinite();
            assertThat(l.designKvaPerHp()).as("V has no top: the lower figure is used").isEqualTo(from);
        } else {
            assertThat(l.highKvaPerHp()).isCloseTo(below, within(TABLE));
            assertThat(l.designKvaPerHp()).as("sizing uses the top of the range").isEqualTo(below);
            // The range includes its lower figure and excludes its upper one (EASA / MG 1 rule).
            assertThat(NemaCodeLetter.of(from)).isEqualTo(l);
            assertThat(NemaCodeLetter.of(Math.nextDown(below))).isEqualTo(l);
            assertThat(NemaCodeLetter.of(below)).isNotEqualTo(l);
        }
    }

    @ParameterizedTest
    @CsvSource({"3.14,A", "3.15,B", "6.29,G", "6.30,H", "22.39,U", "22.40,V", "40,V"})
    void boundariesFollowTheLowerIncludedRule(double kvaPerHp, String letter) {
        // REFERENCES.md section 2: "3.14 -> A, 3.15 -> B".
        assertThat(NemaCodeLetter.of(kvaPerHp)).isEqualTo(NemaCodeLetter.valueOf(letter));
    }

    @ParameterizedTest
    @CsvSource({"1.0,G,240,26.25", "0.5,K,230,19.5652173913", "2.0,H,240,59.1666666667"})
    void lockedRotorAmpsFollowTheEasaRelation(double hp, String letter, double volts, double expectedAmps) {
        // EASA relation for single phase: kVA/hp = V × LRA ÷ (1000 × hp), so LRA = kVA/hp × hp × 1000 ÷ V;
        // expected amps computed by hand from the top of each letter's range (G 6.30, K 9.00, H 7.10).
        LockedRotor.ByCodeLetter lr = new LockedRotor.ByCodeLetter(hp, NemaCodeLetter.valueOf(letter));
        double va = lr.directStartVa(0);
        assertThat(va / volts).isCloseTo(expectedAmps, within(1e-6));
    }
}
