package org.holdover.solar;

/**
 * The diffuse fraction of hourly global horizontal irradiation from the hourly clearness index, by
 * D. G. Erbs, S. A. Klein, J. A. Duffie, "Estimation of the diffuse radiation fraction for hourly,
 * daily and monthly-average global radiation", Solar Energy 28(4):293–302 (1982):
 * <pre>
 *   k_t ≤ 0.22:         I_d / I = 1.0 − 0.09 k_t
 *   0.22 &lt; k_t ≤ 0.80:  I_d / I = 0.9511 − 0.1604 k_t + 4.388 k_t² − 16.638 k_t³ + 12.336 k_t⁴
 *   k_t &gt; 0.80:         I_d / I = 0.165
 * </pre>
 */
public final class DiffuseFraction {

    private DiffuseFraction() {
    }

    /**
     * Erbs et al. (1982) hourly diffuse fraction.
     *
     * @param clearnessIndex hourly clearness index k_t = I / I_o, ≥ 0 (values above 1 are accepted
     *                       and fall in the top branch)
     * @return diffuse fraction I_d / I in [0.165, 1]
     */
    public static double erbs(double clearnessIndex) {
        if (!(clearnessIndex >= 0)) {
            throw new IllegalArgumentException("clearnessIndex must be >= 0, got " + clearnessIndex);
        }
        double k = clearnessIndex;
        if (k <= 0.22) {
            return 1.0 - 0.09 * k;
        }
        if (k <= 0.80) {
            return 0.9511 + k * (-0.1604 + k * (4.388 + k * (-16.638 + k * 12.336)));
        }
        return 0.165;
    }
}
