package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad input: each case gives one line per problem on stderr — file:line:column: field: what is wrong;
 * what is expected — exit code 2, no stack trace, and no workbook written.
 */
class BadInputTest {

    /** A valid small project; each case changes one thing. */
    static final String BASE = String.join("\n",
            "name: Test cabin (demo data)",
            "mode: off-grid",
            "site:",
            "  latitudeDeg: 45.0",
            "  longitudeDeg: 7.0",
            "  timeZone: Europe/Rome",
            "  ac: { voltsRms: 230, frequencyHz: 50, wiring: single }",
            "  batteryAmbientC: { coldest: 5, design: 15 }",
            "loads:",
            "  appliances:",
            "    - name: Fridge",
            "      watts: 120",
            "      powerFactor: 0.75",
            "      dutyCycle: 0.35",
            "      motor: { startMultiple: 6, startSeconds: 0.5 }",
            "    - name: Lights",
            "      watts: 100",
            "      hoursPerDay: 4",
            "      hours: [\"18-23\"]",
            "offGrid:",
            "  autonomyDays: 2",
            "");

    static Stream<Arguments> cases() {
        return Stream.of(
                c("unknown key with a hint", BASE.replace("latitudeDeg: 45.0", "latitudeDge: 45.0"),
                        "project.yaml:4:3: site.latitudeDge: unknown field \"latitudeDge\"; did you mean \"latitudeDeg\"?"),
                c("missing field", BASE.replace("mode: off-grid\n", ""), "mode: is missing"),
                c("negative watts", BASE.replace("watts: 120", "watts: -150"),
                        "project.yaml:12:14: loads.appliances[0].watts: must be > 0 W, got -150"),
                c("depth of discharge above 100 %", BASE + "battery: { maxDepthOfDischargePct: 120 }\n",
                        "battery.maxDepthOfDischargePct: must be greater than 0 % and at most 100 %, got 120"),
                c("latitude out of range", BASE.replace("latitudeDeg: 45.0", "latitudeDeg: 95"),
                        "project.yaml:4:16: site.latitudeDeg: must be -90–90 °, got 95"),
                c("hours per day above 24", BASE.replace("hoursPerDay: 4", "hoursPerDay: 25"),
                        "loads.appliances[1].hoursPerDay: must be 0–24 h, got 25; hours per day cannot exceed 24"),
                c("hours per day beyond its window", BASE.replace("hoursPerDay: 4", "hoursPerDay: 6"),
                        "loads.appliances[1].hoursPerDay: 6 h is longer than its time windows (5 h)"),
                c("missing profile file", BASE.replace("loads:\n", "loads:\n  profile: { file: nope.csv }\n"),
                        "loads.profile.file: cannot use \"nope.csv\": no such file"),
                c("broken YAML", BASE.replace("  latitudeDeg: 45.0", " latitudeDeg: [45.0"), "not valid YAML"),
                c("wrong type", BASE.replace("watts: 120", "watts: lots"),
                        "loads.appliances[0].watts: expected a number, got \"lots\"; write a plain number without units"),
                c("unknown mode", BASE.replace("mode: off-grid", "mode: grid-tie"),
                        "mode: unknown value \"grid-tie\"; expected one of backup, off-grid"),
                c("empty file", "", "project.yaml: the file is empty"),
                c("not a NEMA code letter", BASE.replace("{ startMultiple: 6, startSeconds: 0.5 }",
                        "{ horsepower: 0.5, codeLetter: I }"), "is not a NEMA code letter"),
                c("time window out of range", BASE.replace("[\"18-23\"]", "[\"25-03\"]"), "has hours out of range"),
                c("split phase at 230 V", BASE.replace("wiring: single", "wiring: split-phase"),
                        "a split-phase service is 120/240 V: voltsRms must be 240, got 230"),
                c("not a number", BASE.replace("watts: 120", "watts: .nan"), "project.yaml:12:18: not a plain finite number: '.nan'"),
                c("duplicate key", BASE.replace("  longitudeDeg: 7.0\n", "  longitudeDeg: 7.0\n  longitudeDeg: 8.0\n"),
                        "not valid YAML"),
                c("motor without data", BASE.replace("{ startMultiple: 6, startSeconds: 0.5 }", "{ startSeconds: 0.5 }"),
                        "gives no starting data"),
                c("two appliances with one name", BASE.replace("name: Lights", "name: fridge"),
                        "is used by another appliance"),
                c("mode section missing", BASE.replace("offGrid:\n  autonomyDays: 2\n", ""),
                        "offGrid: is missing; off-grid mode needs the days of autonomy"),
                c("missing catalog", BASE + "catalog: my-parts.yaml\n", "catalog: cannot use \"my-parts.yaml\": no such file"),
                c("a list where a mapping belongs", BASE.replace("  ac: { voltsRms: 230, frequencyHz: 50, wiring: single }",
                        "  ac: [230, 50]"), "site.ac: expected a mapping of fields, got a list"),
                c("huge number", BASE.replace("watts: 120", "watts: 1e300"), "above the 1,000,000 W limit"),
                c("zero power factor", BASE.replace("powerFactor: 0.75", "powerFactor: 0"),
                        "loads.appliances[0].powerFactor: must be greater than 0 and at most 1, got 0"),
                c("the whole file is a list", "- 1\n- 2\n", "expected a project (a mapping of fields), got a list"),
                c("too many alternatives", BASE + "rules: { alternatives: 99 }\n", "rules.alternatives: must be 0–20, got 99"),
                c("negative load growth", BASE + "rules: { loadGrowthPct: -5 }\n", "rules.loadGrowthPct: must be 0–200 %, got -5"),
                c("zero cost horizon", BASE + "rules: { costHorizonYears: 0 }\n",
                        "rules.costHorizonYears: must be greater than 0 years and at most 100 years, got 0"),
                c("no inverters at all", BASE + "rules: { maxInvertersInParallel: 0 }\n",
                        "rules.maxInvertersInParallel: must be 1–12, got 0"),
                c("zero-length inverter leads", BASE + "wiring: { busBarToInverterM: 0 }\n",
                        "wiring.busBarToInverterM: must be greater than 0 m and at most 100 m, got 0"),
                c("PV system voltage above 1500 V", BASE + "solar:\n  monthlyGhiKwhM2Day: [1, 2, 3, 4, 5, 6, 6, 5, 4, 3, 2, 1]\n"
                        + "  monthlyAirTempC: [0, 1, 4, 8, 12, 16, 19, 18, 14, 9, 4, 1]\n  systemVoltageLimitV: 2000\n",
                        "solar.systemVoltageLimitV: must be greater than 0 V and at most 1500 V, got 2000"),
                c("misspelt search rule", BASE + "rules: { alternatves: 2 }\n",
                        "rules.alternatves: unknown field \"alternatves\"; did you mean \"alternatives\"?"));
    }

