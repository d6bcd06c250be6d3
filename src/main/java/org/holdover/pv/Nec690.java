package org.holdover.pv;

import java.util.List;
import java.util.Optional;

/**
 * The PV voltage and current rules of NFPA 70 (National Electrical Code) Article 690 that the
 * string checks use. Table values: NEC Table 690.7(A) (same factors in the 2017, 2020 and 2023
 * editions; confirmed in two public transcriptions, see REFERENCES.md §5a); multipliers: 690.8(A)(1)
 * and 690.8(B) (REFERENCES.md §5b).
 */
public final class Nec690 {

    /** 690.8(A)(1): maximum PV source-circuit current = 125 % of the summed short-circuit currents. */
    public static final double MAX_CIRCUIT_CURRENT_FACTOR = 1.25;
    /** 690.8(B): conductors and overcurrent devices sized at 125 % of the maximum circuit current. */
    public static final double CONDUCTOR_OCPD_FACTOR = 1.25;
    /** 690.7: maximum PV system voltage for one- and two-family dwellings, V. */
    public static final double DWELLING_LIMIT_V = 600.0;
    /** 690.7: maximum PV system voltage for other buildings, V. */
    public static final double OTHER_BUILDING_LIMIT_V = 1000.0;

    /** One row of Table 690.7(A): lowest expected ambient from {@code warmestC} down to {@code coldestC}. */
    public record VocTableRow(int warmestC, int coldestC, double factor) {
        public String label() {
            return warmestC + " to " + coldestC + " °C";
        }
    }

    /** Table 690.7(A), crystalline and multicrystalline silicon, warmest row first. */
    public static final List<VocTableRow> TABLE_690_7_A = List.of(
            new VocTableRow(24, 20, 1.02),
            new VocTableRow(19, 15, 1.04),
            new VocTableRow(14, 10, 1.06),
            new VocTableRow(9, 5, 1.08),
            new VocTableRow(4, 0, 1.10),
            new VocTableRow(-1, -5, 1.12),
            new VocTableRow(-6, -10, 1.14),
            new VocTableRow(-11, -15, 1.16),
            new VocTableRow(-16, -20, 1.18),
            new VocTableRow(-21, -25, 1.20),
            new VocTableRow(-26, -30, 1.21),
            new VocTableRow(-31, -35, 1.23),
            new VocTableRow(-36, -40, 1.25));

    private Nec690() {
    }

    /**
     * The Table 690.7(A) row for a lowest expected ambient temperature. The table's rows are whole
     * degrees; a temperature between two rows takes the colder row (the floor), the safe side. At
     * 25 °C and above no correction applies (empty with {@link #vocCorrectionFactor} = 1).
     *
     * @param lowestAmbientC lowest expected ambient temperature, °C
     * @return the row; empty when the temperature is 25 °C or warmer, or colder than −40 °C (use
     *         {@link #isBelowTable} to tell them apart)
     */
    public static Optional<VocTableRow> vocTableRow(double lowestAmbientC) {
        long t = (long) Math.floor(lowestAmbientC);
        for (VocTableRow r : TABLE_690_7_A) {
            if (t <= r.warmestC() && t >= r.coldestC()) {
                return Optional.of(r);
            }
        }
        return Optional.empty();
    }

    /** True when the temperature is colder than the table's last row (−40 °C). */
    public static boolean isBelowTable(double lowestAmbientC) {
        return Math.floor(lowestAmbientC) < -40;
    }

    /**
     * The Table 690.7(A) factor: 1.00 at 25 °C and above; the coldest factor, 1.25, below −40 °C, where
     * the table no longer applies (callers must flag that, see {@link #isBelowTable}).
     */
    public static double vocCorrectionFactor(double lowestAmbientC) {
        if (Math.floor(lowestAmbientC) >= 25) {
            return 1.0;
        }
        return vocTableRow(lowestAmbientC).map(VocTableRow::factor)
                .orElse(TABLE_690_7_A.get(TABLE_690_7_A.size() - 1).factor());
    }

    /**
     * The coefficient method of 690.7(A)(1): V_oc,max = V_oc · (1 + β_voc (T_min − 25 °C)), with β_voc
     * the module's Voc coefficient as a fraction per °C (negative).
     */
    public static double vocAtLowestTempV(double vocStcV, double vocPerC, double lowestAmbientC) {
        return vocStcV * (1 + vocPerC * (lowestAmbientC - 25.0));
    }

    /** 690.8(A)(1): maximum circuit current = 1.25 × summed I_sc, A. */
    public static double maxCircuitCurrentA(double iscA) {
        return MAX_CIRCUIT_CURRENT_FACTOR * iscA;
    }

    /** 690.8(B): current for sizing conductors and overcurrent devices = 1.25 × 1.25 × I_sc = 1.5625 × I_sc, A. */
    public static double conductorSizingCurrentA(double iscA) {
        return CONDUCTOR_OCPD_FACTOR * maxCircuitCurrentA(iscA);
    }
}
