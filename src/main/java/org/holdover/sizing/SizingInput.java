package org.holdover.sizing;

import java.util.List;
import java.util.Objects;
import org.holdover.battery.Chemistry;
import org.holdover.catalog.Catalog;
import org.holdover.load.LoadAnalysis;
import org.holdover.project.Problem;
import org.holdover.project.ProjectInput;

/**
 * Everything the sizing needs, defaults applied.
 *
 * @param name              project name
 * @param mode              backup or off-grid
 * @param acVoltsRms        service voltage (line to line), V
 * @param frequencyHz       service frequency, Hz
 * @param splitPhase        120/240 V split-phase service
 * @param inverterAmbientC  design ambient around the inverter, °C
 * @param batteryColdestC   coldest battery temperature, °C
 * @param inverterMargin    continuous rating ≥ this × running demand
 * @param maxBatteryCurrentA largest continuous battery current for the bus choice, A
 * @param maxParallelRule   project cap on parallel strings (0: none)
 * @param chemistry         chemistry to use, or null for any
 * @param depthOfDischarge  override of the chemistry default, or null
 * @param endOfLife         override of the chemistry default, or null
 * @param location          battery location (fire-code limits), or null when not given
 * @param outageHours       backup: outage to bridge, h
 * @param autonomyDays      off-grid: days of autonomy
 * @param loads             the load analysis
 * @param catalog           component catalog
 * @param assumptions       values used and their sources
 * @param warnings          input warnings to show
 * @param notes             user notes (text)
 * @param measuredW         the measured profile as read, W per hour, or null
 * @param profileScale      scale applied to it
 * @param profileServed     whether the profile's loads are served (backup: critical)
 * @param wiring            cable runs and conductor rules
 * @param maxUnmetFraction  unmet energy the simulated year may leave, fraction of the served energy
 * @param batteryDesignC    typical battery temperature, °C (charging limits in the simulated year)
 * @param solar             the solar resource and array settings, or null when the project has no solar section
 * @param generator         the generator rules ({@link GeneratorRules#NONE} without a generator)
 * @param maxInvertersInParallel project cap on identical inverters in parallel (each unit's catalog limit applies too)
 */
