package org.holdover.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.holdover.sizing.ProjectAssembler;
import org.holdover.sizing.Sizing;
import org.holdover.sizing.SizingResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * User text that starts with {@code = + - @} (project name, appliance names, notes, catalog ids and
 * descriptions) stays text in the workbook: read back with the library, each is a STRING cell with the
 * exact text, and no formula anywhere contains it. (A spreadsheet application would run such text as a
 * formula if it were written as one: "CSV injection" in the OWASP testing guide.)
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class UserTextStaysTextTest {

    static final String NAME = "=HYPERLINK(\"http://example.invalid\",\"open\") demo data";
    static final List<String> APPLIANCES = List.of("+7777+1 fridge", "-8888+3 pump", "@SUM(Q9:Q99) lights",
            "=cmd|' /C calc'!A0");
    static final List<String> NOTES = List.of("=9191+1", "+SUM(9292,1)", "-9393", "@NOW() 9494");
    static final List<String> CATALOG_TEXT = List.of("=INV-7171", "@inverter 7373 (demo data)", "+BAT-7272",
            "-module 7474 (demo data)");

    private static String q(String s) {
        return "\"" + s.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }

    static String project() {
        return String.join("\n",
                "name: " + q(NAME),
                "mode: off-grid",
                "site:",
                "  latitudeDeg: 45.0",
                "  longitudeDeg: 7.0",
                "  timeZone: Europe/Rome",
                "  ac: { voltsRms: 230, frequencyHz: 50, wiring: single }",
                "  batteryAmbientC: { coldest: 5, design: 15 }",
                "loads:",
                "  appliances:",
                "    - { name: " + q(APPLIANCES.get(0)) + ", watts: 120, powerFactor: 0.75, dutyCycle: 0.35,"
                        + " motor: { startMultiple: 6, startSeconds: 0.5 } }",
                "    - { name: " + q(APPLIANCES.get(1)) + ", watts: 400, powerFactor: 0.8, hoursPerDay: 1,"
                        + " motor: { startMultiple: 5, startSeconds: 1 } }",
                "    - { name: " + q(APPLIANCES.get(2)) + ", watts: 100, hoursPerDay: 4, hours: [\"18-23\"] }",
                "    - { name: " + q(APPLIANCES.get(3)) + ", watts: 60, hoursPerDay: 2 }",
                "offGrid: { autonomyDays: 2 }",
                "catalog: parts.yaml",
                "notes: [" + String.join(", ", NOTES.stream().map(UserTextStaysTextTest::q).toList()) + "]",
                "");
    }

    static String catalog() {
        return String.join("\n",
                "name: My parts (demo data)",
                "demoData: true",
                "inverters:",
                "  - id: " + q(CATALOG_TEXT.get(0)),
                "    description: " + q(CATALOG_TEXT.get(1)),
                "    busClassV: 48",
                "    dcWindowV: { min: 42, max: 64 }",
                "    ac: { voltsRms: 230, frequenciesHz: [50], splitPhase: false }",
                "    continuousW: 3000",
                "    surge: [{ seconds: 5, va: 6000 }]",
                "    efficiency: [{ loadPct: 10, pct: 90 }, { loadPct: 50, pct: 94 }, { loadPct: 100, pct: 92 }]",
                "    noLoadW: 20",
                "    price: 900",
                "batteryModules:",
                "  - id: " + q(CATALOG_TEXT.get(2)),
                "    description: " + q(CATALOG_TEXT.get(3)),
                "    chemistry: lifepo4",
                "    nominalV: 51.2",
                "    capacityAh: 100",
                "    rateHours: 5",
                "    internalResistanceMilliohm: 15",
                "    maxContinuousA: 100",
                "    maxChargeA: 50",
                "    maxParallel: 8",
                "    price: 1500",
                "");
    }

    private final List<Cell> strings = new ArrayList<>();
    private final List<Cell> formulas = new ArrayList<>();

    @BeforeAll
    void writeAndReadBack(@TempDir Path dir) throws IOException, InputException {
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, project(), StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("parts.yaml"), catalog(), StandardCharsets.UTF_8);
        SizingResult r = Sizing.run(ProjectAssembler.assemble(ProjectReader.read(project, "project.yaml")));
        assertThat(r.passes()).as("the test project sizes with the test catalog").isTrue();
        Path out = dir.resolve("text.xlsx");
        WorkbookWriter.write(r, out, false);
        try (InputStream in = Files.newInputStream(out); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            for (Sheet sheet : wb) {
                for (Row row : sheet) {
                    for (Cell cell : row) {
                        if (cell.getCellType() == CellType.STRING) {
                            strings.add(cell);
                        } else if (cell.getCellType() == CellType.FORMULA) {
                            formulas.add(cell);
                        }
                    }
                }
            }
        }
        assertThat(formulas).as("the workbook has its formulas").hasSizeGreaterThan(10_000);
    }

    @Test
    void appliancesNotesAndCatalogTextAreStringCellsWithTheExactText() {
        List<String> exact = new ArrayList<>(APPLIANCES);
        exact.addAll(NOTES);
        exact.addAll(CATALOG_TEXT);
        for (String text : exact) {
            assertThat(strings).as(text).anySatisfy(c -> assertThat(c.getStringCellValue()).isEqualTo(text));
        }
    }

    @Test
    void theProjectNameIsTextInTheTitles() {
        assertThat(strings).anySatisfy(c -> assertThat(c.getStringCellValue()).isEqualTo("Sizing summary: " + NAME));
        assertThat(strings).anySatisfy(c -> assertThat(c.getStringCellValue()).isEqualTo("Loads: " + NAME));
    }

    @Test
    void noFormulaContainsUserText() {
        // A formula may refer to a cell that holds user text (e.g. the motor table's names); it must never
        // contain the text itself. The leading = + - @ is left off, as it would be if the text were stored as
        // a formula.
        List<String> all = new ArrayList<>(APPLIANCES);
        all.addAll(NOTES);
        all.addAll(CATALOG_TEXT);
        all.add(NAME);
        for (Cell f : formulas) {
            String formula = f.getCellFormula();
            for (String text : all) {
                assertThat(formula).as(f.getSheet().getSheetName() + "!" + f.getAddress()).doesNotContain(text.substring(1));
            }
        }
    }
}
