package org.holdover.load;

import java.util.List;
import org.holdover.project.Problem;

/**
 * An hourly load profile read from a file.
 *
 * @param hourlyW   mean power of each hour of the year, local standard time, W
 * @param year      calendar year of the data
 * @param samples   data rows read
 * @param intervalS the data's interval, s (3600 for hourly data)
 * @param warnings  things the user should know (filled gaps, daylight-saving repeats, wrapped samples)
 */
public record MeasuredProfile(double[] hourlyW, int year, int samples, int intervalS, List<Problem> warnings) {
    public MeasuredProfile {
        warnings = List.copyOf(warnings);
    }
}
