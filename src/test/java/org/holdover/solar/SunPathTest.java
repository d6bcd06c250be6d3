package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import org.junit.jupiter.api.Test;

class SunPathTest {

    @Test
    void hoursAreSampledAtTheirMidpointInLocalStandardTime() {
        SunPath path = DemoSites.northInlandPath2023();
        assertThat(path.hours()).isEqualTo(8760);
        // 1 July 2023 is day index 181; the hour 13:00–14:00 local standard time (UTC−5, no daylight
        // saving) is sampled at 13:30 UTC−5 = 18:30 UTC.
        int h = 181 * 24 + 13;
        SunPosition expected = SunPositions.at(DemoSites.NORTH_INLAND,
                ZonedDateTime.of(2023, 7, 1, 18, 30, 0, 0, ZoneOffset.UTC), 69.0,
                Refraction.standardAtmosphere(300, 7.0));
        assertThat(path.zenithDeg(h)).isEqualTo(expected.zenithDeg());
        assertThat(path.azimuthDeg(h)).isEqualTo(expected.azimuthDeg());
    }

    @Test
    void leapYearHas8784Hours() {
        SunPath path = SunPath.compute(new Site(-33.9, 18.4, 10, 2), 2024, 69.0, Refraction.none());
        assertThat(path.hours()).isEqualTo(8784);
        assertThat(path.calendar().daysIn(1)).isEqualTo(29);
    }

    @Test
    void hourAngleFromSolarTimeMatchesTheSpaAzimuthAtSolarNoon() {
        // Where the textbook hour angle crosses zero, the SPA sun must be on the meridian (azimuth 180°
        // north of the tropics). Spencer's equation of time is good to about 0.5 min (from memory),
        // i.e. about 0.125° of hour angle; near noon the azimuth moves ~2.5× as fast at this latitude
        // in summer, so we allow 0.5° (our tolerance).
        SunPath path = DemoSites.northInlandPath2023();
        for (int d = 0; d < 365; d += 30) {
            for (int k = 0; k < 23; k++) {
                int h = d * 24 + k;
                double w0 = path.hourAngleDeg(h);
                double w1 = path.hourAngleDeg(h + 1);
                if (w0 < 0 && w1 >= 0) {
                    double f = -w0 / (w1 - w0);
                    double az = path.azimuthDeg(h) + f * (path.azimuthDeg(h + 1) - path.azimuthDeg(h));
                    assertThat(az).as("day %d", d).isCloseTo(180.0, within(0.5));
                }
            }
        }
    }
}
