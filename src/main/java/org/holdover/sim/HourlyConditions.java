package org.holdover.sim;

import java.util.Arrays;
import java.util.Objects;

/**
 * The hour-by-hour inputs of one simulated period, usually a year of 8,760 (8,784) hours in local standard
 * time. Each value is the average over its hour, so a power in W is also the energy of that hour in Wh.
 * Immutable: arrays are copied in and out.
 */
public final class HourlyConditions {

    final double[] loadW;
    final double[] pvArrayW;
    final boolean[] chargeForbidden;
    final boolean[] gridAvailable;

    private HourlyConditions(double[] loadW, double[] pvArrayW, boolean[] chargeForbidden,
                             boolean[] gridAvailable) {
        this.loadW = loadW;
        this.pvArrayW = pvArrayW;
        this.chargeForbidden = chargeForbidden;
        this.gridAvailable = gridAvailable;
    }

    /**
     * Off-grid conditions: no grid in any hour, charging allowed in every hour.
     *
     * @param loadW    AC load served by the inverter, W per hour (&ge; 0, finite)
     * @param pvArrayW PV array DC output before the charge controller, W per hour (&ge; 0, finite), same length
     * @return the conditions
     */
    public static HourlyConditions offGrid(double[] loadW, double[] pvArrayW) {
        Objects.requireNonNull(loadW, "loadW");
        Objects.requireNonNull(pvArrayW, "pvArrayW");
        if (loadW.length == 0 || loadW.length != pvArrayW.length) {
            throw new IllegalArgumentException("loadW and pvArrayW must have the same, non-zero length, got "
                    + loadW.length + " and " + pvArrayW.length);
        }
        double[] l = loadW.clone();
        double[] p = pvArrayW.clone();
        for (int t = 0; t < l.length; t++) {
            // The name is built only for a value that fails (building it every hour dominated the cost).
            if (!(l[t] >= 0) || Double.isInfinite(l[t])) {
                Checks.nonNegative("loadW[" + t + "]", l[t]);
            }
            if (!(p[t] >= 0) || Double.isInfinite(p[t])) {
                Checks.nonNegative("pvArrayW[" + t + "]", p[t]);
            }
        }
        return new HourlyConditions(l, p, new boolean[l.length], new boolean[l.length]);
    }

    /**
     * Conditions over arrays shared with the caller, not copied: for a search that simulates many systems over the
     * same year, where copying every array for every system would cost more than the simulation. The caller must
     * not change the arrays afterwards. Values are checked as in {@link #offGrid}.
     *
     * @param loadW           AC load, W per hour
     * @param pvArrayW        PV array DC output, W per hour
     * @param gridAvailable   grid available, per hour
     * @param chargeForbidden charging forbidden, per hour
     */
    public static HourlyConditions sharing(double[] loadW, double[] pvArrayW, boolean[] gridAvailable, boolean[] chargeForbidden) {
        int n = loadW.length;
        if (n == 0 || pvArrayW.length != n || gridAvailable.length != n || chargeForbidden.length != n) {
            throw new IllegalArgumentException("every series must have the same, non-zero length");
        }
        for (int t = 0; t < n; t++) {
            if (!(loadW[t] >= 0) || Double.isInfinite(loadW[t])) {
                Checks.nonNegative("loadW[" + t + "]", loadW[t]);
            }
            if (!(pvArrayW[t] >= 0) || Double.isInfinite(pvArrayW[t])) {
                Checks.nonNegative("pvArrayW[" + t + "]", pvArrayW[t]);
            }
        }
        return new HourlyConditions(loadW, pvArrayW, chargeForbidden, gridAvailable);
    }

    /**
     * The same conditions with hours in which the battery must not be charged (for example a LiFePO4 bank
     * below 0 °C; see {@link #chargeForbiddenBelow}).
     *
     * @param forbidden true where charging is forbidden, one per hour
     * @return new conditions
     */
    public HourlyConditions withChargeForbidden(boolean[] forbidden) {
        return new HourlyConditions(loadW, pvArrayW, sameLength("chargeForbidden", forbidden), gridAvailable);
    }

    /**
     * The same conditions in backup mode: in hours where the grid is available it carries the load and may
     * recharge the battery through the charger (see {@link OutageWindows} to build the flags).
     *
     * @param available true where the grid is available, one per hour
     * @return new conditions
     */
    public HourlyConditions withGridAvailable(boolean[] available) {
        return new HourlyConditions(loadW, pvArrayW, chargeForbidden, sameLength("gridAvailable", available));
    }

    /** The same conditions with another PV array series, W per hour (&ge; 0), same length. */
    public HourlyConditions withPvArrayW(double[] pv) {
        HourlyConditions c = offGrid(loadW, pv);
        return new HourlyConditions(c.loadW, c.pvArrayW, chargeForbidden, gridAvailable);
    }

    /**
     * Hours in which charging is forbidden because the battery is colder than a limit.
     *
     * @param batteryTempC battery temperature, °C per hour
     * @param limitC       charging is forbidden strictly below this temperature, °C (0 °C is the usual
     *                     limit for LiFePO4 cells: common practice, no source)
     * @return one flag per hour
     */
    public static boolean[] chargeForbiddenBelow(double[] batteryTempC, double limitC) {
        Checks.finite("limitC", limitC);
        boolean[] f = new boolean[batteryTempC.length];
        for (int t = 0; t < f.length; t++) {
            double v = batteryTempC[t];
            if (!Double.isFinite(v)) {
                Checks.finite("batteryTempC[" + t + "]", v);
            }
            f[t] = v < limitC;
        }
        return f;
    }

    private boolean[] sameLength(String name, boolean[] flags) {
        Objects.requireNonNull(flags, name);
        if (flags.length != loadW.length) {
            throw new IllegalArgumentException(
                    name + " must have " + loadW.length + " hours, got " + flags.length);
        }
        return flags.clone();
    }

    /** Number of hours. */
    public int hours() {
        return loadW.length;
    }

    /** AC load, W per hour (a copy). */
    public double[] loadW() {
        return loadW.clone();
    }

    /** PV array DC output, W per hour (a copy). */
    public double[] pvArrayW() {
        return pvArrayW.clone();
    }

    /** Charging-forbidden flags (a copy). */
    public boolean[] chargeForbidden() {
        return chargeForbidden.clone();
    }

    /** Grid-available flags (a copy); all false off-grid. */
    public boolean[] gridAvailable() {
        return gridAvailable.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof HourlyConditions h && Arrays.equals(loadW, h.loadW)
                && Arrays.equals(pvArrayW, h.pvArrayW) && Arrays.equals(chargeForbidden, h.chargeForbidden)
                && Arrays.equals(gridAvailable, h.gridAvailable);
    }

    @Override
    public int hashCode() {
        return Objects.hash(Arrays.hashCode(loadW), Arrays.hashCode(pvArrayW));
    }

    @Override
    public String toString() {
        return "HourlyConditions[" + loadW.length + " hours]";
    }
}
