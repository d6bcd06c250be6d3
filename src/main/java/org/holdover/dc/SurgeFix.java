package org.holdover.dc;

import java.util.Locale;
import java.util.Objects;

/**
 * A change that might keep the inverter above its cutoff during a start. Each fix turns the present
 * {@link SurgeInput} into the one after the change; {@link SurgeFixes#evaluate} solves each.
 */
public sealed interface SurgeFix permits SurgeFix.HigherBusVoltage, SurgeFix.ParallelStrings,
        SurgeFix.HeavierCable, SurgeFix.ShorterCable, SurgeFix.SoftStarter {

    /**
     * @param present the situation now
     * @return the situation after the change
     */
    SurgeInput apply(SurgeInput present);

    /** @return one line saying what the fix is, with its numbers */
    String describe();

    /**
     * Move to the next higher bus voltage: a different bank and inverter, the same cable and the same power.
     *
     * @param label                 e.g. "48 V bus"
     * @param openCircuitV          the new bank's open-circuit voltage at the same worst case, V
     * @param bankResistanceOhm     the new bank's resistance, Ω
     * @param lowVoltageCutoffV     the new inverter's cutoff, V
     * @param peakCurrentLimitA     the new bank's peak-current limit, A
     */
    record HigherBusVoltage(String label, double openCircuitV, double bankResistanceOhm, double lowVoltageCutoffV,
                            double peakCurrentLimitA) implements SurgeFix {
        public HigherBusVoltage {
            Objects.requireNonNull(label, "label");
        }

        @Override
        public SurgeInput apply(SurgeInput present) {
            return new SurgeInput(openCircuitV, bankResistanceOhm, present.cableRoundTripResistanceOhm(),
                    present.inverterInputW(), lowVoltageCutoffV, peakCurrentLimitA);
        }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "%s: %.2f V open circuit, %.4f ohm bank, cutoff %.2f V", label,
                    openCircuitV, bankResistanceOhm, lowVoltageCutoffV);
        }
    }

    /**
     * Add parallel strings of the same modules. The bank resistance scales by present ÷ (present + added); the
     * peak-current limit scales by (present + added) ÷ present (each string assumed to bring its own, equal
     * limit).
     *
     * @param presentStrings strings now, ≥ 1
     * @param addedStrings   strings added, ≥ 1
     */
    record ParallelStrings(int presentStrings, int addedStrings) implements SurgeFix {
        public ParallelStrings {
            if (presentStrings < 1 || addedStrings < 1) {
                throw new IllegalArgumentException("string counts must be >= 1, got " + presentStrings + " + "
                        + addedStrings);
            }
        }

        @Override
        public SurgeInput apply(SurgeInput present) {
            double scale = (double) presentStrings / (presentStrings + addedStrings);
            return new SurgeInput(present.openCircuitV(), present.bankResistanceOhm() * scale,
                    present.cableRoundTripResistanceOhm(), present.inverterInputW(), present.lowVoltageCutoffV(),
                    present.peakCurrentLimitA() / scale);
        }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "%d more parallel string(s) (%d to %d)", addedStrings, presentStrings,
                    presentStrings + addedStrings);
        }
    }

    /**
     * A heavier cable (see {@link SurgeFixes#heavierCables}).
     *
     * @param label                  e.g. "2/0 AWG, 1 set"
     * @param roundTripResistanceOhm the new cable's out-and-back resistance, Ω, ≥ 0
     * @param fixedOhm               the rest of the path the cable does not change (inverters' own leads), Ω, ≥ 0
     */
    record HeavierCable(String label, double roundTripResistanceOhm, double fixedOhm) implements SurgeFix {
        public HeavierCable {
            Objects.requireNonNull(label, "label");
            if (!(roundTripResistanceOhm >= 0) || !(fixedOhm >= 0)) {
                throw new IllegalArgumentException("resistance must be >= 0, got " + roundTripResistanceOhm + " and " + fixedOhm);
            }
        }

        /** A heavier battery cable on a path with nothing else in series. */
        public HeavierCable(String label, double roundTripResistanceOhm) {
            this(label, roundTripResistanceOhm, 0);
        }

        /** The same cable on a path that also runs through {@code ohm} that the cable does not change (inverter leads). */
        public HeavierCable withFixedOhm(double ohm) {
            return new HeavierCable(label, roundTripResistanceOhm, ohm);
        }

        @Override
        public SurgeInput apply(SurgeInput present) {
            return present.withCableRoundTripResistanceOhm(roundTripResistanceOhm + fixedOhm);
        }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "cable %s (%.5f ohm out and back)", label, roundTripResistanceOhm);
        }
    }


    /**
     * Move the inverter closer to the battery: cable resistance scales with length.
     *
     * @param presentLengthM one-way length now, m, &gt; 0
     * @param newLengthM     one-way length after, m, in (0, present]
     * @param fixedOhm       the part of the path's resistance that is not the battery cable (inverters' own leads), Ω
     */
    record ShorterCable(double presentLengthM, double newLengthM, double fixedOhm) implements SurgeFix {
        public ShorterCable {
            if (!(presentLengthM > 0) || !(newLengthM > 0) || newLengthM > presentLengthM) {
                throw new IllegalArgumentException("need 0 < new length <= present length, got " + newLengthM
                        + " m and " + presentLengthM + " m");
            }
            if (!(fixedOhm >= 0)) {
                throw new IllegalArgumentException("fixed resistance must be >= 0, got " + fixedOhm);
            }
        }

        /** A shorter battery cable on a path with nothing else in series. */
        public ShorterCable(double presentLengthM, double newLengthM) {
            this(presentLengthM, newLengthM, 0);
        }

        /**
         * The path's resistance with the cable shortened: the part that is not the cable ({@code fixedOhm}, the inverters'
         * leads) stays.
         */
        @Override
        public SurgeInput apply(SurgeInput present) {
            double cable = present.cableRoundTripResistanceOhm() - fixedOhm;
            return present.withCableRoundTripResistanceOhm(fixedOhm + cable * newLengthM / presentLengthM);
        }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "shorter cable, %.1f m instead of %.1f m one way", newLengthM,
                    presentLengthM);
        }
    }

    /**
     * A soft starter (or a drive) on the motor: the inverter's input power during the start is multiplied by
     * {@code surgePowerRatio}.
     *
     * @param surgePowerRatio start power with the starter ÷ start power without, in (0, 1]
     */
    record SoftStarter(double surgePowerRatio) implements SurgeFix {
        public SoftStarter {
            if (!(surgePowerRatio > 0 && surgePowerRatio <= 1)) {
                throw new IllegalArgumentException("surgePowerRatio must be in (0, 1], got " + surgePowerRatio);
            }
        }

        @Override
        public SurgeInput apply(SurgeInput present) {
            return present.withInverterInputW(present.inverterInputW() * surgePowerRatio);
        }

        @Override
        public String describe() {
            return String.format(Locale.ROOT, "soft starter, start power x %.2f", surgePowerRatio);
        }
    }
}
