package org.holdover.dc;

/**
 * Solves the power balance at the inverter's DC terminals during a start. The bank is a voltage source V_oc
 * behind R = R_bank + R_cable; the inverter draws constant power P:
 * V·I = P with V = V_oc − I·R, so V² − V_oc·V + P·R = 0 and V = (V_oc + √(V_oc² − 4PR)) / 2.
 * A negative discriminant means no current delivers P (voltage collapse).
 */
public final class SurgeVoltage {

    private SurgeVoltage() {
    }

    /**
     * @param input battery, cable and inverter
     * @return the operating point, or the collapse
     */
    public static SurgeResult solve(SurgeInput input) {
        double voc = input.openCircuitV();
        double r = input.totalResistanceOhm();
        double p = input.inverterInputW();
        double discriminant = voc * voc - 4.0 * p * r;
        if (discriminant < 0) {
            double pMax = voc * voc / (4.0 * r);
            if (p > pMax) {
                return new SurgeResult.Collapse(input, pMax, voc / (2.0 * r), voc / 2.0, p - pMax);
            }
            // P equals the maximum power to within rounding: the maximum-power point itself.
            discriminant = 0.0;
        }
        // I = 2P / (V_oc + √D) is the smaller root written without the cancellation in (V_oc − √D) / (2R), and
        // works for R = 0. The voltages then follow from Kirchhoff's law, so V_bat ≥ V_inv holds exactly.
        double current = 2.0 * p / (voc + Math.sqrt(discriminant));
        double bankDrop = current * input.bankResistanceOhm();
        double cableDrop = current * input.cableRoundTripResistanceOhm();
        double vInverter = voc - current * r;
        double margin = vInverter - input.lowVoltageCutoffV();
        return new SurgeResult.Operating(input, voc - bankDrop, vInverter, current, bankDrop, cableDrop, margin,
                100.0 * margin / input.lowVoltageCutoffV(), current / input.peakCurrentLimitA());
    }
}
