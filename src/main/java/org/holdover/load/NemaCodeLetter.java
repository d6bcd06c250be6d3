package org.holdover.load;

/**
 * NEMA MG 1 locked-rotor code letters: locked-rotor kVA per horsepower at full voltage and rated
 * frequency. Each range includes its lower figure and excludes its upper one (NEMA MG 1-10.37.2, as
 * tabulated in the EASA Electrical Engineering Handbook, "NEMA Code Letters for AC Motors").
 * Letters I, O and Q are not used. Letter V has no upper figure.
 */
public enum NemaCodeLetter {
    A(0.00, 3.15), B(3.15, 3.55), C(3.55, 4.00), D(4.00, 4.50), E(4.50, 5.00), F(5.00, 5.60),
    G(5.60, 6.30), H(6.30, 7.10), J(7.10, 8.00), K(8.00, 9.00), L(9.00, 10.00), M(10.00, 11.20),
    N(11.20, 12.50), P(12.50, 14.00), R(14.00, 16.00), S(16.00, 18.00), T(18.00, 20.00),
    U(20.00, 22.40), V(22.40, Double.POSITIVE_INFINITY);

    private final double lowKvaPerHp;
    private final double highKvaPerHp;

    NemaCodeLetter(double lowKvaPerHp, double highKvaPerHp) {
        this.lowKvaPerHp = lowKvaPerHp;
        this.highKvaPerHp = highKvaPerHp;
    }

    /** Lower end of the range, kVA/hp (included). */
    public double lowKvaPerHp() {
        return lowKvaPerHp;
    }

    /** Upper end of the range, kVA/hp (excluded); infinite for V. */
    public double highKvaPerHp() {
        return highKvaPerHp;
    }

    /**
     * The figure used for sizing: the top of the range, the worst case a motor with this letter may
     * draw. For V, which has no top, the lower figure (22.4) is used and the result says so.
     */
    public double designKvaPerHp() {
        return Double.isInfinite(highKvaPerHp) ? lowKvaPerHp : highKvaPerHp;
    }

    /** The letter whose range contains {@code kvaPerHp}. */
    public static NemaCodeLetter of(double kvaPerHp) {
        if (!(kvaPerHp >= 0)) {
            throw new IllegalArgumentException("kVA/hp must be >= 0, got " + kvaPerHp);
        }
        for (NemaCodeLetter l : values()) {
            if (kvaPerHp >= l.lowKvaPerHp && kvaPerHp < l.highKvaPerHp) {
                return l;
            }
        }
        throw new IllegalStateException("unreachable for " + kvaPerHp);
    }
}
