package org.holdover.solar;

/**
 * Monthly means that describe a site's climate, January first.
 *
 * @param ghiKwhM2PerDay    monthly mean daily global horizontal irradiation, kWh/m²/day, each in [0, 12]
 * @param airTempC          monthly mean air temperature, °C, each in [-70, 50]
 * @param dailyTempRangeC   mean daily air-temperature swing (daily maximum − daily minimum) per month,
 *                          °C, each in [0, 40]; see {@link #withDefaultTempRange}
 */
public record MonthlyClimate(double[] ghiKwhM2PerDay, double[] airTempC, double[] dailyTempRangeC) {

    /**
     * Default daily air-temperature swing, °C, used when the site's is not known: common practice, no
     * source (real swings run from about 5 °C on coasts and in cloudy months to 15–20 °C in dry
     * inland climates).
     */
    public static final double DEFAULT_DAILY_TEMP_RANGE_C = 10.0;

    public MonthlyClimate {
        ghiKwhM2PerDay = checked("ghiKwhM2PerDay", ghiKwhM2PerDay, 0, 12);
        airTempC = checked("airTempC", airTempC, -70, 50);
        dailyTempRangeC = checked("dailyTempRangeC", dailyTempRangeC, 0, 40);
    }

    /** Climate with the {@link #DEFAULT_DAILY_TEMP_RANGE_C default} daily temperature swing every month. */
    public static MonthlyClimate withDefaultTempRange(double[] ghiKwhM2PerDay, double[] airTempC) {
        double[] range = new double[12];
        java.util.Arrays.fill(range, DEFAULT_DAILY_TEMP_RANGE_C);
        return new MonthlyClimate(ghiKwhM2PerDay, airTempC, range);
    }

    private static double[] checked(String name, double[] v, double lo, double hi) {
        if (v == null || v.length != 12) {
            throw new IllegalArgumentException(name + " needs 12 monthly values, got "
                    + (v == null ? "null" : v.length));
        }
        double[] c = v.clone();
        for (int m = 0; m < 12; m++) {
            if (!(c[m] >= lo && c[m] <= hi)) {
                throw new IllegalArgumentException(name + "[" + m + "] must be in [" + lo + ", " + hi + "], got " + c[m]);
            }
        }
        return c;
    }

    @Override
    public double[] ghiKwhM2PerDay() {
        return ghiKwhM2PerDay.clone();
    }

    @Override
    public double[] airTempC() {
        return airTempC.clone();
    }

    @Override
    public double[] dailyTempRangeC() {
        return dailyTempRangeC.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MonthlyClimate c
                && java.util.Arrays.equals(ghiKwhM2PerDay, c.ghiKwhM2PerDay)
                && java.util.Arrays.equals(airTempC, c.airTempC)
                && java.util.Arrays.equals(dailyTempRangeC, c.dailyTempRangeC);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(java.util.Arrays.hashCode(ghiKwhM2PerDay), java.util.Arrays.hashCode(airTempC),
                java.util.Arrays.hashCode(dailyTempRangeC));
    }

    @Override
    public String toString() {
        return "MonthlyClimate[ghiKwhM2PerDay=" + java.util.Arrays.toString(ghiKwhM2PerDay)
                + ", airTempC=" + java.util.Arrays.toString(airTempC)
                + ", dailyTempRangeC=" + java.util.Arrays.toString(dailyTempRangeC) + "]";
    }
}
