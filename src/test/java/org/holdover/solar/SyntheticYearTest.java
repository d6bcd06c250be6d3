package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The synthetic year reproduces its inputs and keeps its physics consistent. */
class SyntheticYearTest {

    /**
     * Monthly means are reproduced exactly by construction; what remains is floating-point summation
     * over ~744 hours: a relative 1e-12 is far above that and far below anything that matters.
     */
    private static final double REPRODUCE_RELATIVE = 1e-12;
    /** Closure GHI = DHI + DNI cos θz holds to rounding, W/m². */
    private static final double CLOSURE_WM2 = 1e-9;

    private static final ClearnessSequence RANDOM = new ClearnessSequence.SeededRandom(42L, 0.3, 0.3);

    @Test
    void uniformYearReproducesMonthlyGhiAndTemperature() {
        SyntheticYear y = SyntheticYear.generate(DemoSites.northInlandPath2023(), DemoSites.northInlandClimate(),
                ClearnessSequence.uniform());
        assertReproduces(y);
    }

    @Test
    void randomYearReproducesMonthlyGhiAndTemperature() {
        SyntheticYear y = SyntheticYear.generate(DemoSites.northInlandPath2023(), DemoSites.northInlandClimate(), RANDOM);
        assertReproduces(y);
        double[] k = y.dailyClearness();
        for (double v : k) {
            assertThat(v).isBetween(SyntheticYear.MIN_DAILY_CLEARNESS, SyntheticYear.MAX_DAILY_CLEARNESS);
        }
        // It does vary: the spread of daily clearness in a month is far from zero.
        double min = 1;
        double max = 0;
        for (int d = 0; d < 31; d++) {
            min = Math.min(min, k[d]);
            max = Math.max(max, k[d]);
        }
        assertThat(max - min).isGreaterThan(0.1);
    }

    @Test
    void seededYearsRepeatAndDifferentSeedsDiffer() {
        SyntheticYear a = SyntheticYear.generate(DemoSites.northInlandPath2023(), DemoSites.northInlandClimate(), RANDOM);
        SyntheticYear b = SyntheticYear.generate(DemoSites.northInlandPath2023(), DemoSites.northInlandClimate(), RANDOM);
        SyntheticYear c = SyntheticYear.generate(DemoSites.northInlandPath2023(), DemoSites.northInlandClimate(),
                new ClearnessSequence.SeededRandom(7L, 0.3, 0.3));
        assertThat(a.weather().ghiWm2()).containsExactly(b.weather().ghiWm2());
        assertThat(a.dailyClearness()).isNotEqualTo(c.dailyClearness());
    }

    @Test
    void everyHourCloses() {
        SyntheticYear y = SyntheticYear.generate(DemoSites.northInlandPath2023(), DemoSites.northInlandClimate(), RANDOM);
        SunPath p = y.sunPath();
        WeatherYear w = y.weather();
        for (int h = 0; h < w.hours(); h++) {
            double cosZ = Math.cos(Math.toRadians(p.zenithDeg(h)));
            if (!p.position(h).isUp()) {
                assertThat(w.ghiWm2(h)).as("hour %d below the horizon", h).isZero();
                continue;
            }
            assertThat(w.dhiWm2(h) + w.dniWm2(h) * cosZ).as("hour %d", h).isCloseTo(w.ghiWm2(h), within(CLOSURE_WM2));
            assertThat(w.dniWm2(h)).isLessThanOrEqualTo(p.extraterrestrialNormalWm2(h));
            if (p.zenithDeg(h) > SyntheticYear.HORIZON_GUARD_ZENITH_DEG) {
                assertThat(w.dniWm2(h)).isZero();
            }
        }
    }

    @Test
    void daysSumToTheirDailyIrradiationAndPeakNearSolarNoon() {
        SyntheticYear y = SyntheticYear.generate(DemoSites.northInlandPath2023(), DemoSites.northInlandClimate(),
                ClearnessSequence.uniform());
        double[] ghi = y.weather().ghiWm2();
        double[] daily = y.dailyGhiWhM2();
        for (int d = 0; d < 365; d++) {
            double sum = 0;
            int peak = d * 24;
            for (int k = 0; k < 24; k++) {
                sum += ghi[d * 24 + k];
                if (ghi[d * 24 + k] > ghi[peak]) {
                    peak = d * 24 + k;
                }
            }
            assertThat(sum).isCloseTo(daily[d], within(daily[d] * REPRODUCE_RELATIVE + 1e-9));
            // The peak hour holds the smallest |hour angle| of the day: within half an hour of solar noon.
            assertThat(Math.abs(y.sunPath().hourAngleDeg(peak))).isLessThanOrEqualTo(7.5 + 1e-9);
        }
    }

    @Test
    void implausibleClearnessIsRejected() {
        double[] ghi = DemoSites.NORTH_INLAND_GHI.clone();
        ghi[11] = 5.0; // December at 44.5° N: more than the plausible share of the extraterrestrial
        MonthlyClimate c = MonthlyClimate.withDefaultTempRange(ghi, DemoSites.NORTH_INLAND_TEMP);
        assertThat(SyntheticYear.monthlyClearness(DemoSites.NORTH_INLAND, 2023, c)[11])
                .isGreaterThan(SyntheticYear.MAX_MONTHLY_CLEARNESS);
        assertThatThrownBy(() -> SyntheticYear.generate(DemoSites.northInlandPath2023(), c, ClearnessSequence.uniform()))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("month 12");
    }

    private static void assertReproduces(SyntheticYear y) {
        WeatherYear w = y.weather();
        assertThat(w.hours()).isEqualTo(8760);
        double[] ghi = w.monthlyMeanDailyGhiKwhM2();
        double[] t = w.monthlyMeanAirTempC();
        for (int m = 0; m < 12; m++) {
            assertThat(ghi[m]).as("GHI month %d", m + 1)
                    .isCloseTo(DemoSites.NORTH_INLAND_GHI[m], within(DemoSites.NORTH_INLAND_GHI[m] * REPRODUCE_RELATIVE));
            assertThat(t[m]).as("air month %d", m + 1).isCloseTo(DemoSites.NORTH_INLAND_TEMP[m], within(1e-9));
        }
        // The daily swing of the default range: max − min within a day is the range (10 °C) to the
        // resolution of sampling a cosine at the hour midpoints (cos 7.5° ≈ 0.991).
        double dayMax = Double.NEGATIVE_INFINITY;
        double dayMin = Double.POSITIVE_INFINITY;
        for (int k = 0; k < 24; k++) {
            dayMax = Math.max(dayMax, w.airTempC(180 * 24 + k));
            dayMin = Math.min(dayMin, w.airTempC(180 * 24 + k));
        }
        assertThat(dayMax - dayMin).isCloseTo(MonthlyClimate.DEFAULT_DAILY_TEMP_RANGE_C, within(0.1));
    }
}
