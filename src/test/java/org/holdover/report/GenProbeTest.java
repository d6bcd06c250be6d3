package org.holdover.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.holdover.project.ProjectReader;
import org.holdover.sizing.ProjectAssembler;
import org.holdover.sizing.Sizing;
import org.holdover.sizing.SizingResult;
import org.holdover.testing.*;
import org.junit.jupiter.api.Test;

class GenProbeTest {
    @Test
    void probe() throws Exception {
        String demo = System.getProperty("probe.demo", "examples/variants/cabin-generator.yaml");
        Path project = Path.of(demo);
        var p = ProjectReader.read(project, demo);
        SizingResult r = Sizing.run(ProjectAssembler.assemble(p), ProjectAssembler.searchOptions(p.input(), null, null));
        assertThat(r.passes()).isTrue();
        Path out = Artifacts.dir("probe").resolve("probe.xlsx");
        WorkbookWriter.write(r, out, true);
        assertThat(SafeFunctions.unsafeFunctionUses(out)).isEmpty();
        RecalcReport report = PoiRecalc.recalculate(out);
        System.out.println(report.summary(Tolerance.DEFAULT));
        report.assertAgrees(Tolerance.DEFAULT);
        if (Boolean.getBoolean("probe.office")) {
            for (RecalcReport rr : SpreadsheetRecalc.recalculate(List.of(out))) {
                System.out.println(rr.summary(Tolerance.DEFAULT));
                rr.assertAgrees(Tolerance.DEFAULT);
            }
        }
    }
}
