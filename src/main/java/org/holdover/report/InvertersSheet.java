package org.holdover.report;

import java.util.List;
import org.holdover.inverter.InverterSpec;
import org.holdover.inverter.LossModel;
import org.holdover.inverter.SurgeRating;
import org.holdover.inverter.TabulatedCurve;
import org.holdover.inverter.WeightedEfficiency;
import org.holdover.sizing.Check;
import org.holdover.sizing.InverterAssessment;

/** Every catalog inverter against the demand: its ratings (inputs) and each check as a formula. */
final class InvertersSheet {

    static final int FIRST = 5;
    static final int ID = 0, DESC = 1, BUS = 2, DC_MIN = 3, DC_MAX = 4, AC_V = 5, SPLIT = 6, HZ50 = 7, HZ60 = 8,
            CONT_W = 9, CONT_VA = 10, LEG_VA = 11, DER_START = 12, DER_PCT = 13, S1 = 14, NO_LOAD = 20, PRICE = 21,
            AC_OK = 22, DERATE = 23, AVAIL_W = 24, REQ_W = 25, OK_W = 26, AVAIL_VA = 27, REQ_VA = 28, OK_VA = 29,
            AVAIL_SURGE = 30, REQ_SURGE = 31, OK_SURGE = 32, AVAIL_LEG = 33, REQ_LEG = 34, OK_LEG = 35,
            AVAIL_LEG_SURGE = 36, REQ_LEG_SURGE = 37, OK_LEG_SURGE = 38, P0 = 39, K1 = 40, K2 = 41, DC_A = 42,
            DC_SURGE_A = 43, PASS = 44, CEC = 45, EURO = 46, UNITS = 47, UNITS_PRICE = 48;

    private InvertersSheet() {
    }

