package org.holdover.sim;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What to compute besides the energy flows.
 *
 * @param socThresholds states of charge (fractions in [0, 1]) for which the hours spent below are counted
 * @param aging         battery wear model; empty skips the battery-life estimate (and rainflow counting)
 */
public record AnalysisOptions(List<Double> socThresholds, Optional<BatteryAging> aging) {

    /** No thresholds, no life estimate. */
    public static final AnalysisOptions NONE = new AnalysisOptions(List.of(), Optional.empty());

    public AnalysisOptions {
        socThresholds = List.copyOf(socThresholds);
        for (Double s : socThresholds) {
            Checks.fraction("socThreshold", s);
        }
        Objects.requireNonNull(aging, "aging");
    }
}
