package org.holdover.report;

import java.util.List;
import java.util.Locale;
import org.holdover.load.Appliance;
import org.holdover.load.LoadAnalysis;
import org.holdover.load.YearCalendar;

/**
 * The appliance table (inputs and per-appliance figures, with when each may run) and the load figures
 * computed from the hourly sheet.
 */
final class LoadsSheet {

    static final int HEADER = 3;
    static final int FIRST = 4;
    static final int NAME = 0, QTY = 1, W = 2, PF = 3, DUTY = 4, WINDOW = 5, DAYS = 6, WEEKDAY = 7, WEEKEND = 8,
            SERVED = 9, L1 = 10, L2 = 11, IN_PROFILE = 12, VA_UNIT = 13, RUN_W = 14, RUN_VA = 15, MEAN_W = 16,
            DAY_WH = 17, ADDS = 18, IN_PROF_SERVED = 19, HOUR0 = 20, MONTH1 = 44;
    static final String[] MONTHS = {"Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"};

    private LoadsSheet() {
    }

    /** Number of rows in the appliance table (at least one, a zero row when the project lists none). */
    static int rows(Context ctx) {
        return Math.max(1, ctx.r.input().loads().appliances().size());
    }

    static int last(Context ctx) {
        return FIRST + rows(ctx) - 1;
    }

    /** An absolute range of one column of the appliance table on this sheet, qualified. */
    static String column(Context ctx, int c) {
        return ctx.sheet(Context.LOADS).ref(FIRST, c, last(ctx), c);
    }

    static void writeTable(Context ctx) {
        SheetWriter s = ctx.sheet(Context.LOADS);
        s.text(0, 0, "Loads: " + ctx.r.input().name(), ctx.styles.title);
        s.text(1, 0, (ctx.backup() ? "Backup mode: only loads marked critical are served (served = 1)."
                : "Off-grid: every load is served.") + " A load is taken as running at its full running power in every hour its"
                + " windows, months and days allow (coincident demand); its mean power is running W × quantity × duty.", ctx.styles.note);
        s.header(HEADER, 0, "Appliance", "Qty", "W per unit", "Power factor", "Duty in window", "Window h/day", "Days",
                "Weekdays (1/0)", "Weekends (1/0)", "Served (1/0)", "Leg 1 share", "Leg 2 share", "In profile (1/0)",
                "VA per unit", "Running W", "Running VA", "Mean W in window", "Wh per running day",
                "Adds energy (1/0)", "In profile, served (1/0)");
        for (int h = 0; h < 24; h++) {
            s.text(HEADER, HOUR0 + h, String.format(Locale.ROOT, "%02d h", h), ctx.styles.header);
        }
        for (int m = 0; m < 12; m++) {
            s.text(HEADER, MONTH1 + m, MONTHS[m], ctx.styles.header);
        }
        List<Appliance> list = ctx.r.input().loads().appliances();
        if (list.isEmpty()) {
            int r = FIRST;
            s.inputText(r, NAME, "(no appliances listed)");
            for (int c : new int[] {QTY, W, DUTY, WEEKDAY, WEEKEND, SERVED, L1, L2, IN_PROFILE}) {
                s.input(r, c, 0, Styles.INT);
            }
            s.input(r, PF, 1, Styles.D2);
            s.inputText(r, DAYS, "all");
            writeFormulas(s, r, 0, 0, 0, 0, 0, 0, 0, 0);
            for (int h = 0; h < 24; h++) {
                s.input(r, HOUR0 + h, 0, Styles.INT);
            }
            for (int m = 0; m < 12; m++) {
                s.input(r, MONTH1 + m, 0, Styles.INT);
            }
        }
        for (int i = 0; i < list.size(); i++) {
            Appliance a = list.get(i);
            int r = FIRST + i;
            s.inputText(r, NAME, a.name());
            s.input(r, QTY, a.quantity(), Styles.INT);
            s.input(r, W, a.runningW(), Styles.INT);
            s.input(r, PF, a.powerFactor(), Styles.D2);
            s.input(r, DUTY, a.dutyInWindow(), Styles.D3);
            s.inputText(r, DAYS, a.weekdays() && a.weekends() ? "all" : a.weekdays() ? "weekdays" : "weekends");
            s.input(r, WEEKDAY, a.weekdays() ? 1 : 0, Styles.INT);
            s.input(r, WEEKEND, a.weekends() ? 1 : 0, Styles.INT);
            s.input(r, SERVED, a.served() ? 1 : 0, Styles.INT);
            s.input(r, L1, a.leg().shareL1(), Styles.D2);
            s.input(r, L2, a.leg().shareL2(), Styles.D2);
            s.input(r, IN_PROFILE, a.inProfile() ? 1 : 0, Styles.INT);
            boolean[] hours = a.hours();
            boolean[] months = a.months();
            for (int h = 0; h < 24; h++) {
                s.input(r, HOUR0 + h, hours[h] ? 1 : 0, Styles.INT);
            }
            for (int m = 0; m < 12; m++) {
                s.input(r, MONTH1 + m, months[m] ? 1 : 0, Styles.INT);
            }
            writeFormulas(s, r, a.windowHours(), a.runningVa(), a.runningW() * a.quantity(), a.runningVa() * a.quantity(),
                    a.meanWindowW(), a.dailyEnergyWh(), a.served() && !a.inProfile() ? 1 : 0,
                    a.served() && a.inProfile() ? 1 : 0);
        }
        s.sheet.createFreezePane(1, FIRST);
        s.sheet.setColumnWidth(NAME, 34 * 256);
        for (int c = 1; c < HOUR0; c++) {
            s.sheet.setColumnWidth(c, 11 * 256);
        }
        for (int c = HOUR0; c < MONTH1 + 12; c++) {
            s.sheet.setColumnWidth(c, 5 * 256);
        }
    }

