package org.holdover.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.holdover.sizing.ProjectAssembler;
import org.holdover.sizing.Sizing;
import org.holdover.sizing.SizingResult;
import org.holdover.testing.Artifacts;
import org.holdover.testing.ExternalTools;
import org.holdover.testing.PaperRender;
import org.holdover.testing.PoiRecalc;
import org.holdover.testing.RecalcReport;
import org.holdover.testing.SafeFunctions;
import org.holdover.testing.SpreadsheetRecalc;
import org.holdover.testing.Tolerance;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

/**
 * The demo workbooks: every formula cell must recompute to the engine's cached value (relative 1e-9) in
 * POI's evaluator and in a real spreadsheet application, use only functions both evaluate alike, and
 * the summary must fit its page width when printed.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class DemoWorkbooksTest {

    /**
     * The two demos, their lifetime-cost and generator variants (cycle charging and load following), the whole-shop
     * variant (identical inverters in parallel), and the two
     * starter projects of {@code holdover init}: their loads repeat day after day, so months and outage windows tie exactly, which is where a spreadsheet's own summation order could pick
     * another month than the engine did.
     */
    static final List<String> DEMOS = List.of("examples/farm-shop-backup.yaml", "examples/ridge-cabin-offgrid.yaml",
            "src/main/resources/org/holdover/cli/starter-backup.yaml", "src/main/resources/org/holdover/cli/starter-off-grid.yaml",
            "examples/variants/cabin-lifetime-cost.yaml", "examples/variants/cabin-generator.yaml",
            "examples/variants/cabin-generator-load-following.yaml", "examples/variants/cabin-generator-lifetime.yaml",
            "examples/variants/farm-shop-whole-shop.yaml");
    private final List<Path> workbooks = new ArrayList<>();

    @BeforeAll
    void writeDemoWorkbooks() throws IOException, InputException {
        Path dir = Artifacts.dir("demo-workbooks");
        for (String demo : DEMOS) {
            Path project = Path.of(demo);
            var p = ProjectReader.read(project, demo);
            SizingResult r = Sizing.run(ProjectAssembler.assemble(p), ProjectAssembler.searchOptions(p.input(), null, null));
            assertThat(r.passes()).as(demo + " passes every check").isTrue();
            if (demo.contains("generator")) {
                // The generator variants exist to show a chosen system with a generator running in the simulated year.
                assertThat(r.generator()).as(demo + " chooses a generator").isNotNull();
                assertThat(r.year().metrics().generator().hours()).as(demo + " runs it").isPositive();
            }
            if (demo.contains("whole-shop")) {
                // The whole-shop variant exists to show a chosen system with identical inverters in parallel.
                assertThat(r.inverter().spec().units()).as(demo + " puts inverters in parallel").isGreaterThan(1);
            }
            Path out = dir.resolve(project.getFileName().toString().replace(".yaml", ".xlsx"));
            WorkbookWriter.write(r, out, true);
            workbooks.add(out);
        }
    }

    @Test
    void poiRecomputesEveryFormulaToTheEngineValue() {
        for (Path wb : workbooks) {
            RecalcReport report = PoiRecalc.recalculate(wb);
            assertThat(report.cells()).as("formula cells in " + wb.getFileName()).hasSizeGreaterThan(40_000);
            System.out.println(report.summary(Tolerance.DEFAULT));
            report.assertAgrees(Tolerance.DEFAULT);
        }
    }

    @Test
    void aSpreadsheetApplicationRecomputesEveryFormulaToTheEngineValue() {
        ExternalTools.requireOffice();
        for (RecalcReport report : SpreadsheetRecalc.recalculate(workbooks)) {
            System.out.println(report.summary(Tolerance.DEFAULT));
            report.assertAgrees(Tolerance.DEFAULT);
        }
    }

    @Test
    void onlyFunctionsBothEvaluatorsAgreeOn() throws IOException {
        for (Path wb : workbooks) {
            assertThat(SafeFunctions.unsafeFunctionUses(wb)).as(wb.getFileName().toString()).isEmpty();
        }
    }

    @Test
    void summaryPrintsWithinThePageWidth() throws IOException {
        ExternalTools.requireOffice();
        ExternalTools.requirePdfTools();
        for (Path wb : workbooks.subList(0, 2)) {
            PaperRender.SheetFit fit = PaperRender.measureFit(wb, "Summary");
            System.out.println(fit.describe());
            fit.assertFitsPageWidth(0.6);
            Path pdf = PaperRender.toPdf(wb);
            Path png = PaperRender.pageToPng(pdf, 1, 60);
            Path kept = Artifacts.dir("demo-pages").resolve(wb.getFileName().toString().replace(".xlsx", "-page1.png"));
            Files.copy(png, kept, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            assertThat(PaperRender.pageText(pdf, 1)).contains("Sizing summary");
        }
    }
}
