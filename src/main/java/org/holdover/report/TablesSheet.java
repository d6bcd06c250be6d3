package org.holdover.report;

import java.util.List;
import org.holdover.battery.Chemistry;
import org.holdover.battery.TemperatureTable;
import org.holdover.inverter.WeightedEfficiency;
import org.holdover.load.NemaCodeLetter;
import org.holdover.sizing.Sizing;

/** Reference tables the formulas look values up in, each with its source. */
final class TablesSheet {

    private TablesSheet() {
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.TABLES);
        s.widths(12, 12, 12, 12, 3, 10, 10, 10, 3, 10, 10, 10, 3, 16, 10, 10, 10, 10, 10, 10, 10, 10, 10, 10, 3, 12, 10, 10);
        s.text(0, 0, "Reference tables", ctx.styles.title);

        // NEMA code letters (A–D)
        s.text(2, 0, "NEMA MG 1 locked-rotor code letters, kVA per hp", ctx.styles.subtitle);
        s.text(3, 0, "Source: NEMA MG 1-10.37.2 (EASA Electrical Engineering Handbook table). Ranges include the lower figure; the top of the range is used for sizing (V has no top: 22.4 is used).", ctx.styles.note);
        s.header(4, 0, "Letter", "kVA/hp from", "kVA/hp below", "Used");
        int r = 5;
        for (NemaCodeLetter l : NemaCodeLetter.values()) {
            s.inputText(r, 0, l.name());
            s.input(r, 1, l.lowKvaPerHp(), Styles.D2);
            if (Double.isInfinite(l.highKvaPerHp())) {
                s.text(r, 2, "no upper");
            } else {
                s.input(r, 2, l.highKvaPerHp(), Styles.D2);
            }
            s.input(r, 3, l.designKvaPerHp(), Styles.D2);
            r++;
        }
        s.name("NemaLetter", 5, 0, r - 1, 0);
        s.name("NemaKva", 5, 3, r - 1, 3);

        // Temperature tables (F–G lead-acid, J–K LiFePO4)
        temperature(s, ctx, TemperatureTable.of(Chemistry.FLOODED), 5, "Lead", "Lead-acid capacity temperature factor");
        temperature(s, ctx, TemperatureTable.of(Chemistry.LIFEPO4), 9, "Lfp", "LiFePO4 capacity temperature factor");

        // Chemistry defaults (N–X)
        int c0 = 13;
        s.text(2, c0, "Chemistry defaults", ctx.styles.subtitle);
        s.text(3, c0, "Each row's sources are written under the tables.", ctx.styles.note);
        s.header(4, c0, "Chemistry", "Cell V", "Cells per 12 V", "End V/cell", "Absorption V/cell", "Depth of discharge",
                "End of life", "Peukert k", "Round trip", "Max parallel", "Lead-acid (1/0)");
        r = 5;
        for (Chemistry c : Chemistry.values()) {
            s.inputText(r, c0, c.word());
            s.input(r, c0 + 1, c.cellNominalV(), Styles.D2);
            s.input(r, c0 + 2, c.cellsPer12V(), Styles.INT);
            s.input(r, c0 + 3, c.cellEndV(), Styles.D2);
            s.input(r, c0 + 4, c.cellAbsorptionV(), Styles.D2);
            s.input(r, c0 + 5, c.defaultDepthOfDischarge(), Styles.PCT);
            s.input(r, c0 + 6, c.defaultEndOfLife(), Styles.PCT);
            s.input(r, c0 + 7, c.peukertExponent(), Styles.D2);
            s.input(r, c0 + 8, c.roundTripEfficiency(), Styles.PCT);
            s.input(r, c0 + 9, c.defaultMaxParallel(), Styles.INT);
            s.input(r, c0 + 10, c.leadAcid() ? 1 : 0, Styles.INT);
            r++;
        }
        int notes = NOTES_ROW + 24;
        s.text(notes++, 0, "Chemistry defaults: sources", ctx.styles.subtitle);
        for (Chemistry c : Chemistry.values()) {
            s.text(notes++, 0, c.word() + ": " + c.sources(), ctx.styles.note);
        }
        String[] names = {"ChemWord", "ChemCellV", "ChemCellsPer12", "ChemEndV", "ChemAbsV", "ChemDod", "ChemEol", "ChemK",
            "ChemRte", "ChemMaxPar", "ChemLead"};
        for (int i = 0; i < names.length; i++) {
            s.name(names[i], 5, c0 + i, r - 1, c0 + i);
        }

