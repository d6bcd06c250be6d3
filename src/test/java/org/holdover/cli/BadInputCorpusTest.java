package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.stream.Stream;
import org.holdover.project.InputFiles;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * More of the bad-input corpus of {@link BadInputTest}, through the command line: user catalogs with
 * errors, profiles with daylight-saving gaps, duplicated minutes, binary or empty content, files that are
 * folders, devices or over the size limit, and hostile project text. Each case: exit code 2, one line per
 * problem naming the file, no stack trace, and nothing written beside the inputs.
 */
class BadInputCorpusTest {

    /** A file made sparse to a size, standing in for a huge file without writing one. */
    record Sparse(long bytes) {
    }

    /** The cabin project of {@link BadInputTest} with a catalog file. */
    static final String WITH_CATALOG = BadInputTest.BASE + "catalog: parts.yaml\n";
    /** The cabin project of {@link BadInputTest} with a profile file. */
    static final String WITH_PROFILE = BadInputTest.BASE.replace("loads:\n", "loads:\n  profile: { file: profile.csv }\n");

    /** A valid one-inverter, one-module user catalog (demo data, invented). */
    static final String CATALOG = String.join("\n",
            "name: My parts (demo data)",
            "demoData: true",
            "inverters:",
            "  - id: INV-A",
            "    busClassV: 48",
            "    dcWindowV: { min: 42, max: 64 }",
            "    ac: { voltsRms: 230, frequenciesHz: [50], splitPhase: false }",
            "    continuousW: 3000",
            "    surge: [{ seconds: 5, va: 6000 }]",
            "    efficiency: [{ loadPct: 10, pct: 90 }, { loadPct: 50, pct: 94 }, { loadPct: 100, pct: 92 }]",
            "    noLoadW: 20",
            "    price: 900",
            "batteryModules:",
            "  - id: BAT-A",
            "    chemistry: lifepo4",
            "    nominalV: 51.2",
            "    capacityAh: 100",
            "    rateHours: 5",
            "    internalResistanceMilliohm: 15",
            "    maxContinuousA: 100",
            "    maxChargeA: 50",
            "    maxParallel: 8",
            "    price: 1500",
            "");

