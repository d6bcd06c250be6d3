package org.holdover.project;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.holdover.testing.Fuzz;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile project files, each a regression case of something the fuzzing found or the brief named: they
 * must end in an {@link InputException} whose problems are one clean line each naming the file.
 */
class HostileProjectTest {

    private static final String DISPLAY = "examples/hostile.yaml";
    private static final Path FILE = Path.of(DISPLAY);

    private static String cabin() {
        // A frozen copy of the off-grid demo before it had a solar section: the line numbers below point into it.
        return ProjectReaderFuzzTest.resource("/org/holdover/project/cabin-without-solar.yaml");
    }

    private static List<Problem> problems(String text) {
        InputException e = assertThrows(InputException.class, () -> ProjectReader.parse(text, FILE, DISPLAY, false));
        assertThat(Fuzz.badRendering(e, DISPLAY)).as("renders as one line naming the file").isNull();
        return e.problems();
    }

    private static String only(String text) {
        List<Problem> p = problems(text);
        assertThat(p).hasSize(1);
        return p.get(0).oneLine();
    }

    // Found by the fuzzing: a NUL character in a path made java.nio throw InvalidPathException (exit 3).

    @Test
    void nulCharacterInTheCatalogPath() {
        assertThat(only(cabin() + "catalog: \"my\\0parts.yaml\"\n"))
                .isEqualTo("examples/hostile.yaml:56:10: catalog: cannot use \"my?parts.yaml\": not a usable path"
                        + " (Nul character not allowed); write builtin, or the path of a catalog file relative to the"
                        + " project file");
    }

    @Test
    void nulCharacterInTheProfilePath() {
        assertThat(only(cabin().replace("file: ../load-profiles/ridge-cabin-base.csv", "file: \"base\\0.csv\"")))
                .startsWith("examples/hostile.yaml:19:11: loads.profile.file: cannot use \"base?.csv\": not a usable path");
    }

    @Test
    void nulCharacterInTheWeatherFilePath() {
        assertThat(only(cabin() + "solar: { weatherFile: \"\\0\" }\n"))
                .startsWith("examples/hostile.yaml:56:23: solar.weatherFile: cannot use \"?\": not a usable path");
    }

    // Found by the fuzzing: control characters in a key or a parser message reached the terminal as is.

    @Test
    void terminalEscapeInAnUnknownKeyIsShownAsAQuestionMark() {
        String line = only(cabin().replace("  inverterAmbientC: 25", "  \"\\e[2J\\e[31minverterAmbientC\": 25"));
        assertThat(line).isEqualTo("examples/hostile.yaml:14:3: site.?[2J?[31minverterAmbientC: unknown field"
                + " \"?[2J?[31minverterAmbientC\"; expected one of: ac, batteryAmbientC, designHighC, elevationM,"
                + " inverterAmbientC, latitudeDeg, longitudeDeg, recordLowC, timeZone, utcOffsetHours, year");
    }

    @Test
    void lineSeparatorsAndBidirectionalOverridesDoNotBreakOrReorderTheLine() {
        String line = only(cabin().replace("  inverterAmbientC: 25", "  \"a\\u2028b\\u0085c\\u202Ed\": 25"));
        assertThat(line).contains("site.a?b?c?d: unknown field \"a?b?c?d\"");
    }

    @Test
    void jsonWithALineSeparatorWhereACommaBelongs() {
        String json = "{\"name\": \"x\"\u2028 \"mode\": \"backup\"}";
        InputException e = assertThrows(InputException.class, () -> ProjectReader.parse(json, FILE, DISPLAY, true));
        assertThat(e.problems().get(0).oneLine()).startsWith("examples/hostile.yaml:1:13: not valid JSON: Unexpected character ('?'");
    }

    // Named in the brief.

    @Test
    void aDeviceIsNotAFile() {
        assertThat(only(cabin() + "catalog: /dev/zero\n"))
                .isEqualTo("examples/hostile.yaml:56:10: catalog: cannot use \"/dev/zero\": is not a regular file (a"
                        + " device, pipe or socket); write builtin, or the path of a catalog file relative to the project file");
    }

