package org.holdover.solar;

/**
 * Where the sun is seen from the site.
 *
 * @param zenithDeg  topocentric zenith angle in degrees, 0 overhead, 90 on the horizon, above 90 below
 *                   it; refracted (apparent) when the calculation applied refraction
 * @param azimuthDeg azimuth in degrees clockwise from geographic north (90 east, 180 south, 270 west),
 *                   in [0, 360)
 */
public record SunPosition(double zenithDeg, double azimuthDeg) {

    public SunPosition {
        if (!(zenithDeg >= 0 && zenithDeg <= 180)) {
            throw new IllegalArgumentException("zenithDeg must be in [0, 180], got " + zenithDeg);
        }
        if (!(azimuthDeg >= 0 && azimuthDeg < 360)) {
            throw new IllegalArgumentException("azimuthDeg must be in [0, 360), got " + azimuthDeg);
        }
    }

    /** Elevation above the horizon in degrees: 90 − zenith. */
    public double elevationDeg() {
        return 90.0 - zenithDeg;
    }

    /** True when the sun's centre is above the horizon (zenith below 90°). */
    public boolean isUp() {
        return zenithDeg < 90.0;
    }
}
