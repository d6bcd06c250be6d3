package org.holdover.pv;

/**
 * The array power each month would need, and the month that decides.
 *
 * @param requiredStcWByMonth STC array power needed for each month, W, January first; +∞ for a month
 *                            with load but no sun
 * @param worstMonth          0-based month (0 = January) with the largest need
 * @param requiredStcW        the largest need, W (may be +∞ when no array can do it)
 */
public record MonthlySizingResult(double[] requiredStcWByMonth, int worstMonth, double requiredStcW) {

    public MonthlySizingResult {
        if (requiredStcWByMonth.length != 12) {
            throw new IllegalArgumentException("need 12 monthly values");
        }
        requiredStcWByMonth = requiredStcWByMonth.clone();
        if (worstMonth < 0 || worstMonth > 11) {
            throw new IllegalArgumentException("worstMonth must be in [0, 11]");
        }
        for (double v : requiredStcWByMonth) {
            if (!(v >= 0) || v > requiredStcW) {
                throw new IllegalArgumentException("monthly needs must be >= 0 and <= the worst");
            }
        }
        if (requiredStcWByMonth[worstMonth] != requiredStcW) {
            throw new IllegalArgumentException("requiredStcW must be the worst month's need");
        }
    }

    @Override
    public double[] requiredStcWByMonth() {
        return requiredStcWByMonth.clone();
    }

    /** True when some array size can meet every month (no month with load but no sun). */
    public boolean feasible() {
        return Double.isFinite(requiredStcW);
    }

    static MonthlySizingResult of(double[] byMonth) {
        int worst = 0;
        for (int m = 1; m < 12; m++) {
            if (byMonth[m] > byMonth[worst]) {
                worst = m;
            }
        }
        return new MonthlySizingResult(byMonth, worst, byMonth[worst]);
    }
}
