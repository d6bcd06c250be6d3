package org.holdover.pv;

/** How a charge controller draws power from the array. */
public enum ControllerType {
    /** Maximum power point tracking: a DC–DC converter holds the array at its maximum power point. */
    MPPT,
    /** Pulse-width modulation: a switch connects the array to the battery, so the array runs at battery voltage. */
    PWM
}
