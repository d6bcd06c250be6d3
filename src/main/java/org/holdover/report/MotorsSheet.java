package org.holdover.report;

import java.util.List;
import org.holdover.load.Appliance;
import org.holdover.load.LoadAnalysis;
import org.holdover.load.LockedRotor;
import org.holdover.load.Motor;
import org.holdover.load.StartingMotor;

/**
 * Motor starting: one row per appliance (aligned with the Loads table), the starting demand of each motor
 * and which units make up the set that starts together, then the surge.
 */
final class MotorsSheet {

    static final int HAS = 1, BASIS = 2, HP = 3, LETTER = 4, KVA_HP = 5, LRA = 6, VOLTS = 7, MULT = 8, RUN_VA = 9,
            DIRECT = 10, STARTER = 11, FACTOR = 12, START_VA = 13, LR_PF = 14, START_W = 15, START_S = 16,
            ELIGIBLE = 17, UNITS = 18, SET_RUN_W = 19, SET_RUN_VA = 20, SET_VA = 21, SET_W = 22, SET_S = 23,
            SET_L1 = 24, SET_L2 = 25;

    private MotorsSheet() {
    }

    static String column(Context ctx, int c) {
        return ctx.sheet(Context.MOTORS).ref(LoadsSheet.FIRST, c, LoadsSheet.last(ctx), c);
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.MOTORS);
        LoadAnalysis la = ctx.r.input().loads();
        s.text(0, 0, "Motor starting", ctx.styles.title);
        s.text(1, 0, "Starting demand per unit: nameplate locked-rotor amps × volts; or hp × the code letter's kVA/hp (top of the NEMA MG 1 range);"
                + " or a multiple of running VA; × the starter's share. The motors that start together are the "
                + "MotorsTogether units with the largest starting VA (ties: the one listed first).", ctx.styles.note);
        s.text(2, 0, "Motor units starting together");
        s.input(2, 3, la.starting().size() > 0 ? countTogether(ctx) : 0, Styles.INT);
        s.name("MotorsTogether", 2, 3);
        s.header(LoadsSheet.HEADER, 0, "Appliance", "Motor (1/0)", "Basis", "hp", "Code letter", "kVA/hp", "Locked-rotor A",
                "Volts", "Multiple of running VA", "Running VA per unit", "Direct-on-line start VA per unit", "Starter",
                "Starter share", "Start VA per unit", "Locked-rotor power factor", "Start W per unit", "Start s",
                "Units eligible", "Units starting", "Their running W", "Their running VA", "Their start VA",
                "Their start W", "Start s if starting", "Start VA on leg 1", "Start VA on leg 2");
        List<Appliance> list = la.appliances();
        int n = LoadsSheet.rows(ctx);
        String unitsCol = "$" + SheetWriter.col(ELIGIBLE) + "$";
        String vaCol = "$" + SheetWriter.col(START_VA) + "$";
        int first = LoadsSheet.FIRST;
        int last = LoadsSheet.last(ctx);
        for (int i = 0; i < n; i++) {
            int r = first + i;
            String row = String.valueOf(r + 1);
            String loads = ctx.sheet(Context.LOADS).quoted() + "!";
            Appliance a = i < list.size() ? list.get(i) : null;
            Motor m = a == null ? null : a.motor();
            s.formulaText(r, 0, loads + SheetWriter.addr(r, LoadsSheet.NAME), a == null ? "(no appliances listed)" : a.name());
            s.sheet.getRow(r).getCell(0).setCellStyle(ctx.styles.text);
            s.input(r, HAS, m == null ? 0 : 1, Styles.INT);
            LockedRotor lr = m == null ? null : m.lockedRotor();
            String basis = lr == null ? "" : lr instanceof LockedRotor.ByNameplateAmps ? "nameplate amps"
                    : lr instanceof LockedRotor.ByCodeLetter ? "code letter" : "multiple";
            s.inputText(r, BASIS, basis);
            s.input(r, HP, lr instanceof LockedRotor.ByCodeLetter c ? c.horsepower() : 0, Styles.D2);
            s.inputText(r, LETTER, lr instanceof LockedRotor.ByCodeLetter c ? c.letter().name() : "");
            double kvaHp = lr instanceof LockedRotor.ByCodeLetter c ? c.letter().designKvaPerHp() : 0;
            s.formula(r, KVA_HP, "IF(C" + row + "=\"code letter\",INDEX(NemaKva,MATCH(E" + row + ",NemaLetter,0)),0)", kvaHp, Styles.D2);
            s.input(r, LRA, lr instanceof LockedRotor.ByNameplateAmps b ? b.amps() : 0, Styles.D1);
            s.input(r, VOLTS, lr instanceof LockedRotor.ByNameplateAmps b ? b.volts() : 0, Styles.INT);
            s.input(r, MULT, lr instanceof LockedRotor.ByMultiple b ? b.multiple() : 0, Styles.D2);
            double runVa = a == null ? 0 : a.runningVa();
            s.formula(r, RUN_VA, loads + SheetWriter.addr(r, LoadsSheet.VA_UNIT), runVa, Styles.INT);
            double direct = m == null ? 0 : lr.directStartVa(runVa);
            s.formula(r, DIRECT, "IF(C" + row + "=\"nameplate amps\",G" + row + "*H" + row + ",IF(C" + row
                    + "=\"code letter\",D" + row + "*F" + row + "*1000,IF(C" + row + "=\"multiple\",I" + row + "*J" + row + ",0)))",
                    direct, Styles.INT);
            s.inputText(r, STARTER, m == null ? "" : m.starter().name().toLowerCase(java.util.Locale.ROOT));
            s.input(r, FACTOR, m == null ? 1 : m.starterFactor(), Styles.D2);
            double startVa = m == null ? 0 : m.startVa(runVa);
            s.formula(r, START_VA, "K" + row + "*M" + row, startVa, Styles.INT);
            s.input(r, LR_PF, m == null ? 0 : m.lockedRotorPowerFactor(), Styles.D2);
            s.formula(r, START_W, "N" + row + "*O" + row, m == null ? 0 : m.startW(runVa), Styles.INT);
            s.input(r, START_S, m == null ? 0 : m.startS(), Styles.D2);
            int eligible = a == null || m == null || !a.served() ? 0 : a.quantity();
            s.formula(r, ELIGIBLE, loads + SheetWriter.addr(r, LoadsSheet.QTY) + "*" + loads
                    + SheetWriter.addr(r, LoadsSheet.SERVED) + "*B" + row, eligible, Styles.INT);
            int units = 0;
            double setRunW = 0, setRunVa = 0, setVa = 0, setW = 0, setS = 0;
            for (StartingMotor sm : la.starting()) {
                if (sm.applianceIndex() == i) {
                    units++;
                    setRunW += sm.runningW();
                    setRunVa += sm.runningVa();
                    setVa += sm.startVa();
                    setW += sm.startW();
                    setS = Math.max(setS, sm.startS());
                }
            }
            String all = unitsCol + (first + 1) + ":" + unitsCol + (last + 1);
            String allVa = vaCol + (first + 1) + ":" + vaCol + (last + 1);
            // Rows above this one, from the header row (text, ignored by SUMIFS) to the previous row.
            String aboveUnits = unitsCol + (LoadsSheet.HEADER + 1) + ":" + SheetWriter.col(ELIGIBLE) + r;
            String aboveVa = vaCol + (LoadsSheet.HEADER + 1) + ":" + SheetWriter.col(START_VA) + r;
            // Units of this row among the MotorsTogether largest: larger start VA goes first, then equal start
            // VA in rows above.
            s.formula(r, UNITS, "IF(R" + row + "=0,0,MAX(0,MIN(R" + row + ",MotorsTogether-SUMIFS(" + all + "," + allVa
                    + ",\">\"&N" + row + ")-SUMIFS(" + aboveUnits + "," + aboveVa + ",N" + row + "))))", units, Styles.INT);
            String loadsW = loads + SheetWriter.addr(r, LoadsSheet.W);
            s.formula(r, SET_RUN_W, "S" + row + "*" + loadsW, setRunW, Styles.INT);
            s.formula(r, SET_RUN_VA, "S" + row + "*J" + row, setRunVa, Styles.INT);
            s.formula(r, SET_VA, "S" + row + "*N" + row, setVa, Styles.INT);
            s.formula(r, SET_W, "S" + row + "*P" + row, setW, Styles.INT);
            s.formula(r, SET_S, "IF(S" + row + ">0,Q" + row + ",0)", setS, Styles.D2);
            double l1 = a == null ? 0 : setVa * a.leg().shareL1();
            double l2 = a == null ? 0 : setVa * a.leg().shareL2();
            s.formula(r, SET_L1, "V" + row + "*" + loads + SheetWriter.addr(r, LoadsSheet.L1), l1, Styles.INT);
            s.formula(r, SET_L2, "V" + row + "*" + loads + SheetWriter.addr(r, LoadsSheet.L2), l2, Styles.INT);
        }
        s.sheet.createFreezePane(1, LoadsSheet.FIRST);
        s.sheet.setColumnWidth(0, 34 * 256);
        for (int c = 1; c <= SET_L2; c++) {
            s.sheet.setColumnWidth(c, 12 * 256);
        }
    }

    private static double countTogether(Context ctx) {
        return ctx.r.input().loads().starting().size();
    }

    /** The surge block below the table; needs the hourly names. */
    static void writeSurge(Context ctx) {
        SheetWriter s = ctx.sheet(Context.MOTORS);
        LoadAnalysis.Figures f = ctx.r.input().loads().figures();
        int r = LoadsSheet.last(ctx) + 3;
        s.text(r++, 0, "Surge while the set starts", ctx.styles.subtitle);
        s.text(r++, 0, "Surge = the highest running demand of everything else (hourly sheet) + the starting demand of the set. VA add arithmetically (conservative), common practice.", ctx.styles.note);
        s.header(r++, 0, "Figure", "", "", "Value", "Unit");
        r = fig(s, r, "Running demand of everything else, highest", "MAX(H_OthersVA)", f.othersPeakVa(), "VA", "OthersPeakVA");
        r = fig(s, r, "Running demand of everything else, highest", "MAX(H_OthersW)", f.othersPeakW(), "W", "OthersPeakW");
        r = fig(s, r, "Starting demand of the set", "SUM(" + column(ctx, SET_VA) + ")", f.surgeVa() - f.othersPeakVa(), "VA", null);
        r = fig(s, r, "Surge", "OthersPeakVA+SUM(" + column(ctx, SET_VA) + ")", f.surgeVa(), "VA", "SurgeVA");
        r = fig(s, r, "Surge", "OthersPeakW+SUM(" + column(ctx, SET_W) + ")", f.surgeW(), "W", "SurgeW");
        r = fig(s, r, "Length of the start (longest in the set)", "MAX(" + column(ctx, SET_S) + ")", f.surgeS(), "s", "SurgeS");
        if (ctx.split()) {
            r = fig(s, r, "Leg 1 surge", "MAX(H_OthersL1VA)+SUM(" + column(ctx, SET_L1) + ")", f.surgeL1Va(), "VA", "SurgeL1VA");
            r = fig(s, r, "Leg 2 surge", "MAX(H_OthersL2VA)+SUM(" + column(ctx, SET_L2) + ")", f.surgeL2Va(), "VA", "SurgeL2VA");
            fig(s, r, "More loaded leg, surge", "MAX(SurgeL1VA,SurgeL2VA)", Math.max(f.surgeL1Va(), f.surgeL2Va()), "VA", "LegSurgeVA");
        }
    }

    private static int fig(SheetWriter s, int r, String label, String formula, double value, String unit, String name) {
        s.text(r, 0, label);
        s.formula(r, 3, formula, value, Styles.INT);
        s.text(r, 4, unit);
        if (name != null) {
            s.name(name, r, 3);
        }
        return r + 1;
    }
}
