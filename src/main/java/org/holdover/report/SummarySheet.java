package org.holdover.report;

import java.util.List;
import java.util.Locale;
import org.holdover.battery.BankDesign;
import org.holdover.load.LoadAnalysis;
import org.holdover.project.Problem;
import org.holdover.sizing.BusOption;
import org.holdover.sizing.Check;
import org.holdover.sizing.SizingResult;

/** The first sheet: the chosen system, every check with its margin, code limits, warnings and cautions. */
final class SummarySheet {

    private SummarySheet() {
    }

    static void write(Context ctx, int bankRow) {
        SheetWriter s = ctx.sheet(Context.SUMMARY);
        SizingResult r = ctx.r;
        s.widths(52, 18, 13, 7, 8, 9, 40);
        int row = 0;
        s.text(row++, 0, "Sizing summary: " + r.input().name(), ctx.styles.title);
        row = paragraph(ctx, s, row, (ctx.backup() ? "Backup system" : "Off-grid system") + ", " + service(ctx)
                + ". Yellow cells are inputs; every other number is a live formula you can trace.");
        if (r.input().catalog().demoData()) {
            row = paragraph(ctx, s, row, "DEMO DATA: the components come from the built-in catalog of invented, generic units. Not a quote.");
        }
        row++;
        if (r.chosen() == null) {
            s.text(row++, 0, "No system in the catalog passes every check.", ctx.styles.bold);
            for (BusOption b : r.buses()) {
                s.text(row, 0, (long) b.busClassV() + " V bus");
                s.text(row, 1, b.reason(), ctx.styles.wrap);
                s.sheet.addMergedRegion(new org.apache.poi.ss.util.CellRangeAddress(row, row, 1, 6));
                s.sheet.getRow(row).setHeightInPoints(32);
                row++;
            }
        } else {
            row = system(ctx, s, row, bankRow);
        }
        row++;
        s.text(row++, 0, "Loads", ctx.styles.subtitle);
        LoadAnalysis.Figures f = r.input().loads().figures();
        row = ref(s, row, "Served energy per day, year mean", "DailyWh", f.dailyEnergyWh(), "Wh/day", Styles.INT);
        row = ref(s, row, "Coincident running demand", "RunPeakW", f.runningPeakW(), "W", Styles.INT);
        row = ref(s, row, "Coincident running demand", "RunPeakVA", f.runningPeakVa(), "VA", Styles.INT);
        if (ctx.hasMotors()) {
            row = ref(s, row, "Surge while the largest motor(s) start", "SurgeVA", f.surgeVa(), "VA", Styles.INT);
            row = ref(s, row, "…lasting", "SurgeS", f.surgeS(), "s", Styles.D2);
        }
        if (r.chosen() != null) {
            row = ref(s, row, "DC energy the battery must deliver", "EnergyDcWh", r.energy().energyDcWh(), "Wh", Styles.INT);
            row = ref(s, row, "Inverter efficiency over that discharge (idle draw included)", "EffectiveEff",
                    r.energy().effectiveEfficiency(), "", Styles.PCT);
            s.text(row, 0, "Chosen inverter: CEC / European weighted efficiency");
            int invRow = InvertersSheet.FIRST + r.inverters().indexOf(r.inverter());
            s.formula(row, 1, ctx.sheet(Context.INVERTERS).ref(invRow, InvertersSheet.CEC), r.cecEfficiency(), Styles.PCT);
            s.formula(row++, 2, ctx.sheet(Context.INVERTERS).ref(invRow, InvertersSheet.EURO), r.euroEfficiency(), Styles.PCT);
        }

        if (r.chosen() != null) {
            row++;
            s.text(row++, 0, "Checks", ctx.styles.subtitle);
            s.header(row++, 0, "Check", "Design value", "Limit", "Unit", "Result", "Margin", "Basis");
            int firstCheck = row;
            for (Check c : r.checks()) {
                row = check(ctx, s, row, c, bankRow);
            }
            int lastCheck = row - 1;
            s.text(row, 0, "Overall", ctx.styles.bold);
            s.formulaText(row++, 4, "IF(COUNTIF(" + SheetWriter.addr(firstCheck, 4) + ":" + SheetWriter.addr(lastCheck, 4)
                    + ",\"FAIL\")=0,\"pass\",\"FAIL\")", r.passes() ? "pass" : "FAIL");
            row = paragraph(ctx, s, row, r.year() == null ? "The year was not simulated: an off-grid system needs its PV array for that."
                    : "Daily-energy chain against the simulated year: " + r.year().comparison(r.bank()) + "; " + r.year().life() + ".");
            if (r.generator() != null && r.year() != null) {
                var g = r.year().metrics().generator();
                s.text(row, 0, "Generator over the simulated year: running hours; starts");
                s.formula(row, 1, "S_GenHours", g.hours(), Styles.INT);
                s.formula(row++, 2, "S_GenStarts", g.starts(), Styles.INT);
                s.text(row, 0, "Fuel over the simulated year, L; its cost at the project's fuel price");
                s.formula(row, 1, "S_FuelL", g.fuelL(), Styles.D1);
                s.formula(row++, 2, "S_FuelCost", r.fuelCostPerYear(), Styles.INT);
            }
            row++;
            s.text(row++, 0, "Limits to look at (they do not reject the design; for code limits the authority having jurisdiction decides)", ctx.styles.subtitle);
            s.header(row++, 0, "Limit", "Design value", "Limit", "Unit", "Result", "Margin", "Basis");
            for (Check c : r.advisories()) {
                row = check(ctx, s, row, c, bankRow);
            }
        }
        List<Problem> warnings = r.input().warnings();
        if (!warnings.isEmpty()) {
            row++;
            s.text(row++, 0, "Input warnings", ctx.styles.subtitle);
            for (Problem p : warnings) {
                row = paragraph(ctx, s, row, p.oneLine());
            }
        }
        if (!r.input().notes().isEmpty()) {
            row++;
            s.text(row++, 0, "Notes", ctx.styles.subtitle);
            for (String n : r.input().notes()) {
                row = paragraph(ctx, s, row, n);
            }
        }
        row++;
        s.text(row++, 0, "Cautions (in full on the Cautions sheet)", ctx.styles.subtitle);
        for (String c : Cautions.LINES) {
            row = paragraph(ctx, s, row, c);
        }
    }

