package org.holdover.solar;

import java.util.Objects;

/**
 * The LOCATION header line of an EPW weather file.
 *
 * @param city           city name as written in the file
 * @param region         state, province or region
 * @param country        country code or name
 * @param latitudeDeg    latitude, degrees north positive
 * @param longitudeDeg   longitude, degrees east positive
 * @param utcOffsetHours time zone of the data, hours from UTC (standard time)
 * @param elevationM     elevation, metres above sea level
 */
public record EpwLocation(String city, String region, String country, double latitudeDeg, double longitudeDeg,
        double utcOffsetHours, double elevationM) {

    public EpwLocation {
        Objects.requireNonNull(city, "city");
        Objects.requireNonNull(region, "region");
        Objects.requireNonNull(country, "country");
    }

    /** The location as a {@link Site}. */
    public Site toSite() {
        return new Site(latitudeDeg, longitudeDeg, elevationM, utcOffsetHours);
    }
}
