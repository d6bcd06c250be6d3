package org.holdover.dc;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** The bundled NEC tables against check values transcribed separately (each check CSV names its source). */
class NecTablesTest {

    private static final ConductorTables TABLES = ConductorTables.standard();

    /** Table values are printed numbers; they must match exactly (allowing only binary representation). */
    private static final double EXACT = 1e-12;

    @ParameterizedTest(name = "{0}: {1}/{2}/{3} A")
    @CsvFileSource(resources = "nec-310-16-2023-check.csv", numLinesToSkip = 1)
    void table310_16_copperAmpacities_nfpa70_2023(String size, double a60, double a75, double a90) {
        // Source: NFPA 70-2023 Table 310.16 (REFERENCES §4a conf. C; kcmil rows: 2023 repo copy).
        ConductorSize s = TABLES.sizeOrThrow(TableSystem.NEC, size);
        assertThat(TABLES.tableAmpacityA(s, 60)).isEqualTo(a60);
        assertThat(TABLES.tableAmpacityA(s, 75)).isEqualTo(a75);
        assertThat(TABLES.tableAmpacityA(s, 90)).isEqualTo(a90);
    }

    @Test
    void table310_16_editionTrap_pinnedTo2023() {
        // Source: REFERENCES §4a edition trap. NFPA 70-2023: 3 AWG 90 °C = 115 (not 110), 1 AWG 90 °C = 145
        // (not 150), 14 AWG 60 °C = 15 (not 20).
        assertThat(TABLES.tableAmpacityA(TABLES.sizeOrThrow(TableSystem.NEC, "3 AWG"), 90)).isEqualTo(115.0);
        assertThat(TABLES.tableAmpacityA(TABLES.sizeOrThrow(TableSystem.NEC, "1 AWG"), 90)).isEqualTo(145.0);
        assertThat(TABLES.tableAmpacityA(TABLES.sizeOrThrow(TableSystem.NEC, "14 AWG"), 60)).isEqualTo(15.0);
    }

    @ParameterizedTest(name = "{0} °C")
    @CsvFileSource(resources = "nec-ambient-2023-check.csv", numLinesToSkip = 1)
    void table310_15_B_1_1_ambientFactors_nfpa70_2023(double ambientC, double f60, double f75, double f90) {
        // Source: NFPA 70-2023 Table 310.15(B)(1)(1) (REFERENCES §4b conf. C). -1 = the table's dash.
        assertFactor(TABLES.necAmbientFactor(ambientC, 60), f60);
        assertFactor(TABLES.necAmbientFactor(ambientC, 75), f75);
        assertFactor(TABLES.necAmbientFactor(ambientC, 90), f90);
    }

    @Test
    void ambientFactor_fractionalAmbientRoundsUpToTheWarmerRow() {
        // Convention (ours, conservative): 30.2 °C is read in the 31–35 row. Values from NFPA 70-2023
        // Table 310.15(B)(1)(1) (REFERENCES §4b): 26–30 → 1.00, 31–35 → 0.94 (75 °C).
        assertThat(TABLES.necAmbientFactor(30.0, 75).getAsDouble()).isEqualTo(1.00);
        assertThat(TABLES.necAmbientFactor(30.2, 75).getAsDouble()).isEqualTo(0.94);
    }

    /**
     * Derivation check (D): the factors follow the NEC 310.15(B) formula sqrt((Tc − Ta)/(Tc − 30)) taken at the
     * warm end of each row, rounded to two decimals. A wrong digit in a copy would show up here.
     */
    @Test
    void ambientFactors_followTheSquareRootFormulaAtTheWarmEndOfEachRow() {
        double roundingSlack = 0.006; // two printed decimals, plus the table's own rounding
        for (ConductorTables.NecAmbientRow row : TABLES.necAmbientCorrection()) {
            for (int tc : new int[] {60, 75, 90}) {
                OptionalDouble f = row.factor(tc);
                if (f.isEmpty()) {
                    continue;
                }
                double expected = Math.sqrt((tc - row.ambientToC()) / (tc - 30.0));
                assertThat(f.getAsDouble()).as("%d °C insulation, %d..%d °C", tc, row.ambientFromC(),
                        row.ambientToC()).isCloseTo(expected, org.assertj.core.data.Offset.offset(roundingSlack));
            }
        }
    }

