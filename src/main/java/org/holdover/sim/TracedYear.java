package org.holdover.sim;

import java.util.Objects;

/**
 * A year's metrics with its hour-by-hour trace.
 *
 * @param metrics the metrics (equal to those of {@link YearSimulation#run})
 * @param trace   every hour's flows
 */
public record TracedYear(SimulationMetrics metrics, HourlyTrace trace) {

    public TracedYear {
        Objects.requireNonNull(metrics, "metrics");
        Objects.requireNonNull(trace, "trace");
    }
}
