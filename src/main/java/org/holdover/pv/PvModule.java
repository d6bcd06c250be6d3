package org.holdover.pv;

import java.util.Objects;

/**
 * A PV module as its datasheet describes it.
 *
 * @param name         a label (catalog entries are demo data unless the user supplies real ones)
 * @param stc          ratings at standard test conditions
 * @param coefficients temperature coefficients
 * @param noctC        nominal operating cell temperature, °C, in [30, 70] (cell temperature at
 *                     800 W/m², 20 °C air, 1 m/s wind, open rack)
 * @param areaM2       module area, m², &gt; 0
 */
public record PvModule(String name, StcRatings stc, TemperatureCoefficients coefficients, double noctC, double areaM2) {

    public PvModule {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(stc, "stc");
        Objects.requireNonNull(coefficients, "coefficients");
        if (!(noctC >= 30 && noctC <= 70)) {
            throw new IllegalArgumentException("noctC must be in [30, 70], got " + noctC);
        }
        if (!(areaM2 > 0 && areaM2 < 10)) {
            throw new IllegalArgumentException("areaM2 must be in (0, 10), got " + areaM2);
        }
        if (stc.powerW() / areaM2 > 400) {
            throw new IllegalArgumentException("efficiency above 40 % (" + stc.powerW() + " W on " + areaM2 + " m²)");
        }
    }

    /** Module efficiency at STC: P_mp / (1000 W/m² · area). */
    public double efficiencyStc() {
        return stc.powerW() / (1000.0 * areaM2);
    }

    /** V_mp at a cell temperature, V: V_mp (1 + β_vmp (T_c − 25)). */
    public double vmpAtCellV(double cellTempC) {
        return stc.vmpV() * (1 + coefficients.vmpPerCForModelling() * (cellTempC - 25.0));
    }

    /** V_oc at a cell temperature for hourly modelling, V (irradiance dependence neglected). */
    public double vocAtCellV(double cellTempC) {
        return stc.vocV() * (1 + coefficients.vocPerCForModelling() * (cellTempC - 25.0));
    }

    /** I_sc at a cell temperature and irradiance, A: I_sc (G / 1000)(1 + α (T_c − 25)). */
    public double iscAtA(double irradianceWm2, double cellTempC) {
        return stc.iscA() * irradianceWm2 / 1000.0 * (1 + coefficients.iscPerCForModelling() * (cellTempC - 25.0));
    }

    /** I_mp at a cell temperature and irradiance, A, taken to scale as I_sc does. */
    public double impAtA(double irradianceWm2, double cellTempC) {
        return stc.impA() * irradianceWm2 / 1000.0 * (1 + coefficients.iscPerCForModelling() * (cellTempC - 25.0));
    }

    /**
     * Maximum power before other losses, W: P_mp (G / 1000)(1 + γ (T_c − 25)), floored at 0. Linear in
     * irradiance: the efficiency drop at low light is not modelled.
     */
    public double powerW(double irradianceWm2, double cellTempC) {
        return Math.max(0.0, stc.powerW() * irradianceWm2 / 1000.0 * (1 + coefficients.pmaxPerC() * (cellTempC - 25.0)));
    }
}