    static void write(Context ctx, List<CurvesSheet.Block> blocks) {
        SheetWriter s = ctx.sheet(Context.INVERTERS);
        SheetWriter curves = ctx.sheet(Context.CURVES);
        s.text(0, 0, "Inverters: every catalog unit, alone and in parallel, against the demand", ctx.styles.title);
        s.text(1, 0, "Ratings are one unit's (catalog); identical units in parallel (last columns) share the load equally, so every"
                + " rating, the no-load draw and the price are × units and the loss model is the unit's with × units the rating."
                + " Continuous ratings are derated above the unit's derating start: factor = 1 − max(0, ambient − start) × %/°C ÷ 100."
                + " Surge available = the rating of the shortest listed duration at least as long as the start (slots in rising duration; 0 = unused)."
                + " DC current at the low-voltage cutoff = (P + rated × (p0 + k1·p + k2·p²)) ÷ V_cutoff.", ctx.styles.note);
        s.text(2, 0, ctx.r.input().catalog().demoData() ? "Catalog: " + ctx.r.input().catalog().name()
                + " - DEMO DATA: invented, generic units, not real products." : "Catalog: " + ctx.r.input().catalog().name(),
                ctx.styles.note);
        s.header(FIRST - 1, 0, "Inverter", "Description", "Bus class V", "DC min (cutoff) V", "DC max V", "AC V", "Split phase (1/0)",
                "50 Hz (1/0)", "60 Hz (1/0)", "Continuous W", "Continuous VA", "Per-leg VA", "Derating from °C", "Derating %/°C",
                "Surge 1 s", "Surge 1 VA", "Surge 2 s", "Surge 2 VA", "Surge 3 s", "Surge 3 VA", "No-load W", "Demo price",
                "AC output matches", "Derating factor", "Available W", "Needed W", "W check", "Available VA", "Needed VA",
                "VA check", "Surge available VA", "Surge needed VA", "Surge check", "Leg available VA", "Leg needed VA",
                "Leg check", "Leg surge available VA", "Leg surge needed VA", "Leg surge check", "p0", "k1", "k2",
                "DC current, running, A", "DC current, surge, A", "Passes", "CEC weighted η", "European weighted η",
                "Units in parallel", "Price of the units");
        List<InverterAssessment> all = ctx.r.inverters();
        boolean motors = ctx.hasMotors();
        for (int i = 0; i < all.size(); i++) {
            InverterAssessment a = all.get(i);
            InverterSpec spec = a.spec().catalogUnit();
            int units = a.spec().units();
            int r = FIRST + i;
            String R = String.valueOf(r + 1);
            s.inputText(r, ID, spec.id());
            s.inputText(r, DESC, units == 1 ? spec.description() : units + " in parallel: " + spec.description());
            s.input(r, BUS, spec.busClassV(), Styles.INT);
            s.input(r, DC_MIN, spec.dcMinV(), Styles.D1);
            s.input(r, DC_MAX, spec.dcMaxV(), Styles.D1);
            s.input(r, AC_V, spec.ac().voltsRms(), Styles.INT);
            s.input(r, SPLIT, spec.ac().splitPhase() ? 1 : 0, Styles.INT);
            s.input(r, HZ50, spec.ac().frequenciesHz().contains(50.0) ? 1 : 0, Styles.INT);
            s.input(r, HZ60, spec.ac().frequenciesHz().contains(60.0) ? 1 : 0, Styles.INT);
            s.input(r, CONT_W, spec.continuousW(), Styles.INT);
            s.input(r, CONT_VA, spec.continuousVa(), Styles.INT);
            s.input(r, LEG_VA, spec.perLegVa(), Styles.INT);
            s.input(r, DER_START, spec.deratingStartC(), Styles.D1);
            s.input(r, DER_PCT, spec.deratingPctPerC(), Styles.D2);
            for (int k = 0; k < 3; k++) {
                SurgeRating sr = k < spec.surge().size() ? spec.surge().get(k) : null;
                s.input(r, S1 + 2 * k, sr == null ? 0 : sr.durationS(), Styles.D1);
                s.input(r, S1 + 2 * k + 1, sr == null ? 0 : sr.va(), Styles.INT);
            }
            s.input(r, NO_LOAD, spec.noLoadW(), Styles.D1);
            s.input(r, PRICE, spec.price(), Styles.INT);
            s.formulaText(r, AC_OK, "IF(AND(F" + R + "=ServiceV,G" + R + "=SplitPhase,IF(ServiceHz=50,H" + R + ",I" + R + ")=1),\"yes\",\"no\")",
                    a.acMatch() ? "yes" : "no");
            s.formula(r, DERATE, "MAX(0,1-MAX(0,InverterAmbientC-M" + R + ")*N" + R + "/100)", a.deratingFactor(), Styles.D3);
            Check w = find(a, "inverter.continuousW");
            Check va = find(a, "inverter.continuousVa");
            s.input(r, UNITS, units, Styles.INT);
            s.formula(r, UNITS_PRICE, "V" + R + "*AV" + R, a.spec().price(), Styles.INT);
            s.formula(r, AVAIL_W, "X" + R + "*J" + R + "*AV" + R, w.value(), Styles.INT);
            s.formula(r, REQ_W, "Margin*RunPeakW", w.limit(), Styles.INT);
            verdict(s, r, OK_W, "Y" + R + ">=Z" + R, w);
            s.formula(r, AVAIL_VA, "X" + R + "*K" + R + "*AV" + R, va.value(), Styles.INT);
            s.formula(r, REQ_VA, "Margin*RunPeakVA", va.limit(), Styles.INT);
            verdict(s, r, OK_VA, "AB" + R + ">=AC" + R, va);
            String surgeAvail = "IF(SurgeS<=O" + R + ",P" + R + ",IF(SurgeS<=Q" + R + ",R" + R + ",IF(SurgeS<=S" + R + ",T" + R + ",K" + R
                    + ")))*AV" + R;
            if (motors) {
                Check su = find(a, "inverter.surgeVa");
                s.formula(r, AVAIL_SURGE, surgeAvail, su.value(), Styles.INT);
                s.formula(r, REQ_SURGE, "SurgeVA", su.limit(), Styles.INT);
                verdict(s, r, OK_SURGE, "AE" + R + ">=AF" + R, su);
            } else {
                s.text(r, OK_SURGE, "n/a");
            }
            if (ctx.split() && spec.ac().splitPhase()) {
                Check leg = find(a, "inverter.legVa");
                s.formula(r, AVAIL_LEG, "X" + R + "*L" + R + "*AV" + R, leg.value(), Styles.INT);
                s.formula(r, REQ_LEG, "Margin*LegPeakVA", leg.limit(), Styles.INT);
                verdict(s, r, OK_LEG, "AH" + R + ">=AI" + R, leg);
                if (motors) {
                    Check ls = find(a, "inverter.legSurgeVa");
                    s.formula(r, AVAIL_LEG_SURGE, "AE" + R + "*L" + R + "/K" + R, ls.value(), Styles.INT);
                    s.formula(r, REQ_LEG_SURGE, "LegSurgeVA", ls.limit(), Styles.INT);
                    verdict(s, r, OK_LEG_SURGE, "AK" + R + ">=AL" + R, ls);
                } else {
                    s.text(r, OK_LEG_SURGE, "n/a");
                }
            } else {
                s.text(r, OK_LEG, "n/a");
                s.text(r, OK_LEG_SURGE, "n/a");
            }
            CurvesSheet.Block b = blocks.get(ctx.r.input().catalog().inverters().indexOf(spec));
            LossModel loss = spec.loss();
            s.formula(r, P0, curves.ref(b.p0Row(), CurvesSheet.VALUE_COL), loss.p0(), Styles.D4);
            s.formula(r, K1, curves.ref(b.k1Row(), CurvesSheet.VALUE_COL), loss.k1(), "0.00000");
            s.formula(r, K2, curves.ref(b.k2Row(), CurvesSheet.VALUE_COL), loss.k2(), "0.00000");
            s.formula(r, DC_A, dcCurrent("RunPeakW", R), a.continuousDcA(), Styles.D1);
            // (the DC current formula takes the rating of the units together: J × AV)
            s.formula(r, DC_SURGE_A, dcCurrent(motors ? "SurgeW" : "RunPeakW", R), a.surgeDcA(), Styles.D1);
            s.formulaText(r, PASS, "IF(AND(W" + R + "=\"yes\",AA" + R + "=\"pass\",AD" + R + "=\"pass\",AG" + R + "<>\"FAIL\",AJ" + R
                    + "<>\"FAIL\",AM" + R + "<>\"FAIL\"),\"pass\",\"FAIL\")", a.passes() ? "pass" : "FAIL");
            s.formula(r, CEC, curves.ref(b.cecRow(), 3), WeightedEfficiency.CEC.of(loss), Styles.PCT);
            s.formula(r, EURO, curves.ref(b.euroRow(), 3), WeightedEfficiency.EURO.of(loss), Styles.PCT);
            if (ctx.r.inverter() != null && ctx.r.inverter() == a) {
                s.name("ChosenInvRow", r, ID);
                s.name("InvUnits", r, UNITS);
                s.name("InvUnitsPrice", r, UNITS_PRICE);
                s.name("ContA", r, DC_A);
                s.name("SurgeA", r, DC_SURGE_A);
                s.name("InvDcMaxV", r, DC_MAX);
                s.name("InvDcMinV", r, DC_MIN);
            }
        }
        s.sheet.createFreezePane(1, FIRST);
        s.sheet.setColumnWidth(ID, 22 * 256);
        s.sheet.setColumnWidth(DESC, 40 * 256);
        for (int k = BUS; k <= UNITS_PRICE; k++) {
            s.sheet.setColumnWidth(k, 11 * 256);
        }
    }

    /** Row of a catalog unit (alone) on this sheet. */
    static int rowOf(Context ctx, InverterSpec unit) {
        List<InverterAssessment> all = ctx.r.inverters();
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i).spec() == unit) {
                return FIRST + i;
            }
        }
        throw new IllegalStateException("no row for " + unit.id());
    }

    private static String dcCurrent(String power, String R) {
        String rated = "J" + R + "*AV" + R;
        String p = "(" + power + "/(" + rated + "))";
        return "(" + power + "+" + rated + "*(AN" + R + "+AO" + R + "*" + p + "+AP" + R + "*" + p + "*" + p + "))/D" + R;
    }

    static void verdict(SheetWriter s, int r, int c, String condition, Check check) {
        s.formulaText(r, c, "IF(" + condition + ",\"pass\",\"FAIL\")", check.passes() ? "pass" : "FAIL");
    }

    static Check find(InverterAssessment a, String id) {
        return a.checks().stream().filter(k -> k.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalStateException("no check " + id + " for " + a.spec().id()));
    }

    static TabulatedCurve tabulated(InverterSpec spec) {
        return new TabulatedCurve(spec.efficiencyPoints(), spec.loss());
    }
}
