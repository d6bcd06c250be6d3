package org.holdover.solar;

/**
 * Whether, and how, the sun position includes atmospheric refraction. Refraction lifts the apparent
 * sun by about half a degree at the horizon and by a few thousandths of a degree at 50° zenith.
 */
public sealed interface Refraction {

    /** Geometric position, no refraction. */
    record None() implements Refraction {
    }

    /**
     * Refraction for the given local air, as in the NREL solar position algorithm (Reda and Andreas,
     * 2004, Eq. 42), which assumes a refraction of 0.5667° at the horizon.
     *
     * @param pressureHpa annual mean local air pressure in hPa (= mbar), in (0, 1200]
     * @param airTempC    annual mean local air temperature in °C, in [-90, 60]
     */
    record Atmosphere(double pressureHpa, double airTempC) implements Refraction {
        public Atmosphere {
            if (!(pressureHpa > 0 && pressureHpa <= 1200)) {
                throw new IllegalArgumentException("pressureHpa must be in (0, 1200], got " + pressureHpa);
            }
            if (!(airTempC >= -90 && airTempC <= 60)) {
                throw new IllegalArgumentException("airTempC must be in [-90, 60], got " + airTempC);
            }
        }
    }

    /** No refraction. */
    static Refraction none() {
        return new None();
    }

    /**
     * Refraction with the pressure of the standard atmosphere at the site's elevation,
     * p = 1013.25 · (1 − 2.25577e-5 · h)^5.25588 hPa (the barometric formula of the ICAO/ISO 2533
     * standard atmosphere; constants from memory).
     *
     * @param elevationM site elevation in metres above sea level
     * @param airTempC   annual mean air temperature in °C
     */
    static Refraction standardAtmosphere(double elevationM, double airTempC) {
        double pressureHpa = 1013.25 * Math.pow(1 - 2.25577e-5 * elevationM, 5.25588);
        return new Atmosphere(pressureHpa, airTempC);
    }
}
