package org.holdover.solar;

/** How sky diffuse irradiance is carried onto a tilted plane. */
public enum SkyModel {
    /** Isotropic sky (Liu and Jordan): DHI (1 + cos β) / 2. */
    ISOTROPIC,
    /**
     * Hay and Davies (1980): DHI [A R_b + (1 − A)(1 + cos β) / 2] with the anisotropy index
     * A = DNI / G_on and R_b = cos θ / cos θ_z. J. E. Hay, J. A. Davies, "Calculation of the solar
     * radiation incident on an inclined surface", Proc. First Canadian Solar Radiation Data
     * Workshop, 59–72 (1980) (page numbers from memory); D&B §2.16.
     */
    HAY_DAVIES
}
