package org.holdover.pv;

import java.util.OptionalDouble;

/**
 * The site and battery conditions the string checks use.
 *
 * @param recordLowC           the site's record low air temperature, °C (the cold-voltage check
 *                             takes the cells at this temperature, as at dawn)
 * @param designHighAirC       the design high air temperature, °C
 * @param designIrradianceWm2  plane-of-array irradiance at which the hot cell temperature is taken,
 *                             W/m², in (0, 1500]; see {@link #DEFAULT_DESIGN_IRRADIANCE_W_M2}
 * @param batteryNominalV      nominal battery voltage, V (12, 24, 48 …); used for the static
 *                             output-current check (the lower voltage gives the higher current)
 * @param batteryOperatingV    typical battery voltage while charging, V, in [nominal, charge]; the
 *                             PWM operating point and the hourly output limit use it
 * @param batteryChargeV       highest charging voltage the controller must reach (absorption or
 *                             equalisation, at the coldest battery temperature if compensated), V
 * @param systemVoltageLimitV  the code's maximum PV system voltage when it applies, V (NEC 690.7:
 *                             600 for one- and two-family dwellings, 1000 for other buildings)
 */
public record StringDesignConditions(double recordLowC, double designHighAirC, double designIrradianceWm2,
        double batteryNominalV, double batteryOperatingV, double batteryChargeV, OptionalDouble systemVoltageLimitV) {

    /**
     * Hot-cell irradiance 1000 W/m², the STC level, a full clear-sky midday on a tilted array
     * (common practice, no source).
     */
    public static final double DEFAULT_DESIGN_IRRADIANCE_W_M2 = 1000.0;

    public StringDesignConditions {
        java.util.Objects.requireNonNull(systemVoltageLimitV, "systemVoltageLimitV");
        if (!(recordLowC >= -70 && recordLowC <= 40)) {
            throw new IllegalArgumentException("recordLowC must be in [-70, 40], got " + recordLowC);
        }
        if (!(designHighAirC > recordLowC && designHighAirC <= 60)) {
            throw new IllegalArgumentException("designHighAirC must be above recordLowC and <= 60, got " + designHighAirC);
        }
        if (!(designIrradianceWm2 > 0 && designIrradianceWm2 <= 1500)) {
            throw new IllegalArgumentException("designIrradianceWm2 must be in (0, 1500], got " + designIrradianceWm2);
        }
        if (!(batteryNominalV > 0 && batteryNominalV <= 1000)) {
            throw new IllegalArgumentException("batteryNominalV must be in (0, 1000], got " + batteryNominalV);
        }
        if (!(batteryChargeV >= batteryNominalV && batteryChargeV <= 1.5 * batteryNominalV)) {
            throw new IllegalArgumentException("batteryChargeV must be in [nominal, 1.5 × nominal], got " + batteryChargeV);
        }
        if (!(batteryOperatingV >= batteryNominalV && batteryOperatingV <= batteryChargeV)) {
            throw new IllegalArgumentException("batteryOperatingV must be in [nominal, charge], got " + batteryOperatingV);
        }
        if (systemVoltageLimitV.isPresent() && !(systemVoltageLimitV.getAsDouble() > 0)) {
            throw new IllegalArgumentException("systemVoltageLimitV must be > 0");
        }
    }
}
