package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.Duration;
import java.time.LocalDate;
import java.time.LocalTime;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * Our wrapper around the SPA library against the NREL SPA worked example (I. Reda, A. Andreas,
 * NREL/TP-560-34302 rev. 2008, appendix example; expected values as printed by NREL's spa_tester.c;
 * REFERENCES.md §1a–1c, confidence C).
 */
class SunPositionsTest {

    /** The public SPA ports test zenith and azimuth to 1e-6°, the printed precision of spa_tester.c. */
    private static final double SPA_PRINTED_TOLERANCE_DEG = 1e-6;
    /** Sunrise and sunset are printed to the second. */
    private static final Duration PRINTED_SECOND = Duration.ofSeconds(1);

    /** REFERENCES.md §1a inputs. */
    private static final Site GOLDEN = new Site(39.742476, -105.1786, 1830.14, -7.0);
    private static final ZonedDateTime EXAMPLE_TIME =
            ZonedDateTime.of(2003, 10, 17, 12, 30, 30, 0, ZoneOffset.ofHours(-7));
    private static final double EXAMPLE_DELTA_T_S = 67.0;
    private static final Refraction EXAMPLE_AIR = new Refraction.Atmosphere(820.0, 11.0);

    @Test
    void workedExampleZenithAndAzimuth() {
        SunPosition p = SunPositions.at(GOLDEN, EXAMPLE_TIME, EXAMPLE_DELTA_T_S, EXAMPLE_AIR);
        // spa_tester.c: Zenith 50.111622°, Azimuth 194.340241° (REFERENCES.md §1b, C).
        assertThat(p.zenithDeg()).isCloseTo(50.111622, within(SPA_PRINTED_TOLERANCE_DEG));
        assertThat(p.azimuthDeg()).isCloseTo(194.340241, within(SPA_PRINTED_TOLERANCE_DEG));
    }

    @Test
    void workedExampleIncidenceOnTheTiltedSurface() {
        SunPosition p = SunPositions.at(GOLDEN, EXAMPLE_TIME, EXAMPLE_DELTA_T_S, EXAMPLE_AIR);
        // SPA surface: slope 30°, azimuth rotation −10° from south (east negative) = 170° clockwise from north.
        SurfaceOrientation surface = new SurfaceOrientation(30.0, 170.0);
        double incidence = Math.toDegrees(Math.acos(SolarGeometry.cosIncidence(p, surface)));
        // spa_tester.c: Incidence 25.187000° (REFERENCES.md §1b, C).
        assertThat(incidence).isCloseTo(25.187000, within(SPA_PRINTED_TOLERANCE_DEG));
    }

    @Test
    void withoutRefractionTheSunIsLowerByTheExamplesRefraction() {
        SunPosition refracted = SunPositions.at(GOLDEN, EXAMPLE_TIME, EXAMPLE_DELTA_T_S, EXAMPLE_AIR);
        SunPosition geometric = SunPositions.at(GOLDEN, EXAMPLE_TIME, EXAMPLE_DELTA_T_S, Refraction.none());
        // spa_tester intermediate: e0 = 39.872046° (no refraction), Δe = 0.016332° (REFERENCES.md §1b, C).
        assertThat(geometric.elevationDeg()).isCloseTo(39.872046, within(SPA_PRINTED_TOLERANCE_DEG));
        assertThat(geometric.zenithDeg() - refracted.zenithDeg()).isCloseTo(0.016332, within(SPA_PRINTED_TOLERANCE_DEG));
    }

    @Test
    void workedExampleSunrise() {
        SunriseSunset r = SunPositions.sunriseSunset(GOLDEN, EXAMPLE_TIME, EXAMPLE_DELTA_T_S);
        assertThat(r).isInstanceOf(SunriseSunset.RegularDay.class);
        SunriseSunset.RegularDay d = (SunriseSunset.RegularDay) r;
        // spa_tester.c: Sunrise 06:12:43 local time (REFERENCES.md §1b, C).
        assertThat(Duration.between(EXAMPLE_TIME.with(LocalTime.of(6, 12, 43)), d.sunrise()).abs())
                .isLessThanOrEqualTo(PRINTED_SECOND);
    }

    /**
     * spa_tester.c prints sunset 17:20:19 (REFERENCES.md §1b), but the library gives 17:18:51, 88 s
     * earlier, and its own test suite pins 17:18:51. The §1c sunset cases agree to the second (see
     * below), so the difference is specific to this case. We keep the printed value as the reference
     * and accept the documented 88 s disagreement plus the printed second.
     */
    @Test
    void workedExampleSunsetWithinTheKnownLibraryDisagreement() {
        SunriseSunset.RegularDay d = (SunriseSunset.RegularDay) SunPositions.sunriseSunset(GOLDEN, EXAMPLE_TIME,
                EXAMPLE_DELTA_T_S);
        Duration knownDisagreement = Duration.ofSeconds(88).plus(PRINTED_SECOND);
        assertThat(Duration.between(EXAMPLE_TIME.with(LocalTime.of(17, 20, 19)), d.sunset()).abs())
                .isLessThanOrEqualTo(knownDisagreement);
    }

    @ParameterizedTest
    @CsvFileSource(resources = "spa-sunrise-sunset.csv")
    void sunriseAndSunsetChecks(LocalDate date, double lat, double lon, double deltaT, LocalTime rise, LocalTime set) {
        Site site = new Site(lat, lon, 0, 0);
        ZonedDateTime day = date.atStartOfDay(ZoneOffset.UTC);
        SunriseSunset.RegularDay d = (SunriseSunset.RegularDay) SunPositions.sunriseSunset(site, day, deltaT);
        assertThat(Duration.between(date.atTime(rise).atZone(ZoneOffset.UTC), d.sunrise()).abs())
                .isLessThanOrEqualTo(PRINTED_SECOND);
        assertThat(Duration.between(date.atTime(set).atZone(ZoneOffset.UTC), d.sunset()).abs())
                .isLessThanOrEqualTo(PRINTED_SECOND);
    }

    @Test
    void polarNightAndPolarDayAreTheirOwnOutcomes() {
        Site north = new Site(78.2, 15.6, 0, 1);
        assertThat(SunPositions.sunriseSunset(north, ZonedDateTime.of(2023, 12, 21, 12, 0, 0, 0, ZoneOffset.ofHours(1)), 69))
                .isInstanceOf(SunriseSunset.AllNight.class);
        assertThat(SunPositions.sunriseSunset(north, ZonedDateTime.of(2023, 6, 21, 12, 0, 0, 0, ZoneOffset.ofHours(1)), 69))
                .isInstanceOf(SunriseSunset.AllDay.class);
    }
}
