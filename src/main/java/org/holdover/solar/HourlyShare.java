package org.holdover.solar;

/**
 * The share of a day's irradiation that falls in one hour, centred on hour angle ω (the hour's
 * midpoint), as in J. A. Duffie, W. A. Beckman, <i>Solar Engineering of Thermal Processes</i>, §2.13.
 *
 * <ul>
 *   <li>Total (global), M. Collares-Pereira, A. Rabl, "The average distribution of solar radiation —
 *       correlations between diffuse and hemispherical and between daily and hourly insolation
 *       values", Solar Energy 22:155–164 (1979):
 *       r_t = (π/24)(a + b cos ω)(cos ω − cos ω_s) / (sin ω_s − (π ω_s / 180) cos ω_s),
 *       a = 0.409 + 0.5016 sin(ω_s − 60°), b = 0.6609 − 0.4767 sin(ω_s − 60°).</li>
 *   <li>Diffuse, B. Y. H. Liu, R. C. Jordan, Solar Energy 4(3):1–19 (1960):
 *       r_d = (π/24)(cos ω − cos ω_s) / (sin ω_s − (π ω_s / 180) cos ω_s).</li>
 * </ul>
 * Both are 0 when |ω| ≥ ω_s (the hour's midpoint is outside daylight).
 */
public final class HourlyShare {

    private HourlyShare() {
    }

    /** Collares-Pereira and Rabl coefficient a = 0.409 + 0.5016 sin(ω_s − 60°). */
    public static double cprA(double sunsetHourAngleDeg) {
        return 0.409 + 0.5016 * SolarGeometry.sinDeg(sunsetHourAngleDeg - 60.0);
    }

    /** Collares-Pereira and Rabl coefficient b = 0.6609 − 0.4767 sin(ω_s − 60°). */
    public static double cprB(double sunsetHourAngleDeg) {
        return 0.6609 - 0.4767 * SolarGeometry.sinDeg(sunsetHourAngleDeg - 60.0);
    }

    /**
     * Collares-Pereira and Rabl (1979) ratio r_t of hourly to daily global irradiation.
     *
     * @param hourAngleDeg       hour angle at the hour's midpoint, degrees
     * @param sunsetHourAngleDeg sunset hour angle ω_s, degrees in [0, 180]
     */
    public static double collaresPereiraRabl(double hourAngleDeg, double sunsetHourAngleDeg) {
        double rd = liuJordan(hourAngleDeg, sunsetHourAngleDeg);
        if (rd == 0.0) {
            return 0.0;
        }
        return (cprA(sunsetHourAngleDeg) + cprB(sunsetHourAngleDeg) * SolarGeometry.cosDeg(hourAngleDeg)) * rd;
    }

    /**
     * Liu and Jordan (1960) ratio r_d of hourly to daily diffuse irradiation.
     *
     * @param hourAngleDeg       hour angle at the hour's midpoint, degrees
     * @param sunsetHourAngleDeg sunset hour angle ω_s, degrees in [0, 180]
     */
    public static double liuJordan(double hourAngleDeg, double sunsetHourAngleDeg) {
        if (!(sunsetHourAngleDeg >= 0 && sunsetHourAngleDeg <= 180)) {
            throw new IllegalArgumentException("sunsetHourAngleDeg must be in [0, 180], got " + sunsetHourAngleDeg);
        }
        double w = wrap(hourAngleDeg);
        if (Math.abs(w) >= sunsetHourAngleDeg) {
            return 0.0;
        }
        double ws = Math.toRadians(sunsetHourAngleDeg);
        double denom = Math.sin(ws) - ws * Math.cos(ws);
        return Math.PI / 24.0 * (SolarGeometry.cosDeg(w) - Math.cos(ws)) / denom;
    }

    /** Wraps an hour angle into (−180, 180]. */
    private static double wrap(double deg) {
        double w = deg % 360.0;
        if (w > 180) {
            w -= 360;
        } else if (w <= -180) {
            w += 360;
        }
        return w;
    }
}
