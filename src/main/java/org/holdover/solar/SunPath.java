package org.holdover.solar;

import java.time.LocalDateTime;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.util.Objects;

/**
 * The sun's position at the midpoint of every hour of one year in local standard time (hour h is
 * sampled at h + 0.5 hours after 1 January 00:00, fixed UTC offset, no daylight saving), with the
 * day-level quantities the irradiance models use.
 *
 * <p>Arrays are copied in and out; use the indexed accessors in loops.
 */
public final class SunPath {

    private final Site site;
    private final int year;
    private final double deltaTS;
    private final double[] zenithDeg;
    private final double[] azimuthDeg;
    private final double[] hourAngleDeg;
    private final double[] extraterrestrialNormalWm2;

    private SunPath(Site site, int year, double deltaTS, double[] zenithDeg, double[] azimuthDeg,
            double[] hourAngleDeg, double[] extraterrestrialNormalWm2) {
        this.site = site;
        this.year = year;
        this.deltaTS = deltaTS;
        this.zenithDeg = zenithDeg;
        this.azimuthDeg = azimuthDeg;
        this.hourAngleDeg = hourAngleDeg;
        this.extraterrestrialNormalWm2 = extraterrestrialNormalWm2;
    }

    /**
     * Computes the hourly sun positions of a year by the NREL SPA.
     *
     * @param site       the site; its UTC offset defines local standard time
     * @param year       the calendar year (its leap-ness sets 8760 or 8784 hours)
     * @param deltaTS    ΔT = TT − UT in seconds, used for the whole year
     * @param refraction refraction to apply to the zenith
     */
    public static SunPath compute(Site site, int year, double deltaTS, Refraction refraction) {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(refraction, "refraction");
        if (year < 1900 || year > 2200) {
            throw new IllegalArgumentException("year must be in [1900, 2200], got " + year);
        }
        HourCalendar cal = HourCalendar.ofYear(year);
        int n = cal.hours();
        double[] zen = new double[n];
        double[] az = new double[n];
        double[] ha = new double[n];
        double[] g0n = new double[n];
        ZoneOffset offset = site.zoneOffset();
        LocalDateTime start = LocalDateTime.of(year, 1, 1, 0, 30);
        for (int h = 0; h < n; h++) {
            ZonedDateTime t = ZonedDateTime.of(start.plusHours(h), offset);
            SunPosition p = SunPositions.at(site, t, deltaTS, refraction);
            zen[h] = p.zenithDeg();
            az[h] = p.azimuthDeg();
            int dayOfYear = h / 24 + 1;
            ha[h] = SolarGeometry.hourAngleDeg(site, dayOfYear, (h % 24) + 0.5);
            g0n[h] = SolarGeometry.extraterrestrialNormalWm2(dayOfYear);
        }
        return new SunPath(site, year, deltaTS, zen, az, ha, g0n);
    }

    public Site site() {
        return site;
    }

    public int year() {
        return year;
    }

    /** ΔT used, in seconds. */
    public double deltaTS() {
        return deltaTS;
    }

    /** Number of hours (8760 or 8784). */
    public int hours() {
        return zenithDeg.length;
    }

    public HourCalendar calendar() {
        return HourCalendar.ofHours(hours());
    }

    /** Zenith angle at the midpoint of hour h, degrees. */
    public double zenithDeg(int h) {
        return zenithDeg[h];
    }

    /** Azimuth at the midpoint of hour h, degrees clockwise from north. */
    public double azimuthDeg(int h) {
        return azimuthDeg[h];
    }

    /** Sun position at the midpoint of hour h. */
    public SunPosition position(int h) {
        return new SunPosition(zenithDeg[h], azimuthDeg[h]);
    }

    /**
     * Hour angle at the midpoint of hour h in degrees, from solar time (equation of time by Spencer,
     * {@link SolarGeometry#hourAngleDeg}); negative before solar noon.
     */
    public double hourAngleDeg(int h) {
        return hourAngleDeg[h];
    }

    /** Extraterrestrial normal irradiance on the day of hour h, W/m² ({@link SolarGeometry#extraterrestrialNormalWm2}). */
    public double extraterrestrialNormalWm2(int h) {
        return extraterrestrialNormalWm2[h];
    }

    /**
     * Extraterrestrial irradiance on a horizontal plane at the midpoint of hour h, W/m²:
     * G_on · max(0, cos θ_z).
     */
    public double extraterrestrialHorizontalWm2(int h) {
        return extraterrestrialNormalWm2[h] * Math.max(0.0, Math.cos(Math.toRadians(zenithDeg[h])));
    }

    /** Copy of all zenith angles, degrees. */
    public double[] zenithDeg() {
        return zenithDeg.clone();
    }

    /** Copy of all azimuths, degrees clockwise from north. */
    public double[] azimuthDeg() {
        return azimuthDeg.clone();
    }

    /** Copy of all hour angles, degrees. */
    public double[] hourAngleDeg() {
        return hourAngleDeg.clone();
    }

    /** Copy of the extraterrestrial normal irradiance per hour, W/m². */
    public double[] extraterrestrialNormalWm2() {
        return extraterrestrialNormalWm2.clone();
    }
}
