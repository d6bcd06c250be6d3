package org.holdover.testing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;

/** The library-evaluator check needs no external program. */
class PoiRecalcTest {

    /** See SpreadsheetRecalcTest: iterated drift about 1e-12 relative over 9,000 rows. */
    private static final double CLOSED_FORM_RELATIVE = 1e-9;

    private final Path dir = Artifacts.dir("poi-recalc");

    @Test
    void rightCachedValuesAgree() {
        RecalcReport report = PoiRecalc.recalculate(TestWorkbooks.sizingSketch(dir.resolve("sizing.xlsx")));
        report.assertAgrees();
        assertThat(report.cell(TestWorkbooks.BANK, "B3").cached()).isEqualTo(new CellResult.Numeric(232));
        assertThat(report.cell(TestWorkbooks.BANK, "B6").cached()).isEqualTo(new CellResult.ErrorCode("#N/A"));
    }

    @Test
    void wrongCachedValuesAreFound() {
        RecalcReport report = PoiRecalc.recalculate(TestWorkbooks.sizingSketchWithWrongCache(dir.resolve("wrong.xlsx")));
        assertThat(report.disagreements(Tolerance.DEFAULT)).extracting(FormulaCell::address)
                .containsExactly("B2", "B4", "B5");
        assertThatThrownBy(report::assertAgrees).isInstanceOf(AssertionError.class).hasMessageContaining("B2");
    }

    @Test
    void nineThousandRowChainsEvaluateInBothDirections() {
        RecalcReport report = PoiRecalc.recalculate(TestWorkbooks.chains(dir.resolve("chains.xlsx"), true));
        report.assertAgrees();
        int n = TestWorkbooks.CHAIN_ROWS;
        double down = ((CellResult.Numeric) report.cell("Down", "A" + n).recomputed()).value();
        double up = ((CellResult.Numeric) report.cell("Up", "A1").recomputed()).value();
        double expected = TestWorkbooks.chainValue(n - 1);
        assertThat(down).isCloseTo(expected, within(CLOSED_FORM_RELATIVE * expected));
        assertThat(up).isCloseTo(expected, within(CLOSED_FORM_RELATIVE * expected));
    }

    @Test
    void aFormulaTheLibraryCannotEvaluateIsADisagreement() throws Exception {
        Path file = dir.resolve("unsupported.xlsx");
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            workbook.createSheet("S").createRow(0).createCell(0).setCellFormula("_xlfn.XOR(TRUE,FALSE)");
            TestWorkbooks.save(workbook, file);
        }
        RecalcReport report = PoiRecalc.recalculate(file);
        assertThat(report.cells()).singleElement().satisfies(cell -> {
            assertThat(cell.recomputed()).isInstanceOf(CellResult.Unevaluated.class);
            assertThat(cell.agrees(Tolerance.DEFAULT)).isFalse();
        });
        try (XSSFWorkbook workbook = WorkbookCells.open(file)) {
            assertThatThrownBy(() -> PoiRecalc.storeCachedValues(workbook)).isInstanceOf(IllegalStateException.class)
                    .hasMessageContaining("S!A1");
        }
    }

    @Test
    void aWorkbookWithoutFormulasFailsTheCheckRatherThanPassingEmpty() throws Exception {
        Path file = dir.resolve("no-formulas.xlsx");
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            workbook.createSheet("S").createRow(0).createCell(0).setCellValue(1);
            TestWorkbooks.save(workbook, file);
        }
        assertThatThrownBy(() -> PoiRecalc.recalculate(file).assertAgrees()).hasMessageContaining("no formula cells");
    }
}
