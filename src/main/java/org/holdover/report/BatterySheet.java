package org.holdover.report;

import java.util.List;
import org.holdover.battery.BankDesign;
import org.holdover.battery.BankRequirement;
import org.holdover.battery.BatteryModule;
import org.holdover.battery.Chemistry;
import org.holdover.battery.TemperatureTable;
import org.holdover.inverter.InverterSpec;
import org.holdover.sizing.BankOption;
import org.holdover.sizing.EnergyBasis;

/**
 * The battery chain at the chosen bus voltage: the DC energy from the hourly sheet, then for every module
 * the corrections (depth of discharge, temperature, aging, rate) and the strings needed.
 */
final class BatterySheet {

    static final int ID = 0, CHEM = 1, MOD_V = 2, AH = 3, RATE_H = 4, CONT = 5, SURGE = 6, SURGE_S = 7, MAX_PAR = 8,
            MAX_SER = 9, PRICE = 10, CELLS = 11, SERIES = 12, BANK_V = 13, DOD = 14, EOL = 15, TEMP = 16, AGING = 17,
            EFF_AH = 18, DIS_A = 19, K = 20, RATE = 21, RATED_AH = 22, S_ENERGY = 23, S_CONT = 24, S_SURGE = 25,
            STRINGS = 26, PAR_LIMIT = 27, FEASIBLE = 28, KWH = 29, COST = 30, USABLE = 31, ABS_V = 32, END_V = 33,
            SUITS = 34, USE = 35, CHOSEN = 36;

    private BatterySheet() {
    }

