package org.holdover.report;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.holdover.sizing.SizingResult;

/** What the sheet writers share: the workbook, its styles, the result and the sheets by name. */
final class Context {

    static final String SUMMARY = "Summary";
    static final String LOADS = "Loads";
    static final String MOTORS = "Motors";
    static final String DAYS = "Typical days";
    static final String INVERTERS = "Inverters";
    static final String CURVES = "Inverter curves";
    static final String BUS = "DC bus";
    static final String BATTERY = "Battery";
    static final String PV = "PV";
    static final String WIRING = "Wiring";
    static final String HOURLY = "Hourly";
    static final String PV_HOURLY = "PV hourly";
    static final String SIMULATION = "Year simulation";
    static final String MONTHLY = "Monthly";
    static final String INPUTS = "Inputs";
    static final String TABLES = "Tables";
    static final String CONDUCTORS = "Conductor tables";
    static final String CAUTIONS = "Cautions";
    static final String ALTERNATIVES = "Alternatives";

    static final List<String> ORDER = List.of(SUMMARY, LOADS, MOTORS, DAYS, INVERTERS, CURVES, BUS, BATTERY, PV, WIRING, ALTERNATIVES,
            HOURLY, PV_HOURLY, SIMULATION, MONTHLY, INPUTS, TABLES, CONDUCTORS, CAUTIONS);

    final SXSSFWorkbook wb;
    final Styles styles;
    final SizingResult r;
    private final Map<String, SheetWriter> sheets = new HashMap<>();
    /** Check id → the formulas of its value and limit, for checks computed on sheets other than Summary. */
    final Map<String, String[]> checkCells = new HashMap<>();

    Context(SXSSFWorkbook wb, SizingResult r) {
        this.wb = wb;
        this.r = r;
        this.styles = new Styles(wb);
        for (String name : ORDER) {
            SXSSFSheet s = wb.createSheet(name);
            if (!name.equals(HOURLY) && !name.equals(PV_HOURLY) && !name.equals(SIMULATION)) {
                s.setRandomAccessWindowSize(-1);
            }
            sheets.put(name, new SheetWriter(wb, s, styles));
        }
    }

    SheetWriter sheet(String name) {
        return sheets.get(name);
    }

    Sheet raw(String name) {
        return sheets.get(name).sheet;
    }

    /** Whether the project is in backup mode. */
    boolean backup() {
        return r.input().mode() == org.holdover.project.ProjectInput.Mode.BACKUP;
    }

    boolean split() {
        return r.input().splitPhase();
    }

    boolean hasProfile() {
        return r.input().measuredW() != null;
    }

    boolean hasMotors() {
        return !r.input().loads().starting().isEmpty();
    }
}
