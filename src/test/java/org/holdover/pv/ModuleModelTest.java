package org.holdover.pv;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class ModuleModelTest {

    private static final double EXACT = 1e-9;

    @Test
    void noctModelReturnsNoctAtItsOwnTestConditions() {
        // The NOCT definition: 800 W/m², 20 °C air (module standards; from memory).
        assertThat(CellTemperature.noct(20, 800, 45)).isCloseTo(45, within(EXACT));
        assertThat(CellTemperature.noct(35, 1000, 45)).isCloseTo(35 + 25 * 1000.0 / 800, within(EXACT));
        assertThat(CellTemperature.noct(-10, 0, 45)).isCloseTo(-10, within(EXACT));
    }

    @Test
    void powerIsTheNameplateAtStcAndFollowsTheCoefficient() {
        PvModule m = DemoEquipment.MODULE_400;
        assertThat(m.powerW(1000, 25)).isCloseTo(400, within(EXACT));
        assertThat(m.powerW(500, 45)).isCloseTo(400 * 0.5 * (1 - 0.0035 * 20), within(EXACT));
        assertThat(m.powerW(0, 45)).isZero();
    }

    @Test
    void vmpCoefficientFallsBackToPowerMinusCurrent() {
        // Common practice, no source: β_vmp ≈ γ_pmax − α_isc when the datasheet has no β_vmp.
        assertThat(DemoEquipment.MODULE_400.coefficients().vmpPerCForModelling()).isCloseTo(-0.0035 - 0.0005, within(EXACT));
        assertThat(DemoEquipment.MODULE_400.vmpAtCellV(65)).isCloseTo(41.0 * (1 - 0.004 * 40), within(EXACT));
    }

    @Test
    void lossesMultiplyAndCarryTheirSources() {
        DcLosses d = DcLosses.defaults();
        double expected = 0.98 * 1.0 * 1.0 * 0.98 * 0.98 * 0.995 * 0.985 * 0.99 * 1.0;
        assertThat(d.factor()).isCloseTo(expected, within(EXACT));
        assertThat(d.withAgeYears(10).factor()).isCloseTo(expected * (1 - 0.05), within(EXACT));
        assertThat(d.items()).allSatisfy(i -> assertThat(i.source()).isNotBlank());
        assertThat(DcLosses.none().factor()).isEqualTo(1.0);
    }

    @Test
    void inconsistentDatasheetsAreRefused() {
        assertThatThrownBy(() -> new StcRatings(400, 41, 9.76, 40, 10.35)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new StcRatings(300, 41, 9.76, 49.2, 10.35)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> TemperatureCoefficients.of(0.001, -0.003, 0.0005))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