    /** Writes the sheet; returns the row of the chosen bank (or −1). */
    static int write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.BATTERY);
        s.text(0, 0, "Battery bank", ctx.styles.title);
        if (ctx.r.chosen() == null) {
            s.text(2, 0, "No bus voltage gives a passing system, so no bank was sized. See the DC bus sheet for the reasons.");
            return -1;
        }
        EnergyBasis e = ctx.r.energy();
        BankRequirement req = ctx.r.requirement();
        InverterSpec inv = ctx.r.inverter().spec();
        s.text(1, 0, "Effective Ah = DC energy ÷ (bank V × depth of discharge) × temperature factor × aging factor;"
                + " rated Ah = effective Ah × Peukert rate factor (≥ 1); strings = the most of capacity, continuous and surge needs, each rounded up.", ctx.styles.note);
        int r = 3;
        s.text(r, 0, "Bus voltage class chosen, V");
        s.formula(r, 2, ctx.sheet(Context.INVERTERS).ref(InvertersSheet.FIRST + ctx.r.inverters().indexOf(ctx.r.inverter()),
                InvertersSheet.BUS), ctx.r.chosen().busClassV(), Styles.INT);
        s.name("ChosenBusV", r++, 2);
        if (ctx.backup()) {
            s.text(r, 0, "Outage window, whole hours");
            s.formula(r, 2, "ROUNDUP(OutageHours-RoundingSlack,0)", e.windowHours(), Styles.INT);
            s.name("WindowHours", r++, 2);
            s.text(r, 0, "DC energy over the hardest window, Wh");
            s.formula(r, 2, "MAX(H_WindowWh)", e.energyDcWh(), Styles.INT);
            s.name("EnergyDcWh", r++, 2);
            s.text(r, 0, "…window starts at hour of the year");
            s.formula(r, 2, "MATCH(1,H_WindowNear,0)-1", e.windowStartHour(), Styles.GENERAL);
            s.name("WindowStart", r++, 2);
            s.text(r, 0, "AC energy served in that window, Wh");
            s.formula(r, 2, "SUMIFS(H_LoadW,H_Hour,\">=\"&WindowStart,H_Hour,\"<\"&(WindowStart+WindowHours))", e.energyAcWh(), Styles.INT);
            s.name("EnergyAcWh", r++, 2);
            s.text(r, 0, "Discharge time, h");
            s.formula(r, 2, "WindowHours", e.dischargeHours(), Styles.D1);
            s.name("DischargeH", r++, 2);
        } else {
            s.header(r++, 0, "Month", "Days", "DC Wh per day", "Within 1e-9 of the most (1/0)");
            int first = r;
            for (int m = 1; m <= 12; m++) {
                s.text(r, 0, LoadsSheet.MONTHS[m - 1]);
                s.formula(r, 1, "INDEX(MonthDays," + m + ")", ctx.r.input().loads().calendar().daysInMonth(m), Styles.INT);
                s.formula(r, 2, "SUMIFS(H_DcW,H_Month," + m + ")/B" + (r + 1), e.monthlyDailyDcWh()[m - 1], Styles.INT);
                s.formula(r, 3, "IF(C" + (r + 1) + ">=MAX(" + s.ref(first, 2, first + 11, 2) + ")*(1-" + org.holdover.load.Picks.NEAR + "),1,0)",
                        org.holdover.load.Picks.nearMax(e.monthlyDailyDcWh())[m - 1] ? 1 : 0, Styles.INT);
                r++;
            }
            s.name("MonthlyDcNear", first, 3, r - 1, 3);
            s.name("MonthlyDcWh", first, 2, r - 1, 2);
            s.text(r, 0, "Worst month (most DC energy per day)");
            s.formula(r, 2, "MATCH(1,MonthlyDcNear,0)", e.worstMonth(), Styles.GENERAL);
            s.name("WorstDcMonth", r++, 2);
            s.text(r, 0, "DC energy over the days of autonomy, Wh");
            s.formula(r, 2, "AutonomyDays*INDEX(MonthlyDcWh,WorstDcMonth)", e.energyDcWh(), Styles.INT);
            s.name("EnergyDcWh", r++, 2);
            s.text(r, 0, "AC energy served over them, Wh");
            s.formula(r, 2, "AutonomyDays*INDEX(MonthlyWh,WorstDcMonth)", e.energyAcWh(), Styles.INT);
            s.name("EnergyAcWh", r++, 2);
            s.text(r, 0, "Discharge time, h");
            s.formula(r, 2, "AutonomyDays*24", e.dischargeHours(), Styles.D1);
            s.name("DischargeH", r++, 2);
        }
        s.text(r, 0, "Inverter efficiency over the discharge (AC ÷ DC)");
        s.formula(r, 2, "EnergyAcWh/EnergyDcWh", e.effectiveEfficiency(), Styles.PCT);
        s.name("EffectiveEff", r++, 2);
        s.text(r, 0, "Battery temperature, °C / °F");
        s.formula(r, 2, "BatteryColdC", req.batteryTempC(), Styles.D1);
        s.formula(r, 3, "C" + (r + 1) + "*9/5+32", TemperatureTable.toF(req.batteryTempC()), Styles.D1);
        s.name("BatteryF", r++, 3);
        r = tempFactor(s, r, "Lead-acid temperature factor (IEEE 485 Table 1)", "Lead", Chemistry.FLOODED, req.batteryTempC());
        r = tempFactor(s, r, "LiFePO4 temperature factor (from memory)", "Lfp", Chemistry.LIFEPO4, req.batteryTempC());
        s.text(r, 0, "Continuous / surge DC current at the cutoff, A; start, s");
        s.formula(r, 2, "ContA", req.continuousA(), Styles.D1);
        s.formula(r, 3, "SurgeA", req.surgeA(), Styles.D1);
        s.formula(r, 4, ctx.hasMotors() ? "SurgeS" : "0", req.surgeS(), Styles.D2);
        s.name("StartS", r++, 4);
        s.text(r, 0, "Chosen inverter: topology; maximum modulation index");
        s.inputText(r, 2, inv.topology().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        s.input(r, 3, inv.maxModulationIndex(), Styles.D2);
        s.name("InvTopology", r, 2);
        s.name("InvModIndex", r++, 3);
        s.text(r, 0, "Lowest DC for the AC peak (transformerless bridge: √2 × V rms ÷ modulation index), V");
        s.formula(r, 2, "IF(InvTopology=\"transformerless-direct\",SQRT(2)*ServiceV/InvModIndex,0)", inv.minDcForAcPeakV(), Styles.D1);
        s.name("MinDcForPeakV", r++, 2);
        var pin = ctx.r.search() == null || ctx.r.search().chosen() == null ? null : ctx.r.search().chosen().candidate().pin();
        s.text(r, 0, "The system search's choice: module; strings (the table takes at least these for that module)");
        s.inputText(r, 2, pin == null ? "" : pin.batteryModuleId());
        s.input(r, 3, pin == null ? 0 : pin.strings(), Styles.INT);
        s.name("SearchModule", r, 2);
        s.name("SearchStrings", r++, 3);

        r++;
        s.header(r++, 0, "Module", "Chemistry", "Module V", "Ah", "Rated at h", "Continuous A", "Surge A", "Surge s",
                "Max parallel", "Max series", "Demo price", "Cells", "In series", "Bank V", "Depth of discharge",
                "End of life", "Temperature factor", "Aging factor", "Effective Ah", "Discharge A", "Peukert k",
                "Rate factor", "Rated Ah needed", "Strings for capacity", "Strings for continuous A",
                "Strings for surge A", "Strings", "Most strings allowed", "Within limits", "Bank kWh", "Bank price",
                "Usable Wh", "Charging V", "End V", "Suits the inverter", "Usable", "Chosen");
        List<BankOption> banks = ctx.r.chosen().banks();
        int chosenRow = -1;
        for (BankOption o : banks) {
            BankDesign b = o.design();
            BatteryModule m = b.module();
            String R = String.valueOf(r + 1);
            String chem = "MATCH(B" + R + ",ChemWord,0)";
            s.inputText(r, ID, m.id());
            s.inputText(r, CHEM, m.chemistry().word());
            s.input(r, MOD_V, m.nominalV(), Styles.D1);
            s.input(r, AH, m.capacityAh(), Styles.INT);
            s.input(r, RATE_H, m.rateHours(), Styles.GENERAL);
            s.input(r, CONT, m.maxContinuousA(), Styles.INT);
            s.input(r, SURGE, m.maxSurgeA(), Styles.INT);
            s.input(r, SURGE_S, m.surgeS(), Styles.D1);
            s.input(r, MAX_PAR, m.maxParallel(), Styles.INT);
            s.input(r, MAX_SER, m.maxSeries(), Styles.INT);
            s.input(r, PRICE, m.price(), Styles.INT);
            s.formula(r, CELLS, "ROUND(C" + R + "/INDEX(ChemCellV," + chem + "),0)", m.cells(), Styles.INT);
            s.formula(r, SERIES, "ChosenBusV/12*INDEX(ChemCellsPer12," + chem + ")/L" + R, b.series(), Styles.INT);
            s.formula(r, BANK_V, "M" + R + "*C" + R, b.bankNominalV(), Styles.D1);
            s.formula(r, DOD, "IF(DodOverride>0,DodOverride,INDEX(ChemDod," + chem + "))", req(b).depthOfDischarge(), Styles.PCT);
            s.formula(r, EOL, "IF(EolOverride>0,EolOverride,INDEX(ChemEol," + chem + "))", req(b).endOfLife(), Styles.PCT);
            s.formula(r, TEMP, "IF(INDEX(ChemLead," + chem + ")=1,LeadTempFactor,LfpTempFactor)", b.temperatureFactor(), Styles.D3);
            s.formula(r, AGING, "1/P" + R, b.agingFactor(), Styles.D3);
            s.formula(r, EFF_AH, "EnergyDcWh/(N" + R + "*O" + R + ")*Q" + R + "*R" + R, b.effectiveAh(), Styles.D1);
            s.formula(r, DIS_A, "EnergyDcWh/N" + R + "/DischargeH", b.dischargeA(), Styles.D2);
            s.formula(r, K, "INDEX(ChemK," + chem + ")", m.chemistry().peukertExponent(), Styles.D2);
            s.formula(r, RATE, "IF(OR(S" + R + "<=0,T" + R + "<=0),1,MAX(1,(T" + R + "*E" + R + "/S" + R + ")^((U" + R + "-1)/U" + R + ")))",
                    b.rateFactor(), Styles.D3);
            s.formula(r, RATED_AH, "S" + R + "*V" + R, b.ratedAh(), Styles.D1);
            s.formula(r, S_ENERGY, "MAX(1,ROUNDUP(W" + R + "/D" + R + "-RoundingSlack,0))", b.stringsForEnergy(), Styles.INT);
            s.formula(r, S_CONT, "MAX(0,ROUNDUP(ContA/F" + R + "-RoundingSlack,0))", b.stringsForContinuous(), Styles.INT);
            s.formula(r, S_SURGE, "MAX(0,ROUNDUP(SurgeA/IF(StartS<=H" + R + ",G" + R + ",F" + R + ")-RoundingSlack,0))", b.stringsForSurge(), Styles.INT);
            s.formula(r, STRINGS, "MAX(X" + R + ",Y" + R + ",Z" + R + ",IF(A" + R + "=SearchModule,SearchStrings,0))", b.strings(),
                    Styles.INT);
            s.formula(r, PAR_LIMIT, "MIN(I" + R + ",IF(MaxParallelRule>0,MaxParallelRule,INDEX(ChemMaxPar," + chem + ")))",
                    b.maxParallel(), Styles.INT);
            s.formulaText(r, FEASIBLE, "IF(AA" + R + "<=AB" + R + ",\"yes\",\"no\")", b.feasible() ? "yes" : "no");
            s.formula(r, KWH, "N" + R + "*(AA" + R + "*D" + R + ")/1000", b.bankEnergyWh() / 1000.0, Styles.D2);
            s.formula(r, COST, "M" + R + "*AA" + R + "*K" + R, b.price(), Styles.INT);
            double usable = b.usableWh();
            s.formula(r, USABLE, "(AA" + R + "*D" + R + ")*N" + R + "*O" + R + "/(Q" + R + "*R" + R + "*V" + R + ")", usable, Styles.INT);
            s.formula(r, ABS_V, "M" + R + "*L" + R + "*INDEX(ChemAbsV," + chem + ")", b.absorptionV(), Styles.D1);
            s.formula(r, END_V, "M" + R + "*L" + R + "*INDEX(ChemEndV," + chem + ")", b.endV(), Styles.D1);
            boolean suits = o.incompatibility().isEmpty();
            s.formulaText(r, SUITS, "IF(AND(AG" + R + "<=InvDcMaxV,N" + R + ">=InvDcMinV,MAX(InvDcMinV,AH" + R + ")>=MinDcForPeakV),\"yes\",\"no\")",
                    suits ? "yes" : "no");
            s.formulaText(r, USE, "IF(AND(AC" + R + "=\"yes\",AI" + R + "=\"yes\"),\"yes\",\"no\")", o.usable() ? "yes" : "no");
            boolean chosen = b == ctx.r.bank();
            s.text(r, CHOSEN, chosen ? (ctx.r.search() != null && ctx.r.search().chosen() != null
                    ? "chosen (the system search's least-cost passing system)" : "chosen (lowest demo price that is usable)")
                    : o.reason());
            if (chosen) {
                chosenRow = r;
            }
            r++;
        }
        s.sheet.setColumnWidth(0, 44 * 256);
        for (int c = 1; c <= USE; c++) {
            s.sheet.setColumnWidth(c, 11 * 256);
        }
        s.sheet.setColumnWidth(CHOSEN, 50 * 256);
        return chosenRow;
    }

    private static BankRequirement req(BankDesign b) {
        return b.requirement();
    }

    private static int tempFactor(SheetWriter s, int r, String label, String key, Chemistry c, double tempC) {
        String tf = key + "TempF";
        String fa = key + "Factor";
        int n = TemperatureTable.of(c).rows().size();
        String tc = "MIN(MAX(BatteryF,INDEX(" + tf + ",1)),INDEX(" + tf + "," + n + "))";
        String m = "MIN(MATCH(" + tc + "," + tf + ",1)," + (n - 1) + ")";
        String f = "MAX(1,INDEX(" + fa + "," + m + ")+(" + tc + "-INDEX(" + tf + "," + m + "))*(INDEX(" + fa + "," + m + "+1)-INDEX("
                + fa + "," + m + "))/(INDEX(" + tf + "," + m + "+1)-INDEX(" + tf + "," + m + ")))";
        s.text(r, 0, label);
        s.formula(r, 2, f, TemperatureTable.of(c).factor(tempC), Styles.D3);
        s.name(key + "TempFactor", r, 2);
        if (TemperatureTable.of(c).belowTable(tempC)) {
            s.text(r, 3, "colder than the table: its coldest row is used, which understates the loss", s.styles.note);
        }
        return r + 1;
    }
}