    private static void writeFormulas(SheetWriter s, int r, double window, double vaUnit, double runW, double runVa,
                                      double meanW, double dayWh, double adds, double inProf) {
        String row = String.valueOf(r + 1);
        s.formula(r, WINDOW, "SUM(" + SheetWriter.rel(r, HOUR0) + ":" + SheetWriter.rel(r, HOUR0 + 23) + ")", window, Styles.INT);
        s.formula(r, VA_UNIT, "C" + row + "/D" + row, vaUnit, Styles.INT);
        s.formula(r, RUN_W, "C" + row + "*B" + row, runW, Styles.INT);
        s.formula(r, RUN_VA, "N" + row + "*B" + row, runVa, Styles.INT);
        s.formula(r, MEAN_W, "C" + row + "*B" + row + "*E" + row, meanW, Styles.D1);
        s.formula(r, DAY_WH, "Q" + row + "*F" + row, dayWh, Styles.INT);
        s.formula(r, ADDS, "J" + row + "*(1-M" + row + ")", adds, Styles.INT);
        s.formula(r, IN_PROF_SERVED, "J" + row + "*M" + row, inProf, Styles.INT);
    }

    /** The figures block, below the table; needs the hourly sheet's names. */
    static void writeFigures(Context ctx) {
        SheetWriter s = ctx.sheet(Context.LOADS);
        LoadAnalysis la = ctx.r.input().loads();
        LoadAnalysis.Figures f = la.figures();
        YearCalendar cal = la.calendar();
        int r = last(ctx) + 3;
        s.text(r++, 0, "Load figures (served loads)", ctx.styles.subtitle);
        s.header(r++, 0, "Figure", "Value", "Unit");
        r = fig(s, r, "Mean energy per day over the year", "SUM(H_LoadW)/(ROWS(H_LoadW)/24)", f.dailyEnergyWh(), "Wh/day", "DailyWh", Styles.INT);
        r = fig(s, r, "Highest hourly mean load", "MAX(H_LoadW)", f.peakLoadW(), "W", "PeakLoadW", Styles.INT);
        r = fig(s, r, "…in hour of the year (0 = 1 Jan 00 h)", "MATCH(PeakLoadW,H_LoadW,0)-1", f.peakLoadHour(), "", null, Styles.GENERAL);
        r = fig(s, r, "Coincident running demand", "MAX(H_RunW)", f.runningPeakW(), "W", "RunPeakW", Styles.INT);
        r = fig(s, r, "…in hour of the year", "MATCH(RunPeakW,H_RunW,0)-1", f.runningPeakWHour(), "", null, Styles.GENERAL);
        r = fig(s, r, "Coincident running demand", "MAX(H_RunVA)", f.runningPeakVa(), "VA", "RunPeakVA", Styles.INT);
        if (ctx.split()) {
            r = fig(s, r, "Leg 1, highest running demand", "MAX(H_L1VA)", f.legL1PeakVa(), "VA", "L1PeakVA", Styles.INT);
            r = fig(s, r, "Leg 2, highest running demand", "MAX(H_L2VA)", f.legL2PeakVa(), "VA", "L2PeakVA", Styles.INT);
            r = fig(s, r, "More loaded leg", "MAX(L1PeakVA,L2PeakVA)", Math.max(f.legL1PeakVa(), f.legL2PeakVa()), "VA", "LegPeakVA", Styles.INT);
        }
        r++;
        s.text(r++, 0, "Served energy by month", ctx.styles.subtitle);
        s.header(r++, 0, "Month", "Days", "Wh per day", "Month no.", "Within 1e-9 of the most (1/0)");
        int first = r;
        for (int m = 1; m <= 12; m++) {
            s.text(r, 0, MONTHS[m - 1]);
            s.formula(r, 1, "COUNTIFS(H_Month," + m + ",H_HourOfDay,0)", cal.daysInMonth(m), Styles.INT);
            s.formula(r, 2, "SUMIFS(H_LoadW,H_Month," + m + ")/B" + (r + 1), f.monthlyDailyEnergyWh()[m - 1], Styles.INT);
            s.input(r, 3, m, Styles.INT);
            boolean near = org.holdover.load.Picks.nearMax(f.monthlyDailyEnergyWh())[m - 1];
            s.formula(r, 4, "IF(C" + (r + 1) + ">=MAX(" + s.ref(first, 2, first + 11, 2) + ")*(1-" + org.holdover.load.Picks.NEAR + "),1,0)",
                    near ? 1 : 0, Styles.INT);
            r++;
        }
        s.name("MonthNear", first, 4, r - 1, 4);
        s.name("MonthDays", first, 1, r - 1, 1);
        s.name("MonthlyWh", first, 2, r - 1, 2);
        s.name("MonthNo", first, 3, r - 1, 3);
        r = fig(s, r + 1, "Month with the most energy per day", "INDEX(MonthNo,MATCH(1,MonthNear,0))",
                f.worstMonth(), "month", "WorstLoadMonth", Styles.GENERAL);
        Charts.monthlyEnergy(ctx, s, first, r + 1);
    }

    private static int fig(SheetWriter s, int r, String label, String formula, double value, String unit, String name,
                           String format) {
        s.text(r, 0, label);
        s.formula(r, 1, formula, value, format);
        s.text(r, 2, unit);
        if (name != null) {
            s.name(name, r, 1);
        }
        return r + 1;
    }
}
