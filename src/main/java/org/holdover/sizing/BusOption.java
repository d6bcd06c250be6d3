package org.holdover.sizing;

import java.util.List;
import org.holdover.battery.BankDesign;

/**
 * One DC bus voltage class and what it led to.
 *
 * @param busClassV       nominal bus class, V
 * @param inverter        the inverter chosen at this class, or null when none passes
 * @param currentCheck    the continuous battery current against the project's rule (null without an inverter)
 * @param energyDcWh      DC energy the bank must deliver with this inverter, Wh (0 without an inverter)
 * @param banks           every module considered at this class
 * @param bank            the bank chosen, or null
 * @param passes          whether this class gives a system that passes
 * @param reason          why it was rejected, or why it was chosen
 */
public record BusOption(double busClassV, InverterAssessment inverter, Check currentCheck, double energyDcWh,
                        List<BankOption> banks, BankDesign bank, boolean passes, String reason) {
    public BusOption {
        banks = List.copyOf(banks);
    }
}
