package org.holdover.testing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The spreadsheet-application harness on workbooks built here: right cached values pass, wrong ones
 * are found cell by cell, every kind of result survives the round trip, and a 9,000-row chain is
 * recomputed. All workbooks go through one application run.
 */
class SpreadsheetRecalcTest {

    /**
     * The chain's closed form against the iterated cells: 9,000 multiply-adds each round to half an
     * ulp, so the iterated value drifts by up to about 9,000 * 1.1e-16 = 1e-12 relative; 1e-9 leaves
     * room and would still catch a single wrong row (a change of 0.5 in about 7,000).
     */
    private static final double CLOSED_FORM_RELATIVE = 1e-9;

    private static Path right;
    private static RecalcReport rightReport;
    private static RecalcReport wrongReport;
    private static RecalcReport chainReport;
    private static RecalcReport sameNameReport;

    @BeforeAll
    static void recalculateAll() throws Exception {
        Path dir = Artifacts.dir("recalc-harness");
        right = TestWorkbooks.sizingSketch(dir.resolve("sizing.xlsx"));
        Path wrong = TestWorkbooks.sizingSketchWithWrongCache(dir.resolve("sizing-wrong-cache.xlsx"));
        Path chain = TestWorkbooks.chains(dir.resolve("chain.xlsx"), false);
        Path sameName = Files.createDirectories(dir.resolve("other")).resolve("sizing.xlsx");
        TestWorkbooks.sizingSketchWithWrongCache(sameName);
        List<RecalcReport> reports = SpreadsheetRecalc.recalculate(right, wrong, chain, sameName);
        rightReport = reports.get(0);
        wrongReport = reports.get(1);
        chainReport = reports.get(2);
        sameNameReport = reports.get(3);
    }

    @Test
    void rightCachedValuesAgree() {
        rightReport.assertAgrees();
        assertThat(rightReport.cells()).hasSize(9);
        assertThat(rightReport.recalculated()).isNotEqualTo(rightReport.source()).exists();
    }

    @Test
    void everyKindOfResultIsRecomputedAsTheDefinitionSays() {
        // Inputs (demo data): 1200 + 850 + 2400 = 4450 Wh/day; x 2 days / 0.8 = 11,125 Wh; / 48 V = 231.8 -> 232 Ah.
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B1").recomputed()).isEqualTo(new CellResult.Numeric(4450));
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B2").recomputed()).isEqualTo(new CellResult.Numeric(11125));
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B3").recomputed()).isEqualTo(new CellResult.Numeric(232));
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B4").recomputed()).isEqualTo(new CellResult.Text("large bank"));
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B5").recomputed()).isEqualTo(new CellResult.Logical(true));
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B6").recomputed()).isEqualTo(new CellResult.ErrorCode("#N/A"));
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B7").recomputed()).isEqualTo(new CellResult.Text("no data"));
        assertThat(rightReport.cell(TestWorkbooks.BANK, "B8").recomputed()).isEqualTo(new CellResult.ErrorCode("#DIV/0!"));
        CellResult irrational = rightReport.cell(TestWorkbooks.BANK, "B9").recomputed();
        assertThat(irrational).isInstanceOf(CellResult.Numeric.class);
        // the application writes 15 significant digits: within 1e-14 relative of the double
        assertThat(((CellResult.Numeric) irrational).value()).isCloseTo(Math.sqrt(11125) * Math.PI, within(1e-14 * 332));
    }

    @Test
    void wrongCachedValuesAreFoundCellByCell() {
        List<FormulaCell> bad = wrongReport.disagreements(Tolerance.DEFAULT);
        assertThat(bad).extracting(FormulaCell::address).containsExactly("B2", "B4", "B5");
        assertThat(bad.get(0).relativeDifference()).isCloseTo(1e-6, within(1e-9));
        assertThat(bad.get(1).cached()).isEqualTo(new CellResult.Text("small bank"));
        assertThat(bad.get(1).recomputed()).isEqualTo(new CellResult.Text("large bank"));
        assertThat(bad.get(2).cached()).isEqualTo(new CellResult.Logical(false));
        assertThatThrownBy(wrongReport::assertAgrees).isInstanceOf(AssertionError.class)
                .hasMessageContaining("3 disagree").hasMessageContaining("'Battery bank'!B2");
    }

    @Test
    void worstDifferenceIsReportedWithItsCell() {
        FormulaCell worst = wrongReport.worst(Tolerance.DEFAULT).orElseThrow();
        // a text or logical mismatch is an infinite difference, and the first such cell is B4
        assertThat(worst.relativeDifference()).isInfinite();
        FormulaCell worstOfRight = rightReport.worst(Tolerance.DEFAULT).orElseThrow();
        assertThat(worstOfRight.relativeDifference()).isLessThan(Tolerance.DEFAULT.relative());
        assertThat(rightReport.summary(Tolerance.DEFAULT)).contains("worst: 'Battery bank'!");
    }

    @Test
    void differenceWithinToleranceIsNotFlaggedButIsSeen() {
        FormulaCell nearly = wrongReport.cell(TestWorkbooks.BANK, "B9");
        assertThat(nearly.agrees(Tolerance.DEFAULT)).isTrue();
        assertThat(nearly.relativeDifference()).isGreaterThan(1e-13).isLessThan(1e-11);
        assertThat(nearly.agrees(new Tolerance(1e-14, 0))).isFalse();
    }

    @Test
    void workbooksWithTheSameFileNameDoNotOverwriteEachOther() {
        assertThat(sameNameReport.recalculated()).isNotEqualTo(rightReport.recalculated());
        assertThat(sameNameReport.disagreements(Tolerance.DEFAULT)).hasSize(3);
    }

    @Test
    void nineThousandRowChainIsRecomputed() {
        chainReport.assertAgrees();
        int n = TestWorkbooks.CHAIN_ROWS;
        assertThat(chainReport.cells()).hasSize(2 * n - 1);
        double last = ((CellResult.Numeric) chainReport.cell("Down", "A" + n).recomputed()).value();
        double sum = ((CellResult.Numeric) chainReport.cell("Down", "B" + n).recomputed()).value();
        assertThat(last).isCloseTo(TestWorkbooks.chainValue(n - 1), within(CLOSED_FORM_RELATIVE * last));
        assertThat(sum).isCloseTo(TestWorkbooks.chainSum(n), within(CLOSED_FORM_RELATIVE * sum));
    }

    @Test
    void aFileTheApplicationCannotOpenIsAnErrorEvenThoughItExitsWithZero() throws Exception {
        Path broken = Artifacts.dir("recalc-harness").resolve("broken.xlsx");
        Files.write(broken, new byte[] {'P', 'K', 3, 4, 'b', 'r', 'o', 'k', 'e', 'n'});
        assertThatThrownBy(() -> SpreadsheetRecalc.recalculate(broken)).isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("exited with 0").hasMessageContaining("missing outputs");
    }

    @Test
    void theLibraryAgreesWithTheApplicationOnTheSameWorkbook() {
        RecalcReport library = PoiRecalc.recalculate(right);
        library.assertAgrees();
        for (FormulaCell cell : library.cells()) {
            FormulaCell pair = new FormulaCell(cell.sheet(), cell.address(), cell.formula(), cell.recomputed(),
                    rightReport.cell(cell.sheet(), cell.address()).recomputed());
            assertThat(pair.agrees(Tolerance.DEFAULT)).as(pair.describe()).isTrue();
        }
    }
}
