package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The console summary of a system with a generator (the shaded-winter cabin demo, demo data). */
class GeneratorConsoleTest {

    @Test
    void theGeneratorLineAndItsYear(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("g.xlsx");
        Cli r = Cli.run("size", "examples/variants/cabin-generator.yaml", "-o", out.toString());
        assertThat(r.exit).as(r.err).isZero();
        assertThat(Files.exists(out)).isTrue();
        assertThat(r.out).containsPattern("generator: DEMO-GEN-\\S+ \\(.*demo data.*\\), [\\d,]+ W rated");
        assertThat(r.out).containsPattern("generator over the simulated year: [\\d,]+ h running, [\\d,]+ starts, [\\d,]+ L of fuel"
                + " \\([\\d,]+ at 1\\.90 per litre\\)");
        // The worst-month PV check is an advisory once the generator covers the shortfall; the battery check stays.
        assertThat(r.out).contains("(advisory: the generator covers a shortfall)");
        assertThat(r.out).containsPattern("pass +Usable energy after depth of discharge");
    }
}
