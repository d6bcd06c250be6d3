package org.holdover.pv;

import java.util.Objects;

/**
 * A charge controller's hour-by-hour operation over a year. All powers in W (hourly means, so
 * also Wh per hour); totals in Wh. Immutable; arrays are copied out.
 *
 * <p>Per hour: availableDcW ≥ drawnDcW ≥ outputW ≥ 0, and
 * availableDcW = drawnDcW + pwmGivenUpW + clippedDcW.
 */
public final class ControllerSeries {

    private final ChargeController controller;
    private final double batteryV;
    private final double[] availableDcW;
    private final double[] pwmGivenUpW;
    private final double[] clippedDcW;
    private final double[] drawnDcW;
    private final double[] outputW;

    ControllerSeries(ChargeController controller, double batteryV, double[] availableDcW, double[] pwmGivenUpW,
            double[] clippedDcW, double[] drawnDcW, double[] outputW) {
        this.controller = Objects.requireNonNull(controller);
        this.batteryV = batteryV;
        this.availableDcW = availableDcW;
        this.pwmGivenUpW = pwmGivenUpW;
        this.clippedDcW = clippedDcW;
        this.drawnDcW = drawnDcW;
        this.outputW = outputW;
    }

    public ChargeController controller() {
        return controller;
    }

    /** Highest output, W: rated output current × battery voltage (above it the controller clips). */
    public double maxOutputW() {
        return maxOutputW(controller, batteryV);
    }

    static double maxOutputW(ChargeController controller, double batteryV) {
        return controller.ratedOutputCurrentA() * batteryV;
    }

    /** The battery voltage the hourly limits and currents use, V. */
    public double batteryV() {
        return batteryV;
    }

    public int hours() {
        return outputW.length;
    }

    /** Array DC power at its maximum power point (after DC losses), W. */
    public double availableDcW(int h) {
        return availableDcW[h];
    }

    /** PWM: maximum power minus the power at battery voltage, W; 0 for MPPT. */
    public double pwmGivenUpW(int h) {
        return pwmGivenUpW[h];
    }

    /** DC power left unused because the output would exceed the rated current, W. */
    public double clippedDcW(int h) {
        return clippedDcW[h];
    }

    /** DC power the controller actually draws, W. */
    public double drawnDcW(int h) {
        return drawnDcW[h];
    }

    /** Power delivered to the battery bus, W. */
    public double outputW(int h) {
        return outputW[h];
    }

    /** Battery-side current, A: output ÷ battery voltage. */
    public double outputCurrentA(int h) {
        return outputW[h] / batteryV;
    }

    public double[] availableDcW() {
        return availableDcW.clone();
    }

    public double[] pwmGivenUpW() {
        return pwmGivenUpW.clone();
    }

    public double[] clippedDcW() {
        return clippedDcW.clone();
    }

    public double[] drawnDcW() {
        return drawnDcW.clone();
    }

    public double[] outputW() {
        return outputW.clone();
    }

    public double annualAvailableDcWh() {
        return sum(availableDcW);
    }

    public double annualPwmGivenUpWh() {
        return sum(pwmGivenUpW);
    }

    public double annualClippedDcWh() {
        return sum(clippedDcW);
    }

    public double annualDrawnDcWh() {
        return sum(drawnDcW);
    }

    public double annualOutputWh() {
        return sum(outputW);
    }

    /** Monthly mean daily output, Wh/day, January first. */
    public double[] monthlyMeanDailyOutputWh() {
        return org.holdover.solar.HourCalendar.ofHours(hours()).monthlyMeanDailySum(outputW);
    }

    private static double sum(double[] a) {
        double s = 0;
        for (double v : a) {
            s += v;
        }
        return s;
    }
}
