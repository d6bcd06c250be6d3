package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;
import java.util.stream.Stream;
import org.holdover.project.InputException;
import org.holdover.project.InputFiles;
import org.holdover.testing.Fuzz;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad weather files, read from disk: the reader's first problem is one line, {@code file:line[:column]:
 * ...}, naming the line (and column) of the mistake. The sizing reads weather files only once the solar
 * work lands, so these cases stop at the reader; the command-line corpus is {@code BadInputTest} and
 * {@code BadInputCorpusTest}.
 */
class WeatherBadInputTest {

    /** Line of hour {@code h} (from 0) in {@link WeatherFixtures#epwLines}: 8 header lines first. */
    private static int epwLine(int h) {
        return 8 + h + 1;
    }

    /** Line of hour {@code h} in {@link WeatherFixtures#csvLines}: 2 comments and the header first. */
    private static int csvLine(int h) {
        return 3 + h + 1;
    }

    private static byte[] utf8(List<String> lines) {
        return WeatherFixtures.text(lines).getBytes(StandardCharsets.UTF_8);
    }

    private static List<String> epw() {
        return WeatherFixtures.epwLines(false);
    }

    private static List<String> csv() {
        return WeatherFixtures.csvLines(8760);
    }

    private static List<String> set(List<String> lines, int lineNo, String text) {
        lines.set(lineNo - 1, text);
        return lines;
    }

    /** 1-based column where field {@code field0} (0-based) of a line starts. */
    private static int columnOf(String line, int field0) {
        int at = 0;
        for (int i = 0; i < field0; i++) {
            at = line.indexOf(',', at) + 1;
        }
        return at + 1;
    }

    private static List<String> field(List<String> lines, int lineNo, int field0, String value) {
        String[] f = lines.get(lineNo - 1).split(",", -1);
        f[field0] = value;
        return set(lines, lineNo, String.join(",", f));
    }

    static Stream<Arguments> cases() {
        byte[] epwBytes = utf8(epw());
        byte[] csvBytes = utf8(csv());
        int ghiColumn = columnOf(epw().get(epwLine(1000) - 1), EpwReader.FIELD_GHI);
        return Stream.of(
                c("epw", "cut short after 5,000 hours", () -> utf8(epw().subList(0, epwLine(4999))),
                        ":5008: the file is cut short: 5000 hourly rows; 8760 hourly rows (8784 with 29 February)"),
                c("epw", "cut in the middle of a row", () -> Arrays.copyOf(epwBytes, epwBytes.length / 2),
                        ":4393: the file is cut short: 4385 hourly rows; 8760 hourly rows (8784 with 29 February)"),
                c("epw", "cut inside the header", () -> utf8(epw().subList(0, 5)),
                        ":5: the file is cut short: 5 lines, not even the 8 header lines; 8 header lines, then 8760 or 8784"
                                + " hourly rows"),
                c("epw", "empty", () -> new byte[0],
                        ":1: the file is cut short: 0 lines, not even the 8 header lines; 8 header lines, then 8760 or 8784"
                                + " hourly rows"),
                c("epw", "a row with ten fields", () -> utf8(set(epw(), 20, String.join(",",
                                Arrays.asList(epw().get(19).split(",")).subList(0, 10)))),
                        ":20: the row has 10 comma-separated fields; 35 fields per hourly row (at least the first 16)"),
                c("epw", "missing-value code for global horizontal", () -> utf8(field(epw(), epwLine(1000), 13, "9999")),
                        ":1009:" + ghiColumn + ": global horizontal radiation (Wh/m2): missing-value code 9999; a measured"
                                + " value (this reader does not fill gaps; fill them before use)"),
                c("epw", "two hours swapped", () -> {
                    List<String> l = epw();
                    String t = l.get(epwLine(30) - 1);
                    l.set(epwLine(30) - 1, l.get(epwLine(31) - 1));
                    l.set(epwLine(31) - 1, t);
                    return utf8(l);
                }, ":39:10: hour: got \"8\"; 7 (rows must run hour by hour from 1 January, hour 1 to 24)"),
                c("epw", "15-minute records", () -> utf8(set(epw(), 8, "DATA PERIODS,1,4,Data,Sunday, 1/ 1,12/31")),
                        ":8:16: DATA PERIODS records per hour: records per hour is \"4\"; 1 (hourly data)"),
                c("epw", "not UTF-8 (Latin-1 city name)", () -> {
                    byte[] b = epwBytes.clone();
                    b[13] = (byte) 0xE9;
                    return b;
                }, ":1: the file is not valid UTF-8: byte 0xE9 at byte offset 13; save the file as UTF-8 text"),
                c("epw", "latitude out of range", () -> utf8(set(epw(), 1,
                                "LOCATION,Demo Town,XX,Demoland,demo data,000000,94.50,-72.60,-5.0,300.0")),
                        ":1:49: LOCATION latitude: out of range: 94.50; a value from -90 to 90"),
                c("csv", "cut short after 8,000 hours", () -> utf8(csv().subList(0, csvLine(7999))),
                        ":8003: the file is cut short: 8000 hourly rows; 8760 hourly rows (8784 in a leap year)"),
                c("csv", "cut in the middle of the last row", () -> Arrays.copyOf(csvBytes, csvBytes.length - 10),
                        ":8763: the row has 3 fields; 5 fields, as in the header"),
                c("csv", "a word for a number", () -> utf8(set(csv(), csvLine(12), "12,high,300,80,4.0")),
                        ":16:4: ghi_w_m2: not a number: \"high\"; a decimal number such as 412.5"),
                c("csv", "a column missing", () -> utf8(set(csv(), 3, "hour,ghi_w_m2,dni_w_m2,air_c")),
                        ":3: dhi_w_m2: column dhi_w_m2 is missing from the header; the columns"
                                + " hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c"),
                c("csv", "no header and no data", () -> "# only a comment\n".getBytes(StandardCharsets.UTF_8),
                        ":1: the file has no header and no data; a header line hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c and"
                                + " 8760 or 8784 hourly rows"),
                c("csv", "a NUL byte in a value", () -> utf8(set(csv(), csvLine(40), "40,0,0,\0,1.0")),
                        ":44:8: dhi_w_m2: not a number: \"\"; a decimal number such as 412.5"));
    }