    /** Long text across the page width, wrapped, with a row tall enough for it. */
    static int paragraph(Context ctx, SheetWriter s, int row, String text) {
        return s.paragraph(row, 0, 6, text, ctx.styles.wrap, 130);
    }

    /** Text from column C to the right edge, wrapped. */
    private static void side(Context ctx, SheetWriter s, int row, String text) {
        s.text(row, 2, text, ctx.styles.wrap);
        s.sheet.addMergedRegion(new org.apache.poi.ss.util.CellRangeAddress(row, row, 2, 6));
    }

    private static String service(Context ctx) {
        return ctx.split() ? "120/240 V split phase, " + (long) ctx.r.input().frequencyHz() + " Hz"
                : (long) ctx.r.input().acVoltsRms() + " V single phase, " + (long) ctx.r.input().frequencyHz() + " Hz";
    }

    private static int system(Context ctx, SheetWriter s, int row, int bankRow) {
        SizingResult r = ctx.r;
        BankDesign b = r.bank();
        SheetWriter bat = ctx.sheet(Context.BATTERY);
        s.text(row++, 0, "The system", ctx.styles.subtitle);
        s.text(row, 0, "DC bus voltage class, V");
        s.formula(row++, 1, "ChosenBusV", r.chosen().busClassV(), Styles.INT);
        s.text(row, 0, "Inverter");
        s.formulaName(row, 1, "ChosenInvRow", r.inverter().spec().id());
        side(ctx, s, row++, r.inverter().spec().description());
        s.text(row, 0, "Inverters in parallel (identical units sharing one output)");
        s.formula(row++, 1, "InvUnits", r.inverter().spec().units(), Styles.INT);
        s.text(row, 0, "Battery module");
        s.formulaName(row, 1, bat.ref(bankRow, BatterySheet.ID), b.module().id());
        side(ctx, s, row++, b.module().description());
        s.text(row, 0, "Modules in series × parallel strings");
        s.formula(row, 1, bat.ref(bankRow, BatterySheet.SERIES), b.series(), Styles.INT);
        s.formula(row++, 2, bat.ref(bankRow, BatterySheet.STRINGS), b.strings(), Styles.INT);
        s.text(row, 0, "Bank nominal V; rated kWh");
        s.formula(row, 1, bat.ref(bankRow, BatterySheet.BANK_V), b.bankNominalV(), Styles.D1);
        s.formula(row++, 2, bat.ref(bankRow, BatterySheet.KWH), b.bankEnergyWh() / 1000.0, Styles.D2);
        s.text(row, 0, "Demo price: inverter(s) + bank");
        s.formula(row++, 1, "InvUnitsPrice+" + bat.ref(bankRow, BatterySheet.COST),
                r.inverter().spec().price() + b.price(), Styles.INT);
        if (r.generator() != null) {
            s.text(row, 0, "Engine generator");
            s.text(row, 1, r.generator().id());
            side(ctx, s, row++, r.generator().description());
            s.text(row, 0, "Demo price: generator");
            s.formula(row++, 1, "S_GenPrice", r.generator().price(), Styles.INT);
        }
        row = PvSheet.summary(ctx, s, row);
        if (r.search() != null && r.search().chosen() != null) {
            var st = r.search().stats();
            s.text(row, 0, "How it was chosen");
            s.sheet.getRow(row).setHeightInPoints(3 * 15f);
            side(ctx, s, row++, String.format(java.util.Locale.ROOT, "the least %s of %,d systems passing every component check"
                            + " (%,d years simulated), with the next best, the cost-against-unmet frontier and the families left"
                            + " out on the Alternatives sheet%s",
                    r.search().objective().lifetime() ? "lifetime cost" : "demo capital cost", st.candidates(), st.simulated(),
                    st.stoppedEarly() ? "; STOPPED EARLY by the user: the best found so far" : ""));
            s.text(row, 0, "Demo cost of the whole system (Alternatives sheet)");
            s.formula(row++, 1, "SearchChosenCost", r.search().chosen().candidate().cost(), Styles.INT);
        }
        return row;
    }

