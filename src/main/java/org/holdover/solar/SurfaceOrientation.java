package org.holdover.solar;

/**
 * The orientation of the array plane.
 *
 * @param tiltDeg    slope from horizontal in degrees, in [0, 90]: 0 flat, 90 vertical
 * @param azimuthDeg the direction the front of the modules faces, in degrees clockwise from
 *                   geographic north, in [0, 360): 180 faces south (the usual choice north of the
 *                   equator), 0 faces north (south of the equator), 90 east, 270 west
 */
public record SurfaceOrientation(double tiltDeg, double azimuthDeg) {

    public SurfaceOrientation {
        if (!(tiltDeg >= 0 && tiltDeg <= 90)) {
            throw new IllegalArgumentException("tiltDeg must be in [0, 90], got " + tiltDeg);
        }
        if (!(azimuthDeg >= 0 && azimuthDeg < 360)) {
            throw new IllegalArgumentException("azimuthDeg must be in [0, 360), got " + azimuthDeg);
        }
    }

    /** Facing the equator: azimuth 180° north of the equator, 0° south of it (and at it). */
    public static SurfaceOrientation facingEquator(Site site, double tiltDeg) {
        return new SurfaceOrientation(tiltDeg, site.latitudeDeg() > 0 ? 180.0 : 0.0);
    }

    /** cos β, the cosine of the tilt. */
    public double cosTilt() {
        return Math.cos(Math.toRadians(tiltDeg));
    }

    /** The plane's view factor to the sky, (1 + cos β) / 2 (isotropic sky diffuse). */
    public double skyViewFactor() {
        return (1 + cosTilt()) / 2.0;
    }
}
