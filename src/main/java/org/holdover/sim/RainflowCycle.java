package org.holdover.sim;

/**
 * One range counted by rainflow counting.
 *
 * @param range absolute difference of the range's two points, in the history's unit (&ge; 0)
 * @param mean  mean of the two points
 * @param count 0.5 for a half cycle, 1 for a full cycle
 */
public record RainflowCycle(double range, double mean, double count) {

    public RainflowCycle {
        Checks.nonNegative("range", range);
        Checks.finite("mean", mean);
        if (count != 0.5 && count != 1) {
            throw new IllegalArgumentException("count must be 0.5 or 1, got " + count);
        }
    }
}
