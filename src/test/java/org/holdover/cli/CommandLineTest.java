package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The commands end to end, in-process. */
class CommandLineTest {

    @Test
    void sizesADemoAndNeverOverwritesWithoutForce(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("cabin.xlsx");
        Cli first = Cli.run("size", "examples/ridge-cabin-offgrid.yaml", "-o", out.toString());
        assertThat(first.exit).as(first.err).isEqualTo(Main.OK);
        assertThat(first.out).contains("bus: 48 V").contains("pass").contains("Workbook: " + out);
        assertThat(first.out).contains("Cautions:").contains("local codes govern");
        assertThat(Files.size(out)).isGreaterThan(100_000);
        byte[] before = Files.readAllBytes(out);

        Cli again = Cli.run("size", "examples/ridge-cabin-offgrid.yaml", "-o", out.toString());
        assertThat(again.exit).isEqualTo(Main.BAD_INPUT);
        assertThat(again.err).contains(out + " already exists; add --force to replace it");
        assertThat(Files.readAllBytes(out)).as("the existing workbook is untouched").isEqualTo(before);

        Cli forced = Cli.run("size", "examples/ridge-cabin-offgrid.yaml", "-o", out.toString(), "--force");
        assertThat(forced.exit).isEqualTo(Main.OK);
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files.map(p -> p.getFileName().toString())).as("no temporary files left").containsExactly("cabin.xlsx");
        }
    }

    @Test
    void theTwelveVoltVariantFailsItsStartWithTheFixes(@TempDir Path dir) {
        Cli r = Cli.run("size", "examples/variants/cabin-12v-well-pump.yaml", "-o", dir.resolve("v.xlsx").toString());
        assertThat(r.exit).isEqualTo(Main.FAILS_CHECKS);
        assertThat(r.out).contains("NO SYSTEM").contains("below its 10.5 V cutoff").contains("24 V bus").contains("soft starter");
    }

    @Test
    void checkWritesNothing(@TempDir Path dir) {
        Cli r = Cli.run("check", "examples/farm-shop-backup.yaml");
        assertThat(r.exit).isEqualTo(Main.OK);
        assertThat(r.out).contains("Hill farm shop").contains("inverter: DEMO-INV-48-6000S");
        assertThat(r.err).contains("warning:").contains("repeat clock times when daylight saving time ends");
    }

    @Test
    void initWritesAStarterThatSizes(@TempDir Path dir) {
        for (String mode : new String[] {"backup", "off_grid"}) {
            Path p = dir.resolve(mode + ".yaml");
            Cli init = Cli.run("init", p.toString(), "--mode", mode);
            assertThat(init.exit).isEqualTo(Main.OK);
            Cli size = Cli.run("size", p.toString(), "-o", dir.resolve(mode + ".xlsx").toString());
            assertThat(size.exit).as(size.err).isEqualTo(Main.OK);
            Cli again = Cli.run("init", p.toString());
            assertThat(again.exit).isEqualTo(Main.BAD_INPUT);
            assertThat(again.err).contains("already exists");
        }
    }

    @Test
    void helpAndVersionAndUnknownOptions() {
        Cli help = Cli.run("size", "--help");
        assertThat(help.exit).isZero();
        assertThat(help.out).contains("PROJECT").contains("--force").contains("--output");
        assertThat(Cli.run("--version").out).startsWith("holdover");
        Cli bad = Cli.run("size", "--frobnicate", "x.yaml");
        assertThat(bad.exit).isEqualTo(Main.BAD_INPUT);
        assertThat(bad.err).contains("Unknown option");
        Cli missing = Cli.run("size", "no/such/project.yaml");
        assertThat(missing.exit).isEqualTo(Main.BAD_INPUT);
        assertThat(missing.err.strip()).isEqualTo("no/such/project.yaml: no such file; check the path");
    }

    @Test
    void aProjectNoSystemPassesExitsWithOneAndStillWritesTheRecord(@TempDir Path dir) throws IOException {
        String text = Files.readString(Path.of("examples/ridge-cabin-offgrid.yaml"))
                .replace("watts: 1200", "watts: 30000");
        Path p = dir.resolve("huge.yaml");
        Files.writeString(p, text.replace("../load-profiles/", Path.of("load-profiles").toAbsolutePath() + "/"));
        Cli r = Cli.run("size", p.toString(), "-o", dir.resolve("huge.xlsx").toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.FAILS_CHECKS);
        assertThat(r.out).contains("NO SYSTEM in the catalog passes every check");
        assertThat(Files.exists(dir.resolve("huge.xlsx"))).isTrue();
    }
}
