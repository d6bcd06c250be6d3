package org.holdover.battery;

import java.util.Locale;

/**
 * Battery chemistries and their default design parameters. Every default names where it comes from;
 * the project file can override depth of discharge and end of life.
 */
public enum Chemistry {

    /**
     * Vented (flooded) lead-acid. DoD 50 % typical design figure (trade FAQ; re-wrenches list, 2011: never
     * beyond 80 %); Peukert 1.2 (sailnet forum figure for flooded, confirmed; battery-monitor manuals
     * quote 1.25 as typical); round trip 80 % (78–85 % vendor figures for deep-cycle lead-acid);
     * end voltage 1.75 V/cell and absorption 2.40 V/cell, common practice, no source.
     */
    FLOODED("flooded lead-acid", 2.0, 6, 1.75, 2.40, 0.50, 0.80, 1.20, 0.80, 3, true, Double.NEGATIVE_INFINITY),
    /** Absorbed-glass-mat sealed lead-acid. Peukert 1.08 (sailnet forum figure for AGM); otherwise as flooded. */
    AGM("sealed lead-acid (AGM)", 2.0, 6, 1.75, 2.40, 0.50, 0.80, 1.08, 0.85, 3, true, Double.NEGATIVE_INFINITY),
    /** Gel sealed lead-acid. Peukert 1.15 (from memory: 1.1–1.25); absorption 2.35 V/cell, common practice. */
    GEL("sealed lead-acid (gel)", 2.0, 6, 1.75, 2.35, 0.50, 0.80, 1.15, 0.85, 3, true, Double.NEGATIVE_INFINITY),
    /**
     * Lithium iron phosphate. DoD 80 % (80–90 % typical residential figure, vendor FAQ); round trip 95 %
     * (92–98 % vendor range); Peukert 1.05 (from memory: 1.02–1.05); 3.2 V nominal, 2.8 V/cell end and
     * 3.55 V/cell absorption, common practice, no source; no charging below 0 °C (cell makers' common
     * instruction, from memory).
     */
    LIFEPO4("lithium iron phosphate (LiFePO4)", 3.2, 4, 2.80, 3.55, 0.80, 0.80, 1.05, 0.95, 16, false, 0.0);

    private final String label;
    private final double cellNominalV;
    private final int cellsPer12V;
    private final double cellEndV;
    private final double cellAbsorptionV;
    private final double defaultDepthOfDischarge;
    private final double defaultEndOfLife;
    private final double peukertExponent;
    private final double roundTripEfficiency;
    private final int defaultMaxParallel;
    private final boolean leadAcid;
    private final double noChargeBelowC;

    Chemistry(String label, double cellNominalV, int cellsPer12V, double cellEndV, double cellAbsorptionV,
              double defaultDepthOfDischarge, double defaultEndOfLife, double peukertExponent,
              double roundTripEfficiency, int defaultMaxParallel, boolean leadAcid, double noChargeBelowC) {
        this.label = label;
        this.cellNominalV = cellNominalV;
        this.cellsPer12V = cellsPer12V;
        this.cellEndV = cellEndV;
        this.cellAbsorptionV = cellAbsorptionV;
        this.defaultDepthOfDischarge = defaultDepthOfDischarge;
        this.defaultEndOfLife = defaultEndOfLife;
        this.peukertExponent = peukertExponent;
        this.roundTripEfficiency = roundTripEfficiency;
        this.defaultMaxParallel = defaultMaxParallel;
        this.leadAcid = leadAcid;
        this.noChargeBelowC = noChargeBelowC;
    }

