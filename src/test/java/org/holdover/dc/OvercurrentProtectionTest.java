package org.holdover.dc;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class OvercurrentProtectionTest {

    private static final ConductorTables TABLES = ConductorTables.standard();
    private static final ConductorSize AWG_1_0 = TABLES.sizeOrThrow(TableSystem.NEC, "1/0 AWG");

    @ParameterizedTest(name = "{0} A → {1} A")
    @CsvSource({"17.5, 20", "115, 125", "56.25, 60", "50, 50", "9.5, 10"})
    void nextStandardRating_nec240_6_A(double design, double expected) {
        // Source: REFERENCES §4c checks (NFPA 70-2023 240.6(A)): next standard ≥ 17.5 → 20, ≥ 115 → 125,
        // ≥ 56.25 → 60; 50 is itself standard; 2023 starts the list at 10 A.
        assertThat(OvercurrentProtection.nextAtOrAbove(OvercurrentProtection.necRatingsA(TABLES), design))
                .hasValue(expected);
    }

    @Test
    void withinAmpacity() {
        OvercurrentDevice d = OvercurrentProtection.select(TABLES, AWG_1_0, 125.0, 150.0);
        assertThat(d).isInstanceOfSatisfying(OvercurrentDevice.Rated.class, r -> {
            assertThat(r.ratingA()).isEqualTo(125.0);
            assertThat(r.basis()).isEqualTo(OvercurrentDevice.Basis.WITHIN_AMPACITY);
        });
    }

    @Test
    void nextSizeUp_240_4_B_whenAmpacityIsNotAStandardRating() {
        // NEC 240.4(B) (REFERENCES §4c, C): 118.3 A is not a standard rating; 125 A is the next one above it and
        // ≤ 800 A, so a 125 A device may protect it.
        OvercurrentDevice d = OvercurrentProtection.select(TABLES, AWG_1_0, 125.0, 118.32);
        assertThat(d).isInstanceOfSatisfying(OvercurrentDevice.Rated.class, r -> {
            assertThat(r.ratingA()).isEqualTo(125.0);
            assertThat(r.basis()).isEqualTo(OvercurrentDevice.Basis.NEXT_SIZE_UP);
        });
    }

    @Test
    void nextSizeUp_onlyOneStep() {
        // 100.9 A: the next standard above it is 110 A, but the design current needs 125 A → none fits.
        assertThat(OvercurrentProtection.select(TABLES, AWG_1_0, 125.0, 100.92).fits()).isFalse();
    }

    @Test
    void nextSizeUp_notWhenTheAmpacityIsItselfStandard() {
        // 240.4(B)(2): applies only when the ampacity does not correspond to a standard rating. 110 A is standard.
        OvercurrentDevice d = OvercurrentProtection.select(TABLES, AWG_1_0, 115.0, 110.0);
        assertThat(d).isInstanceOfSatisfying(OvercurrentDevice.NoneFits.class,
                n -> assertThat(n.reason()).contains("itself a standard rating"));
    }

    @Test
    void nextSizeUp_stopsAt800A() {
        // 240.4(B)(3) (REFERENCES §4c: next-size-up only ≤ 800 A): ampacity 820 A, design 850 A → 1000 A is not
        // allowed by 240.4(B).
        ConductorSize s500 = TABLES.sizeOrThrow(TableSystem.NEC, "500 kcmil");
        OvercurrentDevice d = OvercurrentProtection.select(TABLES, s500, 850.0, 820.0);
        assertThat(d).isInstanceOfSatisfying(OvercurrentDevice.NoneFits.class,
                n -> assertThat(n.reason()).contains("800 A"));
        // but 780 A ampacity with a 790 A design current may take 800 A:
        OvercurrentDevice ok = OvercurrentProtection.select(TABLES, s500, 790.0, 780.0);
        assertThat(ok).isInstanceOfSatisfying(OvercurrentDevice.Rated.class,
                r -> assertThat(r.ratingA()).isEqualTo(800.0));
    }

    @Test
    void smallConductorLimit_240_4_D_overridesEverything() {
        // NFPA 70-2023 240.4(D) (REFERENCES §4a): 14 AWG copper ≤ 15 A even though its 75 °C ampacity is 20 A.
        ConductorSize s14 = TABLES.sizeOrThrow(TableSystem.NEC, "14 AWG");
        assertThat(OvercurrentProtection.select(TABLES, s14, 16.0, 20.0)).isInstanceOfSatisfying(
                OvercurrentDevice.NoneFits.class, n -> assertThat(n.reason()).contains("240.4(D)"));
        assertThat(OvercurrentProtection.select(TABLES, s14, 15.0, 20.0)).isInstanceOfSatisfying(
                OvercurrentDevice.Rated.class, r -> assertThat(r.ratingA()).isEqualTo(15.0));
    }

    @Test
    void beyondTheLargestRating() {
        ConductorSize s500 = TABLES.sizeOrThrow(TableSystem.NEC, "500 kcmil");
        assertThat(OvercurrentProtection.select(TABLES, s500, 6001.0, 7000.0)).isInstanceOfSatisfying(
                OvercurrentDevice.NoneFits.class, n -> assertThat(n.reason()).contains("6000"));
    }

    @Test
    void iec_InBetweenIbAndIz() {
        // Rule IEC 60364-4-43 433.1 (from memory): Ib ≤ In ≤ Iz. The device list is from memory, so this checks
        // the rule only: the rating is the smallest listed value ≥ Ib and is refused above Iz.
        ConductorSize s10 = ConductorSize.metric(10);
        OvercurrentDevice d = OvercurrentProtection.select(TABLES, s10, 60.0, 63.0);
        assertThat(d).isInstanceOfSatisfying(OvercurrentDevice.Rated.class, r -> {
            assertThat(r.ratingA()).isBetween(60.0, 63.0);
            assertThat(TABLES.iecDeviceRatingsA()).contains(r.ratingA());
        });
        assertThat(OvercurrentProtection.select(TABLES, s10, 60.0, 62.0).fits()).isFalse();
    }
}
