package org.holdover.testing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Proves {@link SafeFunctions}: every listed function gives, in the spreadsheet application and in the
 * library's evaluator, the value its definition gives (see {@link FunctionCase} for the source); and
 * every rule's pitfall behaves on this machine as the Javadoc says.
 */
class SafeFunctionsTest {

    private static final String CASES_SHEET = "Cases";
    private static final String PITFALLS_SHEET = "Pitfalls";

    /** The documented divergences; each pair of values was observed with LibreOffice 7.4 and POI 5.5. */
    private record Pitfall(String rule, String formula, CellResult library, CellResult office) {
    }

    private static final String D = "'" + FunctionCase.DATA_SHEET + "'!";
    private static final CellResult NOT_EVALUATED = new CellResult.Unevaluated("any reason");

    private static final List<Pitfall> PITFALLS = List.of(
            new Pitfall("1 unary minus before ^", "-2^2", num(-4), num(4)),
            new Pitfall("2 array expression in SUMPRODUCT", "SUMPRODUCT((" + D + "A1:A5>2)*" + D + "B1:B5)",
                    num(0), num(120)),
            new Pitfall("2 array expression in SUMPRODUCT", "SUMPRODUCT(--(" + D + "A1:A5>2)," + D + "B1:B5)",
                    new CellResult.ErrorCode("#VALUE!"), num(120)),
            new Pitfall("2 array constant arithmetic", "SUM({1,2,3}*2)", num(4), num(12)),
            new Pitfall("3 step function near a step", "ROUNDUP(2000+1E-9,0)", num(2001), num(2000)),
            new Pitfall("3 step function near a step", "ROUNDDOWN(2.99999999999999,0)", num(2), num(3)),
            new Pitfall("3 step function near a step", "MOD(2.3,0.1)", num(2.3 - 0.1 * 22), num(0)),
            new Pitfall("3 step function near a step", "INT(LOG10(1000))", num(2), num(3)),
            new Pitfall("4 exact match on a computed number", "MATCH(1-0.7," + D + "I1:I3,0)",
                    new CellResult.ErrorCode("#N/A"), num(3)),
            new Pitfall("4 comparison of computed numbers", D + "I3<0.3+1E-15", new CellResult.Logical(true),
                    new CellResult.Logical(false)),
            new Pitfall("5 CEILING of a negative number", "CEILING(-2.5,2)", num(-2), num(-2)),
            new Pitfall("6 domain errors differ in kind", "SQRT(-1)", new CellResult.ErrorCode("#NUM!"),
                    new CellResult.ErrorCode("#VALUE!")),
            new Pitfall("newer function without its prefix", "IFS(" + D + "A1>2,1,TRUE,2)", num(2),
                    new CellResult.ErrorCode("#NAME?")),
            new Pitfall("newer function unknown to the application", "_xlfn.XLOOKUP(3," + D + "A1:A5," + D + "B1:B5)",
                    num(30), new CellResult.ErrorCode("#NAME?")),
            new Pitfall("newer function unknown to the library", "_xlfn.XOR(TRUE,FALSE)", NOT_EVALUATED,
                    new CellResult.Logical(true)),
            new Pitfall("9 cancellation residue", "0.1+0.2-0.3", num(0.1 + 0.2 - 0.3), num(0)));

    private static RecalcReport office;
    private static RecalcReport library;
    private static RecalcReport pitfallsOffice;
    private static RecalcReport pitfallsLibrary;

    @BeforeAll
    static void recalculate() throws IOException {
        Path dir = Artifacts.dir("safe-functions");
        Path cases = dir.resolve("functions.xlsx");
        Path pitfalls = dir.resolve("pitfalls.xlsx");
        write(cases, CASES_SHEET, FunctionCase.ALL.stream().map(FunctionCase::formula).toList(), true);
        write(pitfalls, PITFALLS_SHEET, PITFALLS.stream().map(Pitfall::formula).toList(), false);
        library = PoiRecalc.recalculate(cases);
        pitfallsLibrary = PoiRecalc.recalculate(pitfalls);
        List<RecalcReport> reports = SpreadsheetRecalc.recalculate(cases, pitfalls);
        office = reports.get(0);
        pitfallsOffice = reports.get(1);
    }

