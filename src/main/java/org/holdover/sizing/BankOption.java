package org.holdover.sizing;

import org.holdover.battery.BankDesign;

/**
 * A bank design at a bus class, with whether it suits the inverter chosen there.
 *
 * @param design         the design
 * @param incompatibility why it does not suit the inverter ("" when it does)
 */
public record BankOption(BankDesign design, String incompatibility) {

    /** Buildable within its limits and suited to the inverter. */
    public boolean usable() {
        return design.feasible() && incompatibility.isEmpty();
    }

    /** Why it cannot be used ("" when it can). */
    public String reason() {
        return !design.feasible() ? design.limit() : incompatibility;
    }
}
