package org.holdover.report;

import org.apache.poi.xddf.usermodel.PresetColor;
import org.apache.poi.xddf.usermodel.XDDFColor;
import org.apache.poi.xddf.usermodel.XDDFLineProperties;
import org.apache.poi.xddf.usermodel.XDDFShapeProperties;
import org.apache.poi.xddf.usermodel.XDDFSolidFillProperties;
import org.apache.poi.xddf.usermodel.chart.AxisCrosses;
import org.apache.poi.xddf.usermodel.chart.AxisPosition;
import org.apache.poi.xddf.usermodel.chart.BarDirection;
import org.apache.poi.xddf.usermodel.chart.ChartTypes;
import org.apache.poi.xddf.usermodel.chart.LegendPosition;
import org.apache.poi.xddf.usermodel.chart.MarkerStyle;
import org.apache.poi.xddf.usermodel.chart.XDDFBarChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFCategoryAxis;
import org.apache.poi.xddf.usermodel.chart.XDDFChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFChartLegend;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFDataSourcesFactory;
import org.apache.poi.xddf.usermodel.chart.XDDFNumericalDataSource;
import org.apache.poi.xddf.usermodel.chart.XDDFScatterChartData;
import org.apache.poi.xddf.usermodel.chart.XDDFValueAxis;
import org.apache.poi.xddf.usermodel.chart.ScatterStyle;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFChart;
import org.apache.poi.xssf.usermodel.XSSFClientAnchor;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.holdover.inverter.InverterSpec;
import org.holdover.inverter.LossModel;
import org.holdover.load.LoadAnalysis;

/**
 * Charts. Series carry the engine's numbers as their cache and point at the cells that hold them, so a
 * viewer shows them without recalculating and a spreadsheet application redraws them from the cells.
 */
final class Charts {

    private Charts() {
    }

    /**
     * A scatter series drawn as a straight-segment line of one colour (LibreOffice draws no line without explicit line
     * properties).
     */
    static void line(XDDFScatterChartData.Series series, MarkerStyle marker, PresetColor color, double widthPt) {
        series.setMarkerStyle(marker);
        series.setSmooth(false);
        XDDFShapeProperties shape = new XDDFShapeProperties();
        XDDFLineProperties lp = new XDDFLineProperties();
        lp.setFillProperties(new XDDFSolidFillProperties(XDDFColor.from(color)));
        lp.setWidth(widthPt);
        shape.setLineProperties(lp);
        series.setShapeProperties(shape);
    }

    private static XSSFDrawing drawing(SheetWriter s) {
        SXSSFSheet sheet = (SXSSFSheet) s.sheet;
        sheet.createDrawingPatriarch();
        return sheet.getDrawingPatriarch();
    }

    /** Bar chart of served energy per day, by month (Loads sheet, month rows starting at {@code firstRow}). */
    static void monthlyEnergy(Context ctx, SheetWriter s, int firstRow, int anchorRow) {
        LoadAnalysis.Figures f = ctx.r.input().loads().figures();
        XSSFDrawing d = drawing(s);
        XSSFClientAnchor anchor = d.createAnchor(0, 0, 0, 0, 4, firstRow - 2, 14, firstRow + 16);
        XSSFChart chart = d.createChart(anchor);
        chart.setTitleText("Served energy per day, by month (Wh per day)");
        chart.setTitleOverlay(false);
        XDDFCategoryAxis x = chart.createCategoryAxis(AxisPosition.BOTTOM);
        XDDFValueAxis y = chart.createValueAxis(AxisPosition.LEFT);
        y.setCrosses(AxisCrosses.AUTO_ZERO);
        y.setTitle("Wh per day");
        String[] months = LoadsSheet.MONTHS.clone();
        Double[] values = new Double[12];
        for (int m = 0; m < 12; m++) {
            values[m] = f.monthlyDailyEnergyWh()[m];
        }
        XDDFDataSource<String> cats = XDDFDataSourcesFactory.fromArray(months,
                s.ref(firstRow, 0, firstRow + 11, 0), 0);
        XDDFNumericalDataSource<Double> vals = XDDFDataSourcesFactory.fromArray(values,
                s.ref(firstRow, 2, firstRow + 11, 2), 2);
        XDDFBarChartData data = (XDDFBarChartData) chart.createData(ChartTypes.BAR, x, y);
        data.setBarDirection(BarDirection.COL);
        XDDFChartData.Series series = data.addSeries(cats, vals);
        series.setTitle("Wh per day", null);
        XDDFShapeProperties props = new XDDFShapeProperties();
        props.setFillProperties(new XDDFSolidFillProperties(XDDFColor.from(PresetColor.STEEL_BLUE)));
        series.setShapeProperties(props);
        chart.plot(data);
    }