    static Stream<Arguments> cases() {
        return Stream.of(
                // user catalogs
                catalog("catalog: misspelt key", CATALOG.replace("continuousW", "continousW"),
                        "parts.yaml:8:5: inverters[0].continousW: unknown field \"continousW\"; did you mean \"continuousW\"?"),
                catalog("catalog: surge below the continuous rating", CATALOG.replace("va: 6000", "va: 2000"),
                        "parts.yaml:9:31: inverters[0].surge[0].va: 2000.0 VA is below the continuous 3000.0 VA"),
                catalog("catalog: unknown chemistry", CATALOG.replace("chemistry: lifepo4", "chemistry: unobtainium"),
                        "parts.yaml:15:16: batteryModules[0].chemistry: unknown chemistry \"unobtainium\""),
                catalog("catalog: no inverters", CATALOG.replace(CATALOG.substring(CATALOG.indexOf("inverters:"),
                                CATALOG.indexOf("batteryModules:")), ""),
                        "parts.yaml:1:1: inverters: the catalog has no inverters; list at least one"),
                catalog("catalog: an id used twice", CATALOG.replace("id: BAT-A", "id: INV-A"),
                        "parts.yaml:14:9: batteryModules[0].id: \"INV-A\" is used twice; ids must be unique in a catalog"),
                catalog("catalog: a module of no whole number of cells", CATALOG.replace("nominalV: 51.2", "nominalV: 6"),
                        "parts.yaml:16:15: batteryModules[0].nominalV: 6.0 V is not a whole number of 3.2 V lifepo4 cells"),
                catalog("catalog: broken YAML", CATALOG.replace("    busClassV: 48", "   busClassV: [48"), "not valid YAML"),
                catalog("catalog: a list, not a catalog", "- 1\n- 2\n",
                        "parts.yaml:1:1: expected a mapping of fields at the top of the file"),
                files("catalog: an image", WITH_CATALOG, "parts.yaml",
                        Map.of("parts.yaml", new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n', 0, 0, 0, 13}),
                        "parts.yaml:1: is not valid UTF-8 text (byte 1); save the file as UTF-8"),
                files("catalog: a binary file", WITH_CATALOG, "parts.yaml",
                        Map.of("parts.yaml", new byte[] {'P', 'K', 3, 4, 20, 0, 6, 0, 8, 0, 0, 0}),
                        "parts.yaml:1: contains a NUL byte: this looks like a binary file; expected a UTF-8 text file"),
                files("catalog: over the size limit", WITH_CATALOG, "project.yaml",
                        Map.of("parts.yaml", new Sparse(InputFiles.MAX_PROJECT_BYTES + 1)),
                        "project.yaml:22:10: catalog: cannot use \"parts.yaml\": the file is larger than the limit of 2 MB"),
                text("catalog: a folder", BadInputTest.BASE + "catalog: .\n",
                        "project.yaml:22:10: catalog: cannot use \".\": is a folder, not a file"),
                text("catalog: a device", BadInputTest.BASE + "catalog: /dev/zero\n",
                        "project.yaml:22:10: catalog: cannot use \"/dev/zero\": is not a regular file (a device, pipe or socket)"),
                text("catalog: a NUL character in the path", BadInputTest.BASE + "catalog: \"parts\\0.yaml\"\n",
                        "project.yaml:22:10: catalog: cannot use \"parts?.yaml\": not a usable path (Nul character not allowed)"),
                // load profiles
                profile("profile: a time in the daylight-saving gap", "timestamp,W\n2025-03-30T01:30,5\n2025-03-30T02:30,5\n",
                        "profile.csv:3: timestamp: 2025-03-30T02:30 does not exist in Europe/Rome (clocks jump forward then);"
                                + " remove the row, or give times with an offset"),
                profile("profile: 1-minute readings with a minute twice", readings(LocalDateTime.of(2025, 6, 1, 10, 0), 1, 120, 37),
                        "profile.csv:40: timestamp: this time appears again (first on line 39); one row per interval"),
                profile("profile: empty", "", "profile.csv: the file has no header and no data"),
                profile("profile: comments only", "# nothing measured yet\n\n", "profile.csv: the file has no header and no data"),
                files("profile: a binary file", WITH_PROFILE, "profile.csv",
                        Map.of("profile.csv", new byte[] {'P', 'K', 3, 4, 20, 0, 6, 0, 8, 0, 0, 0, '\n', 0x7f, 'E', 'L', 'F'}),
                        "profile.csv:1: contains a NUL byte: this looks like a binary file; expected a CSV text file"),
                files("profile: not UTF-8", WITH_PROFILE, "profile.csv",
                        Map.of("profile.csv", "# Caf\u00e9 readings\nhour,W\n0,5\n".getBytes(StandardCharsets.ISO_8859_1)),
                        "profile.csv:1: is not valid UTF-8 text; save the file as UTF-8 (plain CSV)"),
                profile("profile: readings every 7 minutes", readings(LocalDateTime.of(2025, 6, 1, 10, 0), 7, 30, -1),
                        "profile.csv:3: timestamp: the readings are 420 s apart, which does not divide an hour"),
                files("profile: a bad byte on line 5", WITH_PROFILE, "profile.csv", Map.of("profile.csv",
                                "hour,W\n0,5\n1,5\n2,5\n3,\u00b15\n".getBytes(StandardCharsets.ISO_8859_1)),
                        "profile.csv:5: is not valid UTF-8 text; save the file as UTF-8 (plain CSV)"),
                profile("profile: no line breaks", "hour,W\n0," + "1".repeat(50_000),
                        "profile.csv:2: the line is longer than 10000 characters"),
                profile("profile: three columns", "timestamp,W,VA\n", "profile.csv:1: header: expected two columns, found 3"),
                profile("profile: an offset beyond 18 hours", "timestamp,W\n2025-01-01T00:00+18:30,5\n",
                        "profile.csv:2: timestamp: \"2025-01-01T00:00+18:30\" is not a timestamp"),
                files("profile: readings of another year", WITH_PROFILE.replace("  timeZone: Europe/Rome\n",
                                "  timeZone: Europe/Rome\n  year: 2025\n"), "profile.csv", Map.of("profile.csv",
                                "timestamp,W\n2023-01-01T00:00,5\n2023-01-01T01:00,5\n".getBytes(StandardCharsets.UTF_8)),
                        "profile.csv:2: timestamp: is outside the year 2025; data for one calendar year (2025)"),
                files("profile: a folder", WITH_PROFILE, "project.yaml", Map.of("profile.csv/readme.txt", DEMO_TEXT),
                        "project.yaml:10:20: loads.profile.file: cannot use \"profile.csv\": is a folder, not a file"),
                files("profile: over the size limit", WITH_PROFILE, "project.yaml",
                        Map.of("profile.csv", new Sparse(InputFiles.MAX_DATA_BYTES + 1)),
                        "loads.profile.file: cannot use \"profile.csv\": the file is larger than the limit of 200 MB"),
                text("profile: a device", WITH_PROFILE.replace("file: profile.csv", "file: /dev/zero"),
                        "loads.profile.file: cannot use \"/dev/zero\": is not a regular file (a device, pipe or socket)"),
                // project text
                text("solar: eleven monthly values", BadInputTest.BASE + "solar:\n  monthlyGhiKwhM2Day: [1, 2, 3, 4, 5, 6, 6, 5,"
                                + " 4, 3, 2]\n  monthlyAirTempC: [0, 1, 4, 8, 12, 16, 19, 18, 14, 9, 4, 1]\n",
                        "project.yaml:23:23: solar.monthlyGhiKwhM2Day: has 11 values; 12 values, January first"),
                text("solar: a weather file that is missing", BadInputTest.BASE + "solar: { weatherFile: site.epw }\n",
                        "project.yaml:22:23: solar.weatherFile: cannot use \"site.epw\": no such file"),
                text("a terminal escape in a key", BadInputTest.BASE.replace("  longitudeDeg: 7.0",
                                "  \"\\e[2Jlongitude\\u2028Deg\": 7.0"),
                        "project.yaml:5:3: site.?[2Jlongitude?Deg: unknown field \"?[2Jlongitude?Deg\""),
                text("a YAML alias", BadInputTest.BASE.replace("watts: 120", "watts: &w 120").replace("watts: 100", "watts: *w"),
                        "project.yaml:17:16: a YAML alias (*w) is not supported; write the value out in full"),
                text("nesting 5,000 deep", BadInputTest.BASE + "notes: " + "[".repeat(5000) + "]".repeat(5000) + "\n",
                        "project.yaml:22:72: nested deeper than 64 levels; check the brackets and indentation"),
                text("unknown time zone", BadInputTest.BASE.replace("Europe/Rome", "Mars/Olympus_Mons"),
                        "project.yaml:6:13: site.timeZone: unknown time zone \"Mars/Olympus_Mons\""),
                text("a year before the tables", BadInputTest.BASE.replace("  timeZone: Europe/Rome", "  timeZone: Europe/Rome\n"
                        + "  year: 1900"), "project.yaml:7:9: site.year: must be 1950–2100, got 1900"),
                text("month 13", BadInputTest.BASE.replace("      hoursPerDay: 4\n", "      hoursPerDay: 4\n      months: [12, 13]\n"),
                        "loads.appliances[1].months[1]: must be a month number 1–12, got 13"),
                files("a project over the size limit", null, "project.yaml",
                        Map.of("project.yaml", new Sparse(InputFiles.MAX_PROJECT_BYTES + 1)),
                        "project.yaml: the file is larger than the limit of 2 MB; check it is the right file"),
                files("a JSON project with a trailing comma", null, "project.json",
                        Map.of("project.json", "{\"name\": \"x\", \"mode\": \"backup\",}".getBytes(StandardCharsets.UTF_8)),
                        "project.json:1:32: not valid JSON: Unexpected character ('}' (code 125)): was expecting double-quote to start"
                                + " field name"));
    }

    /** A small text file for a folder that needs content (demo data). */
    static final byte[] DEMO_TEXT = "demo data\n".getBytes(StandardCharsets.UTF_8);

    /**
     * {@code count} readings {@code stepMinutes} apart from {@code start} (clock time of the project's zone,
     * demo data), the one at index {@code repeat} written twice (none when negative).
     */
    static String readings(LocalDateTime start, int stepMinutes, int count, int repeat) {
        StringBuilder b = new StringBuilder("timestamp,W\n");
        for (int i = 0; i < count; i++) {
            String row = start.plusMinutes((long) i * stepMinutes) + "," + (100 + i % 7) + "\n";
            b.append(row);
            if (i == repeat) {
                b.append(row);
            }
        }
        return b.toString();
    }

    private static Arguments text(String name, String project, String expected) {
        return files(name, project, "project.yaml", Map.of(), expected);
    }

    private static Arguments catalog(String name, String catalog, String expected) {
        return files(name, WITH_CATALOG, "parts.yaml", Map.of("parts.yaml", catalog.getBytes(StandardCharsets.UTF_8)), expected);
    }

    private static Arguments profile(String name, String csv, String expected) {
        return files(name, WITH_PROFILE, "profile.csv", Map.of("profile.csv", csv.getBytes(StandardCharsets.UTF_8)), expected);
    }

    /**
     * @param project  the project text, or null when {@code others} holds the project file itself
     * @param named    the file every error line must start with (relative to the folder)
     */
    private static Arguments files(String name, String project, String named, Map<String, Object> others, String expected) {
        Map<String, Object> all = new LinkedHashMap<>();
        if (project != null) {
            all.put("project.yaml", project.getBytes(StandardCharsets.UTF_8));
        }
        all.putAll(others);
        String projectFile = project != null ? "project.yaml" : others.keySet().iterator().next();
        return Arguments.of(name, all, projectFile, named, expected);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reportsOneLinePerProblemAndWritesNothing(String name, Map<String, Object> files, String projectFile, String named,
                                                  String expected, @TempDir Path dir) throws IOException {
        Assumptions.assumeTrue(!expected.contains("/dev/zero") || Files.exists(Path.of("/dev/zero")),
                "needs a /dev/zero device");
        for (Map.Entry<String, Object> f : files.entrySet()) {
            Path p = dir.resolve(f.getKey());
            Files.createDirectories(p.getParent());
            if (f.getValue() instanceof Sparse s) {
                try (RandomAccessFile raf = new RandomAccessFile(p.toFile(), "rw")) {
                    raf.setLength(s.bytes());
                }
            } else {
                Files.write(p, (byte[]) f.getValue());
            }
        }
        Path project = dir.resolve(projectFile);
        Path out = dir.resolve("out.xlsx");
        Cli r = Cli.run("size", project.toString(), "-o", out.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains(expected);
        BadInputTest.assertOneLineProblems(r.err, dir.resolve(named).toString());
        assertThat(r.out).as("nothing on standard output").isEmpty();
        try (Stream<Path> left = Files.walk(dir)) {
            assertThat(left.filter(Files::isRegularFile).map(p -> dir.relativize(p).toString().replace('\\', '/')))
                    .as("nothing written").containsExactlyInAnyOrderElementsOf(files.keySet());
        }
    }

    @Test
    void theCorpusHoldsAtLeastFortyBadInputs() {
        long total = BadInputTest.cases().count() + BadInputTest.binaries().count() + BadInputTest.profiles().count()
                + cases().count();
        System.out.println("bad-input corpus through the command line: " + total + " cases");
        assertThat(total).isGreaterThanOrEqualTo(40);
    }
}
