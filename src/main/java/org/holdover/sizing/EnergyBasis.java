package org.holdover.sizing;

/**
 * The DC energy the battery must deliver, from the hourly served load through the chosen inverter.
 *
 * @param dcInputW          inverter DC input each hour, W (load through the loss model, no-load draw included)
 * @param monthlyDailyDcWh  mean DC energy per day in each month, Wh
 * @param worstMonth        month (1–12) with the highest DC energy per day
 * @param windowHours       backup: outage length in whole hours (0 off grid)
 * @param windowDcWh        backup: DC energy of the window starting at each hour, Wh (empty off grid)
 * @param windowStartHour   backup: first hour of the hardest outage window (−1 off grid)
 * @param energyDcWh        energy the bank must deliver, Wh
 * @param dischargeHours    over how long, h
 * @param energyAcWh        AC energy served over the same period, Wh
 */
public record EnergyBasis(double[] dcInputW, double[] monthlyDailyDcWh, int worstMonth, int windowHours,
                          double[] windowDcWh, int windowStartHour, double energyDcWh, double dischargeHours, double energyAcWh) {

    /** Effective inverter efficiency over the discharge (AC out ÷ DC in). */
    public double effectiveEfficiency() {
        return energyDcWh > 0 ? energyAcWh / energyDcWh : 0;
    }
}
