package org.holdover.report;

import java.util.List;
import org.holdover.sizing.BusOption;
import org.holdover.sizing.InverterAssessment;

/** The DC bus choice: each voltage class, the inverter chosen there, its battery current against the rule. */
final class BusSheet {

    private BusSheet() {
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.BUS);
        SheetWriter inv = ctx.sheet(Context.INVERTERS);
        s.widths(12, 24, 16, 14, 10, 60, 12);
        s.text(0, 0, "DC bus voltage", ctx.styles.title);
        s.text(1, 0, "The lowest bus voltage whose inverter passes, whose continuous battery current at the low-voltage cutoff is within the"
                + " rule, and for which a battery bank fits. At each voltage the passing inverter with the lowest demo price (with its bank) is taken.", ctx.styles.note);
        s.header(3, 0, "Bus class V", "Inverter", "Continuous battery A", "Rule, A", "Check", "Outcome", "Chosen");
        int r = 4;
        List<InverterAssessment> all = ctx.r.inverters();
        for (BusOption b : ctx.r.buses()) {
            String R = String.valueOf(r + 1);
            s.input(r, 0, b.busClassV(), Styles.INT);
            if (b.inverter() != null) {
                int row = InvertersSheet.FIRST + all.indexOf(b.inverter());
                String units = inv.ref(row, InvertersSheet.UNITS);
                s.formulaName(r, 1, "IF(" + units + ">1," + units + "&\" × \"&" + inv.ref(row, InvertersSheet.ID) + ","
                        + inv.ref(row, InvertersSheet.ID) + ")", b.inverter().spec().label());
                s.formula(r, 2, inv.ref(row, InvertersSheet.DC_A), b.currentCheck().value(), Styles.D1);
                s.formula(r, 3, "MaxBatteryA", b.currentCheck().limit(), Styles.INT);
                s.formulaText(r, 4, "IF(C" + R + "<=D" + R + ",\"pass\",\"FAIL\")", b.currentCheck().passes() ? "pass" : "FAIL");
            } else {
                s.text(r, 1, "none passes");
            }
            s.text(r, 5, b.reason(), ctx.styles.wrap);
            s.text(r, 6, b == ctx.r.chosen() ? "chosen" : "");
            r++;
        }
    }
}
