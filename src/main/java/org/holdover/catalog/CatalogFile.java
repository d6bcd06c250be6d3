package org.holdover.catalog;

import java.util.List;

/**
 * A catalog file as written (YAML or JSON). Optional fields are boxed and may be null; {@link CatalogReader}
 * checks every value and reports problems with their locations.
 *
 * @param name           the catalog's name
 * @param demoData       true for invented demonstration data
 * @param note           a note shown in the workbook
 * @param inverters      inverters
 * @param batteryModules battery modules
 * @param pvModules      PV modules (optional; needed when a project has a solar section)
 * @param chargeControllers solar charge controllers (optional; needed when a project has a solar section)
 * @param generators     engine generators (optional; the system search may add one when the project allows it)
 */
public record CatalogFile(String name, Boolean demoData, String note, List<InverterEntry> inverters,
                          List<ModuleEntry> batteryModules, List<PvModuleEntry> pvModules,
                          List<ControllerEntry> chargeControllers, List<GeneratorEntry> generators) {

    /**
     * An engine generator.
     *
     * @param id           identifier, unique in the catalog
     * @param description  plain description
     * @param ratedW       continuous nameplate rating at sea level, real power, W
     * @param ac           AC output (voltsRms, frequenciesHz, splitPhase as for inverters)
     * @param minLoadRatio smallest output while running, fraction of the rating (0–1)
     * @param fuel         fuel curve: the linear form, or two measured points
     * @param price        demo price
     */
    public record GeneratorEntry(String id, String description, Double ratedW, AcEntry ac, Double minLoadRatio,
                                 FuelEntry fuel, Double price) {
    }

    /**
     * Fuel use of a running set: either the linear form {@code L/h = noLoad × rated kW + slope × output kW}
     * (both coefficients), or {@code points}: two rows of a fuel table, fitted to that line.
     *
     * @param noLoadLPerHPerRatedKw fuel at no load per kW of rating, L/h/kW
     * @param slopeLPerKwh          added fuel per kWh of output, L/kWh
     * @param points                two measured points instead of the coefficients
     */
    public record FuelEntry(Double noLoadLPerHPerRatedKw, Double slopeLPerKwh, List<FuelPointEntry> points) {
    }

    /** @param outputW electrical output, W; @param litresPerHour fuel rate at that output, L/h */
    public record FuelPointEntry(Double outputW, Double litresPerHour) {
    }

    /**
     * @param id                 identifier, unique in the catalog
     * @param description        plain description
     * @param busClassV          nominal DC bus class, V
     * @param dcWindowV          DC input window, V (min is the low-voltage cutoff)
     * @param ac                 AC output
     * @param continuousW        continuous output at 25 °C, W
     * @param continuousVa       continuous output at 25 °C, VA (default: continuousW)
     * @param perLegVa           per-leg continuous VA (split phase only)
     * @param surge              short-time ratings (at most 3)
     * @param derating           temperature derating of the continuous rating
     * @param efficiency         efficiency points
     * @param noLoadW            no-load draw, W
     * @param topology           transformer, transformerless-boost or transformerless-direct
     * @param maxModulationIndex highest modulation index (transformerless-direct), default 0.95
     * @param price              demo price
     * @param maxInParallel      most identical units that may run in parallel on one output (default 1: not built for it)
     */
    public record InverterEntry(String id, String description, Double busClassV, WindowEntry dcWindowV, AcEntry ac,
                                Double continuousW, Double continuousVa, Double perLegVa, List<SurgeEntry> surge,
                                DeratingEntry derating, List<EfficiencyEntry> efficiency, Double noLoadW,
                                String topology, Double maxModulationIndex, Double price, Integer maxInParallel) {
    }

    /** @param min lowest, V; @param max highest, V */
    public record WindowEntry(Double min, Double max) {
    }

    /**
     * @param voltsRms      line-to-line RMS voltage, V
     * @param frequenciesHz frequencies it can be set to, Hz
     * @param splitPhase    120/240 V split-phase output
     */
    public record AcEntry(Double voltsRms, List<Double> frequenciesHz, Boolean splitPhase) {
    }

    /** @param seconds duration, s; @param va apparent power, VA */
    public record SurgeEntry(Double seconds, Double va) {
    }

    /** @param startC ambient where derating starts, °C; @param pctPerC % of rating lost per °C above it */
    public record DeratingEntry(Double startC, Double pctPerC) {
    }

    /** @param loadPct output, % of rated; @param pct efficiency, % */
    public record EfficiencyEntry(Double loadPct, Double pct) {
    }

    /**
     * @param id                    identifier, unique in the catalog
     * @param description           plain description
     * @param chemistry             lifepo4, agm, gel or flooded
     * @param nominalV              nominal voltage, V
     * @param capacityAh            rated capacity, Ah
     * @param rateHours             discharge time of the rating, h
     * @param internalResistanceMilliohm internal resistance at 25 °C, mΩ
     * @param maxContinuousA        continuous discharge limit, A
     * @param maxSurgeA             short-time discharge limit, A
     * @param surgeSeconds          how long the short-time limit may last, s
     * @param maxChargeA            charge current limit, A
     * @param maxParallel           most parallel strings its management system allows
     * @param maxSeries             most modules in series it allows (default: no limit for lead-acid, 1 otherwise)
     * @param price                 demo price
     */
    public record ModuleEntry(String id, String description, String chemistry, Double nominalV, Double capacityAh,
                              Double rateHours, Double internalResistanceMilliohm, Double maxContinuousA,
                              Double maxSurgeA, Double surgeSeconds, Double maxChargeA, Integer maxParallel,
                              Integer maxSeries, Double price) {
    }

    /**
     * A PV module as its datasheet gives it, at standard test conditions (1000 W/m², cells at 25 °C).
     * Temperature coefficients are in % of the STC value per °C, as datasheets print them.
     *
     * @param id          identifier, unique in the catalog
     * @param description plain description
     * @param powerW      maximum power P_mp, W
     * @param vmpV        voltage at maximum power, V
     * @param impA        current at maximum power, A
     * @param vocV        open-circuit voltage, V
     * @param iscA        short-circuit current, A
     * @param pmaxPctPerC temperature coefficient of P_mp, %/°C (negative)
     * @param vocPctPerC  temperature coefficient of V_oc, %/°C (negative); without it the cold-voltage check uses
     *                    NEC Table 690.7(A)
     * @param iscPctPerC  temperature coefficient of I_sc, %/°C (positive, optional)
     * @param vmpPctPerC  temperature coefficient of V_mp, %/°C (negative, optional)
     * @param noctC       nominal operating cell temperature, °C
     * @param areaM2      module area, m²
     * @param price       demo price
     */
    public record PvModuleEntry(String id, String description, Double powerW, Double vmpV, Double impA, Double vocV,
                                Double iscA, Double pmaxPctPerC, Double vocPctPerC, Double iscPctPerC, Double vmpPctPerC,
                                Double noctC, Double areaM2, Double price) {
    }

    /**
     * A solar charge controller.
     *
     * @param id                  identifier, unique in the catalog
     * @param description         plain description
     * @param type                mppt or pwm
     * @param batteryV            nominal battery (bus) voltage classes it charges, V, e.g. [12, 24, 48]
     * @param maxPvInputV         highest PV open-circuit voltage the input withstands, V
     * @param maxInputCurrentA    highest PV input current allowed (compared with 1.25 × I_sc), A
     * @param ratedOutputCurrentA rated battery-side current, A
     * @param efficiencyPct       conversion efficiency, %
     * @param minHeadroomV        how far the array's maximum-power voltage must stay above the battery voltage, V
     *                            (default 0 for PWM, 5 for MPPT)
     * @param price               demo price
     */
    public record ControllerEntry(String id, String description, String type, List<Double> batteryV,
                                  Double maxPvInputV, Double maxInputCurrentA, Double ratedOutputCurrentA,
                                  Double efficiencyPct, Double minHeadroomV, Double price) {
    }
}