    private static int ref(SheetWriter s, int row, String label, String name, double value, String unit, String format) {
        s.text(row, 0, label);
        s.formula(row, 1, name, value, format);
        s.text(row, 3, unit);
        return row + 1;
    }

    private static int check(Context ctx, SheetWriter s, int row, Check c, int bankRow) {
        String[] f = formulas(ctx, c, bankRow);
        String R = String.valueOf(row + 1);
        s.text(row, 0, c.label(), ctx.styles.wrap);
        s.formula(row, 1, f[0], c.value(), format(c));
        s.formula(row, 2, f[1], c.limit(), format(c));
        s.text(row, 3, c.unit());
        boolean atLeast = c.sense() == Check.Sense.AT_LEAST;
        s.formulaText(row, 4, "IF(B" + R + (atLeast ? ">=" : "<=") + "C" + R + ",\"pass\",\"FAIL\")", c.passes() ? "pass" : "FAIL");
        if (c.limit() == 0) {
            s.formulaText(row, 5, "IF(C" + R + "=0,\"n/a\",\"see value\")", "n/a");
        } else {
            s.formula(row, 5, atLeast ? "B" + R + "/C" + R + "-1" : "1-B" + R + "/C" + R, c.margin(), Styles.PCT);
        }
        s.text(row, 6, c.basis(), ctx.styles.wrap);
        int lines = Math.max((int) Math.ceil(c.basis().length() / 44.0), (int) Math.ceil(c.label().length() / 52.0));
        if (lines > 1) {
            s.sheet.getRow(row).setHeightInPoints(15f * lines + 2);
        }
        return row + 1;
    }

    private static String format(Check c) {
        return c.unit().equals("strings") ? Styles.INT : Math.abs(c.limit()) >= 100 ? Styles.INT : Styles.D2;
    }