        // Weighted efficiency schemes (Z–AB)
        int w0 = 25;
        r = 2;
        for (WeightedEfficiency w : List.of(WeightedEfficiency.CEC, WeightedEfficiency.EURO)) {
            s.text(r++, w0, w.name() + " weighted efficiency", ctx.styles.subtitle);
            s.text(r++, w0, "Source: " + w.source(), ctx.styles.note);
            s.header(r++, w0, "Load", "Weight");
            int first = r;
            for (int i = 0; i < w.weights().size(); i++) {
                s.input(r, w0, w.loadFractions().get(i), Styles.PCT);
                s.input(r, w0 + 1, w.weights().get(i), Styles.D2);
                r++;
            }
            String key = w == WeightedEfficiency.CEC ? "Cec" : "Euro";
            s.name(key + "Load", first, w0, r - 1, w0);
            s.name(key + "Weight", first, w0 + 1, r - 1, w0 + 1);
            r++;
        }

        // Battery terminal model: open-circuit voltage and resistance against temperature
        r += 1;
        r = terminal(ctx, s, r, w0, org.holdover.battery.TerminalModel.OCV, "Ocv", "soc", "Rested cell voltage against state of charge, V");
        r = terminal(ctx, s, r + 1, w0, org.holdover.battery.TerminalModel.RESISTANCE, "Rt", "temp",
                "Internal resistance against temperature (× the 25 °C value)");

        // Residential energy-storage limits
        r += 1;
        s.text(r++, w0, "Residential energy-storage limits", ctx.styles.subtitle);
        s.text(r++, w0, "Source: " + Sizing.IRC_BASIS, ctx.styles.note);
        s.text(r, w0, "One unit, kWh");
        s.input(r, w0 + 1, Sizing.IRC_UNIT_LIMIT_KWH, Styles.INT);
        s.name("CodeUnitKwh", r++, w0 + 1);
        s.text(r, w0, "Utility space, kWh");
        s.input(r, w0 + 1, Sizing.IRC_UTILITY_SPACE_LIMIT_KWH, Styles.INT);
        s.name("CodeUtilityKwh", r++, w0 + 1);
        s.text(r, w0, "Garage / outdoors, kWh");
        s.input(r, w0 + 1, Sizing.IRC_GARAGE_OUTDOOR_LIMIT_KWH, Styles.INT);
        s.name("CodeGarageKwh", r, w0 + 1);
    }

    private static int terminal(Context ctx, SheetWriter s, int r, int c0, org.holdover.battery.TerminalModel.Table t, String key,
                                String xName, String title) {
        s.text(r++, c0, title, ctx.styles.subtitle);
        for (String line : t.source()) {
            s.text(r++, c0, line, ctx.styles.note);
        }
        s.header(r++, c0, xName.equals("soc") ? "State of charge" : "°C", "Lead-acid", "LiFePO4");
        int first = r;
        for (int i = 0; i < t.x().length; i++) {
            s.input(r, c0, t.x()[i], Styles.GENERAL);
            s.input(r, c0 + 1, t.leadAcid()[i], Styles.D3);
            s.input(r, c0 + 2, t.lifepo4()[i], Styles.D3);
            r++;
        }
        s.name(key + "_" + xName, first, c0, r - 1, c0);
        s.name(key + "_lead", first, c0 + 1, r - 1, c0 + 1);
        s.name(key + "_lfp", first, c0 + 2, r - 1, c0 + 2);
        return r;
    }

    private static void temperature(SheetWriter s, Context ctx, TemperatureTable t, int c0, String key, String title) {
        s.text(2, c0, title, ctx.styles.subtitle);
        s.text(3, c0, "Source: see the notes under the tables.", ctx.styles.note);
        s.header(4, c0, "°F", "Factor", "Confirmed");
        int r = 5;
        for (TemperatureTable.Row row : t.rows()) {
            s.input(r, c0, row.tempF(), Styles.GENERAL);
            s.input(r, c0 + 1, row.factor(), Styles.D3);
            s.text(r, c0 + 2, row.confirmed() ? "yes" : "from memory");
            r++;
        }
        s.name(key + "TempF", 5, c0, r - 1, c0);
        s.name(key + "Factor", 5, c0 + 1, r - 1, c0 + 1);
        int notes = NOTES_ROW + (key.equals("Lead") ? 0 : t.sourceLines().size() + 2);
        s.text(notes, 0, title + ":", ctx.styles.subtitle);
        for (String line : t.sourceLines()) {
            s.text(++notes, 0, line, ctx.styles.note);
        }
    }

    /** Row where the tables' source notes start (below the longest table). */
    private static final int NOTES_ROW = 50;
}
