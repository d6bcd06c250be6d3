package org.holdover.load;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.List;
import org.holdover.project.InputException;
import org.holdover.project.InputFiles;
import org.holdover.project.Problem;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * A year of 1-minute interval data (525,600 rows, {@code timestamp,W}, clock time with daylight saving)
 * imports to the right hourly means. The expected means are the closed form of {@link MinuteProfiles}
 * (demo data), independent of the reader. Functional only: the import time is measured by
 * {@code ProfileImportBenchmark} (src/bench/java), not here.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class MinuteYearImportTest {

    /**
     * Every reading is a multiple of 0.25 W below 2^20, so each hour's sum of 60 readings is exact in
     * binary floating point and the mean differs from the closed form only by the one division: well
     * within 1e-12 relative.
     */
    private static final double RELATIVE = 1e-12;

    @TempDir
    static Path dir;
    private Path file;
    private MeasuredProfile profile;

    @BeforeAll
    void importTheYear() throws IOException, InputException {
        file = dir.resolve("minute-year.csv");
        MinuteProfiles.write(file);
        profile = ProfileCsvReader.read(file, "minute-year.csv", MinuteProfiles.YEAR, MinuteProfiles.ZONE, 0);
    }

    @Test
    void theFileIsAYearOfMinutesWithinTheDataLimit() throws IOException {
        assertThat(Files.size(file)).isBetween(10_000_000L, InputFiles.MAX_DATA_BYTES);
        try (var lines = Files.lines(file)) {
            assertThat(lines.filter(l -> !l.startsWith("#")).count()).isEqualTo(MinuteProfiles.MINUTES_2025 + 1L);
        }
    }

    @Test
    void everyHourlyMeanIsTheClosedForm() {
        assertThat(profile.samples()).isEqualTo(MinuteProfiles.MINUTES_2025);
        assertThat(profile.intervalS()).isEqualTo(60);
        assertThat(profile.year()).isEqualTo(2025);
        double[] w = profile.hourlyW();
        assertThat(w).hasSize(8760);
        for (int h = 0; h < 8760; h++) {
            double expected = MinuteProfiles.base(h);
            assertThat(w[h]).as("hour %d", h).isCloseTo(expected, within(expected * RELATIVE));
        }
    }

    @Test
    void theDaylightSavingChangesAreHandled() throws IOException {
        // 9 March 2025: clocks go from 02:00 to 03:00, so no row is stamped 02:xx; the standard-time hour
        // 02:00–03:00 is read from the rows stamped 03:00–03:59 (EDT) and still has its own mean.
        try (var lines = Files.lines(file)) {
            assertThat(lines.filter(l -> l.startsWith("2025-03-09T02:")).count()).isZero();
        }
        int springHour = hourOfYear(LocalDateTime.of(2025, 3, 9, 2, 0));
        assertThat(profile.hourlyW()[springHour]).isEqualTo(MinuteProfiles.base(springHour));
        // 2 November 2025: clocks go from 02:00 back to 01:00, so the 60 rows 01:00–01:59 appear twice; the
        // first time is daylight time (standard 00:00–01:00), the second standard time (01:00–02:00).
        try (var lines = Files.lines(file)) {
            assertThat(lines.filter(l -> l.startsWith("2025-11-02T01:")).count()).isEqualTo(120);
        }
        int fallHour = hourOfYear(LocalDateTime.of(2025, 11, 2, 1, 0));
        assertThat(profile.hourlyW()[fallHour - 1]).isEqualTo(MinuteProfiles.base(fallHour - 1));
        assertThat(profile.hourlyW()[fallHour]).isEqualTo(MinuteProfiles.base(fallHour));
        List<String> warnings = profile.warnings().stream().map(Problem::oneLine).toList();
        assertThat(warnings).containsExactly("minute-year.csv:" + firstRepeatLine() + ": timestamp: 60 row(s) repeat clock"
                + " times when daylight saving time ends; read in order as the second (standard-time) hour");
    }

    /** Hour of the year (from 0) of a standard-time date and hour. */
    private static int hourOfYear(LocalDateTime standard) {
        return (standard.getDayOfYear() - 1) * 24 + standard.getHour();
    }

    /** The file line of the first repeated clock time: 2 header lines, then one line per minute. */
    private static int firstRepeatLine() {
        // The repeat starts at standard-time 2025-11-02 01:00, i.e. minute index hourOfYear * 60.
        return 2 + hourOfYear(LocalDateTime.of(2025, 11, 2, 1, 0)) * 60 + 1;
    }
}
