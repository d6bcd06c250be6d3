package org.holdover.catalog;

import java.util.Objects;
import org.holdover.inverter.AcOutput;
import org.holdover.sim.FuelCurve;

/**
 * An engine generator offered in a catalog.
 *
 * @param id           identifier, unique in the catalog
 * @param description  plain description
 * @param ratedW       continuous nameplate rating at sea level, real power, W (&gt; 0)
 * @param ac           its AC output (a 120/240 V split-phase set has voltsRms 240 and splitPhase true)
 * @param minLoadRatio smallest output while running, fraction of the rating, in [0, 1]
 * @param fuel         fuel curve (the linear form)
 * @param price        price of one set (demo data in the built-in catalog), &ge; 0
 */
public record GeneratorItem(String id, String description, double ratedW, AcOutput ac, double minLoadRatio, FuelCurve fuel,
                            double price) {
    public GeneratorItem {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(ac, "ac");
        Objects.requireNonNull(fuel, "fuel");
        if (!(ratedW > 0)) {
            throw new IllegalArgumentException("ratedW must be > 0, got " + ratedW);
        }
        if (!(minLoadRatio >= 0 && minLoadRatio <= 1)) {
            throw new IllegalArgumentException("minLoadRatio must be in [0, 1], got " + minLoadRatio);
        }
        if (!(price >= 0)) {
            throw new IllegalArgumentException("price must be >= 0, got " + price);
        }
    }

    /** Fuel rate at full rated output, L/h. */
    public double fullLoadLitresPerHour() {
        return fuel.litresPerHour(ratedW, ratedW);
    }
}
