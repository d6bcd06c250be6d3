package org.holdover.dc;

/**
 * The ampacity check of one candidate, every quantity shown.
 *
 * <p>NEC: the uncorrected ampacity at the lower of the insulation and terminal columns must reach the design
 * current (110.14(C), 210.19(A)(1)(a), 690.8(B)(1)); the insulation-column ampacity after ambient correction
 * and adjustment must reach the conditions-of-use current (210.19(A)(1)(b), 690.8(B)(2)). The allowable
 * ampacity the overcurrent device protects is the smaller of the two limits.
 *
 * <p>IEC: Iz = table capacity × ambient factor × grouping factor × sets must reach the design current Ib.
 *
 * @param designCurrentA         continuous current × design factor, A
 * @param conditionsOfUseCurrentA current the corrected ampacity must carry, A (IEC: equals the design current)
 * @param insulationColumnC      the column corrected and adjusted, °C (NEC 60/75/90; IEC 70/90)
 * @param tableAmpacityA         one conductor, insulation column, A
 * @param terminalColumnC        NEC terminal column, °C (IEC: same as the insulation column)
 * @param terminalAmpacityA      one conductor, terminal column, A (IEC: same as {@code tableAmpacityA})
 * @param ambientFactor          ambient correction factor (NEC 310.15(B)(1)(1); IEC B.52.14); 0 when the
 *                               insulation is not permitted at that ambient
 * @param adjustmentFactor       NEC 310.15(C)(1) adjustment, or IEC B.52.17 grouping factor; 0 when outside
 *                               the table
 * @param parallelSets           conductors per pole, ≥ 1
 * @param correctedAmpacityA     sets × table × ambient × adjustment, A
 * @param uncorrectedLimitA      NEC: sets × the lower of the insulation and terminal table ampacities, A. IEC has
 *                               no separate uncorrected limit: equal to {@code correctedAmpacityA}.
 * @param allowableAmpacityA     the ampacity to protect: NEC min(corrected, uncorrected limit); IEC corrected, A
 * @param requiredTableAmpacityA per conductor, the insulation-column table value that would just carry the
 *                               conditions-of-use current: current ÷ (ambient × adjustment × sets), A (infinite
 *                               when a factor is 0)
 * @param ok                     true when both NEC conditions (IEC: the one condition) hold
 */
public record AmpacityStep(double designCurrentA, double conditionsOfUseCurrentA, int insulationColumnC,
                           double tableAmpacityA, int terminalColumnC, double terminalAmpacityA,
                           double ambientFactor, double adjustmentFactor, int parallelSets,
                           double correctedAmpacityA, double uncorrectedLimitA, double allowableAmpacityA,
                           double requiredTableAmpacityA, boolean ok) {

    public AmpacityStep {
        if (parallelSets < 1) {
            throw new IllegalArgumentException("parallelSets must be >= 1, got " + parallelSets);
        }
        if (!(designCurrentA > 0) || conditionsOfUseCurrentA > designCurrentA + 1e-9) {
            throw new IllegalArgumentException("currents out of order: design " + designCurrentA
                    + " A, conditions of use " + conditionsOfUseCurrentA + " A");
        }
        if (ambientFactor < 0 || adjustmentFactor < 0 || adjustmentFactor > 1) {
            throw new IllegalArgumentException("factors out of range: ambient " + ambientFactor
                    + ", adjustment " + adjustmentFactor);
        }
        if (allowableAmpacityA > correctedAmpacityA + 1e-9 || allowableAmpacityA > uncorrectedLimitA + 1e-9) {
            throw new IllegalArgumentException("allowable ampacity exceeds a limit");
        }
    }
}
