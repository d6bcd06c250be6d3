package org.holdover.sim;

/**
 * How the generator is run, by the names used by Barley and Winn ("Optimal dispatch strategy in remote
 * hybrid power systems", Solar Energy 58(4-6):165-179, 1996; from memory) and in their NREL report
 * (Barley, Winn, Flowers and Green, "Optimal control of remote hybrid power systems, Part 1: Simplified
 * model", NREL/TP-441-7806, 1995).
 *
 * <p>Both strategies start the generator in an hour when the battery cannot carry the hour's load without
 * going below the generator's start state of charge. They differ in what the generator does once running.
 */
public sealed interface DispatchStrategy {

    /**
     * Load following: the generator supplies only the part of the load that the battery and PV cannot;
     * it never charges the battery on purpose (output forced up by the minimum load ratio is dumped), and
     * it stops in the first hour the battery can carry the load again.
     */
    record LoadFollowing() implements DispatchStrategy {
    }

    /**
     * Cycle charging with a set point: while running, the generator carries the load and feeds the charger
     * as much as the charger, the battery and the generator allow; once started it keeps running, hour
     * after hour, until the state of charge at the start of an hour has reached the set point.
     *
     * @param setPointSoc state of charge at which a running generator stops, fraction in [0, 1]
     */
    record CycleCharging(double setPointSoc) implements DispatchStrategy {
        public CycleCharging {
            Checks.fraction("setPointSoc", setPointSoc);
        }
    }
}
