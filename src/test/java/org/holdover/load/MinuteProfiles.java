package org.holdover.load;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;

/**
 * A year of 1-minute power readings (demo data, invented) stamped in a zone's clock time, with hourly
 * means known in closed form: the reading at minute m of standard-time hour h is
 * {@code base(h) + (m - 29.5) / 2} W, and the minute terms of an hour sum to zero. Every value is a
 * multiple of 0.25 W, so the file's decimals and the reader's sums are exact.
 */
final class MinuteProfiles {

    /** Readings in a common year: 365 × 24 × 60. */
    static final int MINUTES_2025 = 525_600;
    static final int YEAR = 2025;
    static final ZoneId ZONE = ZoneId.of("America/New_York");
    /** The zone's standard offset (Eastern Standard Time). */
    static final ZoneOffset STANDARD = ZoneOffset.ofHours(-5);

    private MinuteProfiles() {
    }

    /** Mean power of standard-time hour {@code h} of the year, W. */
    static double base(int h) {
        return 200 + 37 * (h % 101) + 3 * ((h / 24) % 7);
    }

    /** The reading at minute {@code m} (0–59) of hour {@code h}, W. */
    static double reading(int h, int m) {
        return base(h) + (m - 29.5) / 2;
    }

    /**
     * Writes the year as {@code timestamp,W}, stamps in {@link #ZONE}'s clock time (so the hour clocks skip
     * in March is absent and the hour they repeat in November appears twice, in order).
     *
     * @return the number of data rows
     */
    static int write(Path file) throws IOException {
        long start = LocalDateTime.of(YEAR, 1, 1, 0, 0).toEpochSecond(STANDARD);
        char[] line = "yyyy-MM-ddTHH:mm,".toCharArray();
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("# demo data: a year of 1-minute readings, clock time of America/New_York\n");
            w.write("timestamp,W\n");
            for (int i = 0; i < MINUTES_2025; i++) {
                LocalDateTime t = LocalDateTime.ofInstant(Instant.ofEpochSecond(start + 60L * i), ZONE);
                put(line, 0, t.getYear(), 4);
                put(line, 5, t.getMonthValue(), 2);
                put(line, 8, t.getDayOfMonth(), 2);
                put(line, 11, t.getHour(), 2);
                put(line, 14, t.getMinute(), 2);
                w.write(line);
                w.write(quarters(reading(i / 60, i % 60)));
                w.write('\n');
            }
        }
        return MINUTES_2025;
    }

    private static void put(char[] into, int at, int value, int digits) {
        for (int k = digits - 1; k >= 0; k--) {
            into[at + k] = (char) ('0' + value % 10);
            value /= 10;
        }
    }

    /** A multiple of 0.25 written exactly, e.g. 213.75. */
    private static String quarters(double v) {
        long q = Math.round(v * 4);
        long whole = Math.floorDiv(q, 4);
        int frac = (int) Math.floorMod(q, 4);
        return whole + (frac == 0 ? "" : frac == 1 ? ".25" : frac == 2 ? ".5" : ".75");
    }
}
