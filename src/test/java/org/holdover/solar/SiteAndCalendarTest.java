package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.ZoneId;
import org.junit.jupiter.api.Test;

class SiteAndCalendarTest {

    @Test
    void standardOffsetIgnoresDaylightSaving() {
        assertThat(Site.inZone(44.5, -72.6, 300, ZoneId.of("America/New_York"), 2024).utcOffsetHours()).isEqualTo(-5.0);
        assertThat(Site.inZone(-33.9, 18.4, 10, ZoneId.of("Africa/Johannesburg"), 2024).utcOffsetHours()).isEqualTo(2.0);
        assertThat(Site.inZone(-34.9, 138.6, 50, ZoneId.of("Australia/Adelaide"), 2024).utcOffsetHours()).isEqualTo(9.5);
    }

    @Test
    void calendarMonthsAndDays() {
        HourCalendar common = HourCalendar.ofYear(2023);
        HourCalendar leap = HourCalendar.ofYear(2024);
        assertThat(common.hours()).isEqualTo(8760);
        assertThat(leap.hours()).isEqualTo(8784);
        assertThat(common.monthOfHour(31 * 24 - 1)).isEqualTo(0);
        assertThat(common.monthOfHour(31 * 24)).isEqualTo(1);
        assertThat(leap.monthOfDay(59)).isEqualTo(1); // 29 February
        assertThat(common.monthOfDay(59)).isEqualTo(2); // 1 March
        assertThat(common.monthOfHour(8759)).isEqualTo(11);
        assertThatThrownBy(() -> HourCalendar.ofHours(8000)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void southernLeapYearReproducesItsMonthlyMeans() {
        // Demo data: a southern site, leap year, summer in January.
        Site south = new Site(-33.9, 18.4, 10, 2);
        double[] ghi = {7.9, 7.0, 5.6, 4.0, 2.8, 2.3, 2.5, 3.3, 4.6, 6.1, 7.2, 7.8};
        double[] t = {21, 21, 20, 17, 15, 13, 12, 13, 14, 16, 18, 20};
        SunPath path = SunPath.compute(south, 2024, 69, Refraction.none());
        SyntheticYear y = SyntheticYear.generate(path, MonthlyClimate.withDefaultTempRange(ghi, t),
                new ClearnessSequence.SeededRandom(3L, 0.25, 0.3));
        double[] got = y.weather().monthlyMeanDailyGhiKwhM2();
        assertThat(y.weather().hours()).isEqualTo(8784);
        for (int m = 0; m < 12; m++) {
            assertThat(got[m]).isCloseTo(ghi[m], org.assertj.core.api.Assertions.within(ghi[m] * 1e-12));
        }
    }

    @Test
    void polarNightMonthsMustHaveNoIrradiation() {
        // Demo data: 70° N, where December has no extraterrestrial irradiation (D&B Eq. 1.6.10: ωs = 0).
        Site arctic = new Site(70.0, 25.0, 10, 1);
        double[] ghi = {0.01, 0.5, 1.8, 3.6, 4.8, 5.2, 4.6, 3.1, 1.6, 0.5, 0.05, 0.0};
        double[] t = {-12, -12, -9, -4, 2, 8, 12, 10, 5, -1, -6, -10};
        SunPath path = SunPath.compute(arctic, 2023, 69, Refraction.none());
        SyntheticYear y = SyntheticYear.generate(path, MonthlyClimate.withDefaultTempRange(ghi, t), ClearnessSequence.uniform());
        double[] got = y.weather().monthlyMeanDailyGhiKwhM2();
        assertThat(got[11]).isZero();
        assertThat(got[0]).isCloseTo(0.01, org.assertj.core.api.Assertions.within(0.01 * 1e-12));
        double[] bad = ghi.clone();
        bad[11] = 0.1;
        assertThatThrownBy(() -> SyntheticYear.generate(path, MonthlyClimate.withDefaultTempRange(bad, t),
                ClearnessSequence.uniform())).isInstanceOf(IllegalArgumentException.class).hasMessageContaining("month 12");
    }
}
