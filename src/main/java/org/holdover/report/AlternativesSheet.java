package org.holdover.report;

import java.util.ArrayList;
import java.util.List;
import org.apache.poi.xddf.usermodel.chart.MarkerStyle;
import org.apache.poi.xddf.usermodel.PresetColor;
import org.apache.poi.xddf.usermodel.chart.AxisCrosses;
import org.apache.poi.xddf.usermodel.chart.AxisPosition;
import org.apache.poi.xddf.usermodel.chart.ChartTypes;
import org.apache.poi.xddf.usermodel.chart.ScatterStyle;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSourcesFactory;
import org.apache.poi.xddf.usermodel.chart.XDDFNumericalDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFScatterChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFValueAxis;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFClientAnchor;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.holdover.sizing.SearchResult;
import org.holdover.sizing.SystemPin;

/**
 * The system search: the chosen system and the next best, each system's demo cost as a formula over its parts'
 * counts and prices; the cost-versus-unmet-energy frontier with a chart; the chosen system under more load and less
 * sun; and every family left out with the check that failed.
 */
final class AlternativesSheet {

    private AlternativesSheet() {
    }

    private static final String[] HEAD = {"System", "Bus V", "Inverter", "Inverters in parallel", "Inverter price",
        "Battery module", "Battery modules",
        "Module price", "Strings", "Bank kWh", "PV module", "PV modules", "PV module price", "Modules per string",
        "Strings per controller", "Controllers", "Controller", "Controller price", "Array kW", "Demo cost",
        "Unmet Wh (simulated year)", "Hours unmet", "Lowest state of charge", "Smallest check margin", "Note"};
    static final int INV_N = 3, INV_PRICE = 4, MODULES = 6, MODULE_PRICE = 7, PV_MODULES = 11, PV_PRICE = 12,
            CONTROLLERS = 15, CONTROLLER_PRICE = 17, COST = 19, UNMET = 20, LIFE = 25, LIFETIME = 26;

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.ALTERNATIVES);
        SearchResult sr = ctx.r.search();
        int r = 0;
        s.text(r++, 0, "Alternatives: the system search", ctx.styles.title);
        r = s.paragraph(r, 0, 12, "Every combination the catalog allows (bus × inverter × inverters in parallel × battery module"
                + " × strings × PV module ×"
                + " controller × modules per string × strings × controllers) is checked part by part; the systems whose parts"
                + " all pass are simulated over the year in order of demo cost, and the first that leaves no more unmet energy"
                + " than the project accepts is chosen. Demo prices are invented: with your own catalog's prices the order"
                + " may change. The demo cost of each row is a formula over its counts and prices; the unmet energy of each"
                + " row comes from the engine's simulated year (the chosen system's year is on the Year simulation sheet)."
                + " Cables, fuses, racking and labour are not in the cost.", ctx.styles.noteWrap, 150) + 1;
        if (sr == null) {
            s.text(r, 0, "The search was not run for this result.");
            return;
        }
        var st = sr.stats();
        s.text(r, 0, "Component checks evaluated");
        s.input(r++, 4, st.cheapChecks(), Styles.INT);
        s.text(r, 0, "Whole systems passing every component check");
        s.input(r++, 4, st.candidates(), Styles.INT);
        s.text(r, 0, "Years simulated");
        s.input(r++, 4, st.simulated(), Styles.INT);
        s.text(r, 0, "Skipped: a larger system of the same family had already failed");
        s.input(r++, 4, st.pruned(), Styles.INT);
        s.text(r, 0, "Unmet energy the project accepts over the year, Wh");
        s.input(r++, 4, sr.unmetLimitWh(), Styles.INT);
        if (sr.objective().lifetime()) {
            s.text(r, 0, "Objective: lifetime cost over, years");
            s.input(r, 4, sr.objective().horizonYears(), Styles.D1);
            s.name("CostHorizonY", r++, 4);
            s.text(r, 0, "Discount rate per year");
            s.input(r, 4, sr.objective().discountRate(), Styles.PCT);
            s.name("DiscountRate", r++, 4);
            s.text(r++, 0, "Lifetime cost = demo cost + the battery modules bought again each time the bank's life (rainflow"
                    + " counting of the simulated year, or calendar life) runs out before the horizon, discounted to today"
                    + " + a generator's fuel a year × the annuity factor (1 − (1 + r)^−years) ÷ r.", ctx.styles.note);
        } else {
            s.text(r++, 0, "Objective: least demo capital cost.");
        }
        if (st.stoppedEarly()) {
            s.text(r++, 0, "STOPPED EARLY by the user: this is the best system found so far, not necessarily the least cost.",
                    ctx.styles.bold);
        }
        r++;
        s.text(r++, 0, "The chosen system and the next best of other families", ctx.styles.subtitle);
        List<SearchResult.Evaluated> rows = new ArrayList<>();
        if (sr.chosen() != null) {
            rows.add(sr.chosen());
        }
        rows.addAll(sr.alternatives());
        wrappedHeader(ctx, s, r, 0, HEAD);
        if (sr.objective().lifetime()) {
            wrappedHeader(ctx, s, r, LIFE, "Battery life, years", "Lifetime cost");
        }
        if (sr.generatorsSearched()) {
            wrappedHeader(ctx, s, r, GEN_ID, "Generator", "Generator price");
            if (sr.objective().lifetime()) {
                wrappedHeader(ctx, s, r, FUEL, "Fuel cost a year (simulated)");
            }
        }
        r++;
        int first = r;
        for (int i = 0; i < rows.size(); i++) {
            row(s, r++, i == 0 && sr.chosen() != null ? "chosen" : "next " + i, rows.get(i), sr);
        }
        if (rows.isEmpty()) {
            s.text(r++, 0, "No system passes every check and the simulated year (see the families left out below).");
        }
        r++;
        s.text(r++, 0, "Cost against unmet energy: simulated systems no cheaper one beats on unmet energy", ctx.styles.subtitle);
        s.text(r++, 0, "Rows with a note fail a design check (too little battery for the outage or the autonomy, too little PV for"
                + " the worst month): they show what the design checks buy, they are not offers.", ctx.styles.note);
        if (sr.generatorsSearched()) {
            wrappedHeader(ctx, s, r, GEN_ID, "Generator", "Generator price");
        }
        wrappedHeader(ctx, s, r++, 0, HEAD);
        int frontFirst = r;
        for (SearchResult.Evaluated e : sr.frontier()) {
            row(s, r++, e.passes() ? "passes" : e.designNote().isEmpty() ? "fails the simulated year" : "fails a design check", e, sr);
        }
        int frontLast = r - 1;
        if (!sr.frontier().isEmpty()) {
            chart(s, sr.frontier(), frontFirst, frontLast, r + 1);
            r += 22;
        }
        r++;
        s.text(r++, 0, "The chosen system with more load and with less sun", ctx.styles.subtitle);
        s.header(r++, 0, "Case", "Change, %", "Unmet Wh", "Accepted Wh", "Still passes", "What holds or fails");
        for (SearchResult.Sensitivity c : sr.sensitivity()) {
            s.text(r, 0, c.label());
            s.input(r, 1, c.changePct(), Styles.D1);
            if (Double.isNaN(c.unmetWh())) {
                s.text(r, 2, "not simulated");
            } else {
                s.input(r, 2, c.unmetWh(), Styles.INT);
            }
            s.input(r, 3, c.limitWh(), Styles.INT);
            s.text(r, 4, c.passes() ? "yes" : "NO");
            s.text(r++, 5, c.detail());
        }
        r++;
        s.text(r++, 0, "Families left out, with the check that failed", ctx.styles.subtitle);
        s.header(r++, 0, "Family (bus, inverter, battery module, PV module on controller)", "", "", "", "", "Why");
        for (SearchResult.Rejection j : sr.rejected()) {
            s.text(r, 0, j.family());
            s.text(r++, 5, j.reason());
        }
        s.sheet.setColumnWidth(0, 22 * 256);
        for (int c = 1; c <= FUEL; c++) {
            s.sheet.setColumnWidth(c, 9 * 256);
        }
        for (int c : new int[] {2, 5, 10, 16}) {
            s.sheet.setColumnWidth(c, 17 * 256);
        }
        s.sheet.setColumnWidth(HEAD.length - 1, 44 * 256);
        s.sheet.setColumnWidth(GEN_ID, 17 * 256);

        if (first > 0 && sr.chosen() != null) {
            s.name("SearchChosenCost", first, COST);
        }
    }

    /** A header row whose labels wrap onto up to three lines (the columns are narrow). */
    private static void wrappedHeader(Context ctx, SheetWriter s, int r, int c, String... labels) {
        s.header(r, c, labels);
        org.apache.poi.ss.usermodel.CellStyle h = ctx.wb.createCellStyle();
        h.cloneStyleFrom(ctx.styles.header);
        h.setWrapText(true);
        h.setVerticalAlignment(org.apache.poi.ss.usermodel.VerticalAlignment.TOP);
        for (int i = 0; i < labels.length; i++) {
            s.cell(r, c + i).setCellStyle(h);
        }
        s.sheet.getRow(r).setHeightInPoints(3 * 13f);
    }

    /** Columns of the generator and its price (only when the search may add a generator). */
    static final int GEN_ID = 27;
    /** Column of the generator's fuel cost a year (lifetime objective with generators). */
    static final int FUEL = 29;

    private static void row(SheetWriter s, int r, String label, SearchResult.Evaluated e, SearchResult sr) {
        SearchResult.Candidate c = e.candidate();
        SystemPin p = c.pin();
        String R = String.valueOf(r + 1);
        s.text(r, 0, label);
        s.input(r, 1, p.busClassV(), Styles.INT);
        s.inputText(r, 2, p.inverterId());
        s.input(r, INV_N, p.inverters(), Styles.INT);
        s.input(r, INV_PRICE, c.inverterPrice(), Styles.INT);
        s.inputText(r, 5, p.batteryModuleId());
        s.input(r, MODULES, c.bankModules(), Styles.INT);
        s.input(r, MODULE_PRICE, c.bankModulePrice(), Styles.INT);
        s.input(r, 8, p.strings(), Styles.INT);
        s.input(r, 9, c.bankKwh(), Styles.D1);
        SystemPin.PvPin pv = p.pv();
        s.inputText(r, 10, pv == null ? "none" : pv.moduleId());
        s.input(r, PV_MODULES, c.pvModules(), Styles.INT);
        s.input(r, PV_PRICE, c.pvModulePrice(), Styles.INT);
        s.input(r, 13, pv == null ? 0 : pv.modulesPerString(), Styles.INT);
        s.input(r, 14, pv == null ? 0 : pv.stringsPerController(), Styles.INT);
        s.input(r, CONTROLLERS, c.controllers(), Styles.INT);
        s.inputText(r, 16, pv == null ? "none" : pv.controllerId());
        s.input(r, CONTROLLER_PRICE, c.controllerPrice(), Styles.INT);
        s.input(r, 18, c.pvKw(), Styles.D2);
        boolean gen = sr.generatorsSearched();
        if (gen) {
            s.inputText(r, GEN_ID, p.generatorId() == null ? "none" : p.generatorId());
            s.input(r, GEN_ID + 1, c.generatorPrice(), Styles.INT);
        }
        java.util.function.IntFunction<String> at = c0 -> SheetWriter.col(c0) + R;
        s.formula(r, COST, at.apply(INV_N) + "*" + at.apply(INV_PRICE) + "+" + at.apply(MODULES) + "*" + at.apply(MODULE_PRICE)
                + "+" + at.apply(PV_MODULES) + "*" + at.apply(PV_PRICE) + "+" + at.apply(CONTROLLERS) + "*" + at.apply(CONTROLLER_PRICE)
                + (gen ? "+" + at.apply(GEN_ID + 1) : ""), c.cost(), Styles.INT);
        if (Double.isNaN(e.unmetWh())) {
            s.text(r, UNMET, sr.simulated() ? "not simulated" : "not simulated (off grid without PV)");
        } else {
            s.input(r, UNMET, e.unmetWh(), Styles.INT);
            s.input(r, UNMET + 1, e.unmetHours(), Styles.INT);
            s.input(r, UNMET + 2, e.lowestSoc(), Styles.PCT);
        }
        if (Double.isFinite(c.lowestMargin())) {
            s.input(r, UNMET + 3, c.lowestMargin(), Styles.PCT);
        }
        s.text(r, UNMET + 4, e.designNote());
        if (sr.objective().lifetime() && Double.isFinite(e.lifeYears())) {
            s.input(r, LIFE, e.lifeYears(), Styles.D1);
            String life = at.apply(LIFE);
            String n = "MAX(0,-INT(-(CostHorizonY/" + life + "-1E-9))-1)";
            String q = "(1+DiscountRate)^(-" + life + ")";
            String fuel = "";
            if (gen) {
                // The year's fuel cost (engine: simulated fuel × price) × the annuity factor over the horizon.
                s.input(r, FUEL, Double.isFinite(e.fuelCostPerYear()) ? e.fuelCostPerYear() : 0, Styles.INT);
                fuel = "+" + SheetWriter.col(FUEL) + R
                        + "*IF(DiscountRate=0,CostHorizonY,(1-(1+DiscountRate)^(-CostHorizonY))/DiscountRate)";
            }
            s.formula(r, LIFETIME, at.apply(COST) + "+" + at.apply(MODULES) + "*" + at.apply(MODULE_PRICE) + "*IF(" + n + "=0,0,IF(DiscountRate=0," + n + "," + q + "*(1-" + q + "^" + n
                    + ")/(1-" + q + ")))" + fuel, e.objective(), Styles.INT);
        }
    }

    private static void chart(SheetWriter s, List<SearchResult.Evaluated> front, int firstRow, int lastRow, int anchorRow) {
        SXSSFSheet sheet = (SXSSFSheet) s.sheet;
        sheet.createDrawingPatriarch();
        XSSFDrawing d = sheet.getDrawingPatriarch();
        XSSFClientAnchor anchor = d.createAnchor(0, 0, 0, 0, 0, anchorRow, 10, anchorRow + 20);
        XSSFChart chart = d.createChart(anchor);
        chart.setTitleText("Demo cost against unmet energy over the simulated year");
        chart.setTitleOverlay(false);
        XDDFValueAxis x = chart.createValueAxis(AxisPosition.BOTTOM);
        x.setTitle("Demo cost");
        XDDFValueAxis y = chart.createValueAxis(AxisPosition.LEFT);
        y.setTitle("Unmet Wh");
        y.setCrosses(AxisCrosses.AUTO_ZERO);
        Double[] xs = new Double[front.size()];
        Double[] ys = new Double[front.size()];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = front.get(i).candidate().cost();
            ys[i] = front.get(i).unmetWh();
        }
        XDDFNumericalDataSource<Double> xsrc = XDDFDataSourcesFactory.fromArray(xs, s.ref(firstRow, COST, lastRow, COST), COST);
        XDDFNumericalDataSource<Double> ysrc = XDDFDataSourcesFactory.fromArray(ys, s.ref(firstRow, UNMET, lastRow, UNMET), UNMET);
        XDDFScatterChartData data = (XDDFScatterChartData) chart.createData(ChartTypes.SCATTER, x, y);
        data.setStyle(ScatterStyle.LINE_MARKER);
        XDDFScatterChartData.Series series = (XDDFScatterChartData.Series) data.addSeries(xsrc, ysrc);
        series.setTitle("Frontier", null);
        Charts.line(series, MarkerStyle.CIRCLE, PresetColor.STEEL_BLUE, 1.5);
        chart.plot(data);
    }
}
