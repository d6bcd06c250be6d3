package org.holdover.inverter;

import java.util.List;

/**
 * Weighted efficiencies: a single figure from an efficiency curve, weighting the load points by how
 * often an inverter works there.
 *
 * @param name         scheme name
 * @param loadFractions load points, fraction of rated output
 * @param weights      weights, summing to 1
 * @param source       where the points and weights come from
 */
public record WeightedEfficiency(String name, List<Double> loadFractions, List<Double> weights, String source) {

    /**
     * California Energy Commission weighting: Bower et al., Performance Test Protocol for Evaluating
     * Inverters Used in Grid-Connected PV Systems (Sandia/BEW/CEC, 2004); Sandia PVPMC "CEC Inverter Test
     * Protocol".
     */
    public static final WeightedEfficiency CEC = new WeightedEfficiency("CEC",
            List.of(0.10, 0.20, 0.30, 0.50, 0.75, 1.00), List.of(0.04, 0.05, 0.12, 0.21, 0.53, 0.05),
            "Bower et al., CEC inverter test protocol (Sandia/BEW/CEC, 2004)");

    /** European weighting (JRC Ispra), as tabulated with the CEC set in public comparisons. */
    public static final WeightedEfficiency EURO = new WeightedEfficiency("European",
            List.of(0.05, 0.10, 0.20, 0.30, 0.50, 1.00), List.of(0.03, 0.06, 0.13, 0.10, 0.48, 0.20),
            "European weighted efficiency (JRC Ispra weighting)");

    public WeightedEfficiency {
        loadFractions = List.copyOf(loadFractions);
        weights = List.copyOf(weights);
        if (loadFractions.size() != weights.size()) {
            throw new IllegalArgumentException("one weight per load point");
        }
        double sum = weights.stream().mapToDouble(Double::doubleValue).sum();
        if (Math.abs(sum - 1.0) > 1e-12) {
            throw new IllegalArgumentException("weights must sum to 1, got " + sum);
        }
    }

    /** Σ weight × efficiency at each load point. */
    public double of(EfficiencyCurve curve) {
        double s = 0;
        for (int i = 0; i < weights.size(); i++) {
            s += weights.get(i) * curve.efficiency(loadFractions.get(i));
        }
        return s;
    }
}
