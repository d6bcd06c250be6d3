package org.holdover.solar;

import java.util.Objects;

/**
 * How irradiance is carried onto the array plane.
 *
 * @param orientation tilt and azimuth of the array
 * @param skyModel    sky diffuse model
 * @param albedo      ground reflectance, in [0, 1]; see {@link #DEFAULT_ALBEDO}
 * @param iam         reflection loss on the beam
 */
public record PoaSettings(SurfaceOrientation orientation, SkyModel skyModel, double albedo, IncidenceAngleModifier iam) {

    /**
     * Ground reflectance 0.2, the usual value for ground without snow (common practice, no source;
     * fresh snow reflects 0.7 or more).
     */
    public static final double DEFAULT_ALBEDO = 0.2;

    public PoaSettings {
        Objects.requireNonNull(orientation, "orientation");
        Objects.requireNonNull(skyModel, "skyModel");
        Objects.requireNonNull(iam, "iam");
        if (!(albedo >= 0 && albedo <= 1)) {
            throw new IllegalArgumentException("albedo must be in [0, 1], got " + albedo);
        }
    }

    /** Hay–Davies sky, albedo 0.2, ASHRAE IAM with b₀ = 0.05. */
    public static PoaSettings defaults(SurfaceOrientation orientation) {
        return new PoaSettings(orientation, SkyModel.HAY_DAVIES, DEFAULT_ALBEDO, IncidenceAngleModifier.ashraeDefault());
    }

    public PoaSettings withOrientation(SurfaceOrientation o) {
        return new PoaSettings(o, skyModel, albedo, iam);
    }
}
