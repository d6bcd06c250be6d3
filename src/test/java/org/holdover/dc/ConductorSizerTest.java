package org.holdover.dc;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import org.junit.jupiter.api.Test;

class ConductorSizerTest {

    private static final ConductorTables TABLES = ConductorTables.standard();
    private static final ConductorSizer SIZER = new ConductorSizer(TABLES);

    /** Hand arithmetic below is carried to 5 significant digits. */
    private static final double HAND_V = 5e-4;

    /**
     * Hand-computed voltage-drop case (demo data): 48 V nominal, 40 A continuous, 10 m one way, 3 % limit,
     * NEC 75 °C copper at 30 °C, conductor at 75 °C (Table 8's own temperature, so no scaling).
     *
     * <pre>
     * design current  40 A × 1.25 = 50 A                       (NEC 210.19(A)(1)(a))
     * 8 AWG  75 °C ampacity 50 A ≥ 50 A → ampacity passes      (Table 310.16, 2023)
     * 10 m = 10 / 0.3048 = 32.808 ft; round trip 65.617 ft
     * 8 AWG  Table 8 stranded 0.778 Ω/kft → 0.065617 × 0.778 = 0.051050 Ω → × 40 A = 2.0420 V = 4.254 % &gt; 3 %
     * 6 AWG  Table 8 stranded 0.491 Ω/kft → 0.065617 × 0.491 = 0.032218 Ω → × 40 A = 1.2887 V = 2.685 % ≤ 3 %
     * → 6 AWG, governed by voltage drop; device: next standard ≥ 50 A = 50 A ≤ 65 A (6 AWG 75 °C).
     * </pre>
     */
    @Test
    void handComputedVoltageDrop_necSixAwg() {
        ConductorRequest req = ConductorRequest.of("Inverter feeder (demo data)", 40.0, 48.0, 10.0, 3.0);
        ConductorSelection sel = SIZER.size(req);
        assertThat(sel).isInstanceOf(ConductorSelection.Sized.class);
        ConductorSelection.Sized s = (ConductorSelection.Sized) sel;

        // Independent recomputation through feet (a different path from the engine's ohm-per-metre constant).
        double roundTripKft = 2 * 10.0 / 0.3048 / 1000.0;
        double expectedDropV = 40.0 * roundTripKft * 0.491;
        assertThat(expectedDropV).isCloseTo(1.2887, offset(HAND_V));

        assertThat(s.chosen().size().label()).isEqualTo("6 AWG");
        assertThat(s.chosen().parallelSets()).isEqualTo(1);
        assertThat(s.governing()).isEqualTo(ConductorSelection.Governing.VOLTAGE_DROP);
        assertThat(s.smallestByAmpacity().label()).isEqualTo("8 AWG");
        assertThat(s.smallestByVoltageDrop().label()).isEqualTo("6 AWG");

        VoltageDropStep d = s.chosen().voltageDrop();
        assertThat(d.dropV()).isCloseTo(expectedDropV, offset(1e-12));
        assertThat(d.dropV()).isCloseTo(1.2887, offset(HAND_V));
        assertThat(d.dropPct()).isCloseTo(2.685, offset(0.001));
        assertThat(d.roundTripResistanceOhm()).isCloseTo(0.032218, offset(1e-6));
        assertThat(d.conductorTempC()).isEqualTo(75.0);

        AmpacityStep a = s.chosen().ampacity();
        assertThat(a.designCurrentA()).isEqualTo(50.0);
        assertThat(a.conditionsOfUseCurrentA()).isEqualTo(40.0);
        assertThat(a.tableAmpacityA()).isEqualTo(65.0);
        assertThat(a.ambientFactor()).isEqualTo(1.0);
        assertThat(a.adjustmentFactor()).isEqualTo(1.0);
        assertThat(a.allowableAmpacityA()).isEqualTo(65.0);

        assertThat(s.device().ratingA()).isEqualTo(50.0);
        assertThat(s.device().basis()).isEqualTo(OvercurrentDevice.Basis.WITHIN_AMPACITY);

        // The 8 AWG candidate is in the list with its failing drop: 2.0420 V, 4.254 %.
        CandidateEvaluation eight = s.candidates().stream().filter(c -> c.size().label().equals("8 AWG"))
                .findFirst().orElseThrow();
        assertThat(eight.ampacity().ok()).isTrue();
        assertThat(eight.voltageDrop().ok()).isFalse();
        assertThat(eight.voltageDrop().dropV()).isCloseTo(40.0 * roundTripKft * 0.778, offset(1e-12));
        assertThat(eight.voltageDrop().dropPct()).isCloseTo(4.254, offset(0.001));
    }

