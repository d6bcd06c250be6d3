package org.holdover.report;

import java.util.ArrayList;
import java.util.List;
import org.holdover.load.DayGrid;
import org.holdover.load.LoadAnalysis;

/**
 * Typical-day tables: for each month and day type, each hour's sum over the appliance table of a
 * quantity × whether the appliance may run then (SUMPRODUCT over the 0/1 masks of the Loads sheet).
 */
final class DayGridSheet {

    /** One grid: its defined name, title, the value columns multiplied together, and the engine's grid. */
    private record Grid(String name, String title, List<String> factors, DayGrid engine) {
    }

    private DayGridSheet() {
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.DAYS);
        LoadAnalysis la = ctx.r.input().loads();
        s.text(0, 0, "Typical days", ctx.styles.title);
        s.text(1, 0, "Rows: month and day type (weekday, weekend); columns: hour of day (local standard time)."
                + " Each cell = SUMPRODUCT over the appliance table of the quantity × hour mask × month mask × day-type flag.", ctx.styles.note);
        List<Grid> grids = new ArrayList<>();
        String q = LoadsSheet.column(ctx, LoadsSheet.MEAN_W);
        grids.add(new Grid("G_Energy", "Mean power of served appliances that add energy, W",
                List.of(q, LoadsSheet.column(ctx, LoadsSheet.ADDS)), la.energyGrid()));
        grids.add(new Grid("G_InProfile", "Mean power of served appliances already in the measured profile, W",
                List.of(q, LoadsSheet.column(ctx, LoadsSheet.IN_PROF_SERVED)), la.inProfileGrid()));
        String served = LoadsSheet.column(ctx, LoadsSheet.SERVED);
        grids.add(new Grid("G_RunW", "Running power of served appliances that may be on, W",
                List.of(LoadsSheet.column(ctx, LoadsSheet.RUN_W), served), la.runningWGrid()));
        String runVa = LoadsSheet.column(ctx, LoadsSheet.RUN_VA);
        grids.add(new Grid("G_RunVA", "Running VA of served appliances that may be on",
                List.of(runVa, served), la.runningVaGrid()));
        grids.add(new Grid("G_SetRunW", "Running power of the motors that start together, when they may be on, W",
                List.of(MotorsSheet.column(ctx, MotorsSheet.SET_RUN_W)), la.startingRunWGrid()));
        String setVa = MotorsSheet.column(ctx, MotorsSheet.SET_RUN_VA);
        grids.add(new Grid("G_SetRunVA", "Running VA of the motors that start together, when they may be on",
                List.of(setVa), la.startingRunVaGrid()));
        if (ctx.split()) {
            String l1 = LoadsSheet.column(ctx, LoadsSheet.L1);
            String l2 = LoadsSheet.column(ctx, LoadsSheet.L2);
            grids.add(new Grid("G_L1VA", "Leg 1 running VA", List.of(runVa, served, l1), la.runningL1VaGrid()));
            grids.add(new Grid("G_L2VA", "Leg 2 running VA", List.of(runVa, served, l2), la.runningL2VaGrid()));
            grids.add(new Grid("G_SetL1VA", "Leg 1 running VA of the motors that start together", List.of(setVa, l1), la.startingL1VaGrid()));
            grids.add(new Grid("G_SetL2VA", "Leg 2 running VA of the motors that start together", List.of(setVa, l2), la.startingL2VaGrid()));
        }
        int r = 3;
        for (Grid g : grids) {
            r = grid(ctx, s, r, g);
        }
        s.sheet.setColumnWidth(0, 16 * 256);
        for (int c = 1; c <= 24; c++) {
            s.sheet.setColumnWidth(c, 8 * 256);
        }
    }

    private static int grid(Context ctx, SheetWriter s, int r, Grid g) {
        s.text(r++, 0, g.title(), ctx.styles.subtitle);
        s.text(r, 0, "Month / day", ctx.styles.header);
        for (int h = 0; h < 24; h++) {
            s.text(r, 1 + h, String.format(java.util.Locale.ROOT, "%02d h", h), ctx.styles.header);
        }
        r++;
        int first = r;
        String product = String.join(",", g.factors());
        for (int m = 1; m <= 12; m++) {
            for (int t = 0; t < 2; t++) {
                int row = DayGrid.row(m, t);
                s.text(r, 0, LoadsSheet.MONTHS[m - 1] + (t == 0 ? " weekday" : " weekend"));
                String dayFlag = LoadsSheet.column(ctx, t == 0 ? LoadsSheet.WEEKDAY : LoadsSheet.WEEKEND);
                String month = LoadsSheet.column(ctx, LoadsSheet.MONTH1 + m - 1);
                for (int h = 0; h < 24; h++) {
                    String hour = LoadsSheet.column(ctx, LoadsSheet.HOUR0 + h);
                    s.formula(r, 1 + h, "SUMPRODUCT(" + product + "," + hour + "," + month + "," + dayFlag + ")",
                            g.engine().get(row, h), Styles.INT);
                }
                r++;
            }
        }
        s.name(g.name(), first, 1, r - 1, 24);
        return r + 1;
    }
}
