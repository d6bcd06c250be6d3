package org.holdover.dc;

import java.util.Objects;

/**
 * Prospective (bolted) short-circuit current of a battery bank, for checking the interrupting rating of the
 * battery's overcurrent device. Resistive only: V_oc ÷ R. Use the worst case for fault current: full charge and
 * a warm bank (lowest resistance), the opposite of the start check.
 */
public final class ShortCircuit {

    /**
     * Prospective current above which ordinary devices are doubtful and a high-interrupting-capacity fuse is
     * usually called for, A. Common practice, no source: many DC breakers and automotive-style fuses are rated
     * well below this, while battery fuses of the high-interrupting kind are rated at tens of kA.
     */
    public static final double COMMON_ORDINARY_DEVICE_LIMIT_A = 10_000.0;

    private ShortCircuit() {
    }

    /**
     * @param openCircuitV                bank open-circuit voltage, V, &gt; 0 (full charge)
     * @param bankResistanceOhm           bank resistance, Ω, &gt; 0 (warm bank)
     * @param cableRoundTripResistanceOhm cable from the battery to the fault point, out and back, Ω, ≥ 0
     * @param deviceInterruptingRatingA   the device's DC interrupting rating, A, &gt; 0
     * @param ordinaryDeviceLimitA        the threshold above which to flag, A, &gt; 0 (e.g.
     *                                    {@link #COMMON_ORDINARY_DEVICE_LIMIT_A})
     */
    public record Input(double openCircuitV, double bankResistanceOhm, double cableRoundTripResistanceOhm,
                        double deviceInterruptingRatingA, double ordinaryDeviceLimitA) {
        public Input {
            if (!(openCircuitV > 0) || !(bankResistanceOhm > 0) || !(cableRoundTripResistanceOhm >= 0)
                    || !(deviceInterruptingRatingA > 0) || !(ordinaryDeviceLimitA > 0)
                    || !Double.isFinite(openCircuitV + bankResistanceOhm + cableRoundTripResistanceOhm
                            + deviceInterruptingRatingA + ordinaryDeviceLimitA)) {
                throw new IllegalArgumentException("short-circuit inputs must be positive and finite "
                        + "(bank resistance > 0)");
            }
        }
    }

    /**
     * @param input                   the input
     * @param atBatteryTerminalsA     V_oc ÷ R_bank: a fault at the battery terminals, where the battery's device
     *                                sits, A
     * @param atCableEndA             V_oc ÷ (R_bank + R_cable): a fault at the far end of the cable, A
     * @param exceedsDeviceRating     the terminal fault current is above the device's interrupting rating
     * @param exceedsOrdinaryDeviceLimit the terminal fault current is above the ordinary-device threshold
     */
    public record Result(Input input, double atBatteryTerminalsA, double atCableEndA, boolean exceedsDeviceRating,
                         boolean exceedsOrdinaryDeviceLimit) {
        public Result {
            Objects.requireNonNull(input, "input");
            if (atCableEndA > atBatteryTerminalsA) {
                throw new IllegalArgumentException("the far-end fault cannot exceed the terminal fault");
            }
        }
    }

    /**
     * @param input the bank, cable and device
     * @return the prospective currents and the flags
     */
    public static Result assess(Input input) {
        double atTerminals = input.openCircuitV() / input.bankResistanceOhm();
        double atEnd = input.openCircuitV() / (input.bankResistanceOhm() + input.cableRoundTripResistanceOhm());
        return new Result(input, atTerminals, atEnd, atTerminals > input.deviceInterruptingRatingA(),
                atTerminals > input.ordinaryDeviceLimitA());
    }
}
