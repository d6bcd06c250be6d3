package org.holdover.load;

import java.util.Objects;

/**
 * The starting data of one motor unit.
 *
 * @param lockedRotor            the direct-on-line starting demand
 * @param startS                 how long the start lasts, s
 * @param starter                how it is started
 * @param starterFactor          fraction of the direct-on-line demand the starter leaves, (0, 1]
 * @param lockedRotorPowerFactor power factor while starting, (0, 1]
 */
public record Motor(LockedRotor lockedRotor, double startS, Starter starter, double starterFactor,
                    double lockedRotorPowerFactor) {

    /** How a motor is started. */
    public enum Starter { DIRECT, SOFT, VFD }

    public Motor {
        Objects.requireNonNull(lockedRotor, "lockedRotor");
        Objects.requireNonNull(starter, "starter");
        if (!(startS > 0)) {
            throw new IllegalArgumentException("startS must be > 0, got " + startS);
        }
        if (!(starterFactor > 0 && starterFactor <= 1)) {
            throw new IllegalArgumentException("starterFactor must be in (0, 1], got " + starterFactor);
        }
        if (starter == Starter.DIRECT && starterFactor != 1.0) {
            throw new IllegalArgumentException("a direct-on-line start has starterFactor 1");
        }
        if (!(lockedRotorPowerFactor > 0 && lockedRotorPowerFactor <= 1)) {
            throw new IllegalArgumentException("lockedRotorPowerFactor must be in (0, 1], got " + lockedRotorPowerFactor);
        }
    }

    /** Starting apparent power of one unit with its starter, VA. */
    public double startVa(double runningVa) {
        return lockedRotor.directStartVa(runningVa) * starterFactor;
    }

    /** Starting real power of one unit with its starter, W. */
    public double startW(double runningVa) {
        return startVa(runningVa) * lockedRotorPowerFactor;
    }
}
