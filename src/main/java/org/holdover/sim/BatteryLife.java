package org.holdover.sim;

/**
 * Battery life: cycle life from the year's rainflow-counted state-of-charge ranges by Miner's rule
 * against the cycle-life curve, and calendar life, whichever ends first.
 *
 * @param cycleDamagePerYear Miner's sum for one year (1 = end of life), &ge; 0
 * @param cycleLifeYears     1 / cycleDamagePerYear, years (infinite when there is no cycling)
 * @param calendarLifeYears  calendar life, years
 * @param lifeYears          the smaller of the two, years
 * @param limitedBy          which of the two ends first (calendar on a tie)
 */
public record BatteryLife(double cycleDamagePerYear, double cycleLifeYears, double calendarLifeYears,
                          double lifeYears, Limit limitedBy) {

    /** What ends the battery's life. */
    public enum Limit {
        /** Wear from cycling. */
        CYCLING,
        /** Age. */
        CALENDAR
    }

    public BatteryLife {
        Checks.nonNegative("cycleDamagePerYear", cycleDamagePerYear);
        if (!(cycleLifeYears > 0)) {
            throw new IllegalArgumentException("cycleLifeYears must be > 0, got " + cycleLifeYears);
        }
        Checks.positive("calendarLifeYears", calendarLifeYears);
        if (lifeYears != Math.min(cycleLifeYears, calendarLifeYears)) {
            throw new IllegalArgumentException("lifeYears must be the smaller of cycle and calendar life, got "
                    + lifeYears);
        }
        if (limitedBy != (cycleLifeYears < calendarLifeYears ? Limit.CYCLING : Limit.CALENDAR)) {
            throw new IllegalArgumentException("limitedBy does not match the two lives: " + limitedBy);
        }
    }

    static BatteryLife of(double damagePerYear, double calendarYears) {
        double cycleYears = damagePerYear > 0 ? 1 / damagePerYear : Double.POSITIVE_INFINITY;
        return new BatteryLife(damagePerYear, cycleYears, calendarYears, Math.min(cycleYears, calendarYears),
                cycleYears < calendarYears ? Limit.CYCLING : Limit.CALENDAR);
    }
}
