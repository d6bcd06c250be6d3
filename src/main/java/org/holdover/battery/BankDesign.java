package org.holdover.battery;

/**
 * A battery bank built from one module type for a requirement, with every step of the sizing chain.
 *
 * @param module             the module
 * @param requirement        what it was sized for
 * @param series             modules in series per string
 * @param bankNominalV       nominal bank voltage, V
 * @param temperatureFactor  capacity temperature factor at the battery temperature (≥ 1)
 * @param belowTable         the battery temperature is colder than the table covers
 * @param agingFactor        1 ÷ end-of-life fraction
 * @param effectiveAh        capacity needed at the discharge rate: energy ÷ (V × DoD) × temperature × aging, Ah
 * @param dischargeA         mean discharge current, A (energy ÷ V ÷ hours)
 * @param rateFactor         Peukert correction to the module's rated hours, ≥ 1
 * @param ratedAh            capacity needed at the module's rating, Ah
 * @param stringsForEnergy   strings for capacity
 * @param stringsForContinuous strings so no string exceeds its continuous limit
 * @param stringsForSurge    strings so no string exceeds its surge limit for the start
 * @param strings            strings chosen (the largest of the three)
 * @param maxParallel        most strings allowed
 * @param feasible           whether the bank can be built within the limits
 * @param limit              why not, when it cannot ("" otherwise)
 */
public record BankDesign(BatteryModule module, BankRequirement requirement, int series, double bankNominalV,
                         double temperatureFactor, boolean belowTable, double agingFactor, double effectiveAh,
                         double dischargeA, double rateFactor, double ratedAh, int stringsForEnergy,
                         int stringsForContinuous, int stringsForSurge, int strings, int maxParallel,
                         boolean feasible, String limit) {

    /** Modules in the bank. */
    public int modules() {
        return series * strings;
    }

    /** Rated capacity of the bank, Ah. */
    public double bankAh() {
        return strings * module.capacityAh();
    }

    /** Rated energy of the bank, Wh. */
    public double bankEnergyWh() {
        return bankNominalV * bankAh();
    }

    /** Usable energy after depth of discharge, temperature, aging and rate, Wh (what the sizing chain checks). */
    public double usableWh() {
        return bankAh() * bankNominalV * requirement.depthOfDischarge() / (temperatureFactor * agingFactor * rateFactor);
    }

    /** Demo price of the bank. */
    public double price() {
        return modules() * module.price();
    }

    /** Continuous current per string, A. */
    public double continuousPerStringA() {
        return requirement.continuousA() / strings;
    }

    /** Surge current per string, A. */
    public double surgePerStringA() {
        return requirement.surgeA() / strings;
    }

    /** Lowest bank voltage at the end of discharge under load, V (cells × end voltage). */
    public double endV() {
        return series * module.cells() * module.chemistry().cellEndV();
    }

    /** Highest charging (absorption) voltage, V. */
    public double absorptionV() {
        return series * module.cells() * module.chemistry().cellAbsorptionV();
    }

    /**
     * The same design with another number of parallel strings (a system search's choice). It is within limits only
     * with at least the strings the requirement asks for and at most the most allowed.
     *
     * @param n strings, at least 1
     */
    public BankDesign withStrings(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("strings must be >= 1, got " + n);
        }
        if (n == strings) {
            return this;
        }
        int needed = Math.max(stringsForEnergy, Math.max(stringsForContinuous, stringsForSurge));
        boolean ok = n <= maxParallel && n >= needed && series > 0;
        String why = n > maxParallel ? n + " parallel strings asked for, at most " + maxParallel + " allowed"
                : n < needed ? n + " parallel strings, fewer than the " + needed + " the requirement asks for" : "";
        return new BankDesign(module, requirement, series, bankNominalV, temperatureFactor, belowTable, agingFactor, effectiveAh,
                dischargeA, rateFactor, ratedAh, stringsForEnergy, stringsForContinuous, stringsForSurge, n, maxParallel, ok,
                ok ? "" : why);
    }
}