    @ParameterizedTest(name = "{0} conductors → {1}")
    @CsvFileSource(resources = "nec-adjustment-2023-check.csv", numLinesToSkip = 1)
    void table310_15_C_1_adjustment_nfpa70_2023(int conductors, double factor) {
        // Source: NFPA 70-2023 Table 310.15(C)(1) (REFERENCES §4b conf. C).
        assertThat(TABLES.necAdjustmentFactor(conductors)).isEqualTo(factor);
    }

    @ParameterizedTest(name = "{0}: {2} ohm/kft")
    @CsvFileSource(resources = "nec-table8-check.csv", numLinesToSkip = 1)
    void chapter9Table8_strandedCopperAt75C(String size, double cmil, double ohmPerKft) {
        // Source: NFPA 70-2023 Chapter 9 Table 8 (REFERENCES §3a conf. C; kcmil: second public copy).
        ConductorSize s = TABLES.sizeOrThrow(TableSystem.NEC, size);
        ConductorTables.NecResistanceRow row = TABLES.necResistance().get(TABLES.indexOf(s));
        assertThat(row.strandedOhmPerKft()).isEqualTo(ohmPerKft);
        assertThat(row.areaCmil()).isEqualTo(cmil);
        // Conversion with the named constant: 1 ohm/kft = 1/304.8 ohm/m (exact foot).
        assertThat(TABLES.referenceResistanceOhmPerM(s, false)).isCloseTo(ohmPerKft / 304.8,
                org.assertj.core.data.Offset.offset(EXACT));
    }

    @Test
    void chapter9Table8_theStrandedColumnIsUsed_notTheSolidTrap() {
        // Source: REFERENCES §3a "Surprise": solid 14/12/10/8 AWG = 3.07/1.93/1.21/0.764 are NOT the stranded
        // values (3.14/1.98/1.24/0.778). The engine must use stranded.
        String[] sizes = {"14 AWG", "12 AWG", "10 AWG", "8 AWG"};
        double[] solid = {3.07, 1.93, 1.21, 0.764};
        for (int i = 0; i < sizes.length; i++) {
            ConductorSize s = TABLES.sizeOrThrow(TableSystem.NEC, sizes[i]);
            double engineOhmPerKft = TABLES.referenceResistanceOhmPerM(s, false) * 304.8;
            assertThat(engineOhmPerKft).as(sizes[i]).isGreaterThan(solid[i] * 1.01);
            assertThat(TABLES.necResistance().get(TABLES.indexOf(s)).solidOhmPerKft()).isEqualTo(solid[i]);
        }
    }

    @Test
    void section240_6_A_2023_mainList() throws Exception {
        // Source: NFPA 70-2023 240.6(A) (REFERENCES §4c conf. C): main list from 10 A; fuse-only 1, 3, 6, 601.
        List<Double> expected = CheckCsv.column("nec-240-6-a-2023-check.csv", 0);
        assertThat(OvercurrentProtection.necRatingsA(TABLES)).containsExactlyElementsOf(expected);
        assertThat(TABLES.necStandardRatings().stream().filter(ConductorTables.StandardRating::fuseOnly)
                .map(ConductorTables.StandardRating::ratingA)).containsExactly(1.0, 3.0, 6.0, 601.0);
        assertThat(OvercurrentProtection.necRatingsA(TABLES)).doesNotContain(55.0, 65.0, 85.0);
    }

    @Test
    void section240_4_D_smallConductorLimits() {
        // Source: NFPA 70-2023 240.4(D) (REFERENCES §4a conf. C): 14/12/10 AWG copper → 15/20/30 A.
        assertThat(TABLES.necSmallConductorLimitA(TABLES.sizeOrThrow(TableSystem.NEC, "14 AWG")).getAsDouble())
                .isEqualTo(15.0);
        assertThat(TABLES.necSmallConductorLimitA(TABLES.sizeOrThrow(TableSystem.NEC, "12 AWG")).getAsDouble())
                .isEqualTo(20.0);
        assertThat(TABLES.necSmallConductorLimitA(TABLES.sizeOrThrow(TableSystem.NEC, "10 AWG")).getAsDouble())
                .isEqualTo(30.0);
        assertThat(TABLES.necSmallConductorLimitA(TABLES.sizeOrThrow(TableSystem.NEC, "8 AWG"))).isEmpty();
    }

    private static void assertFactor(OptionalDouble actual, double expected) {
        if (expected < 0) {
            assertThat(actual).isEmpty();
        } else {
            assertThat(actual).hasValue(expected);
        }
    }
}
