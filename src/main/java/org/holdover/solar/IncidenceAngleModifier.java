package org.holdover.solar;

/**
 * Reflection loss of the beam at the module's front glass, as a function of the angle of incidence θ,
 * by the ASHRAE form IAM = 1 − b₀ (1 / cos θ − 1) (A. F. Souka, H. H. Safwat, Solar Energy 10:170–174
 * (1966); adopted in ASHRAE Standard 93-77). Held in [0, 1]; 0 at and beyond the angle where the
 * formula reaches 0, and for θ ≥ 90°.
 *
 * @param b0 the loss coefficient, in [0, 1]
 */
public record IncidenceAngleModifier(double b0) {

    /**
     * b₀ = 0.05, the value in common use for flat-glass PV modules (common practice, no source we can
     * cite; solar thermal collectors with one glass cover are nearer 0.1).
     */
    public static final double DEFAULT_B0 = 0.05;

    public IncidenceAngleModifier {
        if (!(b0 >= 0 && b0 <= 1)) {
            throw new IllegalArgumentException("b0 must be in [0, 1], got " + b0);
        }
    }

    public static IncidenceAngleModifier ashraeDefault() {
        return new IncidenceAngleModifier(DEFAULT_B0);
    }

    /** No reflection loss. */
    public static IncidenceAngleModifier none() {
        return new IncidenceAngleModifier(0.0);
    }

    /**
     * The modifier for a given cosine of the angle of incidence.
     *
     * @param cosIncidence cos θ, in [-1, 1]
     * @return IAM in [0, 1]
     */
    public double atCos(double cosIncidence) {
        if (cosIncidence <= 0) {
            return 0.0;
        }
        double iam = 1.0 - b0 * (1.0 / cosIncidence - 1.0);
        return Math.max(0.0, Math.min(1.0, iam));
    }

    /**
     * The modifier for an angle of incidence.
     *
     * @param incidenceDeg θ in degrees, in [0, 180]
     */
    public double atAngle(double incidenceDeg) {
        return atCos(Math.cos(Math.toRadians(incidenceDeg)));
    }
}