    private static void write(Path file, String sheetName, List<String> formulas, boolean cache) throws IOException {
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            FunctionCase.writeData(workbook);
            Sheet sheet = workbook.createSheet(sheetName);
            for (int i = 0; i < formulas.size(); i++) {
                Row row = sheet.createRow(i);
                row.createCell(1).setCellFormula(formulas.get(i));
            }
            if (cache) {
                PoiRecalc.storeCachedValues(workbook);
            }
            try (OutputStream out = Files.newOutputStream(file)) {
                workbook.write(out);
            }
        }
    }

    static Stream<Arguments> cases() {
        return IntStream.range(0, FunctionCase.ALL.size())
                .mapToObj(i -> Arguments.of(i, FunctionCase.ALL.get(i).function(), FunctionCase.ALL.get(i)));
    }

    @ParameterizedTest(name = "{1}: {2}")
    @MethodSource("cases")
    void spreadsheetApplicationGivesTheDefinedValue(int index, String function, FunctionCase c) {
        FormulaCell cell = office.cell(CASES_SHEET, "B" + (index + 1));
        assertThat(cell.formula()).isEqualTo(c.formula());
        FormulaCell versusDefinition = new FormulaCell(CASES_SHEET, cell.address(), c.formula(), c.expected(),
                cell.recomputed());
        assertThat(versusDefinition.agrees(Tolerance.DEFAULT)).as(versusDefinition.describe()).isTrue();
    }

    @ParameterizedTest(name = "{1}: {2}")
    @MethodSource("cases")
    void libraryGivesTheDefinedValue(int index, String function, FunctionCase c) {
        FormulaCell cell = library.cell(CASES_SHEET, "B" + (index + 1));
        FormulaCell versusDefinition = new FormulaCell(CASES_SHEET, cell.address(), c.formula(), c.expected(),
                cell.recomputed());
        assertThat(versusDefinition.agrees(Tolerance.DEFAULT)).as(versusDefinition.describe()).isTrue();
    }

    @Test
    void bothEvaluatorsAgreeOnEveryCase() {
        office.assertAgrees();
        library.assertAgrees();
    }

    @Test
    void everyListedFunctionIsProvenByACase() {
        Set<String> proven = new TreeSet<>();
        FunctionCase.ALL.forEach(c -> proven.addAll(SafeFunctions.functionsIn(c.formula())));
        Set<String> listed = new TreeSet<>(SafeFunctions.SAFE);
        listed.addAll(SafeFunctions.SAFE_WITH_PREFIX);
        assertThat(proven).containsAll(listed);
        Set<String> named = new TreeSet<>();
        FunctionCase.ALL.stream().map(FunctionCase::function).filter(f -> !f.startsWith("(")).forEach(named::add);
        assertThat(named).isEqualTo(listed);
    }

    @Test
    void everyCaseUsesOnlyListedFunctions() {
        FunctionCase.ALL.forEach(c -> assertThat(SafeFunctions.unsafeFunctions(c.formula())).as(c.formula()).isEmpty());
    }

    @Test
    void everyTextFormatUsedIsListed() {
        Set<String> formats = new TreeSet<>();
        FunctionCase.ALL.stream().filter(c -> c.function().equals("TEXT"))
                .forEach(c -> formats.add(c.formula().replaceAll(".*,\"(.*)\"\\)$", "$1")));
        assertThat(formats).isEqualTo(new TreeSet<>(SafeFunctions.SAFE_TEXT_FORMATS));
    }

    static Stream<Arguments> pitfalls() {
        return IntStream.range(0, PITFALLS.size()).mapToObj(i -> Arguments.of(i, PITFALLS.get(i).rule(), PITFALLS.get(i)));
    }

    @ParameterizedTest(name = "rule {1}: {2}")
    @MethodSource("pitfalls")
    void pitfallBehavesAsDocumented(int index, String rule, Pitfall pitfall) {
        String address = "B" + (index + 1);
        assertSame(pitfall.office(), pitfallsOffice.cell(PITFALLS_SHEET, address).recomputed(), pitfall.formula());
        assertSame(pitfall.library(), pitfallsLibrary.cell(PITFALLS_SHEET, address).recomputed(), pitfall.formula());
    }

    @Test
    void rulesNineResidueIsWithinTheDefaultToleranceAndNothingElseIs() {
        for (int i = 0; i < PITFALLS.size(); i++) {
            String address = "B" + (i + 1);
            FormulaCell both = new FormulaCell(PITFALLS_SHEET, address, PITFALLS.get(i).formula(),
                    pitfallsLibrary.cell(PITFALLS_SHEET, address).recomputed(),
                    pitfallsOffice.cell(PITFALLS_SHEET, address).recomputed());
            boolean sameByRule = PITFALLS.get(i).library().equals(PITFALLS.get(i).office());
            boolean residue = PITFALLS.get(i).rule().startsWith("9 ");
            assertThat(both.agrees(Tolerance.DEFAULT)).as(both.describe()).isEqualTo(sameByRule || residue);
        }
    }

    private static void assertSame(CellResult expected, CellResult actual, String formula) {
        if (expected instanceof CellResult.Unevaluated) {
            assertThat(actual).as(formula).isInstanceOf(CellResult.Unevaluated.class);
            return;
        }
        FormulaCell pair = new FormulaCell(PITFALLS_SHEET, "?", formula, expected, actual);
        assertThat(pair.agrees(Tolerance.DEFAULT)).as(pair.describe()).isTrue();
    }

    private static CellResult num(double value) {
        return new CellResult.Numeric(value);
    }

    @Test
    void functionNamesAreFoundOutsideStringsAndSheetNames() {
        assertThat(SafeFunctions.functionsIn("=IF(A1>0,\"SUM(x)\",'Load (W)'!B2+_xlfn.MAXIFS(A:A,B:B,\">1\"))"))
                .containsExactly("IF", "_XLFN.MAXIFS");
        assertThat(SafeFunctions.functionsIn("ceiling.math(2.5)+Rate*2+'Sheet'!A1")).containsExactly("CEILING.MATH");
        assertThat(SafeFunctions.unsafeFunctions("IFS(A1>2,1,TRUE,2)+CEILING.MATH(2)+_xlfn.IFS(TRUE,1)"))
                .containsExactly("IFS", "CEILING.MATH");
    }
}
