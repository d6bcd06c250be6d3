package org.holdover.report;

import java.util.Locale;
import org.holdover.battery.BankDesign;
import org.holdover.battery.BatteryModule;
import org.holdover.battery.TerminalModel;
import org.holdover.dc.AmpacityStep;
import org.holdover.dc.CandidateEvaluation;
import org.holdover.dc.ConductorSelection;
import org.holdover.dc.ConductorTables;
import org.holdover.dc.ShortCircuit;
import org.holdover.dc.SurgeFix;
import org.holdover.dc.SurgeFixes;
import org.holdover.dc.SurgeResult;
import org.holdover.dc.TableSystem;
import org.holdover.dc.VoltageDropStep;
import org.holdover.inverter.InverterSpec;
import org.holdover.sizing.DcDesign;

/**
 * The DC wiring: the battery–inverter conductor and its overcurrent device with every table lookup as a
 * formula, the battery voltage during the motor start step by step, what would fix a failing start, the
 * prospective short-circuit current, and the cautions that belong here.
 */
final class WiringSheet {

    static final int V = 1;

    private WiringSheet() {
    }

    /** Writes the sheet; names W_* cells the summary refers to. */
    static void write(Context ctx, int bankRow, DcDesign dc) {
        SheetWriter s = ctx.sheet(Context.WIRING);
        s.widths(56, 16, 8, 62);
        s.text(0, 0, "DC wiring and the battery during a motor start", ctx.styles.title);
        if (dc == null) {
            s.text(2, 0, "No system was chosen, so no wiring was sized.");
            return;
        }
        ConductorSelection.Sized cable = (ConductorSelection.Sized) dc.cable();
        CandidateEvaluation ch = cable.chosen();
        AmpacityStep a = ch.ampacity();
        VoltageDropStep vd = ch.voltageDrop();
        boolean nec = ch.size().system() == TableSystem.NEC;
        InverterSpec inv = ctx.r.inverter().spec();
        BankDesign bank = ctx.r.bank();
        BatteryModule m = bank.module();
        SheetWriter invs = ctx.sheet(Context.INVERTERS);
        SheetWriter bat = ctx.sheet(Context.BATTERY);
        int invRow = InvertersSheet.FIRST + ctx.r.inverters().indexOf(ctx.r.inverter());
        int r = 2;
        s.text(r++, 0, "Battery to inverter: conductor and overcurrent device (" + (nec ? "NFPA 70 (NEC) 2023" : "IEC 60364-5-52 / IEC 60228") + ")", ctx.styles.subtitle);
        s.header(r++, 0, "Quantity", "Value", "Unit", "How");
        String x = invs.ref(invRow, InvertersSheet.CONT_W) + "*" + invs.ref(invRow, InvertersSheet.UNITS);
        r = f(s, r, inv.units() > 1 ? "Inverters' rated continuous output (" + inv.units() + " in parallel)"
                : "Inverter rated continuous output", x, inv.continuousW(), "W", "catalog × units in parallel", Styles.INT, "W_RatedW");
        double dcIn = inv.loss().inputW(inv.continuousW());
        r = f(s, r, "Its DC input at rated output (loss model)", "W_RatedW+W_RatedW*(InvP0+InvK1*1+InvK2*1*1)", dcIn, "W",
                "rated × (1 + p0 + k1 + k2)", Styles.INT, "W_DcInW");
        r = f(s, r, "Inverter low-voltage cutoff", "InvDcMinV", inv.dcMinV(), "V", "catalog", Styles.D1, "W_CutoffV");
        r = f(s, r, "Continuous current of the circuit", "W_DcInW/W_CutoffV", dc.cableCurrentA(), "A",
                "the inverter's rated input at its cutoff (the most it can draw continuously)", Styles.D1, "W_ContA");
        r = conductor(ctx, s, r, "W_", cable, "Nominal bank voltage (drop is a % of it)", bat.ref(bankRow, BatterySheet.BANK_V),
                bank.bankNominalV(), "Battery sheet");
        boolean fine = cable.request().fineStranded();
        double alpha = ConductorTables.alpha20PerC(ch.size().system());
        double ref = ConductorTables.referenceTemperatureC(ch.size().system());

        r++;
        s.text(r++, 0, "Battery voltage at the inverter while the motors start (worst case the design allows)", ctx.styles.subtitle);
        s.header(r++, 0, "Quantity", "Value", "Unit", "How");
        String dod = bat.ref(bankRow, BatterySheet.DOD);
        r = f(s, r, "Lowest state of charge (1 − depth of discharge)", "1-" + dod, dc.socFloor(), "", "Battery sheet", Styles.PCT, "W_SocFloor");
        String chem = "\"" + m.chemistry().word() + "\"";
        boolean lead = m.chemistry().leadAcid();
        r = f(s, r, "Rested cell voltage at that state of charge", interp("W_SocFloor", "Ocv_soc", lead ? "Ocv_lead" : "Ocv_lfp",
                TerminalModel.OCV.x().length), dc.ocvCellV(), "V", "Tables: open-circuit voltage (" + m.chemistry().word() + ", from memory)",
                Styles.D3, "W_OcvCellV");
        r = f(s, r, "Cells in series", bat.ref(bankRow, BatterySheet.SERIES) + "*" + bat.ref(bankRow, BatterySheet.CELLS), dc.cells(), "",
                "modules in series × cells per module", Styles.INT, "W_Cells");
        r = f(s, r, "Bank open-circuit voltage", "W_Cells*W_OcvCellV", dc.openCircuitV(), "V", "", Styles.D2, "W_Voc");
        r = in(s, r, "Module internal resistance at 25 °C", m.internalResistanceOhm() * 1000, "mΩ", "catalog", Styles.D2, "W_ModuleMilliohm");
        r = f(s, r, "Coldest battery temperature", "BatteryColdC", dc.tempC(), "°C", "project", Styles.D1, "W_TempC");
        r = f(s, r, "Resistance factor at that temperature", interp("W_TempC", "Rt_temp", lead ? "Rt_lead" : "Rt_lfp",
                TerminalModel.RESISTANCE.x().length), dc.resistanceFactor(), "×", "Tables: resistance against temperature (from memory)",
                Styles.D3, "W_RFactor");
        r = f(s, r, "Bank internal resistance", "(W_ModuleMilliohm/1000*W_RFactor)*" + bat.ref(bankRow, BatterySheet.SERIES) + "/"
                + bat.ref(bankRow, BatterySheet.STRINGS), dc.bankOhm(), "Ω", "module × factor × in series ÷ strings", "0.000000", "W_BankOhm");
        if (dc.leads() != null) {
            r = f(s, r, "Each inverter's leads ÷ inverters in parallel (round trip)", "IVL_CableOhm/InvUnits", dc.leadsOhm(), "Ω",
                    "each unit draws its share of the start current through its own leads (block below)", "0.000000", "W_LeadsOhm");
        } else {
            r = in(s, r, "Inverter leads from a bus bar", 0, "Ω", "one inverter: the battery cable runs to it", "0.000000", "W_LeadsOhm");
        }
        r = f(s, r, "Round-trip resistance of the DC path (cable + leads)", "W_CableOhm+W_LeadsOhm", dc.cableOhm() + dc.leadsOhm(), "Ω",
                "above", "0.000000", "W_SurgeCableOhm");
        r = f(s, r, "Surge (AC)", ctx.hasMotors() ? "SurgeW" : "RunPeakW", ctx.hasMotors() ? ctx.r.input().loads().figures().surgeW()
                : ctx.r.input().loads().figures().runningPeakW(), "W", "Motors sheet", Styles.INT, "W_SurgeAcW");
        String p = "(W_SurgeAcW/InvRatedW)";
        r = f(s, r, "Inverter DC input during the start", "W_SurgeAcW+InvRatedW*(InvP0+InvK1*" + p + "+InvK2*" + p + "*" + p + ")",
                dc.surgeInputW(), "W", "loss model at the surge", Styles.INT, "W_SurgeDcW");
        r = f(s, r, "Bank peak-current limit for the start", bat.ref(bankRow, BatterySheet.STRINGS) + "*IF(StartS<="
                + bat.ref(bankRow, BatterySheet.SURGE_S) + "," + bat.ref(bankRow, BatterySheet.SURGE) + "," + bat.ref(bankRow, BatterySheet.CONT) + ")",
                dc.peakLimitA(), "A", "strings × module short-time limit", Styles.INT, "W_PeakLimitA");
        SurgeResult.Operating o = dc.surge() instanceof SurgeResult.Operating op ? op : null;
        double disc = dc.startDiscriminant();
        r = f(s, r, "Discriminant V_oc² − 4·P·R (negative: the bank cannot deliver the power)",
                "W_Voc*W_Voc-4*W_SurgeDcW*(W_BankOhm+W_SurgeCableOhm)", disc, "V²", "power balance P = V·I with V = V_oc − I·R", Styles.D2, "W_Disc");
        r = f(s, r, "Current during the start", "IF(W_Disc<0,0,2*W_SurgeDcW/(W_Voc+SQRT(W_Disc)))", o == null ? 0 : o.currentA(), "A",
                "I = 2P ÷ (V_oc + √discriminant), the smaller root", Styles.D1, "W_SurgeA");
        r = f(s, r, "Voltage at the battery terminals", "IF(W_Disc<0,0,W_Voc-W_SurgeA*W_BankOhm)", o == null ? 0 : o.batteryTerminalV(), "V",
                "", Styles.D2, "W_SurgeBatV");
        r = f(s, r, "Voltage at the inverter", "IF(W_Disc<0,0,W_Voc-W_SurgeA*(W_BankOhm+W_SurgeCableOhm))", o == null ? 0 : o.inverterTerminalV(),
                "V", "", Styles.D2, "W_SurgeInvV");
        r = f(s, r, "Margin above the cutoff", "W_SurgeInvV-W_CutoffV", o == null ? -inv.dcMinV() : o.cutoffMarginV(), "V", "", Styles.D2, null);
        s.text(r, 0, "Start voltage check");
        s.formulaText(r++, V, "IF(W_SurgeInvV>=W_CutoffV,\"pass\",\"FAIL\")", o != null && o.aboveCutoff() ? "pass" : "FAIL");

        if (!dc.fixes().isEmpty()) {
            r++;
            s.text(r++, 0, "What would fix the start (each fix alone, everything else as above)", ctx.styles.subtitle);
            r = in(s, r, "Soft starter: share of the direct-on-line starting demand it leaves", org.holdover.sizing.DcSide.SOFT_STARTER_SHARE,
                    "", "common practice, no source", Styles.D2, "W_SoftShare");
            s.header(r++, 0, "Fix", "V_oc, V", "Bank Ω", "Cable Ω", "DC input W", "Cutoff V", "Peak limit A", "Discriminant",
                    "Current A", "Inverter V", "Result");
            String directStartW = "SUMIFS(" + MotorsSheet.column(ctx, MotorsSheet.SET_W) + "," + MotorsSheet.column(ctx, MotorsSheet.STARTER)
                    + ",\"direct\")";
            String strings = bat.ref(bankRow, BatterySheet.STRINGS);
            for (SurgeFixes.Evaluation e : dc.fixes()) {
                String R = String.valueOf(r + 1);
                s.text(r, 0, DcDesign.describe(e.fix()));
                String voc = "W_Voc", bk = "W_BankOhm", cab = "W_SurgeCableOhm", pw = "W_SurgeDcW", cut = "W_CutoffV", lim = "W_PeakLimitA";
                SurgeFix fx = e.fix();
                if (fx instanceof SurgeFix.HigherBusVoltage h) {
                    double k = e.after().openCircuitV() / dc.openCircuitV();
                    String kk = String.valueOf(Math.rint(k * 1e9) / 1e9);
                    voc = "W_Voc*" + kk;
                    bk = "W_BankOhm*" + kk;
                    cut = "W_CutoffV*" + kk;
                } else if (fx instanceof SurgeFix.ParallelStrings ps) {
                    bk = "W_BankOhm*" + strings + "/(" + strings + "+" + ps.addedStrings() + ")";
                    lim = "W_PeakLimitA*(" + strings + "+" + ps.addedStrings() + ")/" + strings;
                } else if (fx instanceof SurgeFix.HeavierCable hc) {
                    int steps = dc.fixes().stream().filter(ev -> ev.fix() instanceof SurgeFix.HeavierCable).toList().indexOf(e) + 1;
                    String rr = nec ? "INDEX(NecRes_uncoated_stranded_ohm_per_kft,MATCH(W_Size,NecRes_size,0)+" + steps + ")*(1/304.8)"
                            : "INDEX(" + (fine ? "IecRes_class5_plain_ohm_per_km" : "IecRes_class2_plain_ohm_per_km")
                                    + ",MATCH(W_Size,IecRes_area_mm2,0)+" + steps + ")/1000";
                    cab = "2*W_LengthM*(" + rr + "*((1+" + alpha + "*(W_CondTempC-20))/(1+" + alpha + "*(" + ref + "-20))))/W_Sets+W_LeadsOhm";
                } else if (fx instanceof SurgeFix.ShorterCable sc0) {
                    cab = "W_CableOhm*" + (sc0.newLengthM() / sc0.presentLengthM()) + "+W_LeadsOhm";
                } else if (fx instanceof SurgeFix.SoftStarter) {
                    String x0 = "(W_SurgeAcW-" + directStartW + "*(1-W_SoftShare))";
                    String pp = "(" + x0 + "/InvRatedW)";
                    pw = x0 + "+InvRatedW*(InvP0+InvK1*" + pp + "+InvK2*" + pp + "*" + pp + ")";
                }
                s.formula(r, 1, voc, e.after().openCircuitV(), Styles.D2);
                s.formula(r, 2, bk, e.after().bankResistanceOhm(), "0.000000");
                s.formula(r, 3, cab, e.after().cableRoundTripResistanceOhm(), "0.000000");
                s.formula(r, 4, pw, e.after().inverterInputW(), Styles.INT);
                s.formula(r, 5, cut, e.after().lowVoltageCutoffV(), Styles.D1);
                s.formula(r, 6, lim, e.after().peakCurrentLimitA(), Styles.INT);
                double d = e.after().discriminant();
                s.formula(r, 7, "B" + R + "*B" + R + "-4*E" + R + "*(C" + R + "+D" + R + ")", d, Styles.D2);
                SurgeResult.Operating eo = e.result() instanceof SurgeResult.Operating op2 ? op2 : null;
                s.formula(r, 8, "IF(H" + R + "<0,0,2*E" + R + "/(B" + R + "+SQRT(H" + R + ")))", eo == null ? 0 : eo.currentA(), Styles.D1);
                s.formula(r, 9, "IF(H" + R + "<0,0,B" + R + "-I" + R + "*(C" + R + "+D" + R + "))", eo == null ? 0 : eo.inverterTerminalV(), Styles.D2);
                s.formulaText(r, 10, "IF(AND(H" + R + ">=0,J" + R + ">=F" + R + ",I" + R + "<=G" + R + "),\"works\",\"not enough\")",
                        e.result().passes() ? "works" : "not enough");
                r++;
            }
        }

        r++;
        s.text(r++, 0, "Prospective short-circuit current (full charge, 25 °C)", ctx.styles.subtitle);
        ShortCircuit.Result sc = dc.shortCircuit();
        r = f(s, r, "Bank open-circuit voltage at full charge", "W_Cells*(" + interp("1", "Ocv_soc", lead ? "Ocv_lead" : "Ocv_lfp",
                TerminalModel.OCV.x().length) + ")", sc.input().openCircuitV(), "V", "", Styles.D2, "W_VocFull");
        r = f(s, r, "Bank internal resistance at 25 °C", "(W_ModuleMilliohm/1000)*" + bat.ref(bankRow, BatterySheet.SERIES) + "/"
                + bat.ref(bankRow, BatterySheet.STRINGS), sc.input().bankResistanceOhm(), "Ω", "", "0.000000", "W_BankOhmWarm");
        r = f(s, r, "At the battery terminals (where the battery's device sits)", "W_VocFull/W_BankOhmWarm", sc.atBatteryTerminalsA(), "A",
                "V_oc ÷ R_bank", Styles.INT, "W_ScA");
        r = f(s, r, "At the inverter end of the cable", "W_VocFull/(W_BankOhmWarm+W_CableOhm)", sc.atCableEndA(), "A", "", Styles.INT, null);
        r = in(s, r, "What ordinary devices interrupt", ShortCircuit.COMMON_ORDINARY_DEVICE_LIMIT_A, "A", "common practice, no source",
                Styles.INT, "W_OrdinaryLimitA");
        r = s.paragraph(r, 0, 3, "A device at the battery must be rated to interrupt this DC current; ordinary devices often interrupt no more than "
                + (long) ShortCircuit.COMMON_ORDINARY_DEVICE_LIMIT_A + " A (common practice, no source): check the device's DC interrupting rating.",
                ctx.styles.noteWrap, 150);

        org.holdover.sizing.PvCircuits pvc = ctx.r.pvCircuits();
        if (pvc != null && pvc.pvOutput() instanceof ConductorSelection.Sized pvo
                && pvc.controllerOutput() instanceof ConductorSelection.Sized cto) {
            org.holdover.pv.ArrayCandidate cand = ctx.r.solar().chosen().candidate();
            r++;
            s.text(r++, 0, "PV output circuit, array to each of the " + pvc.controllers() + " controller(s) (NEC 690.8)", ctx.styles.subtitle);
            s.header(r++, 0, "Quantity", "Value", "Unit", "How");
            r = in(s, r, "Module short-circuit current", cand.module().stc().iscA(), "A", "catalog", Styles.D2, "PVO_Isc");
            r = in(s, r, "Strings on each controller", cand.stringsPerController(), "", "PV sheet", Styles.INT, "PVO_Strings");
            r = f(s, r, "Continuous current (the sub-array's short-circuit current)", "PVO_Isc*PVO_Strings", pvo.request().continuousCurrentA(),
                    "A", "NEC 690.8(A)(1) then (B): × 1.25 × 1.25 below", Styles.D2, "PVO_ContA");
            r = in(s, r, "Module maximum-power voltage", cand.module().stc().vmpV(), "V", "catalog", Styles.D2, "PVO_Vmp");
            r = in(s, r, "Modules per string", cand.modulesPerString(), "", "PV sheet", Styles.INT, "PVO_PerString");
            r = conductor(ctx, s, r, "PVO_", pvo, "String maximum-power voltage (drop is a % of it)", "PVO_Vmp*PVO_PerString",
                    pvo.request().nominalV(), "modules per string × Vmp");
            r++;
            s.text(r++, 0, "Controller output circuit, each controller to the battery", ctx.styles.subtitle);
            s.header(r++, 0, "Quantity", "Value", "Unit", "How");
            r = in(s, r, "Controller rated output current", cto.request().continuousCurrentA(), "A",
                    "catalog; NEC 690.8(A)(3) (from memory): the controller's rated output current", Styles.D1, "CTO_ContA");
            r = conductor(ctx, s, r, "CTO_", cto, "Nominal bank voltage (drop is a % of it)", bat.ref(bankRow, BatterySheet.BANK_V),
                    cto.request().nominalV(), "Battery sheet");
            for (String[] k : new String[][] {{"pvc.pv", "PVO_"}, {"pvc.out", "CTO_"}}) {
                ctx.checkCells.put(k[0] + ".ampacity", new String[] {k[1] + "AllowableA", "MAX(" + k[1] + "DesignA," + k[1] + "CouA)"});
                ctx.checkCells.put(k[0] + ".drop", new String[] {k[1] + "DropPct", k[1] + "DropLimitPct"});
                ctx.checkCells.put(k[0] + ".fuse", new String[] {k[1] + "DeviceA", k[1] + "DesignA"});
            }
        }

        org.holdover.sizing.InverterLeads leads = ctx.r.inverterLeads();
        if (leads != null && leads.lead() instanceof ConductorSelection.Sized unitLead) {
            InverterSpec unit = inv.catalogUnit();
            r++;
            s.text(r++, 0, "Each inverter's DC leads from the common bus bar (" + leads.units() + " inverters in parallel)", ctx.styles.subtitle);
            s.header(r++, 0, "Quantity", "Value", "Unit", "How");
            r = f(s, r, "Inverters in parallel", "InvUnits", leads.units(), "", "Inverters sheet; the battery cable above carries them all",
                    Styles.INT, null);
            r = f(s, r, "One unit's rated continuous output", invs.ref(invRow, InvertersSheet.CONT_W), unit.continuousW(), "W", "catalog",
                    Styles.INT, "IVL_UnitW");
            r = f(s, r, "Its DC input at rated output (loss model)", "IVL_UnitW+IVL_UnitW*(InvP0+InvK1*1+InvK2*1*1)",
                    unit.loss().inputW(unit.continuousW()), "W", "rated × (1 + p0 + k1 + k2)", Styles.INT, "IVL_DcInW");
            r = f(s, r, "Continuous current of each lead", "IVL_DcInW/InvDcMinV", leads.unitContinuousA(), "A",
                    "one unit's rated input at its cutoff", Styles.D1, "IVL_ContA");
            r = conductor(ctx, s, r, "IVL_", unitLead, "Nominal bank voltage (drop is a % of it)", bat.ref(bankRow, BatterySheet.BANK_V),
                    unitLead.request().nominalV(), "Battery sheet");
            ctx.checkCells.put("lead.ampacity", new String[] {"IVL_AllowableA", "MAX(IVL_DesignA,IVL_CouA)"});
            ctx.checkCells.put("lead.drop", new String[] {"IVL_DropPct", "IVL_DropLimitPct"});
            ctx.checkCells.put("lead.fuse", new String[] {"IVL_DeviceA", "IVL_DesignA"});
        }

        r++;
        s.text(r++, 0, "Cautions for the DC wiring", ctx.styles.subtitle);
        for (String c : new String[] {
            "DC arcs do not self-extinguish: every switch, breaker and fuse here must be rated for DC at the bank's full-charge voltage.",
            "Put the overcurrent device and a disconnect at the battery, as close to its terminals as practical; the cable before it is unprotected.",
            "Fine-stranded (flexible) cable needs lugs and terminals identified for it (NEC 110.14); crimp with the right die and tool.",
            "Work on batteries with insulated tools; remove rings and watches. A qualified installer does this work; local code governs."}) {
            r = s.paragraph(r, 0, 3, c, ctx.styles.noteWrap, 150);
        }
    }



