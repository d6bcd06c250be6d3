package org.holdover.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.holdover.pv.ControllerType;
import org.holdover.sizing.ProjectAssembler;
import org.holdover.sizing.Sizing;
import org.holdover.sizing.SizingResult;
import org.holdover.testing.Artifacts;
import org.holdover.testing.ExternalTools;
import org.holdover.testing.PoiRecalc;
import org.holdover.testing.RecalcReport;
import org.holdover.testing.SafeFunctions;
import org.holdover.testing.SpreadsheetRecalc;
import org.holdover.testing.Tolerance;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

/**
 * Workbooks the demos do not cover: a small 12 V cabin charged through a PWM controller (the hourly PWM operating
 * point as formulas) and a project without a solar section. Every formula recomputes to the engine's value.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PvWorkbookTest {

    /** A 12 V cabin with a PWM controller (demo data). */
    static final String PWM_CABIN = String.join("\n",
            "name: Small 12 V cabin with a PWM controller (demo data)",
            "mode: off-grid",
            "site:",
            "  latitudeDeg: 39.7",
            "  longitudeDeg: -105.0",
            "  elevationM: 1600",
            "  timeZone: America/Denver",
            "  year: 2025",
            "  ac: { voltsRms: 120, frequencyHz: 60, wiring: single }",
            "  batteryAmbientC: { coldest: 5, design: 15 }",
            "  recordLowC: -29",
            "  designHighC: 35",
            "loads:",
            "  appliances:",
            "    - name: Fridge",
            "      watts: 90",
            "      powerFactor: 0.75",
            "      dutyCycle: 0.35",
            "      motor: { startMultiple: 5, startSeconds: 0.5 }",
            "    - name: Lights",
            "      watts: 60",
            "      hoursPerDay: 5",
            "      hours: [\"17-23\"]",
            // A January-only load: with the same load every day, January and February tie in DC energy per day to the
            // last bit and the Battery sheet's MATCH(MAX(...)) may pick the other month than the engine.
            "    - name: Stock tank heater",
            "      watts: 150",
            "      hoursPerDay: 3",
            "      hours: [\"04-07\"]",
            "      months: [1]",
            "offGrid:",
            "  autonomyDays: 2",
            "battery:",
            "  chemistry: lifepo4",
            "solar:",
            "  monthlyGhiKwhM2Day: [2.6, 3.5, 4.7, 5.8, 6.5, 7.1, 6.9, 6.1, 5.2, 4.0, 2.9, 2.4]",
            "  monthlyAirTempC: [-1, 1, 5, 9, 14, 20, 23, 22, 17, 10, 4, -1]",
            "  tiltDeg: 50",
            "  controller: pwm",
            "");

    private final List<Path> workbooks = new ArrayList<>();
    private SizingResult pwm;

    @BeforeAll
    void write() throws IOException, InputException {
        Path dir = Artifacts.dir("pv-workbooks");
        Path project = dir.resolve("pwm-cabin.yaml");
        Files.writeString(project, PWM_CABIN, StandardCharsets.UTF_8);
        pwm = Sizing.run(ProjectAssembler.assemble(ProjectReader.read(project, project.toString())));
        Path out = dir.resolve("pwm-cabin.xlsx");
        WorkbookWriter.write(pwm, out, true);
        workbooks.add(out);
        Path plain = dir.resolve("no-solar.yaml");
        Files.writeString(plain, PWM_CABIN.substring(0, PWM_CABIN.indexOf("solar:")), StandardCharsets.UTF_8);
        SizingResult none = Sizing.run(ProjectAssembler.assemble(ProjectReader.read(plain, plain.toString())));
        assertThat(none.solar()).isNull();
        Path out2 = dir.resolve("no-solar.xlsx");
        WorkbookWriter.write(none, out2, true);
        workbooks.add(out2);
    }

    @Test
    void thePwmCabinIsChargedThroughAPwmController() {
        assertThat(pwm.passes()).as(pwm.checks().toString()).isTrue();
        assertThat(pwm.solar().chosen().controller().controller().type()).isEqualTo(ControllerType.PWM);
        // PWM gives up part of the array's power at battery voltage, and the design says how much.
        assertThat(pwm.advisories()).anyMatch(c -> c.id().equals("pv.pwmGivenUp"));
        assertThat(pwm.solar().chosen().output().annualPwmGivenUpWh()).isPositive();
    }

    @Test
    void poiRecomputesEveryFormula() {
        for (Path wb : workbooks) {
            RecalcReport report = PoiRecalc.recalculate(wb);
            System.out.println(report.summary(Tolerance.DEFAULT));
            report.assertAgrees(Tolerance.DEFAULT);
        }
    }

    @Test
    void aSpreadsheetApplicationRecomputesEveryFormula() {
        ExternalTools.requireOffice();
        for (RecalcReport report : SpreadsheetRecalc.recalculate(workbooks)) {
            System.out.println(report.summary(Tolerance.DEFAULT));
            report.assertAgrees(Tolerance.DEFAULT);
        }
    }

    @Test
    void onlySafeFunctions() throws IOException {
        for (Path wb : workbooks) {
            assertThat(SafeFunctions.unsafeFunctionUses(wb)).as(wb.getFileName().toString()).isEmpty();
        }
    }

    @Test
    void thePwmColumnsAreFormulasAndTheNoSolarWorkbookSaysSo() throws IOException {
        try (XSSFWorkbook book = new XSSFWorkbook(Files.newInputStream(workbooks.get(0)))) {
            Sheet hourly = book.getSheet("PV hourly");
            Row header = hourly.getRow(3);
            int ratio = -1;
            for (Cell c : header) {
                if (c.getStringCellValue().equals("PWM power ratio")) {
                    ratio = c.getColumnIndex();
                }
            }
            assertThat(ratio).as("a PWM power ratio column").isPositive();
            assertThat(hourly.getRow(4 + 12).getCell(ratio).getCellFormula()).contains("PvPwmModuleV");
            assertThat(book.getSheetIndex("PV")).isEqualTo(book.getSheetIndex("Battery") + 1);
            assertThat(book.getSheetIndex("PV")).isLessThan(book.getSheetIndex("Hourly"));
        }
        try (XSSFWorkbook book = new XSSFWorkbook(Files.newInputStream(workbooks.get(1)))) {
            assertThat(book.getSheet("PV").getRow(2).getCell(0).getStringCellValue())
                    .contains("no solar section").contains("PV is optional");
            boolean said = false;
            for (Row row : book.getSheet("Summary")) {
                for (Cell c : row) {
                    said |= c.getCellType() == org.apache.poi.ss.usermodel.CellType.STRING
                            && c.getStringCellValue().contains("not sized: the project has no solar section");
                }
            }
            assertThat(said).as("the Summary says PV was not sized").isTrue();
        }
    }
}