    /** Formulas for a check's value and limit, pointing at the cells where they are computed. */
    private static String[] formulas(Context ctx, Check c, int bankRow) {
        SheetWriter inv = ctx.sheet(Context.INVERTERS);
        SheetWriter bat = ctx.sheet(Context.BATTERY);
        int i = InvertersSheet.FIRST + ctx.r.inverters().indexOf(ctx.r.inverter());
        java.util.function.IntFunction<String> I = col -> inv.ref(i, col);
        java.util.function.IntFunction<String> B = col -> bat.ref(bankRow, col);
        return switch (c.id()) {
            case "inverter.continuousW" -> new String[] {I.apply(InvertersSheet.AVAIL_W), I.apply(InvertersSheet.REQ_W)};
            case "inverter.continuousVa" -> new String[] {I.apply(InvertersSheet.AVAIL_VA), I.apply(InvertersSheet.REQ_VA)};
            case "inverter.surgeVa" -> new String[] {I.apply(InvertersSheet.AVAIL_SURGE), I.apply(InvertersSheet.REQ_SURGE)};
            case "inverter.legVa" -> new String[] {I.apply(InvertersSheet.AVAIL_LEG), I.apply(InvertersSheet.REQ_LEG)};
            case "inverter.legSurgeVa" -> new String[] {I.apply(InvertersSheet.AVAIL_LEG_SURGE), I.apply(InvertersSheet.REQ_LEG_SURGE)};
            case "bus.continuousA" -> new String[] {I.apply(InvertersSheet.DC_A), "MaxBatteryA"};
            case "bank.strings" -> new String[] {B.apply(BatterySheet.STRINGS), B.apply(BatterySheet.PAR_LIMIT)};
            case "bank.continuousA" -> new String[] {"ContA/" + B.apply(BatterySheet.STRINGS), B.apply(BatterySheet.CONT)};
            case "bank.surgeA" -> new String[] {"SurgeA/" + B.apply(BatterySheet.STRINGS),
                "IF(StartS<=" + B.apply(BatterySheet.SURGE_S) + "," + B.apply(BatterySheet.SURGE) + "," + B.apply(BatterySheet.CONT) + ")"};
            case "bank.chargeV" -> new String[] {B.apply(BatterySheet.ABS_V), "InvDcMaxV"};
            case "inverter.acPeak" -> new String[] {"MAX(InvDcMinV," + B.apply(BatterySheet.END_V) + ")", "MinDcForPeakV"};
            case "bank.energy" -> new String[] {B.apply(BatterySheet.USABLE), "EnergyDcWh"};
            case "code.unitKwh" -> new String[] {B.apply(BatterySheet.MOD_V) + "*" + B.apply(BatterySheet.AH) + "/1000", "CodeUnitKwh"};
            case "code.utilityKwh" -> new String[] {B.apply(BatterySheet.KWH), "CodeUtilityKwh"};
            case "code.garageKwh" -> new String[] {B.apply(BatterySheet.KWH), "CodeGarageKwh"};
            case "dc.cableTerminal" -> new String[] {"W_TerminalLimitA", "W_DesignA"};
            case "dc.cableCorrected" -> new String[] {"W_CorrectedA", "W_CouA"};
            case "dc.cableDrop" -> new String[] {"W_DropPct", "W_DropLimitPct"};
            case "dc.fuseRating" -> new String[] {"W_DeviceA", "W_DesignA"};
            case "dc.fuseProtects" -> new String[] {"W_DeviceA", "W_DeviceLimitA"};
            case "dc.surgeV" -> new String[] {"W_SurgeInvV", "W_CutoffV"};
            case "dc.surgeA" -> new String[] {"W_SurgeA", "W_PeakLimitA"};
            case "dc.shortCircuit" -> new String[] {"W_ScA", "W_OrdinaryLimitA"};
            case "sim.unmet" -> new String[] {"S_UnmetWh", "S_UnmetLimit"};
            default -> {
                String[] cells = ctx.checkCells.get(c.id());
                if (cells == null) {
                    throw new IllegalStateException("no workbook cells for check " + c.id() + " (" + c.label().toLowerCase(Locale.ROOT) + ")");
                }
                yield cells;
            }
        };
    }
}