    /**
     * State of charge over the hardest week: the week ending with the outage window (backup) or around the
     * lowest state of charge of the year (off grid).
     */
    static void stateOfCharge(Context ctx, SheetWriter s, org.holdover.sizing.YearCheck y, int firstRow) {
        double[] soc = y.traced().trace().soc();
        int n = soc.length;
        int centre;
        if (ctx.backup() && ctx.r.energy() != null) {
            centre = ctx.r.energy().windowStartHour() + ctx.r.energy().windowHours() / 2;
        } else {
            centre = 0;
            for (int h = 1; h < n; h++) {
                if (soc[h] < soc[centre]) {
                    centre = h;
                }
            }
        }
        int from = Math.max(0, Math.min(n - 168, centre - 84));
        Double[] xs = new Double[168];
        Double[] ys = new Double[168];
        for (int i = 0; i < 168; i++) {
            xs[i] = (double) (from + i);
            ys[i] = soc[from + i];
        }
        XSSFDrawing d = drawing(s);
        XSSFClientAnchor anchor = d.createAnchor(0, 0, 0, 0, 15, 2, 27, 23);
        XSSFChart chart = d.createChart(anchor);
        chart.setTitleText("State of charge over the hardest week (hours " + from + "–" + (from + 167) + ")");
        chart.setTitleOverlay(false);
        XDDFValueAxis x = chart.createValueAxis(AxisPosition.BOTTOM);
        x.setTitle("Hour of the year");
        XDDFValueAxis yAxis = chart.createValueAxis(AxisPosition.LEFT);
        yAxis.setTitle("State of charge");
        yAxis.setCrosses(AxisCrosses.AUTO_ZERO);
        yAxis.setMinimum(0);
        yAxis.setMaximum(1);
        XDDFNumericalDataSource<Double> xsrc = XDDFDataSourcesFactory.fromArray(xs, s.ref(firstRow + from, 0, firstRow + from + 167, 0), 0);
        XDDFNumericalDataSource<Double> ysrc = XDDFDataSourcesFactory.fromArray(ys, s.ref(firstRow + from, 25, firstRow + from + 167, 25), 25);
        XDDFScatterChartData data = (XDDFScatterChartData) chart.createData(ChartTypes.SCATTER, x, yAxis);
        data.setStyle(ScatterStyle.LINE);
        XDDFScatterChartData.Series series = (XDDFScatterChartData.Series) data.addSeries(xsrc, ysrc);
        series.setTitle("State of charge", null);
        line(series, MarkerStyle.NONE, PresetColor.STEEL_BLUE, 1.5);
        chart.plot(data);
    }