    /** One DC circuit's conductor and device checked against the tables; its cells are named {@code P + …}. */
    static int conductor(Context ctx, SheetWriter s, int r, String P, ConductorSelection.Sized cable, String nominalLabel,
                         String nominalFormula, double nominalV, String nominalHow) {
        CandidateEvaluation ch = cable.chosen();
        AmpacityStep a = ch.ampacity();
        VoltageDropStep vd = ch.voltageDrop();
        boolean nec = ch.size().system() == TableSystem.NEC;
        r = in(s, r, "Design factor for continuous current", cable.request().factors().designFactor(), "×",
                nec ? "NEC 2023 210.19(A)(1)(a), 215.2(A)(1): 125 %" : "IEC 60364-4-43: Ib ≤ In ≤ Iz (no factor); holdover keeps 125 %",
                Styles.D2, P + "DesignFactor");
        r = f(s, r, "Design current", P + "ContA" + "*" + P + "DesignFactor", a.designCurrentA(), "A", "", Styles.D1, P + "DesignA");
        if (nec) {
            r = in(s, r, "Factor for conditions of use", cable.request().factors().conditionsOfUseFactor(), "×",
                    "NEC 2023 210.19(A)(1)(b): the corrected ampacity must carry the load itself", Styles.D2, P + "CouFactor");
            r = f(s, r, "Current the corrected ampacity must carry", P + "ContA" + "*" + P + "CouFactor", a.conditionsOfUseCurrentA(), "A", "",
                    Styles.D1, P + "CouA");
        } else {
            r = f(s, r, "Current the corrected capacity must carry (Ib)", P + "DesignA", a.conditionsOfUseCurrentA(), "A",
                    "IEC 60364-5-52: Iz ≥ Ib", Styles.D1, P + "CouA");
        }
        String given = "project file, or its default (Inputs sheet)";
        r = in(s, r, "One-way length", cable.request().oneWayLengthM(), "m", given, Styles.D2, P + "LengthM");
        r = in(s, r, "Voltage-drop limit", cable.request().maxVoltageDropPct(), "%", given, Styles.D2, P + "DropLimitPct");
        r = in(s, r, "Ambient around the conductors", cable.request().installation().ambientC(), "°C", given, Styles.D1, P + "AmbientC");
        r = in(s, r, "Current-carrying conductors together", cable.request().installation().currentCarryingConductors(), "",
                "a two-wire DC circuit", Styles.INT, P + "Conductors");
        r = f(s, r, nominalLabel, nominalFormula, nominalV, "V", nominalHow, Styles.D1, P + "NominalV");
        r = in(s, r, "Insulation temperature rating", cable.request().installation().insulationTempC(), "°C",
                nec ? "75 °C wire and terminals (common)" : "XLPE/EPR, 90 °C", Styles.INT, P + "InsulC");
        r = in(s, r, "Terminal temperature rating", cable.request().installation().terminalTempC(), "°C",
                nec ? "NEC 2023 110.14(C): take ampacity at the lower of insulation and terminal ratings" : "", Styles.INT, P + "TerminalC");
        s.text(r, 0, "Conductor chosen (smallest that passes; governed by " + cable.governing().name().toLowerCase(Locale.ROOT).replace('_', ' ') + ")");
        if (nec) {
            s.inputText(r, V, ch.size().label());
        } else {
            s.input(r, V, ch.size().areaMm2(), Styles.GENERAL);
        }
        s.text(r, 2, nec ? "" : "mm²");
        s.text(r, 3, "the engine's choice; the rows below check it against the tables");
        s.name(P + "Size", r++, V);
        r = in(s, r, "Conductors in parallel per pole", ch.parallelSets(), "", nec ? "NEC 2023 310.10(G): 1/0 AWG and larger only" : "",
                Styles.INT, P + "Sets");
        String size = P + "Size";
        if (nec) {
            String match = "MATCH(" + size + ",NecAmp_size,0)";
            String col = "IF(%s=60,INDEX(NecAmp_copper_60c_a," + match + "),IF(%s=75,INDEX(NecAmp_copper_75c_a," + match
                    + "),INDEX(NecAmp_copper_90c_a," + match + ")))";
            r = f(s, r, "Table 310.16 ampacity, insulation column", String.format(col, P + "InsulC", P + "InsulC"), a.tableAmpacityA(),
                    "A", "INDEX/MATCH into NEC 2023 Table 310.16", Styles.INT, P + "TableA");
            r = f(s, r, "Table 310.16 ampacity, terminal column", String.format(col, P + "TerminalC", P + "TerminalC"),
                    a.terminalAmpacityA(), "A", "", Styles.INT, P + "TerminalA");
            String amb = "MATCH(ROUNDUP(" + P + "AmbientC" + ",0),NecAmb_ambient_from_c,1)";
            r = f(s, r, "Ambient correction factor", "IF(" + P + "InsulC" + "=60,INDEX(NecAmb_factor_60c," + amb + "),IF(" + P + "InsulC" + "=75,INDEX(NecAmb_factor_75c,"
                    + amb + "),INDEX(NecAmb_factor_90c," + amb + ")))", a.ambientFactor(), "", "NEC 2023 Table 310.15(B)(1)(1), base 30 °C",
                    Styles.D2, P + "AmbFactor");
            r = f(s, r, "Adjustment for more than three conductors", "INDEX(NecAdj_factor,MATCH(" + P + "Conductors" + ",NecAdj_conductors_from,1))",
                    a.adjustmentFactor(), "", "NEC 2023 Table 310.15(C)(1)", Styles.D2, P + "AdjFactor");
            r = f(s, r, "Corrected ampacity", P + "Sets" + "*" + P + "TableA" + "*" + P + "AmbFactor" + "*" + P + "AdjFactor", a.correctedAmpacityA(), "A",
                    "sets × table × ambient × adjustment", Styles.D1, P + "CorrectedA");
            r = f(s, r, "Ampacity at the terminal rating (uncorrected)", P + "Sets" + "*MIN(" + P + "TableA" + "," + P + "TerminalA" + ")", a.uncorrectedLimitA(), "A",
                    "", Styles.D1, P + "TerminalLimitA");
        } else {
            String match = "MATCH(" + size + ",IecCap_area_mm2,0)";
            r = f(s, r, "Current-carrying capacity, method C", "IF(" + P + "InsulC" + "=70,INDEX(IecCap_pvc_70c_a," + match + "),INDEX(IecCap_xlpe_90c_a,"
                    + match + "))", a.tableAmpacityA(), "A", "IEC 60364-5-52 Table B.52.2/B.52.3, method C", Styles.INT, P + "TableA");
            String k = "IFERROR(MATCH(" + P + "AmbientC" + ",IecAmb_ambient_c,1),0)";
            String idx = "IF(" + k + "=0,1," + k + "+IF(INDEX(IecAmb_ambient_c," + k + ")<" + P + "AmbientC" + ",1,0))";
            r = f(s, r, "Ambient correction factor", "IF(" + P + "InsulC" + "=70,INDEX(IecAmb_pvc_70c," + idx + "),INDEX(IecAmb_xlpe_90c," + idx + "))",
                    a.ambientFactor(), "", "IEC 60364-5-52 Table B.52.14 (next warmer row)", Styles.D2, P + "AmbFactor");
            String circuits = "ROUNDUP(" + P + "Conductors" + "/2,0)";
            String g = "MATCH(" + circuits + ",IecGrp_circuits,1)";
            r = f(s, r, "Grouping factor", "INDEX(IecGrp_factor," + g + "+IF(INDEX(IecGrp_circuits," + g + ")<" + circuits + ",1,0))",
                    a.adjustmentFactor(), "", "IEC 60364-5-52 Table B.52.17", Styles.D2, P + "AdjFactor");
            r = f(s, r, "Corrected capacity Iz", P + "Sets" + "*" + P + "TableA" + "*" + P + "AmbFactor" + "*" + P + "AdjFactor", a.correctedAmpacityA(), "A", "", Styles.D1,
                    P + "CorrectedA");
            r = f(s, r, "Capacity Iz (no separate terminal limit)", P + "CorrectedA", a.uncorrectedLimitA(), "A", "", Styles.D1,
                    P + "TerminalLimitA");
        }
        r = f(s, r, "Allowable ampacity", "MIN(" + P + "CorrectedA" + "," + P + "TerminalLimitA" + ")", a.allowableAmpacityA(), "A", "the smaller of the two",
                Styles.D1, P + "AllowableA");
        boolean fine = cable.request().fineStranded();
        String resistance = nec ? "INDEX(NecRes_uncoated_stranded_ohm_per_kft,MATCH(" + P + "Size" + ",NecRes_size,0))*(1/304.8)"
                : "INDEX(" + (fine ? "IecRes_class5_plain_ohm_per_km" : "IecRes_class2_plain_ohm_per_km")
                        + ",MATCH(" + P + "Size" + ",IecRes_area_mm2,0))/1000";
        r = f(s, r, "Resistance at the table temperature", resistance, vd.resistanceOhmPerM()
                / ConductorTables.temperatureRatio(ch.size().system(), vd.conductorTempC()), "Ω/m",
                nec ? "NEC 2023 Chapter 9 Table 8, stranded copper, 75 °C (Ω/kft ÷ 304.8)" : "IEC 60228 class " + (fine ? 5 : 2) + ", 20 °C",
                "0.000000", P + "RefOhmPerM");
        r = in(s, r, "Conductor temperature for the drop", vd.conductorTempC(), "°C", "its insulation rating: a conductor at full load runs that hot",
                Styles.D1, P + "CondTempC");
        double alpha = ConductorTables.alpha20PerC(ch.size().system());
        double ref = ConductorTables.referenceTemperatureC(ch.size().system());
        r = f(s, r, "Resistance at that temperature", P + "RefOhmPerM" + "*((1+" + alpha + "*(" + P + "CondTempC" + "-20))/(1+" + alpha + "*(" + ref + "-20)))",
                vd.resistanceOhmPerM(), "Ω/m", "α20 = " + alpha + " per °C" + (nec ? " (copper; NEC Table 8 note)" : " (IEC 60228 Annex B)"),
                "0.000000", P + "OhmPerM");
        r = f(s, r, "Round-trip resistance", "2*" + P + "LengthM" + "*" + P + "OhmPerM" + "/" + P + "Sets", vd.roundTripResistanceOhm(), "Ω", "out and back",
                "0.000000", P + "CableOhm");
        r = f(s, r, "Voltage drop at the continuous current", P + "ContA" + "*" + P + "CableOhm", vd.dropV(), "V", "", Styles.D3, P + "DropV");
        r = f(s, r, "Voltage drop", "100*" + P + "DropV" + "/" + P + "NominalV", vd.dropPct(), "%", "", Styles.D2, P + "DropPct");
        String dev = nec ? "NecDev_A" : "IecDev_rating_a";
        String next = "IFERROR(IF(INDEX(" + dev + ",MATCH(%1$s-RoundingSlack," + dev + ",1))>=%1$s-RoundingSlack,INDEX(" + dev
                + ",MATCH(%1$s-RoundingSlack," + dev + ",1)),INDEX(" + dev + ",MATCH(%1$s-RoundingSlack," + dev + ",1)+1)),INDEX(" + dev + ",1))";
        r = f(s, r, "Overcurrent device rating", String.format(next, P + "DesignA"), cable.device().ratingA(), "A",
                nec ? "next standard rating at or above the design current, NEC 2023 240.6(A)" : "next rating at or above Ib (IEC ratings from memory)",
                Styles.INT, P + "DeviceA");
        String limit = nec ? "IF(" + P + "DeviceA" + "<=" + P + "AllowableA" + "+RoundingSlack," + P + "AllowableA" + ",IF(AND(" + P + "DeviceA" + "<=800,COUNTIF(NecDev_A," + P + "AllowableA" + ")=0," + P + "DeviceA" + "="
                + String.format(next, P + "AllowableA") + ")," + P + "DeviceA" + "," + P + "AllowableA" + "))" : P + "AllowableA";
        r = f(s, r, "Largest rating that protects the conductor", limit,
                org.holdover.sizing.Sizing.deviceLimit(cable.device()), "A",
                nec ? "the allowable ampacity, or the next standard rating above it (240.4(B), up to 800 A)" : "Iz", Styles.D1, P + "DeviceLimitA");
        for (String note : cable.notes()) {
            r = s.paragraph(r, 0, 3, note, ctx.styles.noteWrap, 150);
        }
        return r;
    }