    /**
     * Cycles to end of life against depth of discharge, {depth[], cycles[]}. FROM MEMORY: typical shapes of
     * makers' cycle-life curves for each family; unconfirmed, replace with the module maker's curve.
     */
    public double[][] cycleLife() {
        return switch (this) {
            case FLOODED -> new double[][] {{0.2, 0.3, 0.5, 0.8, 1.0}, {3000, 2000, 1200, 600, 400}};
            case AGM -> new double[][] {{0.2, 0.3, 0.5, 0.8, 1.0}, {2500, 1600, 800, 450, 300}};
            case GEL -> new double[][] {{0.2, 0.3, 0.5, 0.8, 1.0}, {3000, 2000, 1000, 550, 400}};
            case LIFEPO4 -> new double[][] {{0.2, 0.5, 0.8, 1.0}, {12000, 6000, 4000, 3000}};
        };
    }

    /** Calendar life at moderate temperature, years (from memory; unconfirmed). */
    public double calendarLifeYears() {
        return switch (this) {
            case FLOODED -> 10;
            case AGM -> 7;
            case GEL -> 10;
            case LIFEPO4 -> 15;
        };
    }

    /** Where each default comes from, for the workbook. */
    public String sources() {
        return switch (this) {
            case FLOODED -> "DoD 50 %: typical lead-acid design figure (trade FAQ; never beyond 80 %, re-wrenches list 2011);"
                    + " Peukert 1.2: figure for flooded batteries (sailnet forum, confirmed); round trip 80 %: vendor range 78-85 %;"
                    + " end 1.75 V/cell, absorption 2.40 V/cell, at most 3 parallel strings: common practice, no source;"
                    + " end of life 80 %: IEEE 485 aging factor 1.25 (from memory)";
            case AGM -> "as flooded; Peukert 1.08: figure for AGM (sailnet forum, confirmed); round trip 85 %: vendor range";
            case GEL -> "as flooded; Peukert 1.15 (from memory: 1.1-1.25); absorption 2.35 V/cell: common practice, no source";
            case LIFEPO4 -> "DoD 80 %: residential figure 80-90 % (vendor FAQ); round trip 95 %: vendor range 92-98 %;"
                    + " Peukert 1.05 (from memory: 1.02-1.05); 3.2 V nominal, end 2.8 V/cell, absorption 3.55 V/cell: common practice,"
                    + " no source; end of life 80 %: common definition (from memory); no charging below 0 °C (from memory)";
        };
    }

    /** The word used in project and catalog files. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Parses a project or catalog word (case and dashes ignored); null when unknown. */
    public static Chemistry fromWord(String word) {
        String w = word.toLowerCase(Locale.ROOT).replace("-", "").replace("_", "");
        for (Chemistry c : values()) {
            if (c.word().equals(w)) {
                return c;
            }
        }
        return null;
    }

    public String label() {
        return label;
    }

    /** Nominal cell voltage, V. */
    public double cellNominalV() {
        return cellNominalV;
    }

    /** Cells in series per 12 V of nominal bus class (6 for lead-acid, 4 for LiFePO4). */
    public int cellsPer12V() {
        return cellsPer12V;
    }

    /** End-of-discharge cell voltage under load, V. */
    public double cellEndV() {
        return cellEndV;
    }

    /** Absorption (highest charging) cell voltage, V. */
    public double cellAbsorptionV() {
        return cellAbsorptionV;
    }

    /** Default deepest design discharge, fraction. */
    public double defaultDepthOfDischarge() {
        return defaultDepthOfDischarge;
    }

    /** Default capacity at end of life, fraction of new. */
    public double defaultEndOfLife() {
        return defaultEndOfLife;
    }

    /** Peukert exponent k (1 = no rate effect). */
    public double peukertExponent() {
        return peukertExponent;
    }

    /** Round-trip efficiency, DC to DC, fraction. */
    public double roundTripEfficiency() {
        return roundTripEfficiency;
    }

    /** Default cap on parallel strings (lead-acid: 3, common practice, no source — strings share current unevenly). */
    public int defaultMaxParallel() {
        return defaultMaxParallel;
    }

    public boolean leadAcid() {
        return leadAcid;
    }

    /** Lowest cell temperature at which it may be charged, °C (−∞ when no limit). */
    public double noChargeBelowC() {
        return noChargeBelowC;
    }
}
