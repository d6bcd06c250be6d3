package org.holdover.battery;

/**
 * What a battery bank must do.
 *
 * @param busClassV       nominal bus class, V
 * @param energyDcWh      DC energy the bank must deliver over the discharge, Wh
 * @param dischargeHours  how long that discharge lasts, h (sets the rate for the Peukert correction)
 * @param depthOfDischarge deepest design discharge, (0, 1]
 * @param endOfLife       capacity at end of life, fraction of new, (0, 1]
 * @param batteryTempC    coldest battery temperature during the discharge, °C
 * @param continuousA     continuous DC current at the inverter's low-voltage cutoff, A
 * @param surgeA          DC current during the motor start at the cutoff voltage, A
 * @param surgeS          length of the start, s
 * @param maxParallel     project limit on parallel strings (replaces the chemistry's practice), or 0 for none
 */
public record BankRequirement(double busClassV, double energyDcWh, double dischargeHours, double depthOfDischarge,
                              double endOfLife, double batteryTempC, double continuousA, double surgeA, double surgeS,
                              int maxParallel) {
    public BankRequirement {
        if (!(energyDcWh >= 0) || !(dischargeHours > 0)) {
            throw new IllegalArgumentException("energy must be >= 0 and discharge hours > 0");
        }
        if (!(depthOfDischarge > 0 && depthOfDischarge <= 1) || !(endOfLife > 0 && endOfLife <= 1)) {
            throw new IllegalArgumentException("depth of discharge and end of life must be in (0, 1]");
        }
        if (!(continuousA >= 0) || !(surgeA >= 0) || !(surgeS >= 0)) {
            throw new IllegalArgumentException("currents and duration must be >= 0");
        }
    }
}
