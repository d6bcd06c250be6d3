package org.holdover.report;

import org.holdover.load.YearCalendar;
import org.holdover.sim.BatteryBank;
import org.holdover.sim.HourlyTrace;
import org.holdover.sim.SimulationMetrics;
import org.holdover.sizing.YearCheck;

/**
 * The chosen system over the simulated year, one row per hour: the energy balance and the stored-energy
 * recursion as live formulas (each row from its inputs and the row above), then the year's figures.
 */
final class SimulationSheet {

    static final int HEADER = 24;
    static final int FIRST = HEADER + 1;

    private SimulationSheet() {
    }

    static void write(Context ctx, YearCheck y) {
        SheetWriter s = ctx.sheet(Context.SIMULATION);
        s.text(0, 0, "The year hour by hour", ctx.styles.title);
        if (y == null) {
            s.text(2, 0, "No system was chosen, so none was simulated.");
            return;
        }
        s.paragraph(1, 0, 12, "Each hour: PV through the controller; with the grid up (backup) the grid carries the load and PV and the"
                + " charger refill the bank; otherwise the inverter draws its DC input (loss model, idle draw included) from PV first, then"
                + " the bank down to its floor; what the DC side cannot supply is unmet. Stored energy carries from row to row."
                + " The bank is the chosen one at end of life and at its coldest; the round-trip loss is charged on the way in.",
                ctx.styles.noteWrap, 200);
        BatteryBank b = y.bank();
        int r = 3;
        r = p(s, r, "S_Enom", "Simulated bank energy (rated ÷ (temperature × aging factor))", "Battery sheet", b.nominalEnergyWh(), "Wh", Styles.INT);
        r = p(s, r, "S_Floor", "State-of-charge floor (1 − depth of discharge)", "", b.floorSoc(), "", Styles.PCT);
        r = p(s, r, "S_Ceil", "State-of-charge ceiling", "", b.ceilingSoc(), "", Styles.PCT);
        r = p(s, r, "S_Init", "State of charge at the start (the end of a warm-up year)", "engine", b.initialSoc(), "", "0.000000");
        r = p(s, r, "S_EtaC", "Charge efficiency (the chemistry's round trip)", "", b.chargeEfficiency(), "", Styles.PCT);
        r = p(s, r, "S_EtaD", "Discharge efficiency", "", b.dischargeEfficiency(), "", Styles.PCT);
        r = p(s, r, "S_Pc", "Largest charging power", "strings × module charge limit × bank V", b.maxChargeW(), "W", Styles.INT);
        r = p(s, r, "S_Pd", "Largest discharging power", "strings × module continuous limit × bank V", b.maxDischargeW(), "W", Styles.INT);
        r = p(s, r, "S_EtaCC", "Charge controller efficiency", "", y.controller().efficiency(), "", Styles.PCT);
        r = p(s, r, "S_Pcc", "Charge controller output limit", "", y.controller().outputLimitW(), "W", Styles.INT);
        r = p(s, r, "S_Pchg", "Grid charger input limit (backup)", "", y.charger().maxAcInputW(), "W", Styles.INT);
        r = p(s, r, "S_EtaChg", "Grid charger efficiency", "common practice, no source", y.charger().efficiency(), "", Styles.PCT);
        s.text(r, 0, "Inverter: rated W, p0, k1, k2 (Inverter curves sheet)");
        s.formula(r, 2, "InvRatedW", y.inverter().ratedW(), Styles.INT);
        s.formula(r, 3, "InvP0", y.inverter().noLoadLossPu(), Styles.D4);
        s.formula(r, 4, "InvK1", y.inverter().linearLossPu(), "0.00000");
        s.formula(r, 5, "InvK2", y.inverter().quadraticLossPu(), "0.00000");
        r++;
        s.text(r, 0, "Floor and ceiling, Wh");
        s.formula(r, 2, "S_Floor*S_Enom", b.floorSoc() * b.nominalEnergyWh(), Styles.INT);
        s.name("S_Elo", r, 2);
        s.formula(r, 3, "S_Ceil*S_Enom", b.ceilingSoc() * b.nominalEnergyWh(), Styles.INT);
        s.name("S_Ehi", r, 3);
        r++;

        HourlyTrace t = y.traced().trace();
        SimulationMetrics met = y.metrics();
        YearCalendar cal = ctx.r.input().loads().calendar();
        int n = cal.hours();
        String[] head = {"Hour", "Load W", "PV array W", "Grid (1/0)", "No charging (1/0)", "Stored at start Wh", "PV available W",
            "PV out W", "PV clipped W", "Bank can take W", "Inverter needs W", "PV to inverter W", "Short of PV W",
            "Bank can give W", "Bank gives W", "Still short W", "Inverter input W", "Inverter output W", "Unmet W", "PV to bank W",
            "PV curtailed W", "Charger in W", "Charger out W", "Into bank W", "Stored at end Wh", "State of charge", "Grid to load W"};
        s.header(HEADER, 0, head);
        int first = FIRST;
        int last = first + n - 1;
        s.name("S_Unmet", first, 18, last, 18);
        s.name("S_Soc", first, 25, last, 25);
        s.name("S_PvArray", first, 2, last, 2);
        s.name("S_PvOut", first, 7, last, 7);
        s.name("S_Clip", first, 8, last, 8);
        s.name("S_Curt", first, 20, last, 20);
        s.name("S_BankIn", first, 23, last, 23);
        s.name("S_BankOut", first, 14, last, 14);
        s.name("S_InvIn", first, 16, last, 16);
        s.name("S_InvOut", first, 17, last, 17);
        s.name("S_GridLoad", first, 26, last, 26);
        s.name("S_Load", first, 1, last, 1);
        // The year's figures, beside the parameters.
        int m = 3;
        SimulationMetrics.Reliability rel = met.reliability();
        m = fig(s, m, "Unmet energy over the year", "SUM(S_Unmet)", rel.unmetWh(), "Wh", "S_UnmetWh", Styles.INT);
        m = fig(s, m, "Unmet energy the project accepts", "MaxUnmetFraction*SUM(S_Load)", y.unmetLimitWh(), "Wh", "S_UnmetLimit", Styles.INT);
        m = fig(s, m, "Hours with unmet load", "COUNTIF(S_Unmet,\">0\")", rel.unmetHours(), "h", null, Styles.INT);
        m = fig(s, m, "Loss-of-load probability (hours)", "COUNTIF(S_Unmet,\">0\")/ROWS(S_Unmet)", rel.lossOfLoadProbability(), "",
                null, "0.0000%");
        m = fig(s, m, "Lowest state of charge", "MIN(S_Soc)", met.battery().lowestSoc(), "", null, Styles.PCT);
        m = fig(s, m, "PV clipped by the controller", "SUM(S_Clip)", met.pv().clippedWh(), "Wh", null, Styles.INT);
        m = fig(s, m, "PV curtailed (bank full)", "SUM(S_Curt)", met.pv().curtailedWh(), "Wh", null, Styles.INT);
        m = fig(s, m, "Battery throughput (DC out)", "SUM(S_BankOut)", met.battery().dischargeWh(), "Wh", null, Styles.INT);
        m = fig(s, m, "Equivalent full cycles", "SUM(S_BankOut)/S_Enom", met.battery().equivalentFullCycles(), "", null, Styles.D1);
        m = fig(s, m, "Inverter losses (input − output)", "SUM(S_InvIn)-SUM(S_InvOut)", met.inverter().lossWh(), "Wh", null, Styles.INT);
        fig(s, m, "Grid energy to the loads (backup)", "SUM(S_GridLoad)", met.grid().toLoadWh(), "Wh", null, Styles.INT);
        SheetWriter hourly = ctx.sheet(Context.HOURLY);
        double[] load = y.loadW();
        double[] pvArr = y.pvArrayW();
        boolean[] grid = y.gridAvailable();
        boolean[] nc = y.chargeForbidden();
        double[] stored = t.storedWh();
        final double[] batteryAcceptW = t.batteryAcceptW();
        final double[] batteryAvailableW = t.batteryAvailableW();
        final double[] batteryChargeW = t.batteryChargeW();
        final double[] batteryToInverterW = t.batteryToInverterW();
        final double[] chargerToBatteryW = t.chargerToBatteryW();
        final double[] gridToChargerW = t.gridToChargerW();
        final double[] gridToLoadW = t.gridToLoadW();
        final double[] inverterDemandW = t.inverterDemandW();
        final double[] inverterInputW = t.inverterInputW();
        final double[] inverterOutputW = t.inverterOutputW();
        final double[] pvClippedW = t.pvClippedW();
        final double[] pvControllerW = t.pvControllerW();
        final double[] pvCurtailedW = t.pvCurtailedW();
        final double[] pvToBatteryW = t.pvToBatteryW();
        final double[] pvToInverterW = t.pvToInverterW();
        final double[] soc = t.soc();
        final double[] unmetW = t.unmetW();
        boolean pvLinked = ctx.r.solar() != null && ctx.r.solar().chosen() != null;
        boolean pwm = pvLinked && ctx.r.solar().chosen().controller().controller().type() == org.holdover.pv.ControllerType.PWM;
        double e = b.initialSoc() * b.nominalEnergyWh();
        for (int h = 0; h < n; h++) {
            int row = first + h;
            String R = String.valueOf(row + 1);
            s.input(row, 0, h, Styles.GENERAL);
            s.formula(row, 1, hourly.quoted() + "!" + SheetWriter.col(HourlySheet.loadColumn(ctx)) + (HourlySheet.FIRST + h + 1), load[h], Styles.D1);
            if (pvLinked) {
                s.formula(row, 2, "INDEX(PVH_DcW,A" + R + "+1)" + (pwm ? "-INDEX(PVH_GivenUpW,A" + R + "+1)" : ""), pvArr[h], Styles.D1);
            } else {
                s.input(row, 2, pvArr[h], Styles.D1);
            }
            s.input(row, 3, grid[h] ? 1 : 0, Styles.GENERAL);
            s.input(row, 4, nc[h] ? 1 : 0, Styles.GENERAL);
            s.formula(row, 5, h == 0 ? "S_Init*S_Enom" : "Y" + row, e, Styles.D1);
            double pvAvail = pvControllerW[h] + pvClippedW[h];
            s.formula(row, 6, "S_EtaCC*C" + R, pvAvail, Styles.D1);
            s.formula(row, 7, "MIN(G" + R + ",S_Pcc)", pvControllerW[h], Styles.D1);
            s.formula(row, 8, "G" + R + "-H" + R, pvClippedW[h], Styles.D1);
            double acc = batteryAcceptW[h];
            s.formula(row, 9, "IF(E" + R + "=1,0,MAX(0,MIN(S_Pc,(S_Ehi-F" + R + ")*(1/S_EtaC))))", acc, Styles.D1);
            String x = "(B" + R + "*(1/InvRatedW))";
            double d = inverterDemandW[h];
            s.formula(row, 10, "IF(D" + R + "=1,0,B" + R + "+InvRatedW*(InvP0+InvK1*" + x + "+InvK2*" + x + "*" + x + "))", d, Styles.D1);
            s.formula(row, 11, "MIN(H" + R + ",K" + R + ")", pvToInverterW[h], Styles.D1);
            double short0 = d - pvToInverterW[h];
            s.formula(row, 12, "K" + R + "-L" + R, short0, Styles.D1);
            double avail1 = batteryAvailableW[h];
            s.formula(row, 13, "IF(D" + R + "=1,0,MIN(S_Pd,MAX(0,(F" + R + "-S_Elo)*S_EtaD)))", avail1, Styles.D1);
            s.formula(row, 14, "MIN(M" + R + ",N" + R + ")", batteryToInverterW[h], Styles.D1);
            s.formula(row, 15, "M" + R + "-O" + R, short0 - batteryToInverterW[h], Styles.D1);
            s.formula(row, 16, "L" + R + "+O" + R, inverterInputW[h], Styles.D1);
            String u = "(Q" + R + "/InvRatedW-InvP0)";
            String pout = "IF(" + u + "<=0,0,InvRatedW*(2*" + u + "/((1+InvK1)+SQRT((1+InvK1)*(1+InvK1)+4*InvK2*" + u + "))))";
            s.formula(row, 17, "IF(D" + R + "=1,0,IF(P" + R + ">0,MIN(B" + R + "," + pout + "),B" + R + "))", inverterOutputW[h], Styles.D1);
            s.formula(row, 18, "IF(D" + R + "=1,0,B" + R + "-R" + R + ")", unmetW[h], Styles.D1);
            s.formula(row, 19, "MIN(H" + R + "-L" + R + ",J" + R + ")", pvToBatteryW[h], Styles.D1);
            s.formula(row, 20, "H" + R + "-L" + R + "-T" + R, pvCurtailedW[h], Styles.D1);
            double chgIn = gridToChargerW[h];
            s.formula(row, 21, "IF(D" + R + "=1,MIN(S_Pchg,(J" + R + "-T" + R + ")*(1/S_EtaChg)),0)", chgIn, Styles.D1);
            s.formula(row, 22, "S_EtaChg*V" + R, chargerToBatteryW[h], Styles.D1);
            s.formula(row, 23, "T" + R + "+W" + R, batteryChargeW[h], Styles.D1);
            s.formula(row, 24, "F" + R + "+S_EtaC*X" + R + "-O" + R + "*(1/S_EtaD)", stored[h], Styles.D1);
            s.formula(row, 25, "Y" + R + "*(1/S_Enom)", soc[h], "0.0000");
            s.formula(row, 26, "IF(D" + R + "=1,B" + R + ",0)", gridToLoadW[h], Styles.D1);
            e = stored[h];
        }
        Charts.stateOfCharge(ctx, s, y, FIRST);

        s.sheet.createFreezePane(1, FIRST);
        s.sheet.setColumnWidth(0, 52 * 256);
        for (int c = 1; c < head.length; c++) {
            s.sheet.setColumnWidth(c, 11 * 256);
        }
    }

    private static int fig(SheetWriter s, int r, String label, String formula, double value, String unit, String name, String format) {
        s.text(r, 7, label);
        s.formula(r, 12, formula, value, format);
        s.text(r, 13, unit);
        if (name != null) {
            s.name(name, r, 12);
        }
        return r + 1;
    }

    private static int p(SheetWriter s, int r, String name, String label, String how, double value, String unit, String format) {
        s.text(r, 0, label);
        s.input(r, 2, value, format);
        s.text(r, 3, unit);
        s.text(r, 4, how);
        s.name(name, r, 2);
        return r + 1;
    }
}
