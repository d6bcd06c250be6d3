package org.holdover.load;

/**
 * Where a motor's direct-on-line starting demand comes from. Nameplate locked-rotor current wins over a
 * code letter, which wins over a multiple of running VA.
 */
public sealed interface LockedRotor {

    /** Locked-rotor apparent power of one unit started direct on line, VA. */
    double directStartVa(double runningVa);

    /** A short description of the basis for the workbook. */
    String basis();

    /**
     * From horsepower and NEMA code letter, at the top of the letter's range.
     *
     * @param horsepower rated output, hp
     * @param letter     the nameplate code letter
     */
    record ByCodeLetter(double horsepower, NemaCodeLetter letter) implements LockedRotor {
        public ByCodeLetter {
            if (!(horsepower > 0)) {
                throw new IllegalArgumentException("horsepower must be > 0, got " + horsepower);
            }
        }

        @Override
        public double directStartVa(double runningVa) {
            return horsepower * letter.designKvaPerHp() * 1000.0;
        }

        @Override
        public String basis() {
            return "code letter " + letter + " (" + letter.designKvaPerHp() + " kVA/hp, "
                    + (Double.isInfinite(letter.highKvaPerHp()) ? "lower figure: letter V has no upper" : "top of range")
                    + ")";
        }
    }

    /**
     * From nameplate locked-rotor current (single phase): VA = amps × volts.
     *
     * @param amps  locked-rotor current, A
     * @param volts the voltage it is stated at, V
     */
    record ByNameplateAmps(double amps, double volts) implements LockedRotor {
        public ByNameplateAmps {
            if (!(amps > 0) || !(volts > 0)) {
                throw new IllegalArgumentException("amps and volts must be > 0");
            }
        }

        @Override
        public double directStartVa(double runningVa) {
            return amps * volts;
        }

        @Override
        public String basis() {
            return "nameplate locked-rotor current";
        }
    }

    /**
     * A multiple of the running VA.
     *
     * @param multiple locked-rotor VA ÷ running VA
     */
    record ByMultiple(double multiple) implements LockedRotor {
        public ByMultiple {
            if (!(multiple >= 1)) {
                throw new IllegalArgumentException("multiple must be >= 1, got " + multiple);
            }
        }

        @Override
        public double directStartVa(double runningVa) {
            return multiple * runningVa;
        }

        @Override
        public String basis() {
            return "multiple of running VA";
        }
    }
}
