package org.holdover.dc;

import java.util.Objects;

/**
 * How and where the conductors run.
 *
 * @param system                    table family (NEC or IEC)
 * @param ambientC                  ambient temperature around the conductors, °C
 * @param currentCarryingConductors current-carrying conductors in one raceway or cable, ≥ 2 for a DC
 *                                  circuit. Parallel sets are assumed to run in separate raceways or cables,
 *                                  each holding this many.
 * @param insulationTempC           insulation temperature rating: NEC 60, 75 or 90 (the Table 310.16 column
 *                                  that is corrected and adjusted); IEC 70 (PVC) or 90 (XLPE/EPR)
 * @param terminalTempC             NEC only: the temperature rating of the terminations (110.14(C)); the
 *                                  uncorrected ampacity is taken from the lower of this and the insulation
 *                                  column. Ignored for IEC (set it equal to the insulation rating).
 * @param conductorTempC            conductor temperature assumed for resistance and voltage drop, °C. The
 *                                  factories set it to the insulation rating: a conductor loaded up to its
 *                                  corrected ampacity reaches that temperature, so the drop is never
 *                                  underestimated; a lightly loaded conductor runs cooler.
 */
public record Installation(TableSystem system, double ambientC, int currentCarryingConductors,
                           int insulationTempC, int terminalTempC, double conductorTempC) {

    public Installation {
        Objects.requireNonNull(system, "system");
        if (!Double.isFinite(ambientC) || ambientC < -60 || ambientC > 100) {
            throw new IllegalArgumentException("ambientC must be in -60 .. 100 °C, got " + ambientC);
        }
        if (currentCarryingConductors < 2) {
            throw new IllegalArgumentException("a DC circuit has at least 2 current-carrying conductors, got "
                    + currentCarryingConductors);
        }
        switch (system) {
            case NEC -> {
                if (!isNecColumn(insulationTempC) || !isNecColumn(terminalTempC)) {
                    throw new IllegalArgumentException("NEC ratings must be 60, 75 or 90 °C, got insulation "
                            + insulationTempC + ", terminals " + terminalTempC);
                }
            }
            case IEC -> {
                if (insulationTempC != 70 && insulationTempC != 90) {
                    throw new IllegalArgumentException("IEC insulation must be 70 (PVC) or 90 (XLPE) °C, got "
                            + insulationTempC);
                }
            }
        }
        if (!Double.isFinite(conductorTempC) || conductorTempC < ambientC - 1e-9 || conductorTempC > 250) {
            throw new IllegalArgumentException("conductorTempC must be between the ambient " + ambientC
                    + " °C and 250 °C, got " + conductorTempC);
        }
    }

    private static boolean isNecColumn(int c) {
        return c == 60 || c == 75 || c == 90;
    }

    /**
     * NEC installation with 75 °C insulation and terminals, two current-carrying conductors, conductor at 75 °C.
     *
     * @param ambientC ambient temperature, °C
     */
    public static Installation nec75(double ambientC) {
        return nec(ambientC, 2, 75, 75);
    }

    /**
     * NEC installation; conductor temperature for the drop = the insulation rating (or the ambient when that is
     * hotter).
     *
     * @param ambientC                  ambient, °C
     * @param currentCarryingConductors per raceway or cable, ≥ 2
     * @param insulationTempC           60, 75 or 90
     * @param terminalTempC             60, 75 or 90
     */
    public static Installation nec(double ambientC, int currentCarryingConductors, int insulationTempC,
                                   int terminalTempC) {
        return new Installation(TableSystem.NEC, ambientC, currentCarryingConductors, insulationTempC,
                terminalTempC, Math.max(insulationTempC, ambientC));
    }

    /**
     * IEC method C installation; conductor temperature for the drop = the insulation rating.
     *
     * @param ambientC                  ambient air, °C
     * @param currentCarryingConductors per group, ≥ 2 (circuits in the group = ceil(count / 2))
     * @param insulationTempC           70 (PVC) or 90 (XLPE/EPR)
     */
    public static Installation iec(double ambientC, int currentCarryingConductors, int insulationTempC) {
        return new Installation(TableSystem.IEC, ambientC, currentCarryingConductors, insulationTempC,
                insulationTempC, Math.max(insulationTempC, ambientC));
    }

    /**
     * @param tempC conductor temperature for resistance, °C, ≥ the ambient
     * @return a copy with that conductor temperature
     */
    public Installation withConductorTempC(double tempC) {
        return new Installation(system, ambientC, currentCarryingConductors, insulationTempC, terminalTempC, tempC);
    }
}
