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
        boolean gen = y.generator().isPresent();
        r = p(s, r, "S_Pchg", gen ? "Charger input limit (from the generator; also the grid's in backup)" : "Grid charger input limit (backup)",
                gen ? "generator section, or the bank's rated energy × charging rate ÷ efficiency" : "", y.charger().maxAcInputW(), "W",
                Styles.INT);
        r = p(s, r, "S_EtaChg", gen ? "Charger efficiency" : "Grid charger efficiency", "common practice, no source",
                y.charger().efficiency(), "", Styles.PCT);
        s.text(r, 0, "Inverter: rated W (all units in parallel), p0, k1, k2 (Inverter curves sheet)");
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

        if (gen) {
            generatorParameters(ctx, s, y);
        }
        HourlyTrace t = y.traced().trace();
        SimulationMetrics met = y.metrics();
        YearCalendar cal = ctx.r.input().loads().calendar();
        int n = cal.hours();
        String[] head = {"Hour", "Load W", "PV array W", "Grid (1/0)", "No charging (1/0)", "Stored at start Wh", "PV available W",
            "PV out W", "PV clipped W", "Bank can take W", "Inverter needs W", "PV to inverter W", "Short of PV W",
            "Bank can give W", "Bank gives W", "Still short W", "Inverter input W", "Inverter output W", "Unmet W", "PV to bank W",
            "PV curtailed W", "Charger in W", "Charger out W", "Into bank W", "Stored at end Wh", "State of charge", "Grid to load W"};
        if (gen) {
            head = java.util.stream.Stream.concat(java.util.Arrays.stream(head), java.util.stream.Stream.of(GEN_HEAD))
                    .toArray(String[]::new);
            head[13] = "Bank can give above the generator's reserve W";
            head[14] = "Bank gives W";
            head[15] = "Short after the bank W";
        }
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
        m = fig(s, m, "Grid energy to the loads (backup)", "SUM(S_GridLoad)", met.grid().toLoadWh(), "Wh", null, Styles.INT);
        if (gen) {
            SimulationMetrics.GeneratorRun g = met.generator();
            s.name("S_GenOn", first, C_ON, last, C_ON);
            s.name("S_GenLoad", first, C_LOAD, last, C_LOAD);
            s.name("S_GenDump", first, C_DUMP, last, C_DUMP);
            s.name("S_GenOut", first, C_OUT, last, C_OUT);
            s.name("S_GenFuel", first, C_FUEL, last, C_FUEL);
            s.name("S_GenStart", first, C_START, last, C_START);
            s.name("S_ChgIn", first, 21, last, 21);
            m = fig(s, m, "Generator running hours", "SUM(S_GenOn)", g.hours(), "h", "S_GenHours", Styles.INT);
            m = fig(s, m, "Generator starts", "SUM(S_GenStart)", g.starts(), "", "S_GenStarts", Styles.INT);
            m = fig(s, m, "Fuel over the year", "SUM(S_GenFuel)", g.fuelL(), "L", "S_FuelL", Styles.D1);
            m = fig(s, m, "Fuel cost over the year", "S_FuelL*S_FuelPrice", g.fuelL() * ctx.r.input().generator().fuelPricePerL(),
                    "", "S_FuelCost", Styles.INT);
            m = fig(s, m, "Generator output", "SUM(S_GenOut)", g.outputWh(), "Wh", null, Styles.INT);
            m = fig(s, m, "…to the loads", "SUM(S_GenLoad)", g.toLoadWh(), "Wh", null, Styles.INT);
            m = fig(s, m, "…dumped (below its minimum load)", "SUM(S_GenDump)", g.dumpedWh(), "Wh", null, Styles.INT);
        }
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
        GenTrace ga = gen ? new GenTrace(t) : null;
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
            if (gen) {
                generatorRow(s, h, row, ga);
            }
            e = stored[h];
        }
        Charts.stateOfCharge(ctx, s, y, FIRST);

        s.sheet.createFreezePane(1, FIRST);
        s.sheet.setColumnWidth(0, 52 * 256);
        for (int c = 1; c < head.length; c++) {
            s.sheet.setColumnWidth(c, 11 * 256);
        }
    }

    /** Columns added when the system has a generator. */
    static final int C_FIRST = 27;
    static final int C_ON = 29;
    static final int C_LOAD = 30;
    static final int C_DUMP = 38;
    static final int C_OUT = 39;
    static final int C_FUEL = 40;
    static final int C_START = 41;
    private static final String[] GEN_HEAD = {"Bank first gives W", "Inverter can deliver W", "Generator on (1/0)",
        "Generator to load W", "Inverter share, generator on W", "Inverter needs, generator on W", "PV to inverter, generator on W",
        "Bank may give, generator on W", "Bank gives, generator on W", "Inverter input, generator on W",
        "Inverter output, generator on W", "Generator dumped W", "Generator output W", "Fuel L", "Start (1/0)"};

    /** The engine's hourly values the generator columns show (copied once). */
    private record GenTrace(double[] pv, double[] demand, double[] first, double[] firstOut, boolean[] on, double[] genLoad,
                            double[] share, double[] need, double[] pvInv, double[] availOn, double[] dis, double[] invIn,
                            double[] invOut, double[] dump, double[] out, double[] fuel, double[] gridChg, double[] genChg,
                            double[] avail1, double[] unmet, double[] pvBat, double[] curt) {
        GenTrace(HourlyTrace t) {
            this(t.pvControllerW(), t.inverterDemandW(), t.batteryFirstW(), t.inverterFirstOutputW(), t.generatorOn(),
                    t.generatorToLoadW(), t.generatorInverterShareW(), t.generatorInverterNeedW(), t.pvToInverterW(),
                    t.generatorBatteryAvailableW(), t.batteryToInverterW(), t.inverterInputW(), t.inverterOutputW(),
                    t.generatorDumpedW(), t.generatorOutputW(), t.fuelL(), t.gridToChargerW(), t.generatorToChargerW(),
                    t.batteryAvailableW(), t.unmetW(), t.pvToBatteryW(), t.pvCurtailedW());
        }
    }

    /** Inverter DC input for an AC output held in {@code cell}: Pin(x) of the loss model. */
    private static String pin(String cell) {
        String x = "(" + cell + "*(1/InvRatedW))";
        return cell + "+InvRatedW*(InvP0+InvK1*" + x + "+InvK2*" + x + "*" + x + ")";
    }

    /** Largest AC output an inverter DC input held in {@code cell} sustains: Pout(y), the inverse of Pin. */
    private static String pout(String cell) {
        String u = "(" + cell + "/InvRatedW-InvP0)";
        return "IF(" + u + "<=0,0,InvRatedW*(2*" + u + "/((1+InvK1)+SQRT((1+InvK1)*(1+InvK1)+4*InvK2*" + u + "))))";
    }

    /**
     * The generator's dispatch in one row (the engine's cases a, b and c, YearSimulation's class comment): columns AB–AP,
     * and the bank, inverter, unmet, PV and charger columns rewritten to choose between the cases.
     */
    private static void generatorRow(SheetWriter s, int h, int row, GenTrace g) {
        String R = String.valueOf(row + 1);
        java.util.function.IntFunction<String> c = k -> SheetWriter.col(k) + R;
        String on = c.apply(C_ON) + "=1";
        String cc = "S_CC=1";
        boolean isOn = g.on[h];
        double pvInv0 = Math.min(g.pv[h], g.demand[h]);
        String AB = c.apply(27), AC = c.apply(28), AE = c.apply(30), AF = c.apply(31), AG = c.apply(32), AH = c.apply(33);
        String AI = c.apply(34), AJ = c.apply(35), AK = c.apply(36), AL = c.apply(37), AM = c.apply(38), AN = c.apply(39);
        // Steps 6-10 before the generator: PV first, the bank down to the generator's reserve.
        s.formula(row, 11, "MIN(H" + R + ",K" + R + ")", pvInv0, Styles.D1);
        s.formula(row, 12, "K" + R + "-L" + R, g.demand[h] - pvInv0, Styles.D1);
        s.formula(row, 13, "IF(D" + R + "=1,0,MIN(S_Pd,MAX(0,(F" + R + "-S_Eres)*S_EtaD)))", g.avail1[h], Styles.D1);
        s.formula(row, 27, "MIN(M" + R + ",N" + R + ")", g.first[h], Styles.D1);
        s.formula(row, 28, "IF(D" + R + "=1,0,IF(M" + R + "-" + AB + ">0,MIN(B" + R + "," + pout("(L" + R + "+" + AB + ")") + "),B" + R + "))",
                g.firstOut[h], Styles.D1);
        // Step 11: on when the inverter falls short, or (cycle charging) it ran the hour before and the set point is not reached.
        String short1 = "B" + R + "-" + AC + ">0";
        String test = h == 0 ? short1
                : "OR(" + short1 + ",AND(" + cc + "," + SheetWriter.col(C_ON) + row + "=1,F" + R + "<S_Eset))";
        s.formula(row, C_ON, "IF(D" + R + "=1,0,IF(" + test + ",1,0))", isOn ? 1 : 0, Styles.GENERAL);
        // Generator running: case b (load following) or c (cycle charging).
        s.formula(row, 30, "IF(" + on + ",IF(" + cc + ",MIN(S_Pav,B" + R + "),MIN(S_Pav,B" + R + "-" + AC + ")),0)", g.genLoad[h], Styles.D1);
        s.formula(row, 31, "IF(" + on + ",B" + R + "-" + AE + ",0)", g.share[h], Styles.D1);
        s.formula(row, 32, "IF(" + on + ",IF(" + cc + ",IF(" + AF + ">0," + pin(AF) + ",0),IF(" + AF + ">" + AC + ",MAX(0," + pin(AF)
                + "-(L" + R + "+" + AB + ")),0)),0)", g.need[h], Styles.D1);
        s.formula(row, 33, "IF(" + on + ",IF(" + cc + ",MIN(H" + R + "," + AG + "),L" + R + "),0)", isOn ? g.pvInv[h] : 0, Styles.D1);
        s.formula(row, 34, "IF(" + on + ",IF(" + cc + ",MIN(S_Pd,MAX(0,(F" + R + "-S_Elo)*S_EtaD)),MIN(S_Pd-" + AB
                + ",MAX(0,(MIN(F" + R + ",S_Eres)-S_Elo)*S_EtaD))),0)", g.availOn[h], Styles.D1);
        s.formula(row, 35, "IF(" + on + ",IF(" + cc + ",MIN(" + AG + "-" + AH + "," + AI + ")," + AB + "+MIN(" + AG + "," + AI + ")),0)",
                isOn ? g.dis[h] : 0, Styles.D1);
        s.formula(row, 36, "IF(" + on + "," + AH + "+" + AJ + ",0)", isOn ? g.invIn[h] : 0, Styles.D1);
        s.formula(row, 37, "IF(" + on + ",IF(OR(AND(" + cc + "," + AG + "-" + AH + "<=" + AI + "),AND(S_CC<>1," + AG + "<=" + AI + ")),"
                + AF + ",MIN(" + AF + "," + pout(AK) + ")),0)", isOn ? g.invOut[h] : 0, Styles.D1);
        // The hour's flows: case a (generator off) or the generator's case.
        s.formula(row, 14, "IF(" + on + "," + AJ + "," + AB + ")", g.dis[h], Styles.D1);
        s.formula(row, 15, "M" + R + "-" + AB, g.demand[h] - pvInv0 - g.first[h], Styles.D1);
        s.formula(row, 16, "IF(" + on + "," + AK + ",L" + R + "+" + AB + ")", g.invIn[h], Styles.D1);
        s.formula(row, 17, "IF(D" + R + "=1,0,IF(" + on + "," + AL + "," + AC + "))", g.invOut[h], Styles.D1);
        s.formula(row, 18, "IF(D" + R + "=1,0,IF(" + on + "," + AF + "-" + AL + ",B" + R + "-" + AC + "))", g.unmet[h], Styles.D1);
        s.formula(row, 19, "IF(" + on + ",IF(" + cc + ",MIN(H" + R + "-" + AH + ",J" + R + "),0),MIN(H" + R + "-L" + R + ",J" + R + "))",
                g.pvBat[h], Styles.D1);
        s.formula(row, 20, "IF(" + on + ",H" + R + "-" + AH + "-T" + R + ",H" + R + "-L" + R + "-T" + R + ")", g.curt[h], Styles.D1);
        s.formula(row, 21, "IF(D" + R + "=1,MIN(S_Pchg,(J" + R + "-T" + R + ")*(1/S_EtaChg)),IF(AND(" + on + "," + cc
                + "),MIN(S_Pchg,MIN(S_Pav-" + AE + ",(J" + R + "-T" + R + ")*(1/S_EtaChg))),0))", g.gridChg[h] + g.genChg[h], Styles.D1);
        s.formula(row, C_DUMP, "IF(" + on + ",MAX(0,S_Pmin-" + AE + "-V" + R + "),0)", g.dump[h], Styles.D1);
        s.formula(row, C_OUT, "IF(" + on + "," + AE + "+V" + R + "+" + AM + ",0)", g.out[h], Styles.D1);
        s.formula(row, C_FUEL, "IF(" + on + ",S_F0*(S_Pgen/1000)+S_F1*(" + AN + "/1000),0)", g.fuel[h], "0.000");
        String prevOn = h == 0 ? "0" : SheetWriter.col(C_ON) + row;
        s.formula(row, C_START, "IF(AND(" + on + "," + prevOn + "=0),1,0)", isOn && (h == 0 || !g.on[h - 1]) ? 1 : 0, Styles.GENERAL);
    }

    /** The generator's parameters and its sizing against the charger and the loads, beside the year's figures. */
    private static void generatorParameters(Context ctx, SheetWriter s, YearCheck y) {
        org.holdover.sim.Generator g = y.generator().orElseThrow();
        org.holdover.sizing.SizingInput in = ctx.r.input();
        org.holdover.sizing.GeneratorRules rules = in.generator();
        org.holdover.catalog.GeneratorItem item = ctx.r.generator();
        int r = 3;
        int c0 = GP;
        s.text(2, GP, "Generator " + (item == null ? "" : item.id() + ": " + item.description()), ctx.styles.bold);
        r = gp(s, c0, r, "S_Pgen", "Rating (nameplate, sea level)", g.ratedW(), "W", Styles.INT);
        r = gp(s, c0, r, "S_Alt", "Site altitude (site.elevationM)", rules.altitudeM(), "m", Styles.INT);
        r = gp(s, c0, r, "S_DerThr", "Derating starts above (500 ft)", rules.derating().thresholdM(), "m", Styles.D1);
        r = gp(s, c0, r, "S_DerFrac", "Rating lost per metre (3 % per 1,000 ft; trade rule, common practice, no standard)",
                rules.derating().fractionPerM(), "/m", "0.0000000");
        double factor = rules.derating().factorAt(rules.altitudeM());
        r = gf(s, c0, r, "S_GenFactor", "Altitude factor", "MAX(0,1-MAX(0,S_Alt-S_DerThr)*S_DerFrac)", factor, "", "0.0000");
        r = gf(s, c0, r, "S_Pav", "Available at the site", "S_Pgen*S_GenFactor", g.availableW(), "W", Styles.INT);
        r = gp(s, c0, r, "S_MinRatio", "Minimum load ratio", g.minLoadRatio(), "", Styles.PCT);
        r = gf(s, c0, r, "S_Pmin", "Smallest output while running", "MIN(S_MinRatio*S_Pgen,S_Pav)",
                Math.min(g.minLoadRatio() * g.ratedW(), g.availableW()), "W", Styles.INT);
        r = gp(s, c0, r, "S_F0", "Fuel at no load per rated kW (F0)", g.fuel().noLoadLPerHPerRatedKw(), "L/h/kW", "0.00000");
        r = gp(s, c0, r, "S_F1", "Fuel per kWh of output (F1)", g.fuel().slopeLPerKwh(), "L/kWh", "0.00000");
        boolean cycle = g.strategy() instanceof org.holdover.sim.DispatchStrategy.CycleCharging;
        r = gp(s, c0, r, "S_CC", "Cycle charging (1) or load following (0)", cycle ? 1 : 0, "", Styles.GENERAL);
        r = gp(s, c0, r, "S_Start", "Starts below this state of charge", g.startSoc(), "", Styles.PCT);
        double set = cycle ? ((org.holdover.sim.DispatchStrategy.CycleCharging) g.strategy()).setPointSoc() : 0;
        r = gp(s, c0, r, "S_Set", "Runs on until this state of charge (cycle charging)", set, "", Styles.PCT);
        double eNom = y.bank().nominalEnergyWh();
        r = gf(s, c0, r, "S_Eres", "Reserve kept for the generator's hours, Wh", "MAX(S_Elo,S_Start*S_Enom)",
                Math.max(y.bank().floorSoc() * eNom, g.startSoc() * eNom), "Wh", Styles.INT);
        r = gf(s, c0, r, "S_Eset", "Set point, Wh", "S_Set*S_Enom", set * eNom, "Wh", Styles.INT);
        r = gp(s, c0, r, "S_FuelPrice", "Fuel price (per litre)", rules.fuelPricePerL(), "", Styles.D2);
        r = gp(s, c0, r, "S_GenPrice", "Demo price of the set", item == null ? 0 : item.price(), "", Styles.INT);
        // The set against the charger flat out plus the loads running meanwhile (GeneratorSizing), in the next block.
        r = 3;
        c0 = GP2;
        if (item != null) {
            var d = org.holdover.sizing.GeneratorPlan.demand(in, item, ctx.r.bank());
            boolean oneLeg = org.holdover.sizing.GeneratorPlan.connection(in, item)
                    == org.holdover.sim.GeneratorSizing.ChargerConnection.ONE_LEG_OF_SPLIT_PHASE;
            s.text(2, GP2, "The set against the charger and the loads", ctx.styles.bold);
            r = gf(s, c0, r, "S_GenTotalW", "Charger input + coincident running demand", "S_Pchg+RunPeakW", d.totalDemandW(), "W", Styles.INT);
            r = gp(s, c0, r, "S_OneLeg", "120 V charger on one leg of a 120/240 V set (1/0)", oneLeg ? 1 : 0, "", Styles.GENERAL);
            r = gf(s, c0, r, "S_GenLegW", "On the charger's leg: charger + its loads", "IF(S_OneLeg=1,S_Pchg+RunPeakW,0)", d.legDemandW(), "W",
                    Styles.INT);
            r = gf(s, c0, r, "S_GenReqW", "Output needed: the total, or twice the leg", "MAX(S_GenTotalW,2*S_GenLegW)", d.requiredOutputW(),
                    "W", Styles.INT);
            r = gf(s, c0, r, "S_GenReqRatedW", "Rating needed at this altitude", "S_GenReqW/S_GenFactor", d.requiredRatedW(), "W", Styles.INT);
            ctx.checkCells.put(org.holdover.sizing.GeneratorPlan.RATED, new String[] {"S_Pgen", "S_GenReqRatedW"});
            if (oneLeg) {
                r = gf(s, c0, r, "S_GenLegAvailW", "One leg: half the rating at this altitude", "S_Pgen/2*S_GenFactor",
                        item.ratedW() / 2 * d.deratingFactor(), "W", Styles.INT);
                ctx.checkCells.put(org.holdover.sizing.GeneratorPlan.LEG, new String[] {"S_GenLegAvailW", "S_GenLegW"});
            }
        }
    }

    /** First column of the generator's parameter block and of its sizing block. */
    private static final int GP = 15;
    private static final int GP2 = 22;

    private static int gp(SheetWriter s, int col, int r, String name, String label, double value, String unit, String format) {
        s.text(r, col, label);
        s.input(r, col + 4, value, format);
        s.text(r, col + 5, unit);
        s.name(name, r, col + 4);
        return r + 1;
    }

    private static int gf(SheetWriter s, int col, int r, String name, String label, String formula, double value, String unit, String format) {
        s.text(r, col, label);
        s.formula(r, col + 4, formula, value, format);
        s.text(r, col + 5, unit);
        s.name(name, r, col + 4);
        return r + 1;
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
