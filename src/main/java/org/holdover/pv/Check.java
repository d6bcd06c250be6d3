package org.holdover.pv;

import java.util.Objects;

/**
 * One check of a design: a computed value against a limit, with the margin.
 *
 * <p>Margin is relative to the limit and positive when the check passes: for an upper limit
 * (value must not exceed it) (limit − value) / limit; for a lower limit (value must reach it)
 * (value − limit) / limit.
 *
 * @param id          a stable identifier, e.g. {@code cold-voc-vs-controller}
 * @param description what is checked, in words, with the rule it follows
 * @param value       the computed value, in {@code unit}
 * @param limit       the limit, in {@code unit}, &gt; 0
 * @param unit        unit of value and limit (V, A, W, °C …)
 * @param bound       whether the limit is a maximum or a minimum
 * @param severity    whether failing rejects the design
 */
public record Check(String id, String description, double value, double limit, String unit, Bound bound,
        Severity severity) {

    /** Whether the limit is an upper or a lower one. */
    public enum Bound {
        /** value ≤ limit. */
        MAX,
        /** value ≥ limit. */
        MIN
    }

    /** What failing means. */
    public enum Severity {
        /** Failing rejects the design. */
        REQUIRED,
        /** Failing is allowed but worth knowing (e.g. output clipping). */
        ADVISORY
    }

    public Check {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(bound, "bound");
        Objects.requireNonNull(severity, "severity");
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(id + ": value must be finite, got " + value);
        }
        if (!(Double.isFinite(limit) && limit != 0)) {
            throw new IllegalArgumentException(id + ": limit must be finite and non-zero, got " + limit);
        }
    }

    /** Relative margin, positive when passing. */
    public double margin() {
        double m = bound == Bound.MAX ? (limit - value) / limit : (value - limit) / limit;
        return limit < 0 ? -m : m;
    }

    /** True when the value is within the limit. */
    public boolean passes() {
        return bound == Bound.MAX ? value <= limit : value >= limit;
    }
}
