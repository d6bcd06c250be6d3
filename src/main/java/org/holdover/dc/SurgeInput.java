package org.holdover.dc;

/**
 * The battery, cable and inverter during a motor start.
 *
 * @param openCircuitV                open-circuit voltage of the bank at the worst state of charge and temperature
 *                                    for the start, V, &gt; 0
 * @param bankResistanceOhm           internal resistance of the whole bank, already scaled for temperature and
 *                                    for series and parallel count (see {@link BankResistance}), Ω, ≥ 0
 * @param cableRoundTripResistanceOhm battery-to-inverter cable, out and back, plus fuses and connections if known, Ω, ≥ 0
 * @param inverterInputW              DC power the inverter draws during the start (surge output ÷ efficiency),
 *                                    W, ≥ 0
 * @param lowVoltageCutoffV           inverter low-voltage cutoff at its DC terminals, V, &gt; 0
 * @param peakCurrentLimitA           the largest current the battery (its management system) allows for the start
 *                                    duration, A, &gt; 0
 */
public record SurgeInput(double openCircuitV, double bankResistanceOhm, double cableRoundTripResistanceOhm,
                         double inverterInputW, double lowVoltageCutoffV, double peakCurrentLimitA) {

    public SurgeInput {
        check(openCircuitV > 0, "openCircuitV must be > 0", openCircuitV);
        check(bankResistanceOhm >= 0, "bankResistanceOhm must be >= 0", bankResistanceOhm);
        check(cableRoundTripResistanceOhm >= 0, "cableRoundTripResistanceOhm must be >= 0",
                cableRoundTripResistanceOhm);
        check(inverterInputW >= 0, "inverterInputW must be >= 0", inverterInputW);
        check(lowVoltageCutoffV > 0, "lowVoltageCutoffV must be > 0", lowVoltageCutoffV);
        check(peakCurrentLimitA > 0, "peakCurrentLimitA must be > 0", peakCurrentLimitA);
    }

    private static void check(boolean ok, String message, double value) {
        if (!ok || !Double.isFinite(value)) {
            throw new IllegalArgumentException(message + ", got " + value);
        }
    }

    /** @return bank plus cable resistance, Ω */
    public double totalResistanceOhm() {
        return bankResistanceOhm + cableRoundTripResistanceOhm;
    }

    /** V_oc² − 4·P·R of the power balance P = V·I, V = V_oc − I·R: negative when the bank cannot deliver P. */
    public double discriminant() {
        return openCircuitV * openCircuitV - 4.0 * inverterInputW * totalResistanceOhm();
    }

    /**
     * @param ohm cable round-trip resistance, Ω, ≥ 0
     * @return a copy with that cable resistance
     */
    public SurgeInput withCableRoundTripResistanceOhm(double ohm) {
        return new SurgeInput(openCircuitV, bankResistanceOhm, ohm, inverterInputW, lowVoltageCutoffV,
                peakCurrentLimitA);
    }

    /**
     * @param ohm bank resistance, Ω, ≥ 0
     * @return a copy with that bank resistance
     */
    public SurgeInput withBankResistanceOhm(double ohm) {
        return new SurgeInput(openCircuitV, ohm, cableRoundTripResistanceOhm, inverterInputW, lowVoltageCutoffV,
                peakCurrentLimitA);
    }

    /**
     * @param watts inverter DC input power during the start, W, ≥ 0
     * @return a copy with that power
     */
    public SurgeInput withInverterInputW(double watts) {
        return new SurgeInput(openCircuitV, bankResistanceOhm, cableRoundTripResistanceOhm, watts, lowVoltageCutoffV,
                peakCurrentLimitA);
    }
}
