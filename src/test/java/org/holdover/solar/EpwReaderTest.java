package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.holdover.project.InputException;
import org.holdover.project.Problem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The EPW reader: field positions and missing-value codes per the EPW data dictionary (EnergyPlus
 * "Auxiliary Programs", Weather Converter chapter: field 7 dry bulb, missing 99.9; fields 14–16 global,
 * direct normal, diffuse horizontal radiation, missing 9999; hour 1 = 00:00–01:00).
 */
class EpwReaderTest {

    private static final String NAME = "demo.epw";

    private static EpwFile read(List<String> lines) throws InputException {
        return EpwReader.read(new StringReader(WeatherFixtures.text(lines)), NAME);
    }

    private static Problem firstProblem(List<String> lines) {
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> read(lines));
        return e.problems().get(0);
    }

    /** Replaces field {@code field0} (0-based) of line {@code lineNo} (1-based). */
    private static List<String> withField(List<String> lines, int lineNo, int field0, String value) {
        String[] f = lines.get(lineNo - 1).split(",", -1);
        f[field0] = value;
        lines.set(lineNo - 1, String.join(",", f));
        return lines;
    }

    /** 1-based character column where field {@code field0} of the line starts. */
    private static int columnOf(String line, int field0) {
        int col = 1;
        for (int i = 0; i < field0; i++) {
            col = line.indexOf(',', col - 1) + 2;
        }
        return col;
    }

    @Test
    void readsLocationAndTheFourColumnsAtTheirHours() throws InputException {
        EpwFile f = read(WeatherFixtures.epwLines(false));
        assertThat(f.location().latitudeDeg()).isEqualTo(44.5);
        assertThat(f.location().longitudeDeg()).isEqualTo(-72.6);
        assertThat(f.location().utcOffsetHours()).isEqualTo(-5.0);
        assertThat(f.location().elevationM()).isEqualTo(300.0);
        assertThat(f.location().city()).isEqualTo("Demo Town");
        WeatherYear w = f.weather();
        assertThat(w.hours()).isEqualTo(8760);
        for (int h : new int[] {0, 9, 4000, 8759}) {
            assertThat(w.ghiWm2(h)).isEqualTo(WeatherFixtures.ghi(h));
            assertThat(w.dniWm2(h)).isEqualTo(WeatherFixtures.dni(h));
            assertThat(w.dhiWm2(h)).isEqualTo(WeatherFixtures.dhi(h));
            assertThat(w.airTempC(h)).isCloseTo(WeatherFixtures.air(h), within(0.051));
        }
    }

    @Test
    void readsALeapYearFromAPathWithWindowsLineEnds(@TempDir Path dir) throws Exception {
        Path p = dir.resolve("leap.epw");
        Files.writeString(p, String.join("\r\n", WeatherFixtures.epwLines(true)) + "\r\n", StandardCharsets.UTF_8);
        EpwFile f = EpwReader.read(p);
        assertThat(f.weather().hours()).isEqualTo(8784);
        assertThat(f.weather().source()).isEqualTo(p.toString());
    }

    @Test
    void fileCutShort() {
        List<String> lines = WeatherFixtures.epwLines(false).subList(0, 8 + 5000);
        Problem p = firstProblem(new java.util.ArrayList<>(lines));
        assertThat(p.message()).contains("cut short").contains("5000");
        assertThat(p.where().line()).isEqualTo(8 + 5000);
        assertThat(p.expected()).contains("8760");
    }

    @Test
    void fileCutShortInsideTheHeader() {
        Problem p = firstProblem(new java.util.ArrayList<>(WeatherFixtures.epwLines(false).subList(0, 5)));
        assertThat(p.message()).contains("cut short");
        assertThat(p.where().line()).isEqualTo(5);
    }

    @Test
    void nonNumericGlobalHorizontal() {
        List<String> lines = withField(WeatherFixtures.epwLines(false), 20, EpwReader.FIELD_GHI, "abc");
        Problem p = firstProblem(lines);
        assertThat(p.where().file()).isEqualTo(NAME);
        assertThat(p.where().line()).isEqualTo(20);
        assertThat(p.where().column()).isEqualTo(columnOf(lines.get(19), EpwReader.FIELD_GHI));
        assertThat(p.field()).isEqualTo("global horizontal radiation (Wh/m2)");
        assertThat(p.message()).contains("\"abc\"");
        assertThat(p.expected()).contains("number");
    }

    @Test
    void negativeDirectNormal() {
        Problem p = firstProblem(withField(WeatherFixtures.epwLines(false), 1000, EpwReader.FIELD_DNI, "-3"));
        assertThat(p.where().line()).isEqualTo(1000);
        assertThat(p.field()).isEqualTo("direct normal radiation (Wh/m2)");
        assertThat(p.message()).contains("negative").contains("-3");
        assertThat(p.expected()).contains("0 to 2000");
    }

    @Test
    void missingValueCodes() {
        List<String> lines = withField(WeatherFixtures.epwLines(false), 30, EpwReader.FIELD_DHI, "9999");
        withField(lines, 31, EpwReader.FIELD_DRY_BULB, "99.9");
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> read(lines));
        assertThat(e.problems()).hasSize(2);
        assertThat(e.problems().get(0).where().line()).isEqualTo(30);
        assertThat(e.problems().get(0).field()).isEqualTo("diffuse horizontal radiation (Wh/m2)");
        assertThat(e.problems().get(0).message()).contains("missing-value code 9999");
        assertThat(e.problems().get(1).where().line()).isEqualTo(31);
        assertThat(e.problems().get(1).field()).isEqualTo("dry bulb temperature (C)");
        assertThat(e.problems().get(1).message()).contains("99.9");
    }

    @Test
    void hoursOutOfSequence() {
        Problem p = firstProblem(withField(WeatherFixtures.epwLines(false), 9 + 5, EpwReader.FIELD_HOUR, "7"));
        assertThat(p.where().line()).isEqualTo(14);
        assertThat(p.field()).isEqualTo("hour");
        assertThat(p.message()).contains("\"7\"");
        assertThat(p.expected()).startsWith("6");
    }

    @Test
    void tooFewFieldsInARow() {
        List<String> lines = WeatherFixtures.epwLines(false);
        lines.set(99, "2023,1,4,20,60");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(100);
        assertThat(p.message()).contains("5 comma-separated fields");
    }

    @Test
    void subHourlyDataIsRefused() {
        List<String> lines = WeatherFixtures.epwLines(false);
        lines.set(7, "DATA PERIODS,1,4,Data,Sunday, 1/ 1,12/31");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(8);
        assertThat(p.field()).isEqualTo("DATA PERIODS records per hour");
        assertThat(p.expected()).contains("1");
    }

    @Test
    void badLatitudeInTheHeader() {
        List<String> lines = withField(WeatherFixtures.epwLines(false), 1, 6, "north");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(1);
        assertThat(p.field()).isEqualTo("LOCATION latitude");
        assertThat(p.message()).contains("\"north\"");
    }

    @Test
    void notUtf8(@TempDir Path dir) throws Exception {
        List<String> lines = WeatherFixtures.epwLines(false);
        byte[] head = (String.join("\n", lines.subList(0, 2)) + "\n").getBytes(StandardCharsets.UTF_8);
        byte[] bad = "COMMENTS 0,Caf\u00e9\n".getBytes(StandardCharsets.ISO_8859_1);
        byte[] rest = (String.join("\n", lines.subList(2, lines.size())) + "\n").getBytes(StandardCharsets.UTF_8);
        Path p = dir.resolve("latin1.epw");
        byte[] all = new byte[head.length + bad.length + rest.length];
        System.arraycopy(head, 0, all, 0, head.length);
        System.arraycopy(bad, 0, all, head.length, bad.length);
        System.arraycopy(rest, 0, all, head.length + bad.length, rest.length);
        Files.write(p, all);
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class, () -> EpwReader.read(p));
        assertThat(e.problems().get(0).where().line()).isEqualTo(3);
        assertThat(e.problems().get(0).message()).contains("not valid UTF-8").contains("0xE9");
    }

    @Test
    void replacementCharacterFromAReaderIsRefused() {
        List<String> lines = WeatherFixtures.epwLines(false);
        lines.set(5, "COMMENTS 1,Caf\uFFFD");
        Problem p = firstProblem(lines);
        assertThat(p.where().line()).isEqualTo(6);
        assertThat(p.message()).contains("UTF-8");
    }

    @Test
    void reportsEveryProblemUpToTheCap() {
        List<String> lines = WeatherFixtures.epwLines(false);
        for (int i = 0; i < 40; i++) {
            withField(lines, 100 + i, EpwReader.FIELD_GHI, "x");
        }
        assertThatThrownBy(() -> read(lines)).isInstanceOfSatisfying(InputException.class,
                e -> assertThat(e.problems()).hasSize(WeatherText.MAX_PROBLEMS));
    }
}
