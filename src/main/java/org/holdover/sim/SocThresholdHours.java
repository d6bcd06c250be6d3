package org.holdover.sim;

/**
 * Hours whose end-of-hour state of charge was below a threshold.
 *
 * @param thresholdSoc threshold, fraction in [0, 1]
 * @param hours        number of hours strictly below it (&ge; 0)
 */
public record SocThresholdHours(double thresholdSoc, int hours) {

    public SocThresholdHours {
        Checks.fraction("thresholdSoc", thresholdSoc);
        if (hours < 0) {
            throw new IllegalArgumentException("hours must be >= 0, got " + hours);
        }
    }
}
