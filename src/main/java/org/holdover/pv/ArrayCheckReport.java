package org.holdover.pv;

import java.util.List;
import java.util.Objects;

/**
 * Every check of one array on one controller, with the quantities behind them.
 *
 * @param array                    the array on this controller
 * @param controller               the controller
 * @param conditions               site and battery conditions
 * @param window                   the string-length window for this module and controller
 * @param stringColdVocV           string V_oc at the record low, V
 * @param stringVmpHotV            string V_mp at the hot cell temperature, V
 * @param maxCircuitCurrentA       NEC 690.8(A)(1): 1.25 × array I_sc, A
 * @param conductorSizingCurrentA  NEC 690.8(B): 1.25 × maximum circuit current, A (for the PV
 *                                 conductors and overcurrent devices; not checked here)
 * @param outputCurrentAtStcA      battery-side current at STC power: MPPT, STC power × efficiency ÷
 *                                 nominal battery voltage; PWM, the maximum circuit current, A
 * @param pwmPowerRatio            PWM only: power at the battery operating voltage ÷ maximum power,
 *                                 at 25 °C cells ({@link PwmOperatingPoint}); 1 for MPPT
 * @param checks                   the checks
 */
public record ArrayCheckReport(PvArray array, ChargeController controller, StringDesignConditions conditions,
        StringWindow window, double stringColdVocV, double stringVmpHotV, double maxCircuitCurrentA,
        double conductorSizingCurrentA, double outputCurrentAtStcA, double pwmPowerRatio, List<Check> checks) {

    public ArrayCheckReport {
        Objects.requireNonNull(array, "array");
        Objects.requireNonNull(controller, "controller");
        Objects.requireNonNull(conditions, "conditions");
        Objects.requireNonNull(window, "window");
        checks = List.copyOf(checks);
    }

    /** True when every required check passes. */
    public boolean passesRequired() {
        return checks.stream().allMatch(c -> c.passes() || c.severity() == Check.Severity.ADVISORY);
    }

    /** The checks that fail, required and advisory. */
    public List<Check> failures() {
        return checks.stream().filter(c -> !c.passes()).toList();
    }

    /** The check with the given id, if present. */
    public java.util.Optional<Check> check(String id) {
        return checks.stream().filter(c -> c.id().equals(id)).findFirst();
    }
}
