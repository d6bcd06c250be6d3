package org.holdover.testing;

/**
 * When two numeric cell values count as equal: {@code |a - b| <= absolute} or
 * {@code |a - b| <= relative * max(|a|, |b|)}.
 *
 * @param relative allowed difference as a fraction of the larger magnitude, in [0, 1)
 * @param absolute allowed difference in the cell's own unit, &ge; 0
 */
public record Tolerance(double relative, double absolute) {

    /**
     * The default: relative 1e-9, absolute 1e-9.
     *
     * <p>Relative 1e-9: the spreadsheet application writes 15 significant digits (a relative rounding
     * of at most 5e-16) and both evaluators work in IEEE doubles, so anything beyond a few parts in
     * 1e15 is a real difference; 1e-9 leaves room for different summation order over long ranges while
     * still catching any error a reader could see in the shown digits.
     *
     * <p>Absolute 1e-9: the application rounds a subtraction whose result is within about 2^-44 of its
     * operands to exactly zero (so {@code 0.1+0.2-0.3} is 0 there and 5.55e-17 in Java); such
     * cancellation residue is about one unit in the last place of the operands, 1.9e-9 for a year of
     * hourly watt-hours (about 8.8e6 Wh) at most. 1e-9 in SI units (nW, nWh, nA, nm) is below anything
     * a workbook of ours shows. Tests comparing larger balances pass their own tolerance.
     */
    public static final Tolerance DEFAULT = new Tolerance(1e-9, 1e-9);

    public Tolerance {
        if (!(relative >= 0 && relative < 1)) {
            throw new IllegalArgumentException("relative tolerance must be in [0, 1), got " + relative);
        }
        if (!(absolute >= 0) || Double.isInfinite(absolute)) {
            throw new IllegalArgumentException("absolute tolerance must be finite and >= 0, got " + absolute);
        }
    }

    /**
     * @param a one value
     * @param b the other value
     * @return whether they are equal within this tolerance (NaN never is)
     */
    public boolean equal(double a, double b) {
        double diff = Math.abs(a - b);
        return diff <= absolute || diff <= relative * Math.max(Math.abs(a), Math.abs(b));
    }
}
