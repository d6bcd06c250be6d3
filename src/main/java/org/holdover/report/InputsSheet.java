package org.holdover.report;

import org.holdover.battery.BankSizing;
import org.holdover.sizing.Assumption;
import org.holdover.sizing.SizingInput;

/**
 * The project inputs every formula refers to (as named cells), and every assumption with its source.
 */
final class InputsSheet {

    private InputsSheet() {
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.INPUTS);
        SizingInput in = ctx.r.input();
        s.widths(52, 14, 8, 10, 90);
        s.text(0, 0, "Inputs and assumptions", ctx.styles.title);
        s.text(1, 0, "Yellow cells are inputs (from the project file, its defaults and the catalog); every other number in the workbook is a formula over them.", ctx.styles.note);
        s.header(3, 0, "Input", "Value", "Unit", "Given by", "Source or note");
        int r = 4;
        r = row(s, r, "ServiceV", "AC service voltage (line to line)", in.acVoltsRms(), "V", "project", "", Styles.INT);
        r = row(s, r, "ServiceHz", "AC service frequency", in.frequencyHz(), "Hz", "project", "", Styles.INT);
        r = row(s, r, "SplitPhase", "Split-phase 120/240 V service (1 yes, 0 no)", in.splitPhase() ? 1 : 0, "", "project", "", Styles.INT);
        r = row(s, r, "InverterAmbientC", "Ambient around the inverter", in.inverterAmbientC(), "°C", given(in, "Ambient around the inverter"), source(in, "Ambient around the inverter"), Styles.D1);
        r = row(s, r, "BatteryColdC", "Coldest battery temperature", in.batteryColdestC(), "°C", given(in, "Coldest battery temperature"), source(in, "Coldest battery temperature"), Styles.D1);
        r = row(s, r, "Margin", "Inverter margin over coincident running demand", in.inverterMargin(), "×", given(in, "Inverter margin"), source(in, "Inverter margin"), Styles.D2);
        r = row(s, r, "MaxBatteryA", "Largest continuous battery current for the bus choice", in.maxBatteryCurrentA(), "A", given(in, "Largest continuous battery current"), source(in, "Largest continuous battery current"), Styles.INT);
        r = row(s, r, "MaxParallelRule", "Project cap on parallel battery strings (0 = none)", in.maxParallelRule(), "", in.maxParallelRule() > 0 ? "project" : "default", "", Styles.INT);
        r = row(s, r, "DodOverride", "Deepest design discharge for every chemistry (0 = each chemistry's default)",
                in.depthOfDischarge() == null ? 0 : in.depthOfDischarge(), "", in.depthOfDischarge() == null ? "default" : "project", "", Styles.PCT);
        r = row(s, r, "EolOverride", "Capacity at end of life for every chemistry (0 = each chemistry's default)",
                in.endOfLife() == null ? 0 : in.endOfLife(), "", in.endOfLife() == null ? "default" : "project", "", Styles.PCT);
        if (ctx.backup()) {
            r = row(s, r, "OutageHours", "Outage the battery must bridge", in.outageHours(), "h", "project", "", Styles.D1);
        } else {
            r = row(s, r, "AutonomyDays", "Days of autonomy", in.autonomyDays(), "days", "project", "", Styles.D2);
        }
        r = row(s, r, "MaxUnmetFraction", "Unmet energy the simulated year may leave (fraction of the served energy)",
                in.maxUnmetFraction(), "", given(in, "Unmet energy the simulated year"), source(in, "Unmet energy the simulated year"), "0.00%");
        r = row(s, r, "Year", "Calendar year of the hourly series", ctx.r.input().loads().calendar().year(), "",
                given(in, "Calendar year"), "weekdays and leap year follow it", Styles.GENERAL);
        if (ctx.hasProfile()) {
            r = row(s, r, "ProfilePF", "Power factor of the measured profile", in.loads().profilePowerFactor(), "",
                    given(in, "Power factor of the measured profile"), source(in, "Power factor of the measured profile"), Styles.D2);
            r = row(s, r, "ProfileScale", "Scale applied to the measured profile", in.profileScale(), "×", given(in, "Profile scale"), "", Styles.D3);
            r = row(s, r, "ProfileServed", "Measured profile is served (1) or not (0)", in.profileServed() ? 1 : 0, "",
                    "project", ctx.backup() ? "backup: only critical loads are served" : "", Styles.INT);
            s.text(r, 0, "Measured profile factor (scale × served)");
            s.formula(r, 1, "ProfileScale*ProfileServed", in.profileServed() ? in.profileScale() : 0.0, Styles.D3);
            s.name("ProfileFactor", r, 1);
            r++;
        }
        r = row(s, r, "RoundingSlack", "Shortfall ignored before rounding a count up", BankSizing.ROUNDING_SLACK, "",
                "default", "so that the spreadsheet rounds exactly as the engine", "0.0E+00");
        r += 1;
        s.text(r++, 0, "Every value the sizing used and where it comes from", ctx.styles.subtitle);
        s.header(r++, 0, "Assumption", "Value", "Unit", "Given by", "Source");
        for (Assumption a : in.assumptions()) {
            s.text(r, 0, a.name());
            s.input(r, 1, a.value(), Styles.GENERAL);
            s.text(r, 2, a.unit());
            s.text(r, 3, a.givenBy());
            s.text(r, 4, a.source());
            r++;
        }
        s.text(r + 1, 0, "Catalog: " + ctx.r.input().catalog().name() + " (" + ctx.r.input().catalog().source() + ")"
                + (ctx.r.input().catalog().demoData() ? " - DEMO DATA, invented components" : ""), ctx.styles.note);
    }

    private static int row(SheetWriter s, int r, String name, String label, double value, String unit, String given,
                           String source, String format) {
        s.text(r, 0, label);
        s.input(r, 1, value, format);
        s.text(r, 2, unit);
        s.text(r, 3, given);
        s.text(r, 4, source);
        s.name(name, r, 1);
        return r + 1;
    }

    private static Assumption find(SizingInput in, String prefix) {
        return in.assumptions().stream().filter(a -> a.name().startsWith(prefix)).findFirst().orElse(null);
    }

    private static String given(SizingInput in, String prefix) {
        Assumption a = find(in, prefix);
        return a == null ? "project" : a.givenBy();
    }

    private static String source(SizingInput in, String prefix) {
        Assumption a = find(in, prefix);
        return a == null ? "" : a.source();
    }
}
