package org.holdover.pv;

import java.util.Objects;
import org.holdover.solar.HourCalendar;
import org.holdover.solar.PoaSeries;

/**
 * The array's DC output at its maximum power point for every hour of a year, with the intermediate
 * quantities. Immutable; arrays are copied out.
 */
public final class ArrayDcSeries {

    private final PvArray array;
    private final DcLosses losses;
    private final double[] poaTotalWm2;
    private final double[] poaEffectiveWm2;
    private final double[] cellTempC;
    private final double[] dcBeforeLossesW;
    private final double[] dcW;

    private ArrayDcSeries(PvArray array, DcLosses losses, double[] poaTotalWm2, double[] poaEffectiveWm2,
            double[] cellTempC, double[] dcBeforeLossesW, double[] dcW) {
        this.array = array;
        this.losses = losses;
        this.poaTotalWm2 = poaTotalWm2;
        this.poaEffectiveWm2 = poaEffectiveWm2;
        this.cellTempC = cellTempC;
        this.dcBeforeLossesW = dcBeforeLossesW;
        this.dcW = dcW;
    }

    /**
     * Hourly DC power: cell temperature by NOCT from the plane-of-array total, power from the effective
     * irradiance (after reflection loss) with the P_max temperature coefficient, then the DC losses.
     *
     * @param array    the array
     * @param poa      plane-of-array irradiance per hour
     * @param airTempC air temperature per hour, °C (same length)
     * @param losses   DC losses
     */
    public static ArrayDcSeries compute(PvArray array, PoaSeries poa, double[] airTempC, DcLosses losses) {
        Objects.requireNonNull(array, "array");
        Objects.requireNonNull(poa, "poa");
        Objects.requireNonNull(airTempC, "airTempC");
        Objects.requireNonNull(losses, "losses");
        int n = poa.hours();
        if (airTempC.length != n) {
            throw new IllegalArgumentException("airTempC has " + airTempC.length + " values, POA " + n);
        }
        PvModule m = array.module();
        int count = array.moduleCount();
        double lossFactor = losses.factor();
        double[] total = poa.totalWm2();
        double[] eff = poa.effectiveWm2();
        double[] tc = new double[n];
        double[] before = new double[n];
        double[] dc = new double[n];
        for (int h = 0; h < n; h++) {
            tc[h] = CellTemperature.noct(airTempC[h], total[h], m.noctC());
            before[h] = m.powerW(eff[h], tc[h]) * count;
            dc[h] = before[h] * lossFactor;
        }
        return new ArrayDcSeries(array, losses, total, eff, tc, before, dc);
    }

    public PvArray array() {
        return array;
    }

    public DcLosses losses() {
        return losses;
    }

    public int hours() {
        return dcW.length;
    }

    public HourCalendar calendar() {
        return HourCalendar.ofHours(hours());
    }

    public double cellTempC(int h) {
        return cellTempC[h];
    }

    /** DC power after temperature, before the other losses, W. */
    public double dcBeforeLossesW(int h) {
        return dcBeforeLossesW[h];
    }

    /** DC power at the maximum power point after all losses, W. */
    public double dcW(int h) {
        return dcW[h];
    }

    public double poaTotalWm2(int h) {
        return poaTotalWm2[h];
    }

    public double poaEffectiveWm2(int h) {
        return poaEffectiveWm2[h];
    }

    public double[] cellTempC() {
        return cellTempC.clone();
    }

    public double[] dcBeforeLossesW() {
        return dcBeforeLossesW.clone();
    }

    public double[] dcW() {
        return dcW.clone();
    }

    /** Solar energy reaching the array's module area over the year (plane-of-array total × area), Wh. */
    public double annualPoaOnArrayWh() {
        double s = 0;
        for (double v : poaTotalWm2) {
            s += v;
        }
        return s * array.areaM2();
    }

    /** Annual DC energy after all losses, Wh. */
    public double annualDcWh() {
        double s = 0;
        for (double v : dcW) {
            s += v;
        }
        return s;
    }

    /** Monthly mean daily DC energy after all losses, Wh/day, January first. */
    public double[] monthlyMeanDailyDcWh() {
        return calendar().monthlyMeanDailySum(dcW);
    }

    /**
     * Monthly DC performance ratio: DC energy ÷ (STC power × plane-of-array total irradiation / 1 kW/m²).
     * It gathers reflection, temperature and the DC losses into one derate per month; NaN in a month
     * with no irradiation.
     */
    public double[] monthlyDcPerformanceRatio() {
        double[] dc = monthlyMeanDailyDcWh();
        double[] poa = calendar().monthlyMeanDailySum(poaTotalWm2);
        double[] pr = new double[12];
        for (int m = 0; m < 12; m++) {
            pr[m] = poa[m] > 0 ? dc[m] / (array.stcPowerW() * poa[m] / 1000.0) : Double.NaN;
        }
        return pr;
    }
}
