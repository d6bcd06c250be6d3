package org.holdover.load;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneId;
import org.holdover.project.InputException;
import org.holdover.project.InputFiles;
import org.holdover.testing.Fuzz;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/** Hostile load-profile files: regression cases for the reader, each ending in a one-line problem. */
class HostileProfileTest {

    private static final ZoneId ZONE = ZoneId.of("Europe/Zurich");

    private static String firstProblem(Path file, String display) {
        InputException e = assertThrows(InputException.class, () -> ProfileCsvReader.read(file, display, 2025, ZONE, 0));
        assertThat(Fuzz.badRendering(e, display)).isNull();
        return e.problems().get(0).oneLine();
    }

    @Test
    void anOffsetBeyondEighteenHoursIsNotATimestamp(@TempDir Path dir) throws IOException {
        // Found by reading the reader while writing the fuzzer: +18:30 passed the parser's own range check and
        // then made java.time throw DateTimeException (exit 3). ISO 8601 offsets go to ±18:00, minutes to 59.
        Path f = dir.resolve("p.csv");
        for (String offset : new String[] {"+18:30", "-18:01", "+05:60", "+19:00"}) {
            Files.writeString(f, "timestamp,W\n2025-01-01T00:00" + offset + ",5\n", StandardCharsets.UTF_8);
            assertThat(firstProblem(f, "p.csv")).isEqualTo("p.csv:2: timestamp: \"2025-01-01T00:00" + offset
                    + "\" is not a timestamp; like 2025-07-14T13:15 or 2025-07-14 13:15");
        }
    }

    @Test
    void offsetsAtTheEdgesAreStillRead(@TempDir Path dir) throws IOException, InputException {
        Path f = dir.resolve("p.csv");
        StringBuilder b = new StringBuilder("timestamp,W\n");
        for (int h = 0; h < 8760; h++) {
            // 2025-01-01T18:00+18:00 is 2025-01-01T00:00Z; Zurich standard time is UTC+1.
            b.append(java.time.LocalDateTime.of(2025, 1, 1, 18, 0).plusHours(h)).append("+18:00,").append(h % 50).append('\n');
        }
        Files.writeString(f, b, StandardCharsets.UTF_8);
        MeasuredProfile p = ProfileCsvReader.read(f, "p.csv", 2025, ZONE, 0);
        assertThat(p.hourlyW()[1]).as("UTC 00:00 is Zurich standard 01:00").isEqualTo(0.0);
        assertThat(p.hourlyW()[2]).isEqualTo(1.0);
    }

    @Test
    void aFileOverTheDataLimitIsRefusedBeforeItIsRead(@TempDir Path dir) throws IOException {
        // A sparse file of zeros: read, it would be "a binary file" (NUL bytes); the size check answers first.
        Path big = dir.resolve("big.csv");
        try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(InputFiles.MAX_DATA_BYTES + 1);
        }
        assertThat(firstProblem(big, "big.csv"))
                .isEqualTo("big.csv: the file is larger than the limit of 200 MB; check it is the right file");
    }

    @Test
    @EnabledOnOs({OS.LINUX, OS.MAC})
    void aDeviceThatNeverEndsIsRefused() {
        // Its size reads as 0; read line by line it would never end (and never give a line).
        assertThat(firstProblem(Path.of("/dev/zero"), "/dev/zero"))
                .isEqualTo("/dev/zero: is not a regular file (a device, pipe or socket); give the path of a file");
    }

    @Test
    void aBinaryFileNamesTheLineOfItsFirstNul(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("p.csv");
        Files.write(f, new byte[] {'h', 'o', 'u', 'r', ',', 'W', '\n', '0', ',', '1', '\n', 0x50, 0x4b, 0x03, 0x04, 0, 0});
        assertThat(firstProblem(f, "p.csv"))
                .isEqualTo("p.csv:3: contains a NUL byte: this looks like a binary file; expected a CSV text file");
    }

    @Test
    void aBadByteIsReportedOnItsOwnLine(@TempDir Path dir) throws IOException {
        // Found while writing the corpus: the strict decoder failed inside the 64 K read-ahead buffer, before
        // the parser had counted any line, so a bad byte on line 102 was reported on line 1.
        StringBuilder b = new StringBuilder("hour,W\n");
        for (int h = 0; h < 100; h++) {
            b.append(h).append(",5\n");
        }
        byte[] head = b.toString().getBytes(StandardCharsets.UTF_8);
        byte[] bad = "# caf\u00e9 (Latin-1)\r\n100,5\n".getBytes(StandardCharsets.ISO_8859_1);
        byte[] all = java.util.Arrays.copyOf(head, head.length + bad.length);
        System.arraycopy(bad, 0, all, head.length, bad.length);
        Path f = dir.resolve("p.csv");
        Files.write(f, all);
        assertThat(firstProblem(f, "p.csv")).isEqualTo("p.csv:102: is not valid UTF-8 text; save the file as UTF-8 (plain CSV)");
    }

    @Test
    void aLineTooLongToBeAProfileIsRefusedAsItStreamsBy(@TempDir Path dir) throws IOException {
        // A file with no line breaks would be collected whole as one line, up to the 200 MB limit, which can
        // exhaust a small heap; lines are limited to ProfileCsvReader.MAX_LINE_CHARS as they are read.
        Path f = dir.resolve("p.csv");
        Files.writeString(f, "hour,W\r\n0,5\r\n1," + "7".repeat(ProfileCsvReader.MAX_LINE_CHARS) + "\r\n",
                StandardCharsets.UTF_8);
        assertThat(firstProblem(f, "p.csv")).isEqualTo("p.csv:3: the line is longer than 10000 characters; a CSV profile"
                + " has one short line per reading; check it is the right file");
        Files.writeString(f, "hour,W\n0,5\n# " + "x".repeat(ProfileCsvReader.MAX_LINE_CHARS - 2) + "\n1,6\n",
                StandardCharsets.UTF_8);
        assertThat(firstProblem(f, "p.csv")).as("a line of exactly the limit is read")
                .startsWith("p.csv:4: no data for 8758 hour(s)");
    }

    @Test
    void controlCharactersInAValueAreShownAsQuestionMarks(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("p.csv");
        Files.writeString(f, "hour,W\n0,\u001b[31m5\u0085x\n", StandardCharsets.UTF_8);
        String line = firstProblem(f, "p.csv");
        assertThat(line).isEqualTo("p.csv:2: W: \"?[31m5?x\" is not a number; a plain number in W");
    }
}
