package org.holdover.sim;

import java.util.Objects;

/**
 * Where to put grid outages in a year for backup-mode simulation.
 */
public final class OutageWindows {

    private OutageWindows() {
    }

    /**
     * One outage window.
     *
     * @param startHour     first hour without grid (0-based)
     * @param durationHours number of hours without grid (&gt; 0)
     * @param netLoadWh     sum over the window of critical load minus PV, Wh (the window's score)
     */
    public record Window(int startHour, int durationHours, double netLoadWh) {
        public Window {
            if (startHour < 0 || durationHours <= 0) {
                throw new IllegalArgumentException("need startHour >= 0 and durationHours > 0, got "
                        + startHour + " and " + durationHours);
            }
            Checks.finite("netLoadWh", netLoadWh);
        }
    }

    /**
     * The hardest window of a given length: the one with the largest critical load net of PV,
     * {@code sum over the window of (criticalLoadW[t] - pvW[t])}. PV surplus in one hour offsets deficit in
     * another, because during an outage it recharges the battery. Sliding window, O(n); windows do not wrap
     * past the end of the series; on a tie the earliest window wins.
     *
     * @param criticalLoadW critical load, W per hour (&ge; 0)
     * @param pvW           PV power on the same side as the load (the caller chooses DC or AC
     *                      equivalent), W per hour (&ge; 0), same length
     * @param durationHours outage length, hours, in [1, number of hours]
     * @return the hardest window
     */
    public static Window hardest(double[] criticalLoadW, double[] pvW, int durationHours) {
        Objects.requireNonNull(criticalLoadW, "criticalLoadW");
        Objects.requireNonNull(pvW, "pvW");
        int n = criticalLoadW.length;
        if (pvW.length != n) {
            throw new IllegalArgumentException("criticalLoadW and pvW lengths differ: " + n + " and " + pvW.length);
        }
        if (durationHours < 1 || durationHours > n) {
            throw new IllegalArgumentException("durationHours must be in [1, " + n + "], got " + durationHours);
        }
        // Prefix sums keep every window's score independent of the order the windows are visited.
        double[] prefix = new double[n + 1];
        for (int t = 0; t < n; t++) {
            Checks.nonNegative("criticalLoadW[" + t + "]", criticalLoadW[t]);
            Checks.nonNegative("pvW[" + t + "]", pvW[t]);
            prefix[t + 1] = prefix[t] + (criticalLoadW[t] - pvW[t]);
        }
        int best = 0;
        double bestSum = prefix[durationHours] - prefix[0];
        for (int s = 1; s + durationHours <= n; s++) {
            double sum = prefix[s + durationHours] - prefix[s];
            if (sum > bestSum) {
                best = s;
                bestSum = sum;
            }
        }
        return new Window(best, durationHours, bestSum);
    }

    /**
     * Grid-available flags with outages at given start hours.
     *
     * @param hours         number of hours in the period (&gt; 0)
     * @param durationHours length of each outage, hours (&gt; 0)
     * @param startHours    first hour of each outage; every outage must end within the period
     * @return true where the grid is available
     */
    public static boolean[] gridAvailable(int hours, int durationHours, int... startHours) {
        if (hours <= 0 || durationHours <= 0) {
            throw new IllegalArgumentException("hours and durationHours must be > 0, got " + hours + " and "
                    + durationHours);
        }
        boolean[] up = new boolean[hours];
        java.util.Arrays.fill(up, true);
        for (int s : startHours) {
            if (s < 0 || s + durationHours > hours) {
                throw new IllegalArgumentException("an outage of " + durationHours + " h starting at hour " + s
                        + " does not fit in " + hours + " hours");
            }
            java.util.Arrays.fill(up, s, s + durationHours, false);
        }
        return up;
    }
}
