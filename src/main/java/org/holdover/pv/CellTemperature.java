package org.holdover.pv;

/**
 * Cell temperature by the NOCT model: T_c = T_a + (NOCT − 20 °C) · G / 800 W/m², the linear scaling
 * of the NOCT test condition (800 W/m², 20 °C air, 1 m/s wind) with irradiance (common practice; the
 * NOCT conditions are as recalled from the module standards, from memory). It neglects wind and the
 * small cooling from power drawn, and suits open-rack mounting; roof-flush arrays run hotter.
 */
public final class CellTemperature {

    /** Irradiance of the NOCT test, W/m². */
    public static final double NOCT_IRRADIANCE_W_M2 = 800.0;
    /** Air temperature of the NOCT test, °C. */
    public static final double NOCT_AIR_C = 20.0;

    private CellTemperature() {
    }

    /**
     * @param airTempC      air temperature, °C
     * @param irradianceWm2 plane-of-array irradiance, W/m², ≥ 0
     * @param noctC         the module's NOCT, °C
     * @return cell temperature, °C
     */
    public static double noct(double airTempC, double irradianceWm2, double noctC) {
        if (!(irradianceWm2 >= 0)) {
            throw new IllegalArgumentException("irradianceWm2 must be >= 0, got " + irradianceWm2);
        }
        return airTempC + (noctC - NOCT_AIR_C) * irradianceWm2 / NOCT_IRRADIANCE_W_M2;
    }
}
