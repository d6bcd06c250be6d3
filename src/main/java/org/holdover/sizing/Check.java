package org.holdover.sizing;

import java.util.Objects;

/**
 * One check a candidate must pass: a computed value against a limit.
 *
 * @param id       stable identifier (used to place the check in the workbook)
 * @param label    what is checked, in plain words
 * @param value    the quantity the design has (e.g. available VA, or a current)
 * @param limit    what it is compared with
 * @param unit     unit of value and limit
 * @param sense    whether value must be at least or at most the limit
 * @param basis    where the rule comes from
 */
public record Check(String id, String label, double value, double limit, String unit, Sense sense, String basis) {

    /** Direction of the comparison. */
    public enum Sense {
        /** value ≥ limit passes. */
        AT_LEAST,
        /** value ≤ limit passes. */
        AT_MOST
    }

    public Check {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(sense, "sense");
        basis = basis == null ? "" : basis;
    }

    public boolean passes() {
        return sense == Sense.AT_LEAST ? value >= limit : value <= limit;
    }

    /**
     * Margin as a fraction: how far inside the limit the value is (negative when it fails). For
     * "at least": value ÷ limit − 1; for "at most": 1 − value ÷ limit.
     */
    public double margin() {
        if (limit == 0) {
            return passes() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY;
        }
        return sense == Sense.AT_LEAST ? value / limit - 1.0 : 1.0 - value / limit;
    }
}