    @Test
    void aliasesAreRefusedWhereTheyAreUsedSoNothingExpands() {
        // Jackson's YAML reader does not expand aliases (it gives the anchor's name); the reader says so at the
        // first use, so an expansion bomb costs nothing and a legitimate alias gets a plain answer.
        StringBuilder bomb = new StringBuilder("a0: &a0 [x, x, x, x, x, x, x, x, x, x]\n");
        for (int k = 1; k < 9; k++) {
            bomb.append("a").append(k).append(": &a").append(k).append(" [")
                    .append(String.join(", ", java.util.Collections.nCopies(10, "*a" + (k - 1)))).append("]\n");
        }
        assertThat(only(cabin() + bomb)).isEqualTo("examples/hostile.yaml:57:13: a YAML alias (*a0) is not supported;"
                + " write the value out in full");
        assertThat(only(cabin().replace("watts: 550", "watts: &w 550").replace("watts: 800", "watts: *w")))
                .isEqualTo("examples/hostile.yaml:35:16: a YAML alias (*w) is not supported; write the value out in full");
        assertThat(only(cabin().replace("site:\n", "site: &s\n") + "backup: *s\n"))
                .isEqualTo("examples/hostile.yaml:56:11: a YAML alias (*s) is not supported; write the value out in full");
    }

    @Test
    void deepNestingIsRefusedWhereItGoesTooDeep() {
        String deep = "[".repeat(5000) + "]".repeat(5000);
        assertThat(only(cabin().replace("notes:\n", "notes: " + deep + "\nold:\n")))
                .isEqualTo("examples/hostile.yaml:54:72: nested deeper than 64 levels; check the brackets and indentation");
        InputException e = assertThrows(InputException.class,
                () -> ProjectReader.parse("{\"notes\": " + deep + "}", FILE, DISPLAY, true));
        assertThat(e.problems().get(0).oneLine())
                .isEqualTo("examples/hostile.yaml:1:75: nested deeper than 64 levels; check the brackets and indentation");
        StringBuilder block = new StringBuilder("deep:\n");
        for (int i = 1; i < 100; i++) {
            block.append("  ".repeat(i)).append("a:\n");
        }
        assertThat(only(cabin() + block)).startsWith("examples/hostile.yaml:120:").endsWith(": nested deeper than 64 levels;"
                + " check the brackets and indentation");
    }

    @Test
    void hugeAndNonFiniteNumbers() {
        assertThat(only(cabin().replace("watts: 550", "watts: 1e400"))).contains("loads.appliances[0].watts: must be a finite number");
        assertThat(only(cabin().replace("watts: 550", "watts: 99999999999999999999999999")))
                .contains("above the 1,000,000 W limit");
        assertThat(only(cabin().replace("year: 2025", "year: 99999999999"))).contains("site.year: expected a whole number");
        assertThat(only(cabin().replace("watts: 550", "watts: .inf"))).contains("not a plain finite number");
    }

    @Test
    void aFileOverTheSizeLimitIsRefusedBeforeItIsRead(@TempDir Path dir) throws IOException {
        // A sparse file of zeros: reading it would report a NUL byte; the size check must answer first.
        Path big = dir.resolve("big.yaml");
        try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(InputFiles.MAX_PROJECT_BYTES + 1);
        }
        InputException e = assertThrows(InputException.class, () -> ProjectReader.read(big, "big.yaml"));
        assertThat(e.problems()).extracting(Problem::oneLine)
                .containsExactly("big.yaml: the file is larger than the limit of 2 MB; check it is the right file");
        Path atLimit = dir.resolve("at-limit.yaml");
        Files.write(atLimit, "# x\n".repeat((int) InputFiles.MAX_PROJECT_BYTES / 4).getBytes(StandardCharsets.UTF_8));
        assertThat(Files.size(atLimit)).isEqualTo(InputFiles.MAX_PROJECT_BYTES);
        e = assertThrows(InputException.class, () -> ProjectReader.read(atLimit, "at-limit.yaml"));
        assertThat(e.problems().get(0).oneLine()).as("a file at the limit is read").isEqualTo(
                "at-limit.yaml: the file is empty; expected a project with at least name, mode, site and loads");
    }

    @Test
    @EnabledOnOs({OS.LINUX, OS.MAC})
    void aDeviceGivenAsTheProjectIsRefused() {
        InputException e = assertThrows(InputException.class, () -> ProjectReader.read(Path.of("/dev/zero"), "/dev/zero"));
        assertThat(e.problems().get(0).oneLine())
                .isEqualTo("/dev/zero: is not a regular file (a device, pipe or socket); give the path of a file");
    }
}
