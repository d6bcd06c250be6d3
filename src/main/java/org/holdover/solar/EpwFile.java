package org.holdover.solar;

import java.util.Objects;

/**
 * What {@link EpwReader} takes from an EPW file.
 *
 * @param location the LOCATION header
 * @param weather  the hourly dry-bulb temperature, GHI, DNI and DHI
 */
public record EpwFile(EpwLocation location, WeatherYear weather) {
    public EpwFile {
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(weather, "weather");
    }
}