    /**
     * NEC 240.4(D) steps the size up: 12.8 A continuous → 16 A design. 14 AWG carries 20 A at 75 °C, but the
     * next standard device at or above 16 A is 20 A and 240.4(D) caps 14 AWG at 15 A → 12 AWG (20 A device,
     * cap 20 A). Sources: NFPA 70-2023 Table 310.16, 240.4(D), 240.6(A) (REFERENCES §4a, §4c).
     */
    @Test
    void smallConductorLimitGovernsTheSize() {
        ConductorRequest req = ConductorRequest.of("Lights (demo data)", 12.8, 48.0, 1.0, 3.0);
        ConductorSelection.Sized s = (ConductorSelection.Sized) SIZER.size(req);
        assertThat(s.smallestByAmpacity().label()).isEqualTo("14 AWG");
        assertThat(s.chosen().size().label()).isEqualTo("12 AWG");
        assertThat(s.governing()).isEqualTo(ConductorSelection.Governing.OVERCURRENT_DEVICE);
        assertThat(s.device().ratingA()).isEqualTo(20.0);
    }

    /**
     * Correction, adjustment and 240.4(B) together (demo data). 100 A continuous, 90 °C insulation, 75 °C
     * terminals, 45 °C ambient, 5 current-carrying conductors. Sources: NFPA 70-2023 Tables 310.16,
     * 310.15(B)(1)(1) (41–45 °C, 90 °C: 0.87), 310.15(C)(1) (4–6: 0.80), 240.4(B), 240.6(A).
     *
     * <pre>
     * design 125 A; after correction the conductor must carry 100 A
     * 2 AWG:  uncorrected min(130, 115) = 115 &lt; 125 → fails
     * 1 AWG:  min(145, 130) = 130 ≥ 125; corrected 145 × 0.87 × 0.80 = 100.92 ≥ 100 → ampacity passes;
     *         device ≥ 125 A = 125 A &gt; 100.92 A, and the next standard above 100.92 is 110 → none fits
     * 1/0:    corrected 170 × 0.696 = 118.32; 125 A is the next standard above 118.32 and ≤ 800 A → 240.4(B)
     * </pre>
     */
    @Test
    void correctionAdjustmentAndNextSizeUp() {
        ConductorRequest req = ConductorRequest.of("Battery to bus bar (demo data)", 100.0, 48.0, 1.0, 3.0)
                .withInstallation(Installation.nec(45.0, 5, 90, 75));
        ConductorSelection.Sized s = (ConductorSelection.Sized) SIZER.size(req);
        assertThat(s.smallestByAmpacity().label()).isEqualTo("1 AWG");
        assertThat(s.chosen().size().label()).isEqualTo("1/0 AWG");
        assertThat(s.governing()).isEqualTo(ConductorSelection.Governing.OVERCURRENT_DEVICE);
        AmpacityStep a = s.chosen().ampacity();
        assertThat(a.ambientFactor()).isEqualTo(0.87);
        assertThat(a.adjustmentFactor()).isEqualTo(0.80);
        assertThat(a.correctedAmpacityA()).isCloseTo(170 * 0.87 * 0.80, offset(1e-9));
        assertThat(a.uncorrectedLimitA()).isEqualTo(150.0);
        assertThat(a.allowableAmpacityA()).isCloseTo(118.32, offset(1e-9));
        assertThat(a.requiredTableAmpacityA()).isCloseTo(100.0 / (0.87 * 0.80), offset(1e-9));
        assertThat(s.device().ratingA()).isEqualTo(125.0);
        assertThat(s.device().basis()).isEqualTo(OvercurrentDevice.Basis.NEXT_SIZE_UP);
        assertThat(s.notes()).anyMatch(n -> n.contains("240.4(B)"));
    }

