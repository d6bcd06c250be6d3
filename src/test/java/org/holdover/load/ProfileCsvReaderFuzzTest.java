package org.holdover.load;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import org.holdover.testing.Fuzz;
import org.holdover.testing.Mutator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fuzzing the load-profile reader ({@link ProfileCsvReader}) with mutations of the demo profiles and of
 * small interval files (1, 5 and 30 minutes, clock time across a daylight-saving change, UTC offsets,
 * energy units), read with a random project year, time zone and gap limit. Property of {@link Fuzz}.
 */
class ProfileCsvReaderFuzzTest {

    private static final int CI_TRIES = 900;
    private static final String DISPLAY = "load-profiles/fuzzed.csv";
    private static final List<ZoneId> ZONES = List.of(ZoneId.of("America/New_York"), ZoneId.of("Europe/Zurich"),
            ZoneOffset.UTC, ZoneOffset.ofHoursMinutes(5, 45), ZoneId.of("Australia/Lord_Howe"), ZoneId.of("Pacific/Apia"));
    private static final Integer[] YEARS = {null, 2024, 2025, 2025};
    private static final int[] GAPS = {0, 0, 1, 2, 24};

    static List<byte[]> seeds() throws IOException {
        return List.of(
                Files.readAllBytes(Path.of("load-profiles/ridge-cabin-base.csv")),
                Files.readAllBytes(Path.of("load-profiles/farm-shop-critical-2025.csv")),
                interval("timestamp,W", LocalDateTime.of(2025, 3, 8, 0, 0), 1, 2 * 1440, "", "America/New_York"),
                interval("timestamp,kW", LocalDateTime.of(2025, 10, 31, 0, 0), 5, 4 * 288, "", "America/New_York"),
                interval("timestamp,Wh", LocalDateTime.of(2025, 1, 1, 0, 0), 30, 48 * 14, "Z", null),
                interval("timestamp,kWh", LocalDateTime.of(2024, 12, 31, 0, 0), 60, 24 * 3, "+05:45", null),
                "# demo data\n\"hour\",\"kW\"\n0,\"0.5\"\n1,0.6\n2,0.7\n".getBytes(StandardCharsets.UTF_8));
    }

    /**
     * An interval file (demo data): {@code count} readings {@code minutes} apart from {@code start}; with a
     * zone the stamps are that zone's clock time (daylight saving applied), else {@code start} plus the
     * suffix as written.
     */
    static byte[] interval(String header, LocalDateTime start, int minutes, int count, String suffix, String zone) {
        StringBuilder b = new StringBuilder("# demo data: fuzz seed\n").append(header).append('\n');
        DateTimeFormatter f = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm", Locale.ROOT);
        for (int i = 0; i < count; i++) {
            LocalDateTime t = start.plusMinutes((long) i * minutes);
            String stamp = zone == null ? t.format(f) + suffix
                    : t.atOffset(ZoneOffset.ofHours(-5)).atZoneSameInstant(ZoneId.of(zone)).toLocalDateTime().format(f);
            b.append(stamp).append(',').append(String.format(Locale.ROOT, "%.3f", 100 + (i % 37) * 2.5)).append('\n');
        }
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void mutatedProfilesGiveOnlyOneLineInputProblems(@TempDir Path dir) throws IOException {
        List<byte[]> seeds = seeds();
        Path file = dir.resolve("fuzzed.csv");
        Fuzz.of("profile-csv", 11, CI_TRIES).run(DISPLAY,
                r -> Mutator.mutate(seeds.get(r.nextInt(4) == 0 ? r.nextInt(2) : 2 + r.nextInt(seeds.size() - 2)),
                        Mutator.Kind.CSV, r),
                (input, r) -> {
                    Files.write(file, input);
                    ProfileCsvReader.read(file, DISPLAY, YEARS[r.nextInt(YEARS.length)], ZONES.get(r.nextInt(ZONES.size())),
                            GAPS[r.nextInt(GAPS.length)]);
                });
    }
}
