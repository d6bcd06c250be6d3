package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

class FuelCurveTest {

    /** The §10 table prints 3 decimals (L/h) and 4 (L/kWh): half a unit of the last printed digit. */
    private static final double PRINTED_LPH = 0.0005;
    private static final double PRINTED_SPECIFIC = 0.00005;
    /** Recomputation by the same arithmetic in a different order: rounding only. */
    private static final double ROUNDING = 1e-12;

    @ParameterizedTest(name = "20 kW set at {0} kW: {1} L/h")
    @CsvFileSource(resources = "fuel-curve-20kw.csv")
    void reproducesTheWorkedValues(double outputKw, double fuelLPerH, Double specific) {
        // REFERENCES.md §10 worked values (D), coefficients from memory (M): F0 = 0.08415, F1 = 0.246.
        FuelCurve curve = FuelCurve.FROM_MEMORY_DIESEL;
        double f = curve.litresPerHour(20_000, outputKw * 1000);
        double recomputed = 0.08415 * 20 + 0.246 * outputKw;
        assertThat(f).isCloseTo(recomputed, within(ROUNDING));
        assertThat(f).isCloseTo(fuelLPerH, within(PRINTED_LPH));
        if (specific != null) {
            assertThat(f / outputKw).isCloseTo(specific, within(PRINTED_SPECIFIC));
        }
    }

    @Test
    void theVariantInterceptGivesLessFuelAtNoLoad() {
        // The transposed-digit variant 0.08145 (REFERENCES.md §10) gives 20 * 0.08145 = 1.629 L/h at no
        // load against 1.683: the default is the larger, conservative one.
        FuelCurve variant = new FuelCurve(0.08145, 0.246);
        assertThat(variant.litresPerHour(20_000, 0)).isCloseTo(1.629, within(ROUNDING));
        assertThat(FuelCurve.FROM_MEMORY_DIESEL.litresPerHour(20_000, 0)).isGreaterThan(
                variant.litresPerHour(20_000, 0));
    }

    @Test
    void twoPointFitRecoversTheCoefficients() {
        // REFERENCES.md §10 two-point fit (D): slope = (F2 - F1)/(P2 - P1); F0 = (F1 - slope P1)/P_rated.
        // Points from the worked table: (5 kW, 2.913 L/h), (15 kW, 5.373 L/h), 20 kW set.
        FuelCurve fit = FuelCurve.fitTwoPoints(20_000, 5_000, 2.913, 15_000, 5.373);
        assertThat(fit.slopeLPerKwh()).isCloseTo((5.373 - 2.913) / 10, within(ROUNDING));
        assertThat(fit.slopeLPerKwh()).isCloseTo(0.246, within(1e-12));
        assertThat(fit.noLoadLPerHPerRatedKw()).isCloseTo(0.08415, within(1e-12));
    }

    @Test
    void fullLoadEfficiencyIsPlausibleForDiesel() {
        // Sanity (REFERENCES.md §10, D): 0.3301 L/kWh at full load; with diesel at about 9.94 kWh/L
        // (35.8 MJ/L, from memory) that is about 30.5 % fuel to electricity.
        double specific = FuelCurve.FROM_MEMORY_DIESEL.litresPerHour(20_000, 20_000) / 20;
        double efficiency = 1 / (specific * (35.8 / 3.6));
        assertThat(efficiency).isCloseTo(0.305, within(0.001));
    }
}