    /** Monthly energy flows of the simulated year: load, PV out and unmet, one bar group per month. */
    static void monthlyFlows(Context ctx, SheetWriter s, int firstRow, int anchorRow, double[][] monthly) {
        XSSFDrawing d = drawing(s);
        XSSFClientAnchor anchor = d.createAnchor(0, 0, 0, 0, 0, anchorRow, 10, anchorRow + 20);
        XSSFChart chart = d.createChart(anchor);
        chart.setTitleText("Monthly energy of the simulated year, Wh");
        chart.setTitleOverlay(false);
        chart.getOrAddLegend().setPosition(LegendPosition.BOTTOM);
        XDDFCategoryAxis x = chart.createCategoryAxis(AxisPosition.BOTTOM);
        XDDFValueAxis y = chart.createValueAxis(AxisPosition.LEFT);
        y.setCrosses(AxisCrosses.AUTO_ZERO);
        XDDFDataSource<String> cats = XDDFDataSourcesFactory.fromArray(LoadsSheet.MONTHS.clone(), s.ref(firstRow, 0, firstRow + 11, 0), 0);
        XDDFBarChartData data = (XDDFBarChartData) chart.createData(ChartTypes.BAR, x, y);
        data.setBarDirection(BarDirection.COL);
        int[] keys = {0, 4, 2};
        String[] names = {"Load", "PV out", "Unmet"};
        PresetColor[] colors = {PresetColor.STEEL_BLUE, PresetColor.GOLDENROD, PresetColor.FIREBRICK};
        for (int i = 0; i < keys.length; i++) {
            Double[] v = new Double[12];
            for (int m = 0; m < 12; m++) {
                v[m] = monthly[keys[i]][m];
            }
            int col = 1 + keys[i];
            XDDFNumericalDataSource<Double> vals = XDDFDataSourcesFactory.fromArray(v, s.ref(firstRow, col, firstRow + 11, col), col);
            XDDFChartData.Series series = data.addSeries(cats, vals);
            series.setTitle(names[i], null);
            XDDFShapeProperties props = new XDDFShapeProperties();
            props.setFillProperties(new XDDFSolidFillProperties(XDDFColor.from(colors[i])));
            series.setShapeProperties(props);
        }
        chart.plot(data);
    }

    /** Efficiency against load: the catalog points and the fitted model (Inverter curves sheet). */
    static void efficiency(Context ctx, SheetWriter s, InverterSpec spec, int firstPoint, int lastPoint, int anchorRow) {
        LossModel loss = spec.loss();
        int n = lastPoint - firstPoint + 1;
        Double[] px = new Double[n];
        Double[] py = new Double[n];
        Double[] my = new Double[n];
        for (int i = 0; i < n; i++) {
            px[i] = spec.efficiencyPoints().get(i).loadFraction();
            py[i] = spec.efficiencyPoints().get(i).efficiency();
            my[i] = loss.efficiency(px[i]);
        }
        XSSFDrawing d = drawing(s);
        XSSFClientAnchor anchor = d.createAnchor(0, 0, 0, 0, 11, firstPoint - 8, 19, firstPoint + 12);
        XSSFChart chart = d.createChart(anchor);
        chart.setTitleText("Chosen inverter: efficiency against load (points and fitted model)");
        chart.setTitleOverlay(false);
        XDDFChartLegend legend = chart.getOrAddLegend();
        legend.setPosition(LegendPosition.BOTTOM);
        XDDFValueAxis x = chart.createValueAxis(AxisPosition.BOTTOM);
        x.setTitle("Load, fraction of rating");
        XDDFValueAxis y = chart.createValueAxis(AxisPosition.LEFT);
        y.setTitle("Efficiency");
        y.setCrosses(AxisCrosses.AUTO_ZERO);
        XDDFNumericalDataSource<Double> xs = XDDFDataSourcesFactory.fromArray(px, s.ref(firstPoint, 1, lastPoint, 1), 1);
        XDDFNumericalDataSource<Double> ys = XDDFDataSourcesFactory.fromArray(py, s.ref(firstPoint, 2, lastPoint, 2), 2);
        XDDFNumericalDataSource<Double> ms = XDDFDataSourcesFactory.fromArray(my, s.ref(firstPoint, 9, lastPoint, 9), 9);
        XDDFScatterChartData data = (XDDFScatterChartData) chart.createData(ChartTypes.SCATTER, x, y);
        data.setStyle(ScatterStyle.LINE_MARKER);
        XDDFScatterChartData.Series points = (XDDFScatterChartData.Series) data.addSeries(xs, ys);
        points.setTitle("Catalog points", null);
        points.setMarkerStyle(MarkerStyle.CIRCLE);
        points.setSmooth(false);
        XDDFShapeProperties none = new XDDFShapeProperties();
        XDDFLineProperties noLine = new XDDFLineProperties();
        noLine.setFillProperties(new org.apache.poi.xddf.usermodel.XDDFNoFillProperties());
        none.setLineProperties(noLine);
        points.setShapeProperties(none);
        XDDFScatterChartData.Series model = (XDDFScatterChartData.Series) data.addSeries(xs, ms);
        model.setTitle("Loss model", null);
        line(model, MarkerStyle.NONE, PresetColor.DARK_ORANGE, 2.0);
        chart.plot(data);
    }

