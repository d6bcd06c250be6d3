package org.holdover.pv;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * One way to build the array: a module, a controller type used {@code controllerCount} times, each
 * with its own identical sub-array.
 *
 * @param perController  the sub-array on each controller and all its checks
 * @param controllerCount identical controllers, each with one sub-array, ≥ 1
 * @param requiredStcW   the array power the sizing asked for, W
 * @param powerCheck     total (PWM: effective) STC power against the requirement
 */
public record ArrayCandidate(ArrayCheckReport perController, int controllerCount, double requiredStcW,
        Check powerCheck) {

    public ArrayCandidate {
        Objects.requireNonNull(perController, "perController");
        Objects.requireNonNull(powerCheck, "powerCheck");
        if (controllerCount < 1) {
            throw new IllegalArgumentException("controllerCount must be >= 1");
        }
    }

    public PvModule module() {
        return perController.array().module();
    }

    public ChargeController controller() {
        return perController.controller();
    }

    public int modulesPerString() {
        return perController.array().modulesPerString();
    }

    /** Strings on each controller. */
    public int stringsPerController() {
        return perController.array().strings();
    }

    public int totalStrings() {
        return stringsPerController() * controllerCount;
    }

    public int totalModules() {
        return perController.array().moduleCount() * controllerCount;
    }

    /** Total nameplate power, W. */
    public double totalStcW() {
        return perController.array().stcPowerW() * controllerCount;
    }

    /** Total STC power × the PWM power ratio (= total STC power for MPPT), W. */
    public double effectiveStcW() {
        return totalStcW() * perController.pwmPowerRatio();
    }

    /** Every check: the per-controller checks, then the power check. */
    public List<Check> checks() {
        List<Check> all = new ArrayList<>(perController.checks());
        all.add(powerCheck);
        return List.copyOf(all);
    }

    /** True when every required check passes. */
    public boolean passesRequired() {
        return perController.passesRequired() && powerCheck.passes();
    }

    /** Number of advisory checks that fail. */
    public long advisoryFailures() {
        return checks().stream().filter(c -> !c.passes() && c.severity() == Check.Severity.ADVISORY).count();
    }
}
