package org.holdover.dc;

/**
 * The multipliers the code applies to a circuit's current before sizing.
 *
 * @param designFactor       multiplies the continuous current to give the design current: the minimum table
 *                           ampacity without correction or adjustment (at the terminal column) and the minimum
 *                           overcurrent-device rating. ≥ 1.
 * @param conditionsOfUseFactor multiplies the continuous current to give the current the conductor must carry
 *                           after ambient correction and adjustment. ≥ 1 and ≤ {@code designFactor}.
 */
public record CurrentFactors(double designFactor, double conditionsOfUseFactor) {

    /**
     * Ordinary continuous load: 125 % without correction, 100 % after (NEC 210.19(A)(1)(a)/(b),
     * 215.2(A)(1)(a)/(b)).
     */
    public static final CurrentFactors CONTINUOUS_LOAD = new CurrentFactors(1.25, 1.0);

    /**
     * PV source or output circuit, with the continuous current being the modules' short-circuit current Isc:
     * maximum circuit current 1.25 × Isc (NEC 690.8(A)(1)), conductors and devices at 1.25 × that = 1.5625 × Isc
     * without correction (690.8(B)(1)), and at least 1.25 × Isc after correction (690.8(B)(2)).
     */
    public static final CurrentFactors PV_SOURCE = new CurrentFactors(1.5625, 1.25);

    /** A load that is not continuous (less than three hours at maximum): no multiplier. */
    public static final CurrentFactors NON_CONTINUOUS = new CurrentFactors(1.0, 1.0);

    public CurrentFactors {
        if (!(designFactor >= 1.0) || !Double.isFinite(designFactor)) {
            throw new IllegalArgumentException("designFactor must be >= 1, got " + designFactor);
        }
        if (!(conditionsOfUseFactor >= 1.0) || conditionsOfUseFactor > designFactor) {
            throw new IllegalArgumentException("conditionsOfUseFactor must be in [1, designFactor], got "
                    + conditionsOfUseFactor);
        }
    }
}
