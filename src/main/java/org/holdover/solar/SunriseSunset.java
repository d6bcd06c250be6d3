package org.holdover.solar;

import java.time.ZonedDateTime;
import java.util.Objects;

/**
 * Sunrise, solar transit and sunset of one day, as the NREL solar position algorithm defines them
 * (the sun's upper limb on the horizon with 0.5667° refraction, i.e. a centre altitude of −0.8333°).
 * Times carry the offset of the day asked for.
 */
public sealed interface SunriseSunset {

    /** Solar transit (local noon). */
    ZonedDateTime transit();

    /** The sun rises and sets. */
    record RegularDay(ZonedDateTime sunrise, ZonedDateTime transit, ZonedDateTime sunset) implements SunriseSunset {
        public RegularDay {
            Objects.requireNonNull(sunrise, "sunrise");
            Objects.requireNonNull(transit, "transit");
            Objects.requireNonNull(sunset, "sunset");
        }
    }

    /** The sun stays above the horizon all day (polar day). */
    record AllDay(ZonedDateTime transit) implements SunriseSunset {
        public AllDay {
            Objects.requireNonNull(transit, "transit");
        }
    }

    /** The sun stays below the horizon all day (polar night). */
    record AllNight(ZonedDateTime transit) implements SunriseSunset {
        public AllNight {
            Objects.requireNonNull(transit, "transit");
        }
    }
}
