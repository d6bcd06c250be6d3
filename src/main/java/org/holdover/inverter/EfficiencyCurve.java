package org.holdover.inverter;

/** Conversion efficiency as a function of output power relative to the rating. */
public interface EfficiencyCurve {

    /**
     * @param loadFraction AC output ÷ rated continuous output, ≥ 0
     * @return efficiency in (0, 1]; 0 at zero output when there is a no-load draw
     */
    double efficiency(double loadFraction);
}
