package org.holdover.report;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import org.apache.poi.ss.usermodel.CellStyle;
import org.holdover.load.LoadAnalysis;
import org.holdover.load.YearCalendar;
import org.holdover.sizing.EnergyBasis;

/**
 * The year hour by hour (local standard time): calendar, the measured profile, the served load and the
 * running demands looked up in the typical days, the inverter's DC input, and (backup) the DC energy of
 * the outage window starting at each hour.
 */
final class HourlySheet {

    private static final LocalDate EXCEL_EPOCH = LocalDate.of(1899, 12, 30);
    /** First data row (0-based). */
    static final int FIRST = 4;

    /** Column of the served load. */
    static int loadColumn(Context ctx) {
        return ctx.hasProfile() ? 6 : 5;
    }

    private HourlySheet() {
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.HOURLY);
        LoadAnalysis la = ctx.r.input().loads();
        YearCalendar cal = la.calendar();
        EnergyBasis e = ctx.r.energy();
        boolean split = ctx.split();
        boolean profile = ctx.hasProfile();
        boolean dc = e != null;
        boolean window = dc && ctx.backup();
        s.text(0, 0, "Hourly: the served load over the year", ctx.styles.title);
        s.text(1, 0, "Hour 0 starts at midnight on 1 January, local standard time. Look-ups: INDEX(grid, (month − 1) × 2 + day type + 1, hour + 1).", ctx.styles.note);
        int hr = 3;
        int c = 0;
        final int cHour = c++, cDate = c++, cMonth = c++, cType = c++, cHod = c++;
        final int cProfile = profile ? c++ : -1;
        final int cLoad = c++, cRunW = c++, cRunVa = c++, cOthW = c++, cOthVa = c++;
        final int cL1 = split ? c++ : -1, cL2 = split ? c++ : -1, cOL1 = split ? c++ : -1, cOL2 = split ? c++ : -1;
        final int cDc = dc ? c++ : -1;
        final int cWin = window ? c++ : -1;
        final int cNear = window ? c++ : -1;
        s.text(hr, cHour, "Hour", ctx.styles.header);
        s.text(hr, cDate, "Date", ctx.styles.header);
        s.text(hr, cMonth, "Month", ctx.styles.header);
        s.text(hr, cType, "Day type (0 weekday, 1 weekend)", ctx.styles.header);
        s.text(hr, cHod, "Hour of day", ctx.styles.header);
        if (profile) {
            s.text(hr, cProfile, "Measured profile, W", ctx.styles.header);
        }
        s.text(hr, cLoad, "Served load, W", ctx.styles.header);
        s.text(hr, cRunW, "Running demand, W", ctx.styles.header);
        s.text(hr, cRunVa, "Running demand, VA", ctx.styles.header);
        s.text(hr, cOthW, "Without the starting set, W", ctx.styles.header);
        s.text(hr, cOthVa, "Without the starting set, VA", ctx.styles.header);
        if (split) {
            s.text(hr, cL1, "Leg 1, VA", ctx.styles.header);
            s.text(hr, cL2, "Leg 2, VA", ctx.styles.header);
            s.text(hr, cOL1, "Leg 1 without the set, VA", ctx.styles.header);
            s.text(hr, cOL2, "Leg 2 without the set, VA", ctx.styles.header);
        }
        if (dc) {
            s.text(hr, cDc, "Inverter DC input, W", ctx.styles.header);
        }
        if (window) {
            s.text(hr, cWin, "DC energy of the " + e.windowHours() + " h outage starting here, Wh", ctx.styles.header);
            s.text(hr, cNear, "Within 1e-9 of the hardest (1/0)", ctx.styles.header);
        }
        int n = cal.hours();
        int first = hr + 1;
        int last = first + n - 1;
        CellStyle date = ctx.wb.createCellStyle();
        date.setDataFormat(ctx.wb.createDataFormat().getFormat("yyyy-mm-dd"));
        // Names first: formulas below refer to them.
        s.name("H_Hour", first, cHour, last, cHour);
        s.name("H_Month", first, cMonth, last, cMonth);
        s.name("H_Type", first, cType, last, cType);
        s.name("H_HourOfDay", first, cHod, last, cHod);
        s.name("H_LoadW", first, cLoad, last, cLoad);
        s.name("H_RunW", first, cRunW, last, cRunW);
        s.name("H_RunVA", first, cRunVa, last, cRunVa);
        s.name("H_OthersW", first, cOthW, last, cOthW);
        s.name("H_OthersVA", first, cOthVa, last, cOthVa);
        if (split) {
            s.name("H_L1VA", first, cL1, last, cL1);
            s.name("H_L2VA", first, cL2, last, cL2);
            s.name("H_OthersL1VA", first, cOL1, last, cOL1);
            s.name("H_OthersL2VA", first, cOL2, last, cOL2);
        }
        if (dc) {
            s.name("H_DcW", first, cDc, last, cDc);
        }
        boolean[] near = null;
        if (window) {
            s.name("H_WindowWh", first, cWin, last - e.windowHours() + 1, cWin);
            s.name("H_WindowNear", first, cNear, last - e.windowHours() + 1, cNear);
            s.text(2, cWin - 1, "Hardest outage window, Wh");
            s.formula(2, cWin, "MAX(H_WindowWh)", e.energyDcWh(), Styles.INT);
            s.name("H_WindowMax", 2, cWin);
            near = org.holdover.load.Picks.nearMax(e.windowDcWh());
        }
        double[] raw = ctx.r.input().measuredW();
        double[] prof = la.profileW();
        for (int h = 0; h < n; h++) {
            int r = first + h;
            String R = String.valueOf(r + 1);
            s.input(r, cHour, h, Styles.GENERAL);
            String hour = SheetWriter.col(cHour) + R;
            double serial = ChronoUnit.DAYS.between(EXCEL_EPOCH, cal.date(h));
            s.formula(r, cDate, "DATE(Year,1,1)+INT(" + hour + "/24)", serial, Styles.GENERAL).setCellStyle(date);
            String dateRef = SheetWriter.col(cDate) + R;
            s.formula(r, cMonth, "MONTH(" + dateRef + ")", cal.month(h), Styles.GENERAL);
            s.formula(r, cType, "IF(WEEKDAY(" + dateRef + ",2)>5,1,0)", cal.dayType(h), Styles.GENERAL);
            s.formula(r, cHod, "MOD(" + hour + ",24)", cal.hourOfDay(h), Styles.GENERAL);
            String at = "(" + SheetWriter.col(cMonth) + R + "-1)*2+" + SheetWriter.col(cType) + R + "+1," + SheetWriter.col(cHod) + R + "+1)";
            String residual;
            String profileTerm;
            if (profile) {
                s.input(r, cProfile, raw[h], Styles.D1);
                profileTerm = SheetWriter.col(cProfile) + R + "*ProfileFactor";
                residual = "MAX(" + profileTerm + "-INDEX(G_InProfile," + at + ",0)";
            } else {
                profileTerm = "0";
                residual = "MAX(0-INDEX(G_InProfile," + at + ",0)";
            }
            double res = Math.max(prof[h] - la.inProfileGrid().at(cal, h), 0.0);
            s.formula(r, cLoad, profileTerm + "+INDEX(G_Energy," + at, la.loadW()[h], Styles.D1);
            s.formula(r, cRunW, residual + "+INDEX(G_RunW," + at, la.runningW()[h], Styles.D1);
            String resVa = residual + "/" + (profile ? "ProfilePF" : "1");
            s.formula(r, cRunVa, resVa + "+INDEX(G_RunVA," + at, la.runningVa()[h], Styles.D1);
            s.formula(r, cOthW, SheetWriter.col(cRunW) + R + "-INDEX(G_SetRunW," + at, la.othersW()[h], Styles.D1);
            s.formula(r, cOthVa, SheetWriter.col(cRunVa) + R + "-INDEX(G_SetRunVA," + at, la.othersVa()[h], Styles.D1);
            if (split) {
                s.formula(r, cL1, resVa + "*0.5+INDEX(G_L1VA," + at, la.legL1Va()[h], Styles.D1);
                s.formula(r, cL2, resVa + "*0.5+INDEX(G_L2VA," + at, la.legL2Va()[h], Styles.D1);
                s.formula(r, cOL1, SheetWriter.col(cL1) + R + "-INDEX(G_SetL1VA," + at, la.othersL1Va()[h], Styles.D1);
                s.formula(r, cOL2, SheetWriter.col(cL2) + R + "-INDEX(G_SetL2VA," + at, la.othersL2Va()[h], Styles.D1);
            }
            if (dc) {
                String load = SheetWriter.col(cLoad) + R;
                String p = "(" + load + "/InvRatedW)";
                s.formula(r, cDc, load + "+InvRatedW*(InvP0+InvK1*" + p + "+InvK2*" + p + "*" + p + ")", e.dcInputW()[h], Styles.D1);
            }
            if (window && h + e.windowHours() <= n) {
                String from = SheetWriter.col(cDc) + R;
                String to = SheetWriter.col(cDc) + (r + e.windowHours());
                s.formula(r, cWin, "SUM(" + from + ":" + to + ")", e.windowDcWh()[h], Styles.INT);
                s.formula(r, cNear, "IF(" + SheetWriter.col(cWin) + R + ">=H_WindowMax*(1-" + org.holdover.load.Picks.NEAR + "),1,0)",
                        near[h] ? 1 : 0, Styles.GENERAL);
            }
        }
        s.sheet.createFreezePane(1, first);
        for (int i = 0; i < c; i++) {
            s.sheet.setColumnWidth(i, (i == cDate ? 11 : 13) * 256);
        }
    }
}
