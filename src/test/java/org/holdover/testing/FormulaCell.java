package org.holdover.testing;

/**
 * One formula cell of a workbook: its cached value and the value an application computed for it.
 *
 * @param sheet the sheet's name
 * @param address the cell's A1 address, for example {@code B7}
 * @param formula the formula without the leading {@code =}
 * @param cached the value stored in the file (the engine's value)
 * @param recomputed the value the application computed
 */
public record FormulaCell(String sheet, String address, String formula, CellResult cached, CellResult recomputed) {

    public FormulaCell {
        if (sheet == null || address == null || formula == null || cached == null || recomputed == null) {
            throw new IllegalArgumentException("no field of a formula cell may be null");
        }
    }

    /** @return the reference as a formula writes it, for example {@code 'Battery bank'!B7} */
    public String reference() {
        return "'" + sheet.replace("'", "''") + "'!" + address;
    }

    /**
     * @param tolerance how close two numbers must be
     * @return whether the two values agree: same kind, numbers within the tolerance, equal strings,
     *     logicals and error codes
     */
    public boolean agrees(Tolerance tolerance) {
        if (cached instanceof CellResult.Numeric a && recomputed instanceof CellResult.Numeric b) {
            return tolerance.equal(a.value(), b.value());
        }
        if (cached instanceof CellResult.Unevaluated || recomputed instanceof CellResult.Unevaluated) {
            return false;
        }
        return cached.equals(recomputed);
    }

    /**
     * @return {@code |a - b| / max(|a|, |b|)} for two numbers (0 when both are 0), 0 for equal
     *     non-numbers, and positive infinity for values of different kinds or different non-numbers
     */
    public double relativeDifference() {
        if (cached instanceof CellResult.Numeric a && recomputed instanceof CellResult.Numeric b) {
            double scale = Math.max(Math.abs(a.value()), Math.abs(b.value()));
            double diff = Math.abs(a.value() - b.value());
            if (diff == 0) {
                return 0;
            }
            return Double.isNaN(diff) ? Double.POSITIVE_INFINITY : diff / scale;
        }
        return cached.equals(recomputed) && !(cached instanceof CellResult.Unevaluated) ? 0 : Double.POSITIVE_INFINITY;
    }

    /**
     * How badly the cell disagrees, for ranking: 0 when within the absolute tolerance, else the
     * relative difference.
     *
     * @param tolerance the tolerance whose absolute part counts as no difference
     * @return a number &ge; 0, infinite for a difference of kind
     */
    double badness(Tolerance tolerance) {
        if (cached instanceof CellResult.Numeric a && recomputed instanceof CellResult.Numeric b
                && Math.abs(a.value() - b.value()) <= tolerance.absolute()) {
            return 0;
        }
        return relativeDifference();
    }

    /** @return one line: reference, formula, cached and recomputed values, relative difference */
    public String describe() {
        return reference() + " =" + formula + ": cached " + cached.display() + ", recomputed " + recomputed.display()
                + ", relative difference " + relativeDifference();
    }
}