public record SizingInput(String name, ProjectInput.Mode mode, double acVoltsRms, double frequencyHz, boolean splitPhase,
                          double inverterAmbientC, double batteryColdestC, double inverterMargin,
                          double maxBatteryCurrentA, int maxParallelRule, Chemistry chemistry, Double depthOfDischarge,
                          Double endOfLife, ProjectInput.BatteryLocation location, double outageHours,
                          double autonomyDays, LoadAnalysis loads, Catalog catalog, List<Assumption> assumptions,
                          List<Problem> warnings, List<String> notes, double[] measuredW,
                          double profileScale, boolean profileServed, WiringRules wiring,
                          double maxUnmetFraction, double batteryDesignC, SolarSetup solar, GeneratorRules generator,
                          int maxInvertersInParallel) {

    /** Inverters in parallel when the project does not say: a bound on the search, not a rule of the trade. */
    public static final int DEFAULT_MAX_INVERTERS_IN_PARALLEL = 4;

    public SizingInput {
        if (maxInvertersInParallel < 1) {
            throw new IllegalArgumentException("maxInvertersInParallel must be >= 1");
        }
        generator = generator == null ? GeneratorRules.NONE : generator;
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(loads, "loads");
        Objects.requireNonNull(catalog, "catalog");
        Objects.requireNonNull(wiring, "wiring");
        assumptions = List.copyOf(assumptions);
        warnings = List.copyOf(warnings);
        notes = List.copyOf(notes);
        if (mode == ProjectInput.Mode.BACKUP && !(outageHours > 0)) {
            throw new IllegalArgumentException("backup mode needs outage hours > 0");
        }
        if (mode == ProjectInput.Mode.OFF_GRID && !(autonomyDays > 0)) {
            throw new IllegalArgumentException("off-grid mode needs autonomy days > 0");
        }
    }

    /** With the default cap on inverters in parallel. */
    public SizingInput(String name, ProjectInput.Mode mode, double acVoltsRms, double frequencyHz, boolean splitPhase,
                       double inverterAmbientC, double batteryColdestC, double inverterMargin,
                       double maxBatteryCurrentA, int maxParallelRule, Chemistry chemistry, Double depthOfDischarge,
                       Double endOfLife, ProjectInput.BatteryLocation location, double outageHours,
                       double autonomyDays, LoadAnalysis loads, Catalog catalog, List<Assumption> assumptions,
                       List<Problem> warnings, List<String> notes, double[] measuredW,
                       double profileScale, boolean profileServed, WiringRules wiring,
                       double maxUnmetFraction, double batteryDesignC, SolarSetup solar, GeneratorRules generator) {
        this(name, mode, acVoltsRms, frequencyHz, splitPhase, inverterAmbientC, batteryColdestC, inverterMargin, maxBatteryCurrentA,
                maxParallelRule, chemistry, depthOfDischarge, endOfLife, location, outageHours, autonomyDays, loads, catalog,
                assumptions, warnings, notes, measuredW, profileScale, profileServed, wiring, maxUnmetFraction, batteryDesignC, solar,
                generator, DEFAULT_MAX_INVERTERS_IN_PARALLEL);
    }

    /** Without generator rules (no generator). */
    public SizingInput(String name, ProjectInput.Mode mode, double acVoltsRms, double frequencyHz, boolean splitPhase,
                       double inverterAmbientC, double batteryColdestC, double inverterMargin,
                       double maxBatteryCurrentA, int maxParallelRule, Chemistry chemistry, Double depthOfDischarge,
                       Double endOfLife, ProjectInput.BatteryLocation location, double outageHours,
                       double autonomyDays, LoadAnalysis loads, Catalog catalog, List<Assumption> assumptions,
                       List<Problem> warnings, List<String> notes, double[] measuredW,
                       double profileScale, boolean profileServed, WiringRules wiring,
                       double maxUnmetFraction, double batteryDesignC, SolarSetup solar) {
        this(name, mode, acVoltsRms, frequencyHz, splitPhase, inverterAmbientC, batteryColdestC, inverterMargin, maxBatteryCurrentA,
                maxParallelRule, chemistry, depthOfDischarge, endOfLife, location, outageHours, autonomyDays, loads, catalog,
                assumptions, warnings, notes, measuredW, profileScale, profileServed, wiring, maxUnmetFraction, batteryDesignC, solar,
                GeneratorRules.NONE);
    }

    /** The same input with other generator rules. */
    public SizingInput withGenerator(GeneratorRules g) {
        return copy(catalog, wiring, g, maxInvertersInParallel);
    }

    /** The same input with another catalog. */
    public SizingInput withCatalog(Catalog c) {
        return copy(c, wiring, generator, maxInvertersInParallel);
    }

    /** The same input with other cable runs and conductor rules. */
    public SizingInput withWiring(WiringRules w) {
        return copy(catalog, w, generator, maxInvertersInParallel);
    }

    /** The same input with another cap on inverters in parallel. */
    public SizingInput withMaxInvertersInParallel(int n) {
        return copy(catalog, wiring, generator, n);
    }

    /** The one copy the withers share: everything else as it is. */
    private SizingInput copy(Catalog c, WiringRules w, GeneratorRules g, int inverters) {
        return new SizingInput(name, mode, acVoltsRms, frequencyHz, splitPhase, inverterAmbientC, batteryColdestC, inverterMargin,
                maxBatteryCurrentA, maxParallelRule, chemistry, depthOfDischarge, endOfLife, location, outageHours, autonomyDays,
                loads, c, assumptions, warnings, notes, measuredW, profileScale, profileServed, w, maxUnmetFraction,
                batteryDesignC, solar, g, inverters);
    }

    /** Unit counts to try for a catalog inverter: 1 to the smaller of its own limit and the project's. */
    public int invertersInParallelFor(org.holdover.inverter.InverterSpec unit) {
        return Math.min(unit.maxInParallel(), maxInvertersInParallel);
    }
}
