package org.holdover.sim;

/**
 * The battery bank as an energy store.
 *
 * <p>The stored energy {@code E} (Wh) moves between {@code floorSoc * nominalEnergyWh} and
 * {@code ceilingSoc * nominalEnergyWh}. Charging power is counted at the battery's DC terminals before
 * the charge loss; discharging power at the terminals after the discharge loss.
 *
 * @param nominalEnergyWh       nominal energy, Wh (&gt; 0)
 * @param floorSoc              lowest state of charge the system may reach, fraction (1 - depth-of-discharge
 *                              limit), in [0, ceilingSoc]
 * @param ceilingSoc            highest state of charge, fraction in (0, 1]
 * @param initialSoc            state of charge at the start of hour 0, fraction in [floorSoc, ceilingSoc]
 * @param chargeEfficiency      stored energy per DC energy in, fraction in (0, 1]
 * @param dischargeEfficiency   DC energy out per stored energy, fraction in (0, 1]
 * @param maxChargeW            largest DC charging power into the terminals, W (&ge; 0)
 * @param maxDischargeW         largest DC discharging power out of the terminals, W (&ge; 0)
 */
public record BatteryBank(double nominalEnergyWh, double floorSoc, double ceilingSoc, double initialSoc,
                          double chargeEfficiency, double dischargeEfficiency, double maxChargeW,
                          double maxDischargeW) {

    public BatteryBank {
        Checks.positive("nominalEnergyWh", nominalEnergyWh);
        Checks.fraction("floorSoc", floorSoc);
        Checks.efficiency("ceilingSoc", ceilingSoc);
        if (floorSoc > ceilingSoc) {
            throw new IllegalArgumentException(
                    "floorSoc must be <= ceilingSoc, got " + floorSoc + " > " + ceilingSoc);
        }
        if (!(initialSoc >= floorSoc && initialSoc <= ceilingSoc)) {
            throw new IllegalArgumentException("initialSoc must be in [floorSoc, ceilingSoc] = ["
                    + floorSoc + ", " + ceilingSoc + "], got " + initialSoc);
        }
        Checks.efficiency("chargeEfficiency", chargeEfficiency);
        Checks.efficiency("dischargeEfficiency", dischargeEfficiency);
        Checks.nonNegative("maxChargeW", maxChargeW);
        Checks.nonNegative("maxDischargeW", maxDischargeW);
    }

    /** The same bank with another nominal energy (state-of-charge limits and powers unchanged). */
    public BatteryBank withNominalEnergyWh(double energyWh) {
        return new BatteryBank(energyWh, floorSoc, ceilingSoc, initialSoc, chargeEfficiency,
                dischargeEfficiency, maxChargeW, maxDischargeW);
    }
}
