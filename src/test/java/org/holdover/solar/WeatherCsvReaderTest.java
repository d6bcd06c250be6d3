package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.holdover.project.InputException;
import org.holdover.project.Problem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Our CSV weather format (documented in {@link WeatherCsvReader}). */
class WeatherCsvReaderTest {

    private static final String NAME = "site-weather.csv";

    private static WeatherYear read(List<String> lines) throws InputException {
        return WeatherCsvReader.read(new StringReader(WeatherFixtures.text(lines)), NAME);
    }

    private static Problem firstProblem(List<String> lines) {
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> read(lines));
        return e.problems().get(0);
    }

    /** Line number (1-based) of hour h in {@link WeatherFixtures#csvLines}: 2 comments + header first. */
    private static int lineOfHour(int h) {
        return 4 + h;
    }

    @Test
    void readsACompleteYear() throws InputException {
        WeatherYear w = read(WeatherFixtures.csvLines(8760));
        assertThat(w.hours()).isEqualTo(8760);
        assertThat(w.ghiWm2(10)).isEqualTo(WeatherFixtures.ghi(10));
        assertThat(w.dniWm2(10)).isEqualTo(WeatherFixtures.dni(10));
        assertThat(w.dhiWm2(10)).isEqualTo(WeatherFixtures.dhi(10));
        assertThat(w.airTempC(8759)).isEqualTo(Math.round(WeatherFixtures.air(8759) * 100) / 100.0);
    }

    @Test
    void columnsInAnyOrderCommentsAndBlankLinesAnywhere(@TempDir Path dir) throws Exception {
        List<String> lines = new ArrayList<>();
        lines.add("air_c,hour,dhi_w_m2,dni_w_m2,ghi_w_m2");
        for (int h = 0; h < 8784; h++) {
            if (h == 100) {
                lines.add("# a note in the middle");
                lines.add("");
            }
            lines.add(WeatherFixtures.air(h) + "," + h + "," + WeatherFixtures.dhi(h) + "," + WeatherFixtures.dni(h) + ","
                    + WeatherFixtures.ghi(h));
        }
        Path p = dir.resolve("leap.csv");
        Files.writeString(p, WeatherFixtures.text(lines), StandardCharsets.UTF_8);
        WeatherYear w = WeatherCsvReader.read(p);
        assertThat(w.hours()).isEqualTo(8784);
        assertThat(w.ghiWm2(8783)).isEqualTo(WeatherFixtures.ghi(8783));
        assertThat(w.airTempC(8783)).isEqualTo(WeatherFixtures.air(8783));
    }

    @Test
    void fileCutShort() {
        List<String> lines = new ArrayList<>(WeatherFixtures.csvLines(8000));
        Problem p = firstProblem(lines);
        assertThat(p.message()).contains("cut short").contains("8000");
        assertThat(p.where().line()).isEqualTo(lineOfHour(7999));
        assertThat(p.expected()).contains("8760");
    }

    @Test
    void wrongNumberOfHours() {
        Problem p = firstProblem(WeatherFixtures.csvLines(8770));
        assertThat(p.message()).contains("8770").doesNotContain("cut short");
    }

    @Test
    void nonNumericValue() {
        List<String> lines = WeatherFixtures.csvLines(8760);
        lines.set(lineOfHour(12) - 1, "12,high,300,80,4.0");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(lineOfHour(12));
        assertThat(p.where().column()).isEqualTo(4);
        assertThat(p.field()).isEqualTo("ghi_w_m2");
        assertThat(p.message()).contains("\"high\"");
    }

    @Test
    void numbersMustBePlainDecimals() {
        List<String> lines = WeatherFixtures.csvLines(8760);
        lines.set(lineOfHour(3) - 1, "3,0,0,0,NaN");
        lines.set(lineOfHour(4) - 1, "4,0,0,1e2d,1");
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> read(lines));
        assertThat(e.problems()).extracting(Problem::field).containsExactly("air_c", "dhi_w_m2");
    }

    @Test
    void negativeIrradiance() {
        List<String> lines = WeatherFixtures.csvLines(8760);
        lines.set(lineOfHour(500) - 1, "500,-2,0,0,1.5");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(lineOfHour(500));
        assertThat(p.field()).isEqualTo("ghi_w_m2");
        assertThat(p.message()).contains("negative").contains("-2");
    }

    @Test
    void hoursMustRunInOrder() {
        List<String> lines = WeatherFixtures.csvLines(8760);
        lines.set(lineOfHour(7) - 1, "8,0,0,0,1.0");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(lineOfHour(7));
        assertThat(p.field()).isEqualTo("hour");
        assertThat(p.expected()).startsWith("7");
    }

    @Test
    void headerProblems() {
        List<String> lines = WeatherFixtures.csvLines(8760);
        lines.set(2, "hour,ghi,dni_w_m2,dhi_w_m2,air_c");
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> read(lines));
        assertThat(e.problems()).hasSize(2);
        assertThat(e.problems().get(0).where().line()).isEqualTo(3);
        assertThat(e.problems().get(0).message()).contains("unknown column \"ghi\"");
        assertThat(e.problems().get(1).message()).contains("ghi_w_m2 is missing");
    }

    @Test
    void rowWithTooFewFields() {
        List<String> lines = WeatherFixtures.csvLines(8760);
        lines.set(lineOfHour(2) - 1, "2,0,0");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(lineOfHour(2));
        assertThat(p.message()).contains("3 fields");
    }

    @Test
    void notUtf8(@TempDir Path dir) throws Exception {
        List<String> lines = WeatherFixtures.csvLines(8760);
        Path p = dir.resolve("bad.csv");
        byte[] ok = WeatherFixtures.text(lines).getBytes(StandardCharsets.UTF_8);
        byte[] bad = new byte[ok.length + 1];
        // Put a lone continuation byte at the start of line 2 (the second comment).
        int line2 = WeatherFixtures.text(lines).indexOf('\n') + 1;
        System.arraycopy(ok, 0, bad, 0, line2);
        bad[line2] = (byte) 0x80;
        System.arraycopy(ok, line2, bad, line2 + 1, ok.length - line2);
        Files.write(p, bad);
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> WeatherCsvReader.read(p));
        assertThat(e.problems().get(0).where().line()).isEqualTo(2);
        assertThat(e.problems().get(0).message()).contains("not valid UTF-8");
    }

    @Test
    void emptyFile() {
        Problem p = firstProblem(List.of("# only a comment"));
        assertThat(p.message()).contains("no header");
    }
}
