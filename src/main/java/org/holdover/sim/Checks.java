package org.holdover.sim;

/** Argument checks shared by the records of this package; each failure names the value received. */
final class Checks {

    private Checks() {
    }

    static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
        return value;
    }

    static double nonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and >= 0, got " + value);
        }
        return value;
    }

    static double positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and > 0, got " + value);
        }
        return value;
    }

    /** A fraction in (0, 1], such as an efficiency. */
    static double efficiency(String name, double value) {
        if (!(value > 0 && value <= 1)) {
            throw new IllegalArgumentException(name + " must be in (0, 1], got " + value);
        }
        return value;
    }

    /** A fraction in [0, 1], such as a state of charge. */
    static double fraction(String name, double value) {
        if (!(value >= 0 && value <= 1)) {
            throw new IllegalArgumentException(name + " must be in [0, 1], got " + value);
        }
        return value;
    }
}
