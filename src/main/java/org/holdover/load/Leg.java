package org.holdover.load;

/**
 * Where a load is connected. On a single-phase service every load is {@link #LINE}; on a 120/240 V
 * split-phase service a 120 V load sits on {@link #L1} or {@link #L2} and a 240 V load on {@link #BOTH}.
 */
public enum Leg {
    /** Single-phase service: one hot conductor. */
    LINE(0.0, 0.0),
    /** Split phase, leg 1 (120 V). */
    L1(1.0, 0.0),
    /** Split phase, leg 2 (120 V). */
    L2(0.0, 1.0),
    /** Split phase, across both legs (240 V): the same current flows in each leg, half the VA per leg. */
    BOTH(0.5, 0.5);

    private final double shareL1;
    private final double shareL2;

    Leg(double shareL1, double shareL2) {
        this.shareL1 = shareL1;
        this.shareL2 = shareL2;
    }

    /** Fraction of the load's VA carried by leg 1. */
    public double shareL1() {
        return shareL1;
    }

    /** Fraction of the load's VA carried by leg 2. */
    public double shareL2() {
        return shareL2;
    }
}
