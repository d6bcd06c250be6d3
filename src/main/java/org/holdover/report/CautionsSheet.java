package org.holdover.report;

/** The cautions, in full. */
final class CautionsSheet {

    private CautionsSheet() {
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.CAUTIONS);
        s.widths(110);
        s.text(0, 0, "Cautions", ctx.styles.title);
        int r = 2;
        for (String line : Cautions.LINES) {
            s.text(r, 0, line, ctx.styles.wrap);
            s.sheet.getRow(r).setHeightInPoints(48);
            r++;
        }
        s.text(r + 1, 0, "Code references name their edition (NFPA 70 2023, IRC 2021); your jurisdiction may have adopted another.", ctx.styles.note);
    }
}
