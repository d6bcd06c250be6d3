package org.holdover.inverter;

/**
 * One point of a tabulated efficiency curve.
 *
 * @param loadFraction AC output ÷ rated continuous output, (0, 1.5]
 * @param efficiency   AC output ÷ DC input, (0, 1)
 */
public record EfficiencyPoint(double loadFraction, double efficiency) {
    public EfficiencyPoint {
        if (!(loadFraction > 0 && loadFraction <= 1.5)) {
            throw new IllegalArgumentException("loadFraction must be in (0, 1.5], got " + loadFraction);
        }
        if (!(efficiency > 0 && efficiency < 1)) {
            throw new IllegalArgumentException("efficiency must be in (0, 1), got " + efficiency);
        }
    }
}
