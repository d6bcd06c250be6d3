package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.holdover.testing.Fuzz;
import org.holdover.testing.Mutator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fuzzing the whole command line: mutated projects (the test cabin of {@link BadInputTest}, the starter
 * templates, the ridge-cabin demo with its profile) go through {@code holdover check}, so that what the
 * readers accept also goes through assembly, sizing and the console summary. The property: never exit
 * code 3 (an internal error); exit 2 only with one-line problems, no stack trace. A crash shows as a
 * {@code Fuzz} crash with the saved input. Fewer tries than the reader fuzzers: an accepted input is
 * sized, which takes a good fraction of a second.
 */
class CommandLineFuzzTest {

    private static final int CI_TRIES = 150;

    @Test
    void mutatedProjectsNeverCauseAnInternalError(@TempDir Path dir) throws IOException {
        Path profiles = Files.createDirectories(dir.resolve("load-profiles"));
        Files.copy(Path.of("load-profiles", "ridge-cabin-base.csv"), profiles.resolve("ridge-cabin-base.csv"));
        Path project = Files.createDirectories(dir.resolve("examples")).resolve("fuzzed.yaml");
        List<byte[]> seeds = List.of(Fuzz.utf8(BadInputTest.BASE), resource("starter-backup.yaml"),
                resource("starter-off-grid.yaml"), Files.readAllBytes(Path.of("examples/ridge-cabin-offgrid.yaml")));
        int[] exits = new int[4];
        Fuzz.of("command-line", 41, CI_TRIES).run(project.toString(),
                r -> Mutator.mutate(seeds.get(r.nextInt(seeds.size())), Mutator.Kind.YAML, r),
                (input, r) -> {
                    Files.write(project, input);
                    Cli c = Cli.run("check", project.toString());
                    if (c.exit == Main.INTERNAL || c.exit > Main.INTERNAL || c.exit < 0) {
                        throw new IllegalStateException("exit " + c.exit + ": " + c.err);
                    }
                    exits[c.exit]++;
                    assertThat(c.err).as("no stack trace").doesNotContain("\tat ").doesNotContain("Exception");
                    if (c.exit == Main.BAD_INPUT) {
                        assertThat(c.out).isEmpty();
                        // One problem per line, each naming a file (the project, or a file it names).
                        for (String line : c.err.lines().toList()) {
                            assertThat(line).matches("^[^\\s].*?(:\\d+)*: .*").doesNotContainPattern("\\p{Cntrl}");
                        }
                        throw new Fuzz.Refused();
                    }
                });
        System.out.printf("fuzz command-line: exit 0 (sized, passes) %d, exit 1 (sized, fails a check) %d, exit 2 (bad input) %d%n",
                exits[0], exits[1], exits[2]);
    }

    private static byte[] resource(String name) throws IOException {
        try (InputStream in = InitCommand.class.getResourceAsStream(name)) {
            return in.readAllBytes();
        }
    }
}