    /**
     * PV source circuit: Isc 9 A → 1.5625 × 9 = 14.0625 A design (NEC 690.8(A)(1)+(B), REFERENCES §5b C),
     * 1.25 × 9 = 11.25 A after correction. 14 AWG 90 °C = 25 A, × 0.58 at 66–70 °C (rooftop demo) = 14.5 A ≥
     * 11.25; uncorrected min(25, 20) = 20 ≥ 14.0625. Device: the next standard rating ≥ 14.0625 A is 15 A, above
     * the 14.5 A ampacity; 14.5 A is not a standard rating and 15 A is the next one above it, so 240.4(B) allows
     * 15 A, which is also within the 240.4(D) cap of 15 A for 14 AWG.
     */
    @Test
    void pvSourceCircuitFactors() {
        ConductorRequest req = new ConductorRequest("PV string 1 (demo data)", 9.0, CurrentFactors.PV_SOURCE,
                400.0, 20.0, 2.0, Installation.nec(70.0, 2, 90, 75), 1, false);
        ConductorSelection.Sized s = (ConductorSelection.Sized) SIZER.size(req);
        assertThat(s.chosen().ampacity().designCurrentA()).isEqualTo(14.0625);
        assertThat(s.chosen().ampacity().conditionsOfUseCurrentA()).isEqualTo(11.25);
        assertThat(s.chosen().size().label()).isEqualTo("14 AWG");
        assertThat(s.chosen().ampacity().correctedAmpacityA()).isCloseTo(14.5, offset(1e-9));
        assertThat(s.device().ratingA()).isEqualTo(15.0);
        assertThat(s.device().basis()).isEqualTo(OvercurrentDevice.Basis.NEXT_SIZE_UP);
    }

    /**
     * IEC hand case (demo data): 60 A at 48 V DC, 5 m one way, 3 %, PVC 70 °C method C, 30 °C, one circuit,
     * design factor 1.
     *
     * <pre>
     * 6 mm²: Iz 46 A &lt; 60 A; 10 mm²: Iz 63 A ≥ 60 A    (IEC 60364-5-52 B.52.2, secondary copies)
     * 10 mm² class 2: 1.83 Ω/km at 20 °C (IEC 60228, REFERENCES §3b); at 70 °C ÷ kt 0.833 (§3b) = 2.197 mΩ/m
     * round trip 10 m → 0.02197 Ω × 60 A = 1.318 V = 2.746 % ≤ 3 %
     * </pre>
     */
    @Test
    void iecHandCase_tenSquareMillimetres() {
        ConductorRequest req = new ConductorRequest("Battery feeder (demo data)", 60.0, CurrentFactors.NON_CONTINUOUS,
                48.0, 5.0, 3.0, Installation.iec(30.0, 2, 70), 1, false);
        ConductorSelection.Sized s = (ConductorSelection.Sized) SIZER.size(req);
        assertThat(s.chosen().size().label()).isEqualTo("10 mm²");
        assertThat(s.governing()).isEqualTo(ConductorSelection.Governing.AMPACITY);
        // Independent path: the printed kt (3 decimals) instead of the engine's α = 0.004.
        double rPerM = 1.83e-3 / 0.833;
        double expectedDrop = 60.0 * 2 * 5.0 * rPerM;
        double ktPrintedRelative = 0.0005 / 0.833; // kt printed to 3 decimals
        assertThat(s.chosen().voltageDrop().dropV()).isCloseTo(expectedDrop, offset(expectedDrop * ktPrintedRelative));
        assertThat(s.chosen().voltageDrop().dropV()).isCloseTo(1.318, offset(0.001));
        assertThat(s.chosen().ampacity().allowableAmpacityA()).isEqualTo(63.0);
        assertThat(s.device().ratingA()).isBetween(60.0, 63.0);
    }

