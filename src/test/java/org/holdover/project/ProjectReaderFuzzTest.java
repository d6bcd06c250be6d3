package org.holdover.project;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.holdover.testing.Fuzz;
import org.holdover.testing.Mutator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fuzzing the project-file reader ({@link ProjectReader}) with mutations of the demo projects and the
 * starter templates, in YAML and in JSON: it accepts the input or throws an {@link InputException} whose
 * every problem is one line naming the file; nothing else escapes. See {@link Fuzz} for the budget.
 */
class ProjectReaderFuzzTest {

    /** Tries in the build, per format. */
    private static final int CI_TRIES = 1500;
    /** The name the reader is given; problems must start with it. */
    private static final String DISPLAY = "examples/fuzzed-project";

    /** A solar section and notes that look like formulas, added to one seed so that their paths are reached. */
    private static final String EXTRA = String.join("\n",
            "solar:",
            "  monthlyGhiKwhM2Day: [1.2, 2.0, 3.1, 4.2, 5.0, 5.6, 5.8, 5.1, 4.0, 2.8, 1.5, 1.0]",
            "  monthlyAirTempC: [-5, -3, 1, 6, 11, 15, 17, 16, 12, 7, 2, -3]",
            "  tiltDeg: 45",
            "  azimuthDeg: 180",
            "  albedo: 0.2",
            "  controller: mppt",
            "rules: { inverterMargin: 1.25, maxBatteryCurrentA: 150, motorsStartingTogether: 1, maxParallelStrings: 4 }",
            "catalog: builtin",
            "");

    static List<String> yamlSeeds() {
        List<String> seeds = new ArrayList<>();
        seeds.add(read(Path.of("examples/farm-shop-backup.yaml")));
        seeds.add(read(Path.of("examples/ridge-cabin-offgrid.yaml")));
        seeds.add(resource("/org/holdover/cli/starter-backup.yaml"));
        seeds.add(resource("/org/holdover/cli/starter-off-grid.yaml"));
        seeds.add(resource("/org/holdover/project/cabin-without-solar.yaml").replace("notes:\n", EXTRA + "notes:\n  - \"=1+1\"\n"));
        return seeds;
    }

    static List<String> jsonSeeds() {
        ObjectMapper yaml = new YAMLMapper();
        ObjectMapper json = new ObjectMapper();
        List<String> out = new ArrayList<>();
        for (String s : yamlSeeds()) {
            try {
                JsonNode tree = yaml.readTree(s);
                out.add(json.writerWithDefaultPrettyPrinter().writeValueAsString(tree));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return out;
    }

    @Test
    void seedsAreValidProjects() throws InputException {
        // The seeds themselves must read cleanly, or the fuzzing would start from broken inputs.
        for (String s : yamlSeeds()) {
            assertThat(ProjectReader.parse(s, Path.of(DISPLAY + ".yaml"), DISPLAY, false).input().name()).isNotBlank();
        }
        for (String s : jsonSeeds()) {
            assertThat(ProjectReader.parse(s, Path.of(DISPLAY + ".json"), DISPLAY, true).input().name()).isNotBlank();
        }
    }

    @Test
    void mutatedYamlProjectsGiveOnlyOneLineInputProblems() {
        fuzz("project-yaml", 1, yamlSeeds(), Mutator.Kind.YAML, false);
    }

    @Test
    void mutatedJsonProjectsGiveOnlyOneLineInputProblems() {
        fuzz("project-json", 2, jsonSeeds(), Mutator.Kind.JSON, true);
    }

    @Test
    void mutatedProjectFilesOnDiskGiveOnlyOneLineInputProblems(@TempDir Path dir) throws IOException {
        // Through ProjectReader.read: size limit, strict UTF-8, then parsing. The profile and catalog paths
        // of the seeds point at the real demo files.
        Path profiles = Files.createDirectories(dir.resolve("load-profiles"));
        for (String name : new String[] {"farm-shop-critical-2025.csv", "ridge-cabin-base.csv"}) {
            Files.copy(Path.of("load-profiles", name), profiles.resolve(name));
        }
        Path project = Files.createDirectories(dir.resolve("examples")).resolve("fuzzed.yaml");
        List<byte[]> seeds = yamlSeeds().stream().map(Fuzz::utf8).toList();
        Fuzz.of("project-file", 3, CI_TRIES / 5).run(project.toString(),
                r -> Mutator.mutate(seeds.get(r.nextInt(seeds.size())), Mutator.Kind.YAML, r),
                (input, r) -> {
                    Files.write(project, input);
                    ProjectReader.read(project, project.toString());
                });
    }

    private static void fuzz(String name, long salt, List<String> seeds, Mutator.Kind kind, boolean json) {
        List<byte[]> bytes = seeds.stream().map(Fuzz::utf8).toList();
        Path file = Path.of(DISPLAY + (json ? ".json" : ".yaml"));
        Fuzz.of(name, salt, CI_TRIES).run(DISPLAY,
                r -> Mutator.mutate(bytes.get(r.nextInt(bytes.size())), kind, r),
                (input, r) -> ProjectReader.parse(InputFiles.decodeUtf8(input, DISPLAY), file, DISPLAY, json));
    }

    static String read(Path p) {
        try {
            return Files.readString(p, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String resource(String name) {
        try (InputStream in = ProjectReaderFuzzTest.class.getResourceAsStream(name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
