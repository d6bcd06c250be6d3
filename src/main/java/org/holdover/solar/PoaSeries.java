package org.holdover.solar;

import java.util.Objects;

/**
 * Plane-of-array irradiance for every hour of a year (see {@link PoaIrradiance} for the meaning of
 * each series). All W/m², hourly means. Immutable; arrays are copied out.
 */
public final class PoaSeries {

    private final PoaSettings settings;
    private final double[] incidenceDeg;
    private final double[] beamWm2;
    private final double[] iam;
    private final double[] skyDiffuseWm2;
    private final double[] groundWm2;
    private final double[] totalWm2;
    private final double[] effectiveWm2;
    private final double[] cosIncidence;
    private final double[] anisotropyIndex;
    private final double[] beamRatio;

    PoaSeries(PoaSettings settings, double[] incidenceDeg, double[] beamWm2, double[] iam, double[] skyDiffuseWm2,
            double[] groundWm2, double[] totalWm2, double[] effectiveWm2, double[] cosIncidence,
            double[] anisotropyIndex, double[] beamRatio) {
        this.settings = Objects.requireNonNull(settings);
        this.incidenceDeg = incidenceDeg;
        this.beamWm2 = beamWm2;
        this.iam = iam;
        this.skyDiffuseWm2 = skyDiffuseWm2;
        this.groundWm2 = groundWm2;
        this.totalWm2 = totalWm2;
        this.effectiveWm2 = effectiveWm2;
        this.cosIncidence = cosIncidence;
        this.anisotropyIndex = anisotropyIndex;
        this.beamRatio = beamRatio;
    }

    /** cos θ of hour h, held in [−1, 1] (see {@link PoaIrradiance#cosIncidence()}). */
    public double cosIncidence(int h) {
        return cosIncidence[h];
    }

    /** Hay–Davies anisotropy index A of hour h (see {@link PoaIrradiance#anisotropyIndex()}). */
    public double anisotropyIndex(int h) {
        return anisotropyIndex[h];
    }

    /** Hay–Davies beam ratio R_b of hour h (see {@link PoaIrradiance#beamRatio()}). */
    public double beamRatio(int h) {
        return beamRatio[h];
    }

    public PoaSettings settings() {
        return settings;
    }

    public int hours() {
        return totalWm2.length;
    }

    public HourCalendar calendar() {
        return HourCalendar.ofHours(hours());
    }

    public double incidenceDeg(int h) {
        return incidenceDeg[h];
    }

    public double beamWm2(int h) {
        return beamWm2[h];
    }

    public double iam(int h) {
        return iam[h];
    }

    public double skyDiffuseWm2(int h) {
        return skyDiffuseWm2[h];
    }

    public double groundWm2(int h) {
        return groundWm2[h];
    }

    /** Plane-of-array irradiance before reflection loss, W/m². */
    public double totalWm2(int h) {
        return totalWm2[h];
    }

    /** Irradiance reaching the cells (beam after IAM + sky + ground), W/m². */
    public double effectiveWm2(int h) {
        return effectiveWm2[h];
    }

    public double[] incidenceDeg() {
        return incidenceDeg.clone();
    }

    public double[] beamWm2() {
        return beamWm2.clone();
    }

    public double[] iam() {
        return iam.clone();
    }

    public double[] skyDiffuseWm2() {
        return skyDiffuseWm2.clone();
    }

    public double[] groundWm2() {
        return groundWm2.clone();
    }

    public double[] totalWm2() {
        return totalWm2.clone();
    }

    public double[] effectiveWm2() {
        return effectiveWm2.clone();
    }

    /** Annual plane-of-array irradiation before reflection loss, Wh/m². */
    public double annualTotalWhM2() {
        double s = 0;
        for (double v : totalWm2) {
            s += v;
        }
        return s;
    }

    /**
     * Monthly mean daily plane-of-array irradiation in kWh/m²/day, which is numerically the peak sun
     * hours (hours at 1 kW/m²) per day, January first.
     *
     * @param afterIam true for the effective irradiance (after reflection loss), false for the total
     */
    public double[] monthlyPeakSunHours(boolean afterIam) {
        double[] wh = calendar().monthlyMeanDailySum(afterIam ? effectiveWm2 : totalWm2);
        for (int m = 0; m < 12; m++) {
            wh[m] /= 1000.0;
        }
        return wh;
    }
}
