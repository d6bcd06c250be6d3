package org.holdover.sizing;

import java.util.Objects;
import org.holdover.pv.ControllerType;
import org.holdover.pv.DcLosses;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.Site;
import org.holdover.solar.SunPath;
import org.holdover.solar.WeatherYear;

/**
 * The solar resource and array settings of a project, defaults applied: the input of {@link PvSizing}.
 *
 * @param site                 where the array stands (standard-time offset from the project's time zone)
 * @param year                 the calendar year of the hourly series (the project's)
 * @param weather              the hourly weather year (read from a file, or built from monthly means)
 * @param sunPath              the sun's position at the midpoint of every hour of that year (NREL SPA)
 * @param resource             where the weather came from, in plain words
 * @param monthlyGhiKwhM2Day   the project's monthly mean GHI, kWh/m²/day, January first (null with a weather file)
 * @param monthlyAirTempC      the project's monthly mean air temperature, °C (null with a weather file)
 * @param fixedTiltDeg         the project's tilt, ° from horizontal, or null to search {@code tiltsDeg}
 * @param tiltsDeg             tilts to try when the tilt is not given, ° (the given tilt alone otherwise)
 * @param settings             sky model, albedo, incidence-angle modifier and array azimuth (its tilt is replaced)
 * @param losses               DC losses of the array
 * @param controllerType       the controller type the project asks for, or null for either
 * @param refillDays           backup: days to put back what the hardest outage drew while carrying the loads
 * @param recordLowC           the site's record low air temperature, °C (NEC 690.7 cold open-circuit voltage)
 * @param designHighC          the site's design high air temperature, °C (hot maximum-power voltage)
 * @param designIrradianceWm2  plane-of-array irradiance at which the hot cell temperature is taken, W/m²
 * @param systemVoltageLimitV  the code's maximum PV system voltage applied, V (NEC 690.7)
 * @param maxControllers       most identical charge controllers in parallel, in [1, 20]
 */
public record SolarSetup(Site site, int year, WeatherYear weather, SunPath sunPath, String resource,
                         double[] monthlyGhiKwhM2Day, double[] monthlyAirTempC, Double fixedTiltDeg, double[] tiltsDeg,
                         PoaSettings settings, DcLosses losses, ControllerType controllerType, double refillDays,
                         double recordLowC, double designHighC, double designIrradianceWm2, double systemVoltageLimitV,
                         int maxControllers) {

    public SolarSetup {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(weather, "weather");
        Objects.requireNonNull(sunPath, "sunPath");
        Objects.requireNonNull(resource, "resource");
        Objects.requireNonNull(settings, "settings");
        Objects.requireNonNull(losses, "losses");
        if (weather.hours() != sunPath.hours()) {
            throw new IllegalArgumentException("weather has " + weather.hours() + " hours, the sun path " + sunPath.hours());
        }
        if (tiltsDeg == null || tiltsDeg.length == 0) {
            throw new IllegalArgumentException("need at least one tilt");
        }
        tiltsDeg = tiltsDeg.clone();
        monthlyGhiKwhM2Day = monthlyGhiKwhM2Day == null ? null : monthlyGhiKwhM2Day.clone();
        monthlyAirTempC = monthlyAirTempC == null ? null : monthlyAirTempC.clone();
        if (!(refillDays > 0)) {
            throw new IllegalArgumentException("refillDays must be > 0, got " + refillDays);
        }
        if (!(designHighC > recordLowC)) {
            throw new IllegalArgumentException("designHighC must be above recordLowC");
        }
        if (maxControllers < 1 || maxControllers > 20) {
            throw new IllegalArgumentException("maxControllers must be in [1, 20], got " + maxControllers);
        }
    }

    /** Whether the hourly year was built from monthly means (a synthetic year). */
    public boolean synthetic() {
        return monthlyGhiKwhM2Day != null;
    }

    @Override
    public double[] tiltsDeg() {
        return tiltsDeg.clone();
    }

    @Override
    public double[] monthlyGhiKwhM2Day() {
        return monthlyGhiKwhM2Day == null ? null : monthlyGhiKwhM2Day.clone();
    }

    @Override
    public double[] monthlyAirTempC() {
        return monthlyAirTempC == null ? null : monthlyAirTempC.clone();
    }
}
