package org.holdover.report;

import java.util.ArrayList;
import java.util.List;
import org.holdover.inverter.InverterSpec;
import org.holdover.inverter.LossModel;
import org.holdover.inverter.TabulatedCurve;
import org.holdover.inverter.WeightedEfficiency;

/**
 * For every inverter: its catalog efficiency points, the least-squares fit of the three-term loss model
 * (Schmidt &amp; Sauer, 1996) written out as its normal equations, and the CEC and European weighted
 * efficiencies from the model and from the tabulated points.
 */
final class CurvesSheet {

    /** Where each inverter's fitted coefficients sit. */
    record Block(int p0Row, int k1Row, int k2Row, int cecRow, int euroRow) {
    }

    static final int VALUE_COL = 2;

    private CurvesSheet() {
    }

    static List<Block> write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.CURVES);
        SheetWriter inv = ctx.sheet(Context.INVERTERS);
        s.widths(30, 12, 14, 12, 12, 12, 12, 12, 12, 12);
        s.text(0, 0, "Inverter efficiency: the loss model fitted to each catalog curve", ctx.styles.title);
        s.text(1, 0, "Loss per unit of rating = p0 + k1·p + k2·p² (Schmidt & Sauer, 1996), p = output ÷ rating; p0 = no-load draw ÷ rating."
                + " k1, k2: least squares over the points, solved from the normal equations by Cramer's rule. η = p ÷ (p + loss).", ctx.styles.note);
        List<Block> blocks = new ArrayList<>();
        List<InverterSpec> all = ctx.r.input().catalog().inverters();
        int r = 3;
        for (int i = 0; i < all.size(); i++) {
            InverterSpec spec = all.get(i);
            LossModel loss = spec.loss();
            int invRow = InvertersSheet.rowOf(ctx, spec);
            s.text(r++, 0, spec.id() + " - " + spec.description(), ctx.styles.subtitle);
            s.text(r, 0, "Rated continuous output, W");
            s.formula(r, VALUE_COL, inv.ref(invRow, InvertersSheet.CONT_W), spec.continuousW(), Styles.INT);
            int ratedRow = r++;
            s.text(r, 0, "No-load draw, W");
            s.formula(r, VALUE_COL, inv.ref(invRow, InvertersSheet.NO_LOAD), spec.noLoadW(), Styles.D1);
            int noLoadRow = r++;
            s.text(r, 0, "p0 = no-load ÷ rated");
            s.formula(r, VALUE_COL, SheetWriter.rel(noLoadRow, VALUE_COL) + "/" + SheetWriter.rel(ratedRow, VALUE_COL), loss.p0(), Styles.D4);
            int p0Row = r++;
            String p0 = SheetWriter.addr(p0Row, VALUE_COL);
            s.header(r++, 0, "Point", "Load p", "Efficiency η", "y = p(1/η−1) − p0", "p²", "p³", "p⁴", "y·p", "y·p²", "Model η");
            LossModel.NormalEquations ne = LossModel.normalEquations(loss.p0(), spec.efficiencyPoints());
            int first = r;
            for (int k = 0; k < ne.p().length; k++) {
                String R = String.valueOf(r + 1);
                s.text(r, 0, String.valueOf(k + 1));
                s.input(r, 1, ne.p()[k], Styles.PCT);
                s.input(r, 2, ne.eta()[k], Styles.PCT);
                s.formula(r, 3, "B" + R + "*(1/C" + R + "-1)-" + p0, ne.y()[k], Styles.D4);
                s.formula(r, 4, "B" + R + "*B" + R, ne.p2()[k], Styles.D4);
                s.formula(r, 5, "E" + R + "*B" + R, ne.p3()[k], Styles.D4);
                s.formula(r, 6, "F" + R + "*B" + R, ne.p4()[k], Styles.D4);
                s.formula(r, 7, "D" + R + "*B" + R, ne.yp()[k], Styles.D4);
                s.formula(r, 8, "D" + R + "*E" + R, ne.yp2()[k], Styles.D4);
                r++;
            }
            int lastPt = r - 1;
            s.text(r, 0, "Sums");
            double[] sums = {ne.sumP2(), ne.sumP3(), ne.sumP4(), ne.sumYp(), ne.sumYp2()};
            for (int c = 4; c <= 8; c++) {
                s.formula(r, c, "SUM(" + SheetWriter.rel(first, c) + ":" + SheetWriter.rel(lastPt, c) + ")", sums[c - 4], Styles.D4);
            }
            int sumRow = r++;
            String sp2 = SheetWriter.addr(sumRow, 4), sp3 = SheetWriter.addr(sumRow, 5), sp4 = SheetWriter.addr(sumRow, 6),
                    syp = SheetWriter.addr(sumRow, 7), syp2 = SheetWriter.addr(sumRow, 8);
            s.text(r, 0, "det = Σp²·Σp⁴ − (Σp³)²");
            s.formula(r, VALUE_COL, sp2 + "*" + sp4 + "-" + sp3 + "*" + sp3, ne.det(), "0.000000");
            String det = SheetWriter.addr(r++, VALUE_COL);
            s.text(r, 0, "k1 (linear loss)");
            s.formula(r, VALUE_COL, "(" + syp + "*" + sp4 + "-" + sp3 + "*" + syp2 + ")/" + det, loss.k1(), "0.00000");
            int k1Row = r++;
            s.text(r, 0, "k2 (ohmic loss)");
            s.formula(r, VALUE_COL, "(" + sp2 + "*" + syp2 + "-" + sp3 + "*" + syp + ")/" + det, loss.k2(), "0.00000");
            int k2Row = r++;
            String k1 = SheetWriter.addr(k1Row, VALUE_COL);
            String k2 = SheetWriter.addr(k2Row, VALUE_COL);
            for (int k = first; k <= lastPt; k++) {
                String x = "B" + (k + 1);
                s.formula(k, 9, model(x, p0, k1, k2), loss.efficiency(ne.p()[k - first]), Styles.PCT);
            }
            TabulatedCurve tab = new TabulatedCurve(spec.efficiencyPoints(), loss);
            String pts = SheetWriter.addr(first, 1) + ":" + SheetWriter.addr(lastPt, 1);
            String etas = SheetWriter.addr(first, 2) + ":" + SheetWriter.addr(lastPt, 2);
            int n = ne.p().length;
            int[] weighted = new int[2];
            int w = 0;
            for (WeightedEfficiency scheme : List.of(WeightedEfficiency.CEC, WeightedEfficiency.EURO)) {
                String key = scheme == WeightedEfficiency.CEC ? "Cec" : "Euro";
                s.header(r++, 0, scheme.name() + " weighting", "Load", "Weight", "Model η", "Tabulated η");
                int wf = r;
                for (int k = 0; k < scheme.weights().size(); k++) {
                    double x = scheme.loadFractions().get(k);
                    String xr = "B" + (r + 1);
                    s.formula(r, 1, "INDEX(" + key + "Load," + (k + 1) + ")", x, Styles.PCT);
                    s.formula(r, 2, "INDEX(" + key + "Weight," + (k + 1) + ")", scheme.weights().get(k), Styles.D2);
                    s.formula(r, 3, model(xr, p0, k1, k2), loss.efficiency(x), Styles.PCT);
                    String m = "MIN(MATCH(" + xr + "," + pts + ",1)," + (n - 1) + ")";
                    String interp = "INDEX(" + etas + "," + m + ")+(" + xr + "-INDEX(" + pts + "," + m + "))*(INDEX(" + etas + ","
                            + m + "+1)-INDEX(" + etas + "," + m + "))/(INDEX(" + pts + "," + m + "+1)-INDEX(" + pts + "," + m + "))";
                    s.formula(r, 4, "IF(AND(" + xr + ">=INDEX(" + pts + ",1)," + xr + "<=INDEX(" + pts + "," + n + "))," + interp
                            + "," + "D" + (r + 1) + ")", tab.efficiency(x), Styles.PCT);
                    r++;
                }
                s.text(r, 0, scheme.name() + " weighted efficiency");
                s.formula(r, 3, "SUMPRODUCT(" + SheetWriter.rel(wf, 2) + ":" + SheetWriter.rel(r - 1, 2) + ","
                        + SheetWriter.rel(wf, 3) + ":" + SheetWriter.rel(r - 1, 3) + ")", scheme.of(loss), Styles.PCT);
                s.formula(r, 4, "SUMPRODUCT(" + SheetWriter.rel(wf, 2) + ":" + SheetWriter.rel(r - 1, 2) + ","
                        + SheetWriter.rel(wf, 4) + ":" + SheetWriter.rel(r - 1, 4) + ")", scheme.of(tab), Styles.PCT);
                weighted[w++] = r;
                r++;
            }
            blocks.add(new Block(p0Row, k1Row, k2Row, weighted[0], weighted[1]));
            if (ctx.r.inverter() != null && ctx.r.inverter().spec().catalogUnit() == spec) {
                int chosenRow = InvertersSheet.FIRST + ctx.r.inverters().indexOf(ctx.r.inverter());
                s.text(r, 0, "Units in parallel (the chosen system)");
                s.formula(r, VALUE_COL, inv.ref(chosenRow, InvertersSheet.UNITS), ctx.r.inverter().spec().units(), Styles.INT);
                int unitsRow = r++;
                s.text(r, 0, "Rating of the units together, W (loss model: same p0, k1, k2)");
                s.formula(r, VALUE_COL, SheetWriter.rel(ratedRow, VALUE_COL) + "*" + SheetWriter.rel(unitsRow, VALUE_COL),
                        ctx.r.inverter().spec().loss().ratedW(), Styles.INT);
                s.name("InvRatedW", r++, VALUE_COL);
                s.name("InvP0", p0Row, VALUE_COL);
                s.name("InvK1", k1Row, VALUE_COL);
                s.name("InvK2", k2Row, VALUE_COL);
                Charts.efficiency(ctx, s, spec, first, lastPt, r);
            }
            r += 2;
        }
        return blocks;
    }

    private static String model(String x, String p0, String k1, String k2) {
        return x + "/(" + x + "+(" + p0 + "+" + k1 + "*" + x + "+" + k2 + "*" + x + "*" + x + "))";
    }
}
