package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad generator input, in the project's generator section and in a catalog's generators: one line per problem
 * (file:line:column: field: what is wrong; what is expected), exit code 2, no workbook.
 */
class GeneratorBadInputTest {

    static Stream<Arguments> projects() {
        String g = BadInputTest.BASE + "generator:\n";
        return Stream.of(
                Arguments.of("start state of charge above 95 %", g + "  startSocPct: 120\n",
                        "project.yaml:23:16: generator.startSocPct: must be 0–95 %, got 120"),
                Arguments.of("unknown strategy", g + "  strategy: peak-shaving\n",
                        "generator.strategy: unknown value \"peak-shaving\"; expected one of load-following, cycle-charging"),
                Arguments.of("unknown use", g + "  use: sometimes\n", "expected one of allowed, never"),
                Arguments.of("set point not above the start", g + "  startSocPct: 50\n  setPointSocPct: 40\n",
                        "generator.setPointSocPct: set point 40 % is not above the start 50 %"),
                Arguments.of("set point with load following", g + "  strategy: load-following\n  setPointSocPct: 90\n",
                        "generator.setPointSocPct: is only for cycle charging"),
                Arguments.of("misspelt key", g + "  fuelPricePerLiter: 2\n",
                        "generator.fuelPricePerLiter: unknown field \"fuelPricePerLiter\"; did you mean \"fuelPricePerL\"?"),
                Arguments.of("negative fuel price", g + "  fuelPricePerL: -1\n", "generator.fuelPricePerL: must be 0–1000 per litre, got -1"),
                Arguments.of("zero charger input", g + "  chargerAcW: 0\n", "generator.chargerAcW: must be greater than 0 W"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("projects")
    void badGeneratorSection(String name, String text, String expected, @TempDir Path dir) throws IOException {
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, text, StandardCharsets.UTF_8);
        Path out = dir.resolve("out.xlsx");
        Cli r = Cli.run("size", project.toString(), "-o", out.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains(expected);
        BadInputTest.assertOneLineProblems(r.err, project.toString());
        assertThat(Files.exists(out)).isFalse();
    }

    static Stream<Arguments> catalogs() {
        return Stream.of(
                Arguments.of("negative rating", "    ratedW: 3500\n", "    ratedW: -3500\n",
                        "generators[0].ratedW: must be greater than 0 and at most 1000000.0, got -3500.0"),
                Arguments.of("minimum load of 1.2", "    minLoadRatio: 0.3\n    fuel: { noLoadLPerHPerRatedKw: 0.11",
                        "    minLoadRatio: 1.2\n    fuel: { noLoadLPerHPerRatedKw: 0.11",
                        "generators[0].minLoadRatio: must be 0 or more and below 1, got 1.2"),
                Arguments.of("both fuel forms", "slopeLPerKwh: 0.31 }", "slopeLPerKwh: 0.31, points: [] }",
                        "generators[0].fuel: gives both the coefficients and points"),
                Arguments.of("two points at one output", "{ outputW: 1750, litresPerHour: 1.25 }", "{ outputW: 7000, litresPerHour: 1.25 }",
                        "generators[1].fuel.points: both points are at 7000 W"),
                Arguments.of("fuel falling with output", "{ outputW: 7000, litresPerHour: 2.6 }", "{ outputW: 7000, litresPerHour: 1.0 }",
                        "fuel falling as output rises"),
                Arguments.of("55 Hz", "{ voltsRms: 230, frequenciesHz: [50], splitPhase: false }\n    minLoadRatio: 0.25",
                        "{ voltsRms: 230, frequenciesHz: [55], splitPhase: false }\n    minLoadRatio: 0.25",
                        "generators[2].ac.frequenciesHz[0]: must be 50 or 60, got 55.0"),
                Arguments.of("split phase at 230 V", "ratedW: 3500\n    ac: { voltsRms: 240", "ratedW: 3500\n    ac: { voltsRms: 230",
                        "generators[0].ac.voltsRms: a split-phase set is 120/240 V, got 230 V"),
                Arguments.of("misspelt key", "    ratedW: 3500\n", "    ratedWatts: 3500\n", "unknown field \"ratedWatts\""));
    }

    @ParameterizedTest(name = "catalog: {0}")
    @MethodSource("catalogs")
    void badCatalogGenerators(String name, String from, String to, String expected, @TempDir Path dir) throws IOException {
        String builtin;
        try (InputStream in = org.holdover.catalog.CatalogReader.class.getResourceAsStream("demo-catalog.yaml")) {
            builtin = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        assertThat(builtin).as("the case changes the demo catalog").contains(from);
        Path catalog = dir.resolve("parts.yaml");
        Files.writeString(catalog, builtin.replaceFirst(java.util.regex.Pattern.quote(from),
                java.util.regex.Matcher.quoteReplacement(to)), StandardCharsets.UTF_8);
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, BadInputTest.BASE + "catalog: parts.yaml\n", StandardCharsets.UTF_8);
        Cli r = Cli.run("size", project.toString(), "-o", dir.resolve("out.xlsx").toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains(expected);
        BadInputTest.assertOneLineProblems(r.err, catalog.toString());
        assertThat(r.err).containsPattern("parts\\.yaml:\\d+:\\d+: generators\\[");
    }
}