    /**
     * Bar chart of the controllers' output against what the battery needs from them, Wh per day by month (PV sheet,
     * month rows starting at {@code firstRow}).
     */
    static void pvMonthly(Context ctx, SheetWriter s, int firstRow, int outCol, int needCol, int loadCol, int anchorRow) {
        org.holdover.sizing.PvOption o = ctx.r.solar().chosen();
        XSSFDrawing d = drawing(s);
        XSSFClientAnchor anchor = d.createAnchor(0, 0, 0, 0, 0, anchorRow, 8, anchorRow + 20);
        XSSFChart chart = d.createChart(anchor);
        chart.setTitleText("PV energy to the battery against what it must deliver, Wh per day by month");
        chart.setTitleOverlay(false);
        XDDFChartLegend legend = chart.getOrAddLegend();
        legend.setPosition(LegendPosition.BOTTOM);
        XDDFCategoryAxis x = chart.createCategoryAxis(AxisPosition.BOTTOM);
        XDDFValueAxis y = chart.createValueAxis(AxisPosition.LEFT);
        y.setCrosses(AxisCrosses.AUTO_ZERO);
        y.setTitle("Wh per day");
        Double[] out = new Double[12];
        Double[] need = new Double[12];
        Double[] load = new Double[12];
        double[] loadDc = ctx.r.solar().loadDcWhPerDay();
        for (int m = 0; m < 12; m++) {
            out[m] = o.outputWhPerDay()[m];
            need[m] = o.needWhPerDay()[m];
            load[m] = loadDc[m];
        }
        XDDFDataSource<String> cats = XDDFDataSourcesFactory.fromArray(LoadsSheet.MONTHS.clone(),
                s.ref(firstRow, 0, firstRow + 11, 0), 0);
        XDDFBarChartData data = (XDDFBarChartData) chart.createData(ChartTypes.BAR, x, y);
        data.setBarDirection(BarDirection.COL);
        bar(data, cats, XDDFDataSourcesFactory.fromArray(out, s.ref(firstRow, outCol, firstRow + 11, outCol), outCol),
                "Controllers' output", PresetColor.GOLDENROD);
        bar(data, cats, XDDFDataSourcesFactory.fromArray(need, s.ref(firstRow, needCol, firstRow + 11, needCol), needCol),
                "Output needed", PresetColor.STEEL_BLUE);
        bar(data, cats, XDDFDataSourcesFactory.fromArray(load, s.ref(firstRow, loadCol, firstRow + 11, loadCol), loadCol),
                "Loads' DC energy", PresetColor.SLATE_GRAY);
        chart.plot(data);
    }

    private static void bar(XDDFBarChartData data, XDDFDataSource<String> cats, XDDFNumericalDataSource<Double> vals,
                            String title, PresetColor color) {
        XDDFChartData.Series series = data.addSeries(cats, vals);
        series.setTitle(title, null);
        XDDFShapeProperties props = new XDDFShapeProperties();
        props.setFillProperties(new XDDFSolidFillProperties(XDDFColor.from(color)));
        series.setShapeProperties(props);
    }
}
