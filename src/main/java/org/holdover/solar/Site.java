package org.holdover.solar;

/**
 * Where the array stands and which clock its hourly series use.
 *
 * <p>Hourly series in this package are in local standard time: a fixed offset from UTC all year,
 * never shifted for daylight saving.
 *
 * @param latitudeDeg     geographic latitude in degrees, north positive, in [-90, 90]
 * @param longitudeDeg    geographic longitude in degrees, east positive (west negative), in [-180, 180]
 * @param elevationM      height above mean sea level in metres (may be negative, not below -500)
 * @param utcOffsetHours  the site's standard-time offset from UTC in hours, east positive
 *                        (e.g. -7 for mountain standard time); a whole number of minutes in [-12, 14]
 */
public record Site(double latitudeDeg, double longitudeDeg, double elevationM, double utcOffsetHours) {

    public Site {
        if (!(latitudeDeg >= -90 && latitudeDeg <= 90)) {
            throw new IllegalArgumentException("latitudeDeg must be in [-90, 90], got " + latitudeDeg);
        }
        if (!(longitudeDeg >= -180 && longitudeDeg <= 180)) {
            throw new IllegalArgumentException("longitudeDeg must be in [-180, 180], got " + longitudeDeg);
        }
        if (!(elevationM >= -500 && elevationM <= 9000)) {
            throw new IllegalArgumentException("elevationM must be in [-500, 9000], got " + elevationM);
        }
        if (!(utcOffsetHours >= -12 && utcOffsetHours <= 14)) {
            throw new IllegalArgumentException("utcOffsetHours must be in [-12, 14], got " + utcOffsetHours);
        }
        double minutes = utcOffsetHours * 60;
        if (Math.abs(minutes - Math.rint(minutes)) > 1e-9) {
            throw new IllegalArgumentException("utcOffsetHours must be a whole number of minutes, got " + utcOffsetHours);
        }
    }

    /**
     * A site whose offset is the standard (non-daylight-saving) offset of a time zone in the given
     * year, read from the zone's rules at 1 January 00:00 UTC.
     *
     * @param zone a region-based zone such as {@code America/New_York}
     * @param year the year whose rules apply
     */
    public static Site inZone(double latitudeDeg, double longitudeDeg, double elevationM, java.time.ZoneId zone, int year) {
        java.time.Instant jan1 = java.time.LocalDate.of(year, 1, 1).atStartOfDay(java.time.ZoneOffset.UTC).toInstant();
        int seconds = zone.getRules().getStandardOffset(jan1).getTotalSeconds();
        return new Site(latitudeDeg, longitudeDeg, elevationM, seconds / 3600.0);
    }

    /** The standard meridian of the site's time zone in degrees, east positive: 15 × offset. */
    public double standardMeridianDeg() {
        return 15.0 * utcOffsetHours;
    }

    /** The fixed standard-time offset as a {@link java.time.ZoneOffset}. */
    public java.time.ZoneOffset zoneOffset() {
        return java.time.ZoneOffset.ofTotalSeconds((int) Math.rint(utcOffsetHours * 3600));
    }
}
