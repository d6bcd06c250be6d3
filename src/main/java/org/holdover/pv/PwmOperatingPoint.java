package org.holdover.pv;

/**
 * The power a string gives when a PWM controller holds it at battery voltage, relative to its
 * maximum power.
 *
 * <p>Our own simplification, no source: the module's I–V curve is taken as two straight lines,
 * (0, I_sc) to (V_mp, I_mp) to (V_oc, 0), with I_sc, I_mp, V_mp and V_oc at the cell temperature
 * (irradiance cancels in the ratio: both currents scale with it; the voltage's small dependence on
 * irradiance is neglected). Its maximum power is at V_mp, so the ratio lies in [0, 1]. On the first
 * line it underestimates the current slightly (the real curve bulges above the chord), so the PWM loss
 * errs high by a few per cent at most.
 */
public final class PwmOperatingPoint {

    private PwmOperatingPoint() {
    }

    /**
     * P(V_b) / P_mp for one module held at {@code moduleVoltageV}.
     *
     * @param module         the module
     * @param moduleVoltageV voltage across one module, V (battery voltage ÷ modules per string)
     * @param cellTempC      cell temperature, °C
     * @return ratio in [0, 1]
     */
    public static double powerRatio(PvModule module, double moduleVoltageV, double cellTempC) {
        double vmp = module.vmpAtCellV(cellTempC);
        double voc = module.vocAtCellV(cellTempC);
        double isc = module.iscAtA(1000.0, cellTempC);
        double imp = module.impAtA(1000.0, cellTempC);
        double v = moduleVoltageV;
        if (v <= 0 || vmp <= 0 || voc <= vmp) {
            return v <= 0 ? 0.0 : (v >= voc ? 0.0 : 1.0);
        }
        double i = currentA(module, v, cellTempC);
        double r = v * i / (vmp * imp);
        return Math.max(0.0, Math.min(1.0, r));
    }

    /**
     * The module's current at 1000 W/m² on the two-line I–V curve: I_sc − (I_sc − I_mp) V / V_mp up to V_mp, then
     * I_mp (V_oc − V) / (V_oc − V_mp) up to V_oc, then 0; all at the cell temperature.
     *
     * @param module         the module
     * @param moduleVoltageV voltage across the module, V, &gt; 0
     * @param cellTempC      cell temperature, °C
     * @return current, A, ≥ 0
     */
    public static double currentA(PvModule module, double moduleVoltageV, double cellTempC) {
        double vmp = module.vmpAtCellV(cellTempC);
        double voc = module.vocAtCellV(cellTempC);
        double isc = module.iscAtA(1000.0, cellTempC);
        double imp = module.impAtA(1000.0, cellTempC);
        double v = moduleVoltageV;
        if (v <= vmp) {
            return isc - (isc - imp) * v / vmp;
        } else if (v < voc) {
            return imp * (voc - v) / (voc - vmp);
        }
        return 0.0;
    }

    /** The ratio for a string of {@code modulesPerString} held at battery voltage {@code batteryV}. */
    public static double stringPowerRatio(PvModule module, int modulesPerString, double batteryV, double cellTempC) {
        return powerRatio(module, moduleVoltageV(batteryV, modulesPerString), cellTempC);
    }

    /** Voltage across one module when a string of {@code modulesPerString} is held at {@code batteryV}, V. */
    public static double moduleVoltageV(double batteryV, int modulesPerString) {
        return batteryV / modulesPerString;
    }
}
