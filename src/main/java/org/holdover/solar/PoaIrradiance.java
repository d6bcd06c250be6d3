package org.holdover.solar;

/**
 * Irradiance on the array plane in one hour, W/m².
 *
 * @param incidenceDeg         angle of incidence of the beam on the plane, degrees (90 or more: behind)
 * @param beamWm2              beam on the plane, DNI · max(0, cos θ), before reflection loss
 * @param iam                  incidence angle modifier applied to the beam, in [0, 1]
 * @param skyDiffuseWm2        sky diffuse on the plane
 * @param groundWm2            ground-reflected irradiance on the plane, GHI · ρ · (1 − cos β) / 2
 * @param totalWm2             beam + sky diffuse + ground, before reflection loss (plane-of-array irradiance)
 * @param effectiveWm2         beam · IAM + sky diffuse + ground: what reaches the cells
 * @param cosIncidence         cos θ, held in [−1, 1] (negative: the sun is behind the plane)
 * @param anisotropyIndex      Hay–Davies A = min(1, DNI / G_on) while the sun is up; 0 for the isotropic sky
 *                             or with the sun down
 * @param beamRatio            Hay–Davies R_b = max(0, cos θ) / max(cos θ_z, cos 89°) while the sun is up; 0 for
 *                             the isotropic sky or with the sun down
 */
public record PoaIrradiance(double incidenceDeg, double beamWm2, double iam, double skyDiffuseWm2, double groundWm2,
        double totalWm2, double effectiveWm2, double cosIncidence, double anisotropyIndex, double beamRatio) {

    public PoaIrradiance {
        if (!(beamWm2 >= 0 && skyDiffuseWm2 >= 0 && groundWm2 >= 0)) {
            throw new IllegalArgumentException("irradiance components must be >= 0");
        }
        if (!(iam >= 0 && iam <= 1)) {
            throw new IllegalArgumentException("iam must be in [0, 1], got " + iam);
        }
        if (Math.abs(totalWm2 - (beamWm2 + skyDiffuseWm2 + groundWm2)) > 1e-9 * Math.max(1, totalWm2)) {
            throw new IllegalArgumentException("total must equal beam + sky diffuse + ground");
        }
        if (effectiveWm2 > totalWm2 + 1e-9) {
            throw new IllegalArgumentException("effective irradiance cannot exceed the total");
        }
        if (!(cosIncidence >= -1 && cosIncidence <= 1)) {
            throw new IllegalArgumentException("cosIncidence must be in [-1, 1], got " + cosIncidence);
        }
        if (!(anisotropyIndex >= 0 && anisotropyIndex <= 1 && beamRatio >= 0)) {
            throw new IllegalArgumentException("anisotropy index must be in [0, 1] and R_b >= 0");
        }
    }

    /** Beam reaching the cells after reflection loss, W/m². */
    public double beamAfterIamWm2() {
        return beamWm2 * iam;
    }
}
