package org.holdover.dc;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import org.junit.jupiter.api.Test;

class ConductorUnitsTest {

    private static final ConductorTables TABLES = ConductorTables.standard();

    @Test
    void circularMil_isPiOverFourSquareMils() {
        // Definition: 1 cmil = π/4 mil², 1 mil = 0.0254 mm (exact inch). 250 kcmil = 126.677 mm² (arithmetic:
        // 250000 × 0.785398 × 0.00064516 = 126.6769).
        assertThat(ConductorUnits.kcmilToMm2(250)).isCloseTo(126.6769, offset(5e-4));
        assertThat(ConductorUnits.mm2ToKcmil(ConductorUnits.kcmilToMm2(500))).isCloseTo(500.0, offset(1e-9));
    }

    @Test
    void awgLaw_agreesWithTable8Areas() {
        // NEC Chapter 9 Table 8 lists areas in cmil (REFERENCES §3a): the AWG law (ASTM B258) must reproduce them
        // to within 0.1 % (the table rounds to 4 significant digits).
        double relative = 1e-3;
        String[] labels = {"14 AWG", "10 AWG", "6 AWG", "1 AWG", "1/0 AWG", "4/0 AWG"};
        for (String label : labels) {
            ConductorSize s = TABLES.sizeOrThrow(TableSystem.NEC, label);
            double law = ConductorUnits.awgAreaMm2(ConductorUnits.parseAwg(label));
            assertThat(law).as(label).isCloseTo(s.areaMm2(), offset(relative * s.areaMm2()));
        }
        // 4/0 is 0.4600 in across by definition: 211600 cmil exactly.
        assertThat(ConductorUnits.awgDiameterMm(-3)).isCloseTo(0.46 * 25.4, offset(1e-9));
    }

    @Test
    void parseAwg_handlesAughts() {
        assertThat(ConductorUnits.parseAwg("4/0 AWG")).isEqualTo(-3);
        assertThat(ConductorUnits.parseAwg("1/0")).isEqualTo(0);
        assertThat(ConductorUnits.parseAwg("12 AWG")).isEqualTo(12);
        assertThatThrownBy(() -> ConductorUnits.parseAwg("5/0")).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void ohmPerKft_toOhmPerM_usesTheExactFoot() {
        // 1 ohm/kft = 1 ohm / 304.8 m = 0.00328084 ohm/m.
        // The literal is printed to 8 significant digits, so allow 1e-10.
        assertThat(ConductorUnits.ohmPerKftToOhmPerM(1.0)).isCloseTo(0.0032808399, offset(1e-10));
        assertThat(ConductorUnits.feetToMetres(1000)).isEqualTo(304.8);
        assertThat(ConductorUnits.fahrenheitToCelsius(167)).isCloseTo(75.0, offset(1e-12));
    }

    @Test
    void table8_75CIsTheIdealCopperResistanceScaledFrom20C() {
        // Cross-check (REFERENCES §3a, D): 10 AWG = 10380 cmil = 5.26 mm²; ideal ρ20 = 1/58 Ω·mm²/m (IACS, §3c C)
        // → 3.278 mΩ/m at 20 °C; × (1 + 0.00393 × 55) = × 1.2162 → 3.987 mΩ/m = 1.215 Ω/kft, equal to the
        // SOLID 10 AWG value 1.21 (stranded 1.24 is ~2 % higher because of the lay of the strands).
        double area = ConductorUnits.circularMilsToMm2(10380);
        double r20 = (1.0 / 58.0) / area;
        double r75PerKft = r20 * (1 + ConductorTables.COPPER_ALPHA_20C_PER_C * 55) * 304.8;
        assertThat(r75PerKft).isCloseTo(1.215, offset(0.002));
    }

    @Test
    void necTemperatureScaling_matchesTheTable8NoteCoefficient() {
        // NEC scaling from 75 °C with α20 = 0.00393 (REFERENCES §3c, C): R75/R20 = 1.2162 (D, recomputed:
        // 1 + 0.00393 × 55). Referred to 75 °C the slope is 0.00393 / 1.2162 = 0.003232 per °C; the Chapter 9
        // Table 8 note prints 0.00323 (from memory; a public page repeats it).
        double r20over75 = ConductorTables.temperatureRatio(TableSystem.NEC, 20.0);
        assertThat(1.0 / r20over75).isCloseTo(1 + 0.00393 * 55, offset(1e-12));
        double slopeAt75 = (ConductorTables.temperatureRatio(TableSystem.NEC, 76.0) - 1.0);
        assertThat(slopeAt75).isCloseTo(0.00323, offset(0.000005));
        assertThat(ConductorTables.temperatureRatio(TableSystem.NEC, 75.0)).isEqualTo(1.0);
    }

    @Test
    void conductorSizeValidates() {
        assertThatThrownBy(() -> new ConductorSize("x", 0, TableSystem.NEC))
                .isInstanceOf(IllegalArgumentException.class);
        assertThat(ConductorSize.metric(1.5).label()).isEqualTo("1.5 mm²");
        assertThat(ConductorSize.metric(35).label()).isEqualTo("35 mm²");
    }
}