    @Test
    void parallelSetsOnlyFromOneAught() {
        // NEC 310.10(G): paralleling only for 1/0 AWG and larger. 450 A continuous needs 562.5 A design: beyond
        // 500 kcmil (380 A at 75 °C), so two sets; the smallest set with 2 × ampacity ≥ 562.5 A is
        // 2 × 300 kcmil = 570 A (Table 310.16, 2023).
        ConductorRequest req = ConductorRequest.of("Main battery cable (demo data)", 450.0, 48.0, 1.0, 3.0)
                .withMaxParallelSets(3);
        ConductorSelection.Sized s = (ConductorSelection.Sized) SIZER.size(req);
        assertThat(s.chosen().parallelSets()).isEqualTo(2);
        assertThat(s.chosen().size().label()).isEqualTo("300 kcmil");
        assertThat(s.chosen().ampacity().allowableAmpacityA()).isEqualTo(570.0);
        // 562.5 A design → 600 A; 600 A > 570 A but 570 A is not standard and 600 A is the next one up (240.4(B)).
        assertThat(s.device().ratingA()).isEqualTo(600.0);
        assertThat(s.device().basis()).isEqualTo(OvercurrentDevice.Basis.NEXT_SIZE_UP);
        assertThat(s.candidates().stream().filter(c -> c.parallelSets() == 2))
                .allMatch(c -> SIZER.parallelAllowed(c.size()))
                .noneMatch(c -> c.size().label().equals("1 AWG"));
        assertThat(s.notes()).anyMatch(n -> n.contains("310.10(G)"));
    }

    @Test
    void noSizeFits_isAResultNotAnException() {
        // 450 A continuous with no paralleling: nothing up to 500 kcmil carries 562.5 A.
        ConductorRequest req = ConductorRequest.of("Too big (demo data)", 450.0, 48.0, 1.0, 3.0);
        ConductorSelection sel = SIZER.size(req);
        assertThat(sel).isInstanceOfSatisfying(ConductorSelection.NotSized.class, n -> {
            assertThat(n.reason()).contains("500 kcmil").contains("ampacity");
            assertThat(n.candidates()).hasSize(TABLES.sizes(TableSystem.NEC).size());
        });
    }

    @Test
    void voltageDropCanMakeEverySizeFail() {
        // 200 m one way at 12 V with a 1 % limit: even 500 kcmil (0.0258 Ω/kft) drops far more.
        ConductorRequest req = ConductorRequest.of("Far shed (demo data)", 20.0, 12.0, 200.0, 1.0);
        assertThat(SIZER.size(req)).isInstanceOfSatisfying(ConductorSelection.NotSized.class,
                n -> assertThat(n.reason()).contains("voltage drop"));
    }

    @Test
    void ambientBeyondTheInsulation() {
        // Table 310.15(B)(1)(1): 60 °C insulation has no factor above 55 °C → no size, with a note.
        ConductorRequest req = ConductorRequest.of("Attic (demo data)", 10.0, 48.0, 2.0, 3.0)
                .withInstallation(Installation.nec(58.0, 2, 60, 60));
        ConductorSelection sel = SIZER.size(req);
        assertThat(sel).isInstanceOf(ConductorSelection.NotSized.class);
        assertThat(sel.notes()).anyMatch(n -> n.contains("does not permit 60 °C insulation"));
    }

    @Test
    void fineStrandedNotes() {
        ConductorRequest nec = ConductorRequest.of("Flexible lead (demo data)", 40.0, 48.0, 2.0, 3.0)
                .withFineStranded(true);
        assertThat(SIZER.size(nec).notes()).anyMatch(n -> n.contains("110.14"));
        ConductorRequest iec = new ConductorRequest("Flexible lead (demo data)", 40.0, CurrentFactors.NON_CONTINUOUS,
                48.0, 2.0, 3.0, Installation.iec(30.0, 2, 90), 1, true);
        ConductorSelection.Sized s = (ConductorSelection.Sized) SIZER.size(iec);
        // class 5 resistance is used (IEC 60228 class 5 column, REFERENCES §3b), not class 2
        double r20 = s.chosen().voltageDrop().resistanceOhmPerM()
                / ConductorTables.temperatureRatio(TableSystem.IEC, 90.0);
        double class5 = TABLES.iecResistance().get(TABLES.indexOf(s.chosen().size())).class5OhmPerKm() / 1000.0;
        assertThat(r20).isCloseTo(class5, offset(1e-15));
        double class2 = TABLES.iecResistance().get(TABLES.indexOf(s.chosen().size())).class2OhmPerKm() / 1000.0;
        assertThat(class5).isGreaterThan(class2);
    }

    @Test
    void requestValidation() {
        assertThatThrownBy(() -> ConductorRequest.of("x", -1, 48, 1, 3)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Installation.nec(30, 2, 70, 75)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Installation.iec(30, 2, 75)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new CurrentFactors(1.25, 1.5)).isInstanceOf(IllegalArgumentException.class);
    }
}
