package org.holdover.pv;

import java.util.Objects;

/**
 * A charge controller's operation hour by hour.
 *
 * <ul>
 *   <li>MPPT: the controller draws the array's maximum power; output = drawn × efficiency, limited to
 *       rated output current × battery voltage; the excess is clipped (left in the array).</li>
 *   <li>PWM: the array is held at battery voltage, so it gives maximum power × the
 *       {@link PwmOperatingPoint} ratio at the hour's cell temperature; the rest is given up compared
 *       with MPPT. Output = drawn × efficiency, limited to rated current × battery voltage.</li>
 * </ul>
 * The battery voltage is the conditions' {@code batteryOperatingV} (typical while charging).
 */
public final class ControllerSimulation {

    private ControllerSimulation() {
    }

    /**
     * @param controller the controller
     * @param dc         the array's hourly DC output at maximum power (its array is on this controller)
     * @param conditions battery conditions (operating voltage used)
     */
    public static ControllerSeries run(ChargeController controller, ArrayDcSeries dc, StringDesignConditions conditions) {
        Objects.requireNonNull(controller, "controller");
        Objects.requireNonNull(dc, "dc");
        Objects.requireNonNull(conditions, "conditions");
        int n = dc.hours();
        double vb = conditions.batteryOperatingV();
        double eta = controller.efficiency();
        double maxOut = ControllerSeries.maxOutputW(controller, vb);
        PvArray array = dc.array();
        double[] avail = new double[n];
        double[] givenUp = new double[n];
        double[] clipped = new double[n];
        double[] drawn = new double[n];
        double[] out = new double[n];
        for (int h = 0; h < n; h++) {
            double p = dc.dcW(h);
            avail[h] = p;
            double atOperatingPoint = p;
            if (controller.type() == ControllerType.PWM && p > 0) {
                atOperatingPoint = p * PwmOperatingPoint.stringPowerRatio(array.module(), array.modulesPerString(), vb,
                        dc.cellTempC(h));
            }
            givenUp[h] = p - atOperatingPoint;
            double o = atOperatingPoint * eta;
            if (o > maxOut) {
                out[h] = maxOut;
                drawn[h] = maxOut / eta;
                clipped[h] = atOperatingPoint - drawn[h];
            } else {
                out[h] = o;
                drawn[h] = atOperatingPoint;
                clipped[h] = 0.0;
            }
        }
        return new ControllerSeries(controller, vb, avail, givenUp, clipped, drawn, out);
    }
}
