package org.holdover.report;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.holdover.dc.ConductorTables;
import org.holdover.dc.OvercurrentProtection;
import org.holdover.dc.ReferenceTable;
import org.holdover.dc.ReferenceTable.Cell;

/**
 * The conductor tables the wiring formulas look up (NEC 2023 and IEC), each with its source. Every column
 * is a defined name {@code <table>_<column>}.
 */
final class ConductorTablesSheet {

    /** Short names of the tables, in {@link ConductorTables#TABLE_NAMES} order. */
    static final Map<String, String> PREFIX = Map.ofEntries(
            Map.entry("nec-310-16-copper-ampacity", "NecAmp"),
            Map.entry("nec-310-15-b-1-1-ambient-correction", "NecAmb"),
            Map.entry("nec-310-15-c-1-adjustment", "NecAdj"),
            Map.entry("nec-chapter9-table8-copper-resistance", "NecRes"),
            Map.entry("nec-240-6-a-standard-ratings", "NecStd"),
            Map.entry("nec-240-4-d-small-conductor", "NecSmall"),
            Map.entry("iec-60228-copper-resistance", "IecRes"),
            Map.entry("iec-60364-5-52-method-c-copper", "IecCap"),
            Map.entry("iec-60364-5-52-b52-14-ambient", "IecAmb"),
            Map.entry("iec-60364-5-52-b52-17-grouping", "IecGrp"),
            Map.entry("iec-device-ratings", "IecDev"));

    private ConductorTablesSheet() {
    }

    /** Name of a column of a table. */
    static String name(String prefix, String column) {
        return prefix + "_" + column.replaceAll("[^A-Za-z0-9]", "_");
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.CONDUCTORS);
        s.text(0, 0, "Conductor and overcurrent-device tables", ctx.styles.title);
        s.text(1, 0, "Looked up by the Wiring sheet with INDEX/MATCH. Each table names its source and edition below its title;"
                + " jurisdictions adopt different editions.", ctx.styles.note);
        int r = 3;
        ConductorTables tables = ConductorTables.standard();
        for (String key : ConductorTables.TABLE_NAMES) {
            ReferenceTable t = tables.referenceTables().get(key);
            r = table(ctx, s, r, PREFIX.get(key), t);
        }
        // The ratings a circuit device may have (240.6(A) without the fuse-only ratings).
        s.text(r++, 0, "NEC 2023 240.6(A) ratings for circuit breakers and fuses (fuse-only ratings left out)", ctx.styles.subtitle);
        s.header(r++, 0, "rating_A");
        List<Double> ratings = OvercurrentProtection.necRatingsA(tables);
        int first = r;
        for (double a : ratings) {
            s.input(r++, 0, a, Styles.INT);
        }
        s.name("NecDev_A", first, 0, r - 1, 0);
        for (int c = 0; c < 6; c++) {
            s.sheet.setColumnWidth(c, 16 * 256);
        }
    }

    private static int table(Context ctx, SheetWriter s, int r, String prefix, ReferenceTable t) {
        s.text(r++, 0, t.name(), ctx.styles.subtitle);
        for (String line : t.source()) {
            s.text(r++, 0, line, ctx.styles.note);
        }
        for (int c = 0; c < t.columns().size(); c++) {
            s.text(r, c, t.columns().get(c), ctx.styles.header);
        }
        r++;
        int first = r;
        for (List<Cell> row : t.rows()) {
            for (int c = 0; c < row.size(); c++) {
                Cell cell = row.get(c);
                if (cell instanceof ReferenceTable.Number n) {
                    s.input(r, c, n.value(), Styles.GENERAL);
                } else if (cell instanceof ReferenceTable.Text x) {
                    s.inputText(r, c, x.value());
                }
            }
            r++;
        }
        for (int c = 0; c < t.columns().size(); c++) {
            s.name(name(prefix, t.columns().get(c).toLowerCase(Locale.ROOT)), first, c, r - 1, c);
        }
        return r + 1;
    }
}