    private static Arguments c(String name, String text, String expected) {
        return Arguments.of(name, text, expected);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reportsOneLinePerProblemAndWritesNothing(String name, String text, String expected, @TempDir Path dir)
            throws IOException {
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, text, StandardCharsets.UTF_8);
        Path out = dir.resolve("out.xlsx");
        Cli r = Cli.run("size", project.toString(), "-o", out.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains(expected);
        assertOneLineProblems(r.err, project.toString());
        assertThat(Files.exists(out)).isFalse();
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files.map(p -> p.getFileName().toString())).containsExactly("project.yaml");
        }
    }

    static void assertOneLineProblems(String err, String file) {
        List<String> lines = err.lines().toList();
        assertThat(lines).isNotEmpty();
        for (String line : lines) {
            assertThat(line).as("no stack trace").doesNotContain("\tat ").doesNotContain("Exception");
            assertThat(line).as("names the file").startsWith(file);
        }
    }

    @ParameterizedTest(name = "binary file")
    @MethodSource("binaries")
    void binaryOrNonUtf8Files(byte[] bytes, String expected, @TempDir Path dir) throws IOException {
        Path project = dir.resolve("project.yaml");
        Files.write(project, bytes);
        Cli r = Cli.run("check", project.toString());
        assertThat(r.exit).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains(expected);
        assertOneLineProblems(r.err, project.toString());
    }

    static Stream<Arguments> binaries() {
        byte[] latin1 = "name: Caf\u00e9\n".getBytes(StandardCharsets.ISO_8859_1);
        byte[] zip = {0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00, 0x08, 0x00, 0, 0, 0, 0};
        return Stream.of(Arguments.of(latin1, "project.yaml:1: is not valid UTF-8 text"),
                Arguments.of(zip, "contains a NUL byte"));
    }

    @ParameterizedTest(name = "profile: {0}")
    @MethodSource("profiles")
    void badProfiles(String name, String csv, String expected, @TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("profile.csv"), csv, StandardCharsets.UTF_8);
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, BASE.replace("loads:\n", "loads:\n  profile: { file: profile.csv }\n"), StandardCharsets.UTF_8);
        Path out = dir.resolve("out.xlsx");
        Cli r = Cli.run("size", project.toString(), "-o", out.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains(expected);
        assertOneLineProblems(r.err, dir.resolve("profile.csv").toString());
        assertThat(Files.exists(out)).isFalse();
    }

    static Stream<Arguments> profiles() {
        StringBuilder short8759 = new StringBuilder("hour,W\n");
        for (int h = 0; h < 8759; h++) {
            short8759.append(h).append(",100\n");
        }
        StringBuilder dup = new StringBuilder("hour,kW\n");
        for (int h = 0; h < 8760; h++) {
            dup.append(h == 5 ? 4 : h).append(",0.1\n");
        }
        return Stream.of(
                Arguments.of("8,759 hours", short8759.toString(), "profile.csv:8760: no data for 1 hour(s), 2025-12-31 23:00"),
                Arguments.of("duplicate hour", dup.toString(), "profile.csv:7: hour: hour 4 appears again (first on line 6)"),
                Arguments.of("negative value", "hour,W\n0,-5\n", "profile.csv:2: W: negative value -5"),
                Arguments.of("not a number", "hour,W\n0,abc\n", "profile.csv:2: W: \"abc\" is not a number"),
                Arguments.of("unknown unit", "hour,amps\n0,5\n", "profile.csv:1: header: second column is \"amps\""),
                Arguments.of("header only", "hour,W\n", "the file has a header but no data rows"),
                Arguments.of("bad timestamp", "timestamp,W\n2025-13-01T00:00,5\n", "profile.csv:2: timestamp: \"2025-13-01T00:00\" is not a timestamp"));
    }
}
