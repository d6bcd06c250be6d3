package org.holdover.sim;

import java.util.Objects;

/**
 * What wears the battery out: cycling (rainflow-counted, Miner's rule) and age.
 *
 * @param cycleLife         cycles against depth of discharge
 * @param calendarLifeYears life in years at the site's temperature if never cycled (&gt; 0)
 */
public record BatteryAging(CycleLifeCurve cycleLife, double calendarLifeYears) {

    public BatteryAging {
        Objects.requireNonNull(cycleLife, "cycleLife");
        Checks.positive("calendarLifeYears", calendarLifeYears);
    }
}
