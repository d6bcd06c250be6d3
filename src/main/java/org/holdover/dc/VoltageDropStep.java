package org.holdover.dc;

/**
 * The voltage-drop check of one candidate, every quantity shown. The drop is resistive (DC) over the round
 * trip: ΔV = I × 2 L × r(T) ÷ sets.
 *
 * @param currentA               the current the drop is computed at: the continuous current as given (not
 *                               multiplied by any code factor; for a PV source circuit that is Isc, a
 *                               conservative stand-in for the maximum-power current), A
 * @param conductorTempC         conductor temperature assumed, °C
 * @param resistanceOhmPerM      one conductor at that temperature, Ω/m
 * @param parallelSets           conductors per pole
 * @param oneWayLengthM          one-way length, m
 * @param roundTripResistanceOhm 2 × length × r ÷ sets, Ω
 * @param dropV                  current × round-trip resistance, V
 * @param dropPct                drop as percent of the nominal voltage
 * @param limitPct               the largest acceptable drop, percent
 * @param ok                     dropPct ≤ limitPct
 */
public record VoltageDropStep(double currentA, double conductorTempC, double resistanceOhmPerM, int parallelSets,
                              double oneWayLengthM, double roundTripResistanceOhm, double dropV, double dropPct,
                              double limitPct, boolean ok) {

    public VoltageDropStep {
        if (!(resistanceOhmPerM > 0) || parallelSets < 1 || !(oneWayLengthM > 0) || !(currentA >= 0)) {
            throw new IllegalArgumentException("bad voltage-drop inputs");
        }
    }

    /**
     * Computes the drop for one candidate.
     *
     * @param tables         the bundled tables
     * @param size           a tabulated size
     * @param parallelSets   conductors per pole, ≥ 1
     * @param oneWayLengthM  one-way length, m, &gt; 0
     * @param currentA       current, A, ≥ 0
     * @param conductorTempC conductor temperature, °C
     * @param flexible       IEC class 5 instead of class 2 (ignored for NEC)
     * @param nominalV       nominal voltage, V, &gt; 0
     * @param limitPct       largest acceptable drop, %
     */
    public static VoltageDropStep of(ConductorTables tables, ConductorSize size, int parallelSets,
                                     double oneWayLengthM, double currentA, double conductorTempC,
                                     boolean flexible, double nominalV, double limitPct) {
        double r = tables.resistanceOhmPerM(size, conductorTempC, flexible);
        double roundTrip = roundTripResistanceOhm(r, parallelSets, oneWayLengthM);
        double dropV = currentA * roundTrip;
        double pct = 100.0 * dropV / nominalV;
        return new VoltageDropStep(currentA, conductorTempC, r, parallelSets, oneWayLengthM, roundTrip, dropV, pct,
                limitPct, pct <= limitPct);
    }

    /**
     * @param resistanceOhmPerM one conductor, Ω/m
     * @param parallelSets      conductors per pole, ≥ 1
     * @param oneWayLengthM     one-way length, m
     * @return out-and-back resistance of the circuit, Ω
     */
    public static double roundTripResistanceOhm(double resistanceOhmPerM, int parallelSets, double oneWayLengthM) {
        return 2.0 * oneWayLengthM * resistanceOhmPerM / parallelSets;
    }
}
