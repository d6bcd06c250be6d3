package org.holdover.sizing;

import java.util.List;
import org.holdover.inverter.InverterSpec;

/**
 * One catalog inverter against the demand.
 *
 * @param spec             the inverter
 * @param acMatch          its AC output matches the service (voltage, split phase, frequency)
 * @param acMismatch       why not, when it does not ("" otherwise)
 * @param deratingFactor   continuous-rating factor at the inverter ambient
 * @param checks           the power checks (continuous W and VA, surge, legs)
 * @param continuousDcA    DC current at the low-voltage cutoff for the running demand, A
 * @param surgeDcA         DC current at the cutoff during the motor start, A
 */
public record InverterAssessment(InverterSpec spec, boolean acMatch, String acMismatch, double deratingFactor,
                                 List<Check> checks, double continuousDcA, double surgeDcA) {
    public InverterAssessment {
        checks = List.copyOf(checks);
    }

    /** AC output matches and every power check passes. */
    public boolean passes() {
        return acMatch && checks.stream().allMatch(Check::passes);
    }

    /** The first failing check, or null. */
    public Check firstFailure() {
        return checks.stream().filter(c -> !c.passes()).findFirst().orElse(null);
    }
}
