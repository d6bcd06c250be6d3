package org.holdover.solar;

import java.time.LocalDate;
import java.time.ZonedDateTime;
import java.util.Objects;
import net.e175.klaus.solarpositioning.DeltaT;
import net.e175.klaus.solarpositioning.SPA;
import net.e175.klaus.solarpositioning.SolarPosition;
import net.e175.klaus.solarpositioning.SunriseResult;

/**
 * Sun position by the NREL solar position algorithm (I. Reda, A. Andreas, "Solar position algorithm
 * for solar radiation applications", Solar Energy 76(5):577–589, 2004; NREL/TP-560-34302), through
 * the reference implementation in the solarpositioning library. Only this class touches the library;
 * its types never leave it.
 */
public final class SunPositions {

    private SunPositions() {
    }

    /**
     * The sun's topocentric position at one instant.
     *
     * @param site       the site (latitude, longitude, elevation used; the offset is not: the instant
     *                   carries its own)
     * @param time       the instant, with any offset
     * @param deltaTS    ΔT = TT − UT in seconds (about 69 s in the 2020s; see {@link #estimateDeltaTS})
     * @param refraction whether to add atmospheric refraction
     * @return zenith (refracted when asked) and azimuth clockwise from north
     */
    public static SunPosition at(Site site, ZonedDateTime time, double deltaTS, Refraction refraction) {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(time, "time");
        Objects.requireNonNull(refraction, "refraction");
        checkDeltaT(deltaTS);
        SolarPosition p;
        if (refraction instanceof Refraction.Atmosphere a) {
            p = SPA.calculateSolarPosition(time, site.latitudeDeg(), site.longitudeDeg(), site.elevationM(),
                    deltaTS, a.pressureHpa(), a.airTempC());
        } else {
            p = SPA.calculateSolarPosition(time, site.latitudeDeg(), site.longitudeDeg(), site.elevationM(),
                    deltaTS);
        }
        return new SunPosition(p.zenithAngle(), normaliseAzimuth(p.azimuth()));
    }

    /**
     * Sunrise, transit and sunset on the calendar day of {@code day} (in its own offset).
     *
     * @param site    the site (latitude and longitude used)
     * @param day     any time on the wanted day; the result carries this offset
     * @param deltaTS ΔT = TT − UT in seconds
     */
    public static SunriseSunset sunriseSunset(Site site, ZonedDateTime day, double deltaTS) {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(day, "day");
        checkDeltaT(deltaTS);
        SunriseResult r = SPA.calculateSunriseTransitSet(day, site.latitudeDeg(), site.longitudeDeg(), deltaTS);
        if (r instanceof SunriseResult.RegularDay d) {
            return new SunriseSunset.RegularDay(d.sunrise(), d.transit(), d.sunset());
        } else if (r instanceof SunriseResult.AllDay d) {
            return new SunriseSunset.AllDay(d.transit());
        } else {
            return new SunriseSunset.AllNight(r.transit());
        }
    }

    /**
     * An estimate of ΔT in seconds for a date, from the polynomial fits of Espenak and Meeus
     * (NASA/TP-2006-214141, updated 2014) that the library implements; for future years it is an
     * extrapolation. Pass a published value when one is at hand.
     */
    public static double estimateDeltaTS(LocalDate date) {
        return DeltaT.estimate(Objects.requireNonNull(date, "date"));
    }

    private static void checkDeltaT(double deltaTS) {
        if (!(Math.abs(deltaTS) <= 8000)) {
            throw new IllegalArgumentException("deltaTS must be a finite number of seconds within ±8000, got " + deltaTS);
        }
    }

    private static double normaliseAzimuth(double azimuthDeg) {
        double a = azimuthDeg % 360.0;
        if (a < 0) {
            a += 360.0;
        }
        return a >= 360.0 ? 0.0 : a;
    }
}
