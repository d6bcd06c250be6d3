package org.holdover.inverter;

/**
 * An inverter's short-time rating: the apparent power it can deliver for a stated time.
 *
 * @param durationS how long, s
 * @param va        apparent power, VA
 */
public record SurgeRating(double durationS, double va) {
    public SurgeRating {
        if (!(durationS > 0) || !(va > 0)) {
            throw new IllegalArgumentException("surge duration and VA must be > 0");
        }
    }
}
