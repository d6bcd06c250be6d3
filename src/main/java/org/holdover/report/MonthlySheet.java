package org.holdover.report;

import org.holdover.load.YearCalendar;
import org.holdover.sizing.YearCheck;

/** The simulated year month by month: SUMIFS over the hourly simulation, and a chart of the energy flows. */
final class MonthlySheet {

    private MonthlySheet() {
    }

    static void write(Context ctx, YearCheck y) {
        SheetWriter s = ctx.sheet(Context.MONTHLY);
        s.widths(10, 14, 14, 14, 14, 14, 14, 14, 14, 14);
        s.text(0, 0, "The simulated year by month", ctx.styles.title);
        if (y == null) {
            s.text(2, 0, "The year was not simulated (an off-grid system needs its PV array for that).");
            return;
        }
        s.text(1, 0, "Sums of the Year simulation sheet's hourly rows by month (Wh).", ctx.styles.note);
        String[] head = {"Month", "Load", "Served", "Unmet", "PV array", "PV out", "PV curtailed", "Into bank", "Out of bank", "Grid to load"};
        s.header(3, 0, head);
        String[] cols = {"S_Load", null, "S_Unmet", "S_PvArray", "S_PvOut", "S_Curt", "S_BankIn", "S_BankOut", "S_GridLoad"};
        YearCalendar cal = ctx.r.input().loads().calendar();
        double[][] monthly = y.monthlyWh(cal);
        int r = 4;
        for (int m = 1; m <= 12; m++) {
            String R = String.valueOf(r + 1);
            s.text(r, 0, LoadsSheet.MONTHS[m - 1]);
            for (int k = 0; k < cols.length; k++) {
                if (cols[k] == null) {
                    s.formula(r, 1 + k, "B" + R + "-D" + R, monthly[1][m - 1], Styles.INT);
                } else {
                    s.formula(r, 1 + k, "SUMIFS(" + cols[k] + ",H_Month," + m + ")", monthly[k][m - 1], Styles.INT);
                }
            }
            r++;
        }
        Charts.monthlyFlows(ctx, s, 4, r + 1, monthly);
    }
}