    private static Arguments c(String kind, String name, Supplier<byte[]> bytes, String expectedAfterFile) {
        return Arguments.of(kind, name, bytes, expectedAfterFile);
    }

    @ParameterizedTest(name = "{0}: {1}")
    @MethodSource("cases")
    void firstProblemIsOneLineWithItsLine(String kind, String name, Supplier<byte[]> bytes, String expectedAfterFile,
                                          @TempDir Path dir) throws IOException {
        Path file = dir.resolve("site." + kind);
        Files.write(file, bytes.get());
        InputException e = assertThrows(InputException.class,
                () -> {
                    if (kind.equals("epw")) {
                        EpwReader.read(file);
                    } else {
                        WeatherCsvReader.read(file);
                    }
                });
        assertThat(Fuzz.badRendering(e, file.toString())).isNull();
        assertThat(e.problems().get(0).oneLine()).isEqualTo(file + expectedAfterFile);
    }

    @Test
    void theMessageIsTheSameInALocaleWithOtherDigits(@TempDir Path dir) throws IOException {
        // Found while checking for default-locale dependence: the not-UTF-8 message was formatted in the
        // default locale, so under ar-EG the byte offset came out in Arabic-Indic digits.
        byte[] b = utf8(epw());
        b[13] = (byte) 0xE9;
        Path file = dir.resolve("site.epw");
        Files.write(file, b);
        Locale saved = Locale.getDefault();
        InputException e;
        try {
            Locale.setDefault(Locale.forLanguageTag("ar-EG"));
            e = assertThrows(InputException.class, () -> EpwReader.read(file));
        } finally {
            Locale.setDefault(saved);
        }
        assertThat(e.problems().get(0).oneLine())
                .isEqualTo(file + ":1: the file is not valid UTF-8: byte 0xE9 at byte offset 13; save the file as UTF-8 text");
    }

    @Test
    void aFileOverTheDataLimitIsRefusedBeforeItIsRead(@TempDir Path dir) throws IOException {
        // A sparse file: reading it whole would take 200 MB of memory; the size check answers first.
        for (String name : new String[] {"big.epw", "big.csv"}) {
            Path big = dir.resolve(name);
            try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
                f.setLength(InputFiles.MAX_DATA_BYTES + 1);
            }
            InputException e = assertThrows(InputException.class,
                    () -> {
                        if (name.endsWith(".epw")) {
                            EpwReader.read(big);
                        } else {
                            WeatherCsvReader.read(big);
                        }
                    });
            assertThat(e.problems().get(0).oneLine())
                    .isEqualTo(big + ": the file is larger than the limit of 200 MB; check it is the right file");
        }
    }

    @Test
    @EnabledOnOs({OS.LINUX, OS.MAC})
    void aDeviceIsRefusedBeforeItIsRead() {
        InputException e = assertThrows(InputException.class, () -> EpwReader.read(Path.of("/dev/zero")));
        assertThat(e.problems().get(0).oneLine())
                .isEqualTo("/dev/zero: is not a regular file (a device, pipe or socket); give the path of a file");
    }
}
