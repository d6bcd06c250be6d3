package org.holdover.sim;

import java.util.Arrays;

/**
 * Cycles to end of life against depth of discharge (from the battery's data sheet), interpolated
 * linearly in log(depth)-log(cycles). Outside the table the end segments are extended with their own
 * slope (a power law, the engine's choice: clamping would charge every tiny hourly wiggle with the
 * damage of the table's shallowest cycle).
 */
public final class CycleLifeCurve {

    private final double[] depth;
    private final double[] cycles;
    private final double[] lnDepth;
    private final double[] lnCycles;
    private final double[] slope;

    /**
     * @param depthOfDischarge depths, fraction in (0, 1], strictly increasing, at least two
     * @param cyclesToFailure  cycles to end of life at each depth (&gt; 0), not increasing
     */
    public CycleLifeCurve(double[] depthOfDischarge, double[] cyclesToFailure) {
        if (depthOfDischarge.length < 2 || depthOfDischarge.length != cyclesToFailure.length) {
            throw new IllegalArgumentException("need at least two (depth, cycles) pairs of equal count, got "
                    + depthOfDischarge.length + " depths and " + cyclesToFailure.length + " cycle counts");
        }
        depth = depthOfDischarge.clone();
        cycles = cyclesToFailure.clone();
        int n = depth.length;
        lnDepth = new double[n];
        lnCycles = new double[n];
        slope = new double[n - 1];
        for (int i = 0; i < n; i++) {
            Checks.efficiency("depthOfDischarge[" + i + "]", depth[i]);
            Checks.positive("cyclesToFailure[" + i + "]", cycles[i]);
            if (i > 0 && !(depth[i] > depth[i - 1])) {
                throw new IllegalArgumentException("depths must increase strictly, got " + depth[i - 1]
                        + " then " + depth[i]);
            }
            if (i > 0 && cycles[i] > cycles[i - 1]) {
                throw new IllegalArgumentException("cycles must not increase with depth, got " + cycles[i - 1]
                        + " then " + cycles[i]);
            }
            lnDepth[i] = Math.log(depth[i]);
            lnCycles[i] = Math.log(cycles[i]);
        }
        for (int i = 0; i < n - 1; i++) {
            slope[i] = (lnCycles[i + 1] - lnCycles[i]) / (lnDepth[i + 1] - lnDepth[i]);
        }
    }

    /**
     * Cycles to end of life at a depth of discharge.
     *
     * @param depthOfDischarge depth, fraction (&gt; 0)
     * @return cycles
     */
    public double cyclesToFailure(double depthOfDischarge) {
        return 1 / damagePerCycle(depthOfDischarge);
    }

    /** Miner's-rule damage of one full cycle of the given depth (fraction &gt; 0): 1 / cycles. */
    double damagePerCycle(double depthOfDischarge) {
        double ln = Math.log(depthOfDischarge);
        int i = 0;
        int last = slope.length - 1;
        while (i < last && ln > lnDepth[i + 1]) {
            i++;
        }
        return Math.exp(-(lnCycles[i] + slope[i] * (ln - lnDepth[i])));
    }

    /** Table depths (a copy). */
    public double[] depthOfDischarge() {
        return depth.clone();
    }

    /** Table cycles (a copy). */
    public double[] cyclesToFailure() {
        return cycles.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CycleLifeCurve c && Arrays.equals(depth, c.depth) && Arrays.equals(cycles, c.cycles);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(depth) + Arrays.hashCode(cycles);
    }

    @Override
    public String toString() {
        return "CycleLifeCurve" + Arrays.toString(depth) + " -> " + Arrays.toString(cycles);
    }
}
