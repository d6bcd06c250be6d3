package org.holdover.pv;

/**
 * A module's open-circuit voltage at the site's record low, by the method the code allows.
 */
public sealed interface ColdVoc {

    /** Module V_oc at the record low, V. */
    double moduleVocV();

    /** The record low used, °C. */
    double recordLowC();

    /** The module's own temperature coefficient (NEC 690.7(A)(1)). */
    record ByCoefficient(double recordLowC, double vocStcV, double vocPerC, double moduleVocV) implements ColdVoc {
    }

    /**
     * NEC Table 690.7(A), used when the datasheet gives no V_oc coefficient.
     *
     * @param belowTable true when the record low is colder than −40 °C, the table's last row; the
     *                   coldest factor is then used, and the check must fail
     */
    record ByNecTable(double recordLowC, double vocStcV, double factor, String row, boolean belowTable,
            double moduleVocV) implements ColdVoc {
    }

    /** The coefficient method when the module has a V_oc coefficient, else the table. */
    static ColdVoc of(PvModule module, double recordLowC) {
        double voc = module.stc().vocV();
        if (module.coefficients().vocPerC().isPresent()) {
            double b = module.coefficients().vocPerC().getAsDouble();
            return new ByCoefficient(recordLowC, voc, b, Nec690.vocAtLowestTempV(voc, b, recordLowC));
        }
        double f = Nec690.vocCorrectionFactor(recordLowC);
        String row = Nec690.vocTableRow(recordLowC).map(Nec690.VocTableRow::label)
                .orElse(Nec690.isBelowTable(recordLowC) ? "below -40 °C: outside the table" : "25 °C or warmer: no correction");
        return new ByNecTable(recordLowC, voc, f, row, Nec690.isBelowTable(recordLowC), voc * f);
    }
}
