package org.holdover.solar;

/**
 * Closed-form solar geometry from J. A. Duffie, W. A. Beckman, <i>Solar Engineering of Thermal
 * Processes</i> (Wiley; chapter 1 and §1.10, equation numbers as in the 4th edition, 2013, from
 * memory). These are the textbook relations the daily-to-hourly models were fitted with; the precise
 * hourly sun position comes from {@link SunPositions}.
 *
 * <p>Angles in degrees. Day of year n: 1 on 1 January. Hour angle ω: 0 at solar noon, negative in
 * the morning, 15° per hour.
 */
public final class SolarGeometry {

    /** Solar constant G_sc in W/m² as used by Duffie and Beckman (1367 W/m²). */
    public static final double SOLAR_CONSTANT_W_M2 = 1367.0;

    private SolarGeometry() {
    }

    /** Declination δ in degrees, Cooper (1969): δ = 23.45 sin(360 (284 + n) / 365) (D&B Eq. 1.6.1a). */
    public static double declinationDeg(int dayOfYear) {
        return 23.45 * sinDeg(360.0 * (284 + dayOfYear) / 365.0);
    }

    /**
     * Equation of time in minutes, Spencer (1971) as given by D&B Eq. 1.5.3:
     * E = 229.2 (0.000075 + 0.001868 cos B − 0.032077 sin B − 0.014615 cos 2B − 0.04089 sin 2B),
     * B = (n − 1) 360 / 365.
     */
    public static double equationOfTimeMin(int dayOfYear) {
        double b = Math.toRadians((dayOfYear - 1) * 360.0 / 365.0);
        return 229.2 * (0.000075 + 0.001868 * Math.cos(b) - 0.032077 * Math.sin(b)
                - 0.014615 * Math.cos(2 * b) - 0.04089 * Math.sin(2 * b));
    }

    /**
     * Extraterrestrial irradiance on a plane normal to the sun in W/m²,
     * G_on = G_sc (1 + 0.033 cos(360 n / 365)) (D&B Eq. 1.4.1a).
     */
    public static double extraterrestrialNormalWm2(int dayOfYear) {
        return SOLAR_CONSTANT_W_M2 * (1 + 0.033 * cosDeg(360.0 * dayOfYear / 365.0));
    }

    /**
     * Solar time minus local standard time in minutes: 4 (L_loc − L_st) + E, with longitudes east
     * positive (D&B Eq. 1.5.2, which writes it with west-positive longitudes).
     */
    public static double solarMinusStandardMin(Site site, int dayOfYear) {
        return 4.0 * (site.longitudeDeg() - site.standardMeridianDeg()) + equationOfTimeMin(dayOfYear);
    }

    /**
     * Hour angle ω in degrees at a local standard time of day.
     *
     * @param standardHours hours after local standard midnight, e.g. 10.5 for 10:30
     */
    public static double hourAngleDeg(Site site, int dayOfYear, double standardHours) {
        double solarHours = standardHours + solarMinusStandardMin(site, dayOfYear) / 60.0;
        return 15.0 * (solarHours - 12.0);
    }

    /**
     * Sunset hour angle ω_s in degrees, cos ω_s = −tan φ tan δ (D&B Eq. 1.6.10); 0 in polar night,
     * 180 in polar day.
     */
    public static double sunsetHourAngleDeg(double latitudeDeg, double declinationDeg) {
        double c = -Math.tan(Math.toRadians(latitudeDeg)) * Math.tan(Math.toRadians(declinationDeg));
        if (c >= 1) {
            return 0.0;
        }
        if (c <= -1) {
            return 180.0;
        }
        return Math.toDegrees(Math.acos(c));
    }

    /**
     * Daily extraterrestrial irradiation on a horizontal surface in Wh/m² (D&B Eq. 1.10.3 divided by
     * 3600 J/Wh): H_o = (24 G_sc / π)(1 + 0.033 cos(360 n / 365))
     * (cos φ cos δ sin ω_s + (π ω_s / 180) sin φ sin δ).
     */
    public static double dailyExtraterrestrialWhM2(double latitudeDeg, int dayOfYear) {
        double dec = declinationDeg(dayOfYear);
        double ws = sunsetHourAngleDeg(latitudeDeg, dec);
        double phi = Math.toRadians(latitudeDeg);
        double d = Math.toRadians(dec);
        double h = 24.0 * SOLAR_CONSTANT_W_M2 / Math.PI * (1 + 0.033 * cosDeg(360.0 * dayOfYear / 365.0))
                * (Math.cos(phi) * Math.cos(d) * sinDeg(ws) + Math.PI * ws / 180.0 * Math.sin(phi) * Math.sin(d));
        return Math.max(0.0, h);
    }

    /**
     * The sun's position from latitude, declination and hour angle (D&B Eq. 1.6.5 for the zenith and
     * the standard spherical-triangle relation for the azimuth). No refraction.
     */
    public static SunPosition sunFromHourAngle(double latitudeDeg, double declinationDeg, double hourAngleDeg) {
        double phi = Math.toRadians(latitudeDeg);
        double d = Math.toRadians(declinationDeg);
        double w = Math.toRadians(hourAngleDeg);
        double cosZ = Math.cos(phi) * Math.cos(d) * Math.cos(w) + Math.sin(phi) * Math.sin(d);
        double zenith = Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, cosZ))));
        // Unit vector to the sun in (east, north, up).
        double east = -Math.cos(d) * Math.sin(w);
        double north = Math.sin(d) * Math.cos(phi) - Math.cos(d) * Math.sin(phi) * Math.cos(w);
        double az = Math.toDegrees(Math.atan2(east, north));
        if (az < 0) {
            az += 360.0;
        }
        if (az >= 360.0) {
            az = 0.0;
        }
        return new SunPosition(zenith, az);
    }

    /**
     * Cosine of the angle of incidence of the beam on a surface:
     * cos θ = cos θ_z cos β + sin θ_z sin β cos(γ_s − γ), azimuths clockwise from north. Negative when
     * the sun is behind the surface.
     */
    public static double cosIncidence(SunPosition sun, SurfaceOrientation surface) {
        return cosIncidence(sun.zenithDeg(), sun.azimuthDeg(), surface.tiltDeg(), surface.azimuthDeg());
    }

    static double cosIncidence(double zenithDeg, double sunAzimuthDeg, double tiltDeg, double surfaceAzimuthDeg) {
        double z = Math.toRadians(zenithDeg);
        double b = Math.toRadians(tiltDeg);
        return Math.cos(z) * Math.cos(b)
                + Math.sin(z) * Math.sin(b) * Math.cos(Math.toRadians(sunAzimuthDeg - surfaceAzimuthDeg));
    }

    static double sinDeg(double deg) {
        return Math.sin(Math.toRadians(deg));
    }

    static double cosDeg(double deg) {
        return Math.cos(Math.toRadians(deg));
    }
}
