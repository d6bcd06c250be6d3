package org.holdover.dc;

import java.util.Objects;

/**
 * Battery and inverter terminal voltage during a motor start: either an operating point or voltage collapse.
 */
public sealed interface SurgeResult permits SurgeResult.Operating, SurgeResult.Collapse {

    /** @return the input */
    SurgeInput input();

    /** @return true when the inverter stays above its cutoff and the battery within its current limit */
    boolean passes();

    /**
     * The bank delivers the power. Of the two currents that satisfy V·I = P, this is the lower one (higher
     * voltage), the one a source reaches as the load ramps up.
     *
     * @param input              the input
     * @param batteryTerminalV   V_oc − I·R_bank, V
     * @param inverterTerminalV  V_oc − I·(R_bank + R_cable), V
     * @param currentA           DC current, A
     * @param bankDropV          I·R_bank, V
     * @param cableDropV         I·R_cable, V
     * @param cutoffMarginV      inverter terminal voltage − cutoff, V (negative when below)
     * @param cutoffMarginPct    cutoff margin as percent of the cutoff voltage
     * @param currentLimitRatio  current ÷ battery peak-current limit (above 1 exceeds the limit)
     */
    record Operating(SurgeInput input, double batteryTerminalV, double inverterTerminalV, double currentA,
                     double bankDropV, double cableDropV, double cutoffMarginV, double cutoffMarginPct,
                     double currentLimitRatio) implements SurgeResult {
        /** Relative slack for the self-checks V·I = P and V = V_oc − I·R. */
        private static final double POWER_BALANCE_TOLERANCE = 1e-9;

        public Operating {
            Objects.requireNonNull(input, "input");
            if (!(currentA >= 0) || !(inverterTerminalV > 0) || batteryTerminalV < inverterTerminalV) {
                throw new IllegalArgumentException("impossible operating point: " + currentA + " A at "
                        + inverterTerminalV + " V");
            }
            double p = input.inverterInputW();
            if (Math.abs(inverterTerminalV * currentA - p) > POWER_BALANCE_TOLERANCE * Math.max(1.0, p)) {
                throw new IllegalArgumentException("operating point does not balance power: "
                        + inverterTerminalV * currentA + " W vs " + p + " W");
            }
            double kvl = input.openCircuitV() - currentA * input.totalResistanceOhm();
            if (Math.abs(inverterTerminalV - kvl) > POWER_BALANCE_TOLERANCE * input.openCircuitV()) {
                throw new IllegalArgumentException("operating point breaks V = V_oc - I R: " + inverterTerminalV
                        + " V vs " + kvl + " V");
            }
        }

        /** @return true when the inverter terminal voltage is at or above the cutoff */
        public boolean aboveCutoff() {
            return cutoffMarginV >= 0;
        }

        /** @return true when the current is at or below the battery's peak-current limit */
        public boolean withinCurrentLimit() {
            return currentLimitRatio <= 1.0;
        }

        @Override
        public boolean passes() {
            return aboveCutoff() && withinCurrentLimit();
        }
    }

    /**
     * The bank and cable cannot deliver the power at any current: V_oc² &lt; 4·P·R. The inverter's input voltage
     * would collapse.
     *
     * @param input                the input
     * @param maxDeliverablePowerW V_oc² ÷ (4R), the most power the inverter terminals can receive, W
     * @param currentAtMaxPowerA   V_oc ÷ (2R), A
     * @param voltageAtMaxPowerV   V_oc ÷ 2, V
     * @param shortfallW           requested power − deliverable power, W (&gt; 0)
     */
    record Collapse(SurgeInput input, double maxDeliverablePowerW, double currentAtMaxPowerA,
                    double voltageAtMaxPowerV, double shortfallW) implements SurgeResult {
        public Collapse {
            Objects.requireNonNull(input, "input");
            if (!(shortfallW > 0)) {
                throw new IllegalArgumentException("a collapse has a positive shortfall, got " + shortfallW);
            }
        }

        @Override
        public boolean passes() {
            return false;
        }
    }
}
