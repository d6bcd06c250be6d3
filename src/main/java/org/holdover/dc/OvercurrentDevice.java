package org.holdover.dc;

import java.util.Objects;

/** The overcurrent device for a conductor: a standard rating that fits, or why none does. */
public sealed interface OvercurrentDevice permits OvercurrentDevice.Rated, OvercurrentDevice.NoneFits {

    /** Which rule lets the rating stand. */
    enum Basis {
        /** Rating ≤ the conductor's allowable ampacity (NEC 240.4; IEC 60364-4-43 433.1 In ≤ Iz). */
        WITHIN_AMPACITY,
        /**
         * NEC 240.4(B): the ampacity is not a standard rating, the device is the next standard rating above it,
         * and it is 800 A or less. Not allowed for a branch circuit supplying more than one receptacle for
         * cord-and-plug-connected portable loads.
         */
        NEXT_SIZE_UP
    }

    /** @return true when a rating was found */
    boolean fits();

    /**
     * A standard rating that protects the conductor.
     *
     * @param ratingA        device rating, A: the smallest standard rating at or above the design current
     * @param designCurrentA the design current it had to reach, A
     * @param allowableAmpacityA the conductor ampacity it protects, A
     * @param basis          which rule lets it stand
     * @param rule           the clause, for display
     */
    record Rated(double ratingA, double designCurrentA, double allowableAmpacityA, Basis basis, String rule)
            implements OvercurrentDevice {
        public Rated {
            Objects.requireNonNull(basis, "basis");
            Objects.requireNonNull(rule, "rule");
            if (!(ratingA > 0) || ratingA < designCurrentA - OvercurrentProtection.TOLERANCE_A) {
                throw new IllegalArgumentException("rating " + ratingA + " A is below the design current "
                        + designCurrentA + " A");
            }
            if (basis == Basis.WITHIN_AMPACITY && ratingA > allowableAmpacityA + OvercurrentProtection.TOLERANCE_A) {
                throw new IllegalArgumentException("rating " + ratingA + " A exceeds the ampacity "
                        + allowableAmpacityA + " A");
            }
        }

        @Override
        public boolean fits() {
            return true;
        }
    }

    /**
     * No standard rating fits.
     *
     * @param designCurrentA     the design current, A
     * @param allowableAmpacityA the conductor's allowable ampacity, A
     * @param reason             one sentence with the numbers and the clause
     */
    record NoneFits(double designCurrentA, double allowableAmpacityA, String reason) implements OvercurrentDevice {
        public NoneFits {
            Objects.requireNonNull(reason, "reason");
        }

        @Override
        public boolean fits() {
            return false;
        }
    }
}
