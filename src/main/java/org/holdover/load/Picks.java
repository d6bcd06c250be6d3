package org.holdover.load;

/**
 * Choosing "the largest" among computed values the way a spreadsheet can repeat it: the first value within
 * {@link #NEAR} (relative) of the maximum. Exact ties between sums break on rounding, and a spreadsheet
 * application may add in another order (compensated summation), so both sides pick by this tolerance.
 */
public final class Picks {

    /** Relative tolerance within which values count as tied with the maximum. */
    public static final double NEAR = 1e-9;

    private Picks() {
    }

    /** For each value, whether it lies within {@link #NEAR} of the maximum. */
    public static boolean[] nearMax(double[] v) {
        double max = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            max = Math.max(max, x);
        }
        double threshold = max >= 0 ? max * (1 - NEAR) : max * (1 + NEAR);
        boolean[] out = new boolean[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] >= threshold;
        }
        return out;
    }

    /** Index of the first value within {@link #NEAR} of the maximum (0-based). */
    public static int firstNearMax(double[] v) {
        double max = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            max = Math.max(max, x);
        }
        double threshold = max >= 0 ? max * (1 - NEAR) : max * (1 + NEAR);
        for (int i = 0; i < v.length; i++) {
            if (v[i] >= threshold) {
                return i;
            }
        }
        throw new IllegalArgumentException("no values");
    }
}
