package org.holdover.solar;

import java.util.Objects;

/**
 * One year of hourly weather in local standard time: the irradiance components and the air
 * temperature. Each value is the mean over its hour (so W/m² over one hour is also Wh/m²). Hour h
 * covers [h, h + 1) hours after 1 January 00:00.
 *
 * <p>Immutable: arrays are copied in and out; use the indexed accessors in loops.
 */
public final class WeatherYear {

    /** Largest irradiance accepted, W/m² (a plausibility bound: the extraterrestrial normal value is
     * about 1,410 W/m² at most, and cloud enhancement can briefly exceed it). */
    public static final double MAX_IRRADIANCE_W_M2 = 2000.0;

    private final String source;
    private final double[] ghiWm2;
    private final double[] dniWm2;
    private final double[] dhiWm2;
    private final double[] airTempC;

    /**
     * @param source   where the data came from (a file name, or a description of a synthetic year)
     * @param ghiWm2   global horizontal irradiance, W/m², ≥ 0
     * @param dniWm2   direct normal irradiance, W/m², ≥ 0
     * @param dhiWm2   diffuse horizontal irradiance, W/m², ≥ 0
     * @param airTempC dry-bulb air temperature, °C, in [-90, 70]
     */
    public WeatherYear(String source, double[] ghiWm2, double[] dniWm2, double[] dhiWm2, double[] airTempC) {
        this.source = Objects.requireNonNull(source, "source");
        int n = ghiWm2.length;
        HourCalendar.ofHours(n);
        if (dniWm2.length != n || dhiWm2.length != n || airTempC.length != n) {
            throw new IllegalArgumentException("all series must have " + n + " values");
        }
        this.ghiWm2 = ghiWm2.clone();
        this.dniWm2 = dniWm2.clone();
        this.dhiWm2 = dhiWm2.clone();
        this.airTempC = airTempC.clone();
        for (int h = 0; h < n; h++) {
            checkIrradiance("ghiWm2", h, this.ghiWm2[h]);
            checkIrradiance("dniWm2", h, this.dniWm2[h]);
            checkIrradiance("dhiWm2", h, this.dhiWm2[h]);
            if (!(this.airTempC[h] >= -90 && this.airTempC[h] <= 70)) {
                throw new IllegalArgumentException("airTempC[" + h + "] must be in [-90, 70], got " + this.airTempC[h]);
            }
        }
    }

    private static void checkIrradiance(String name, int h, double v) {
        if (!(v >= 0 && v <= MAX_IRRADIANCE_W_M2)) {
            throw new IllegalArgumentException(name + "[" + h + "] must be in [0, 2000] W/m², got " + v);
        }
    }

    public String source() {
        return source;
    }

    /** 8760 or 8784. */
    public int hours() {
        return ghiWm2.length;
    }

    public HourCalendar calendar() {
        return HourCalendar.ofHours(hours());
    }

    public double ghiWm2(int h) {
        return ghiWm2[h];
    }

    public double dniWm2(int h) {
        return dniWm2[h];
    }

    public double dhiWm2(int h) {
        return dhiWm2[h];
    }

    public double airTempC(int h) {
        return airTempC[h];
    }

    public double[] ghiWm2() {
        return ghiWm2.clone();
    }

    public double[] dniWm2() {
        return dniWm2.clone();
    }

    public double[] dhiWm2() {
        return dhiWm2.clone();
    }

    public double[] airTempC() {
        return airTempC.clone();
    }

    /** Monthly mean daily global horizontal irradiation, kWh/m²/day, January first. */
    public double[] monthlyMeanDailyGhiKwhM2() {
        double[] wh = calendar().monthlyMeanDailySum(ghiWm2);
        for (int m = 0; m < 12; m++) {
            wh[m] /= 1000.0;
        }
        return wh;
    }

    /** Monthly mean air temperature, °C, January first. */
    public double[] monthlyMeanAirTempC() {
        return calendar().monthlyMean(airTempC);
    }

    /** Lowest hourly air temperature of the year, °C. */
    public double minAirTempC() {
        double min = Double.POSITIVE_INFINITY;
        for (double t : airTempC) {
            min = Math.min(min, t);
        }
        return min;
    }

    /** Highest hourly air temperature of the year, °C. */
    public double maxAirTempC() {
        double max = Double.NEGATIVE_INFINITY;
        for (double t : airTempC) {
            max = Math.max(max, t);
        }
        return max;
    }
}
