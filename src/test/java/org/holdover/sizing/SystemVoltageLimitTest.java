package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.holdover.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code solar.systemVoltageLimitV}: the project's maximum PV system voltage bounds the string length. */
class SystemVoltageLimitTest {

    private static SizingInput cabinWith(Path dir, String solarLine) throws Exception {
        String yaml = Files.readString(Path.of(Demos.CABIN), StandardCharsets.UTF_8)
                .replace("../load-profiles/", Path.of("load-profiles").toAbsolutePath() + "/")
                .replace("\nsolar:\n", "\nsolar:\n" + solarLine);
        Path p = dir.resolve("cabin.yaml");
        Files.writeString(p, yaml, StandardCharsets.UTF_8);
        return ProjectAssembler.assemble(ProjectReader.read(p, "cabin.yaml"));
    }

    @Test
    void theDefaultIsTheDwellingLimitAndTheProjectCanLowerIt(@TempDir Path dir) throws Exception {
        SizingInput plain = cabinWith(dir, "");
        // NEC 2023 690.7: 600 V for one- and two-family dwellings.
        assertThat(plain.solar().systemVoltageLimitV()).isEqualTo(600.0);
        SizingInput low = cabinWith(dir, "  systemVoltageLimitV: 150\n");
        assertThat(low.solar().systemVoltageLimitV()).isEqualTo(150.0);
        assertThat(low.assumptions()).anyMatch(a -> a.name().startsWith("Maximum PV system voltage") && a.value() == 150
                && a.givenBy().equals("project"));
        SizingResult r = Sizing.rules(low, null);
        Check c = r.checks().stream().filter(k -> k.id().equals(PvSizing.SYSTEM_VOLTAGE)).findFirst().orElseThrow();
        assertThat(c.limit()).isEqualTo(150.0);
        assertThat(c.value()).isLessThanOrEqualTo(150.0).isPositive();
        // With the project's limit the string window is floor(150 V ÷ one module's cold V_oc) modules at most.
        var cand = r.solar().chosen().candidate();
        double perModule = c.value() / cand.modulesPerString();
        assertThat(cand.modulesPerString()).isLessThanOrEqualTo((int) Math.floor(150.0 / perModule + 1e-12));
    }
}
