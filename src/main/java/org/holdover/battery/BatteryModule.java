package org.holdover.battery;

import java.util.Objects;

/**
 * A catalog battery module (a block, a cell or a packaged module with its own management system).
 *
 * @param id                    catalog identifier
 * @param description           plain description
 * @param chemistry             its chemistry
 * @param nominalV              nominal voltage, V
 * @param capacityAh            rated capacity, Ah, at the {@code rateHours} rate
 * @param rateHours             the discharge time of the rating, h (20 for a C/20 rating)
 * @param internalResistanceOhm internal resistance at 25 °C, Ω
 * @param maxContinuousA        continuous discharge limit, A
 * @param maxSurgeA             short-time discharge limit, A
 * @param surgeS                how long the short-time limit may last, s
 * @param maxChargeA            charge current limit, A
 * @param maxParallel           most strings of it that may be paralleled (its management system's limit)
 * @param maxSeries             most of it that may be connected in series (its management system's limit)
 * @param price                 demo price, currency units
 */
public record BatteryModule(String id, String description, Chemistry chemistry, double nominalV, double capacityAh,
                            double rateHours, double internalResistanceOhm, double maxContinuousA, double maxSurgeA,
                            double surgeS, double maxChargeA, int maxParallel, int maxSeries, double price) {

    public BatteryModule {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(chemistry, "chemistry");
        if (!(nominalV > 0) || !(capacityAh > 0) || !(rateHours > 0)) {
            throw new IllegalArgumentException(id + ": voltage, capacity and rate must be > 0");
        }
        if (!(maxContinuousA > 0) || !(maxSurgeA >= maxContinuousA) || !(surgeS > 0)) {
            throw new IllegalArgumentException(id + ": need 0 < continuous <= surge current and surge seconds > 0");
        }
        if (maxParallel < 1 || maxSeries < 1) {
            throw new IllegalArgumentException(id + ": maxParallel and maxSeries must be >= 1");
        }
        long cells = Math.round(nominalV / chemistry.cellNominalV());
        if (cells < 1 || Math.abs(cells * chemistry.cellNominalV() - nominalV) > 0.05 * nominalV) {
            throw new IllegalArgumentException(id + ": " + nominalV + " V is not a whole number of "
                    + chemistry.cellNominalV() + " V cells");
        }
    }

    /** Cells in series inside the module. */
    public int cells() {
        return (int) Math.round(nominalV / chemistry.cellNominalV());
    }

    /** Rated energy, Wh. */
    public double energyWh() {
        return nominalV * capacityAh;
    }

    /**
     * Modules in series for a bus class, or 0 when the module does not divide it or would need more in
     * series than it allows.
     *
     * @param busClassV nominal bus class, V (12, 24, 48 or a high-voltage class)
     */
    public int seriesFor(double busClassV) {
        double cells = busClassV / 12.0 * chemistry.cellsPer12V();
        if (Math.abs(cells - Math.rint(cells)) > 1e-9) {
            return 0;
        }
        int c = (int) Math.rint(cells);
        if (c % cells() != 0) {
            return 0;
        }
        int series = c / cells();
        return series <= maxSeries ? series : 0;
    }
}