    /** Linear interpolation in a table column with the end rows held (the engine's rule). */
    static String interp(String x, String xs, String ys, int n) {
        String t = "MIN(MAX(" + x + ",INDEX(" + xs + ",1)),INDEX(" + xs + "," + n + "))";
        String m = "MIN(MATCH(" + t + "," + xs + ",1)," + (n - 1) + ")";
        return "INDEX(" + ys + "," + m + ")+(" + t + "-INDEX(" + xs + "," + m + "))*(INDEX(" + ys + "," + m + "+1)-INDEX(" + ys + ","
                + m + "))/(INDEX(" + xs + "," + m + "+1)-INDEX(" + xs + "," + m + "))";
    }

    private static int f(SheetWriter s, int r, String label, String formula, double value, String unit, String how, String format,
                         String name) {
        s.text(r, 0, label);
        s.formula(r, V, formula, value, format);
        s.text(r, 2, unit);
        s.text(r, 3, how);
        if (name != null) {
            s.name(name, r, V);
        }
        return r + 1;
    }

    private static int in(SheetWriter s, int r, String label, double value, String unit, String how, String format, String name) {
        s.text(r, 0, label);
        s.input(r, V, value, format);
        s.text(r, 2, unit);
        s.text(r, 3, how);
        s.name(name, r, V);
        return r + 1;
    }
}
