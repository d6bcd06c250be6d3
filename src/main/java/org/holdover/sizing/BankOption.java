package org.holdover.sizing;

import org.holdover.battery.BankDesign;

/**
 * A bank design at a bus class, with whether it suits the inverter chosen there.
 *
 * @param design         the design
 * @param incompatibility why it does not suit the inverter ("" when it does)
 * @param dc              its DC side with the inverter (null when it was not evaluated: not buildable or not suited)
 */
public record BankOption(BankDesign design, String incompatibility, DcDesign dc) {

    /** Buildable within its limits, suited to the inverter, and its DC side works. */
    public boolean usable() {
        return design.feasible() && incompatibility.isEmpty() && dc != null && dc.problem().isEmpty();
    }

    /** Why it cannot be used ("" when it can). */
    public String reason() {
        if (!design.feasible()) {
            return design.limit();
        }
        if (!incompatibility.isEmpty()) {
            return incompatibility;
        }
        return dc == null ? "" : dc.problem();
    }
}
