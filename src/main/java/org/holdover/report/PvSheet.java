package org.holdover.report;

import java.util.List;
import java.util.Locale;
import org.holdover.catalog.ControllerItem;
import org.holdover.catalog.PvModuleItem;
import org.holdover.pv.ArrayCandidate;
import org.holdover.pv.ArrayChooser;
import org.holdover.pv.ColdVoc;
import org.holdover.pv.ControllerType;
import org.holdover.pv.DcLosses;
import org.holdover.pv.Nec690;
import org.holdover.pv.PvModule;
import org.holdover.pv.PwmOperatingPoint;
import org.holdover.pv.StringWindow;
import org.holdover.sizing.Check;
import org.holdover.sizing.PvOption;
import org.holdover.sizing.PvSizing;
import org.holdover.sizing.SolarDesign;
import org.holdover.sizing.SolarSetup;
import org.holdover.solar.PlaneOfArray;
import org.holdover.solar.Site;
import org.holdover.solar.SurfaceOrientation;

/**
 * The PV array and charge controller(s): the site and its monthly resource summed from the PV hourly sheet, the
 * sizing chain (worst month off grid, refill in backup), the wiring the engine chose, and every string and
 * controller check with its margin.
 */
final class PvSheet {

    private static final int LABEL = 0, VALUE = 1, UNIT = 2, NOTE = 3;
    /** Characters of a label that fit one line of the first column. */
    private static final int LABEL_CHARS = 62;
    /** Monthly table columns. */
    private static final int M_MONTH = 0, M_DAYS = 1, M_GHI_IN = 2, M_GHI = 3, M_AIR = 4, M_PSH = 5, M_PSH_EFF = 6,
            M_DC = 7, M_PR = 8, M_DERATE = 9, M_LOAD = 10, M_REQ = 11, M_OUT = 12, M_NEED = 13, M_RATIO = 14;

    private PvSheet() {
    }

    static void write(Context ctx, int bankRow) {
        SheetWriter s = ctx.sheet(Context.PV);
        SolarDesign sd = ctx.r.solar();
        s.widths(60, 18, 12, 12, 12, 12, 12, 12, 12, 12, 12, 12, 12, 12, 12);
        s.text(0, 0, "PV array and charge controller", ctx.styles.title);
        if (sd == null) {
            s.text(2, 0, ctx.r.chosen() == null ? "No system was chosen, so no PV array was sized."
                    : "The project has no solar section: the PV array and charge controller are not sized (PV is optional)."
                    + " Add solar: with monthly means or a weather file to size them.");
            return;
        }
        SolarSetup setup = sd.setup();
        boolean offGrid = sd.method() == SolarDesign.Method.WORST_MONTH;
        s.text(1, 0, offGrid
                ? "Off grid, worst-month method: for each month, array STC W = DC energy per day ÷ (plane-of-array peak sun hours"
                + " × performance ratio × controller efficiency × battery round trip); the array meets the month that needs most."
                : "Backup, refill method: for each month, array STC W = (energy the hardest outage drew + refill days × DC energy per"
                + " day) ÷ round trip ÷ (refill days × peak sun hours × performance ratio × controller efficiency); the worst month decides.",
                ctx.styles.note);
        int r = 3;
        r = site(ctx, s, sd, r);
        if (sd.chosen() == null) {
            r++;
            s.text(r++, 0, "No PV array could be sized: " + sd.reason(), ctx.styles.bold);
            for (Check c : sd.checks()) {
                s.text(r, LABEL, c.label());
                s.input(r, VALUE, c.value(), Styles.INT);
                s.input(r, UNIT, c.limit(), Styles.INT);
                s.text(r, NOTE, c.basis(), ctx.styles.note);
                ctx.checkCells.put(c.id(), new String[] {s.ref(r, VALUE), s.ref(r, UNIT)});
                r++;
            }
            return;
        }
        PvOption o = sd.chosen();
        SheetWriter bat = ctx.sheet(Context.BATTERY);
        r = array(ctx, s, sd, o, r);
        r = module(ctx, s, o, r);
        r = controller(ctx, s, o, r);
        r = losses(ctx, s, setup.losses(), r);
        r = battery(ctx, s, sd, o, bat, bankRow, r);
        r = monthly(ctx, s, sd, o, r);
        r = wiring(ctx, s, sd, o, r);
        r = checks(ctx, s, sd, o, r);
        r = year(ctx, s, o, r);
        others(ctx, s, sd, o, r);
    }

    private static int site(Context ctx, SheetWriter s, SolarDesign sd, int r) {
        SolarSetup setup = sd.setup();
        Site site = setup.site();
        s.text(r++, 0, "Site and solar resource", ctx.styles.subtitle);
        r = input(s, r, "Latitude (north positive)", "PvLat", site.latitudeDeg(), "°", Styles.D3, "");
        r = input(s, r, "Longitude (east positive)", "PvLon", site.longitudeDeg(), "°", Styles.D3, "");
        r = input(s, r, "Elevation", "PvElev", site.elevationM(), "m", Styles.INT, "");
        r = input(s, r, "Standard-time offset from UTC (the hourly series' clock)", "PvUtcOffset", site.utcOffsetHours(), "h",
                Styles.D2, "");
        s.text(r, LABEL, "Solar resource");
        s.text(r++, VALUE, setup.resource(), ctx.styles.note);
        r = input(s, r, "Record low air temperature (cold open-circuit voltage)", "PvRecordLowC", setup.recordLowC(), "°C",
                Styles.D1, "project: site.recordLowC");
        r = input(s, r, "Design high air temperature (hot maximum-power voltage)", "PvDesignHighC", setup.designHighC(), "°C",
                Styles.D1, "project: site.designHighC");
        r = input(s, r, "Irradiance for the hot cell temperature", "PvDesignG", setup.designIrradianceWm2(), "W/m²", Styles.INT,
                "common practice, no source");
        r = input(s, r, "Maximum PV system voltage (NEC 690.7)", "PvSystemLimitV", setup.systemVoltageLimitV(), "V", Styles.INT,
                setup.systemVoltageLimitV() == Nec690.DWELLING_LIMIT_V ? "one- and two-family dwellings: 600 V (other buildings 1000 V)"
                        : "project (solar.systemVoltageLimitV)");
        return r + 1;
    }

    private static int array(Context ctx, SheetWriter s, SolarDesign sd, PvOption o, int r) {
        SolarSetup setup = sd.setup();
        SurfaceOrientation plane = new SurfaceOrientation(o.tiltDeg(), setup.settings().orientation().azimuthDeg());
        s.text(r++, 0, "Array plane", ctx.styles.subtitle);
        r = input(s, r, "Tilt from horizontal", "PvTilt", o.tiltDeg(), "°", Styles.D1, setup.fixedTiltDeg() != null ? "project"
                : "chosen by the engine: the tilt needing the smallest array for the month that decides (see below)");
        r = input(s, r, "Azimuth, clockwise from north (180 faces south)", "PvAzimuth", plane.azimuthDeg(), "°", Styles.D1, "");
        r = input(s, r, "Ground reflectance (albedo)", "PvAlbedo", setup.settings().albedo(), "", Styles.D2, "");
        r = input(s, r, "Reflection loss coefficient b0 (IAM = 1 − b0 (1/cos θ − 1))", "PvIamB0", setup.settings().iam().b0(), "",
                Styles.D3, "ASHRAE form; 0.05 common practice, no source");
        s.text(r, LABEL, "cos β (tilt)");
        s.formula(r, VALUE, "COS(RADIANS(PvTilt))", plane.cosTilt(), Styles.D4);
        s.name("PvCosTilt", r++, VALUE);
        s.text(r, LABEL, "Sky view factor (1 + cos β) ÷ 2");
        s.formula(r, VALUE, "(1+PvCosTilt)/2", plane.skyViewFactor(), Styles.D4);
        s.name("PvIsoView", r++, VALUE);
        s.text(r, LABEL, "Floor on cos Z in R_b: cos 89° (guard near the horizon)");
        s.formula(r, VALUE, "COS(RADIANS(89))", PlaneOfArray.MIN_COS_ZENITH, Styles.D4);
        s.name("PvCosZenithFloor", r++, VALUE);
        return r + 1;
    }

    private static int module(Context ctx, SheetWriter s, PvOption o, int r) {
        PvModuleItem mi = o.module();
        PvModule m = mi.module();
        s.text(r++, 0, "PV module (from the catalog)", ctx.styles.subtitle);
        s.text(r, LABEL, "Module");
        s.inputText(r, VALUE, mi.id());
        s.name("PvModId", r, VALUE);
        s.text(r++, UNIT, mi.description(), ctx.styles.note);
        r = input(s, r, "STC power P_mp", "PvModW", m.stc().powerW(), "W", Styles.D1, "");
        r = input(s, r, "V_mp", "PvModVmp", m.stc().vmpV(), "V", Styles.D2, "");
        r = input(s, r, "I_mp", "PvModImp", m.stc().impA(), "A", Styles.D2, "");
        r = input(s, r, "V_oc", "PvModVoc", m.stc().vocV(), "V", Styles.D2, "");
        r = input(s, r, "I_sc", "PvModIsc", m.stc().iscA(), "A", Styles.D2, "");
        r = input(s, r, "Temperature coefficient of P_mp", "PvGamma", m.coefficients().pmaxPerC(), "1/°C", Styles.D4, "");
        if (m.coefficients().vocPerC().isPresent()) {
            r = input(s, r, "Temperature coefficient of V_oc (datasheet)", "PvBetaVoc", m.coefficients().vocPerC().getAsDouble(),
                    "1/°C", Styles.D4, "NEC 690.7(A)(1): the coefficient method");
        } else {
            s.text(r, LABEL, "Temperature coefficient of V_oc");
            s.text(r++, VALUE, "not given: NEC Table 690.7(A) is used for the code check", ctx.styles.note);
        }
        r = input(s, r, "Temperature coefficient of V_oc for hourly modelling", "PvBetaVocModel",
                m.coefficients().vocPerCForModelling(), "1/°C", Styles.D4,
                m.coefficients().vocPerC().isPresent() ? "the datasheet's" : "typical −0.30 %/°C: common practice, no source");
        r = input(s, r, "Temperature coefficient of I_sc", "PvAlphaIsc", m.coefficients().iscPerCForModelling(), "1/°C", Styles.D4,
                m.coefficients().iscPerC().isPresent() ? "the datasheet's" : "typical +0.05 %/°C: common practice, no source");
        if (m.coefficients().vmpPerC().isPresent()) {
            r = input(s, r, "Temperature coefficient of V_mp", "PvBetaVmp", m.coefficients().vmpPerC().getAsDouble(), "1/°C",
                    Styles.D4, "the datasheet's");
        } else {
            s.text(r, LABEL, "Temperature coefficient of V_mp (P_mp's − I_sc's)");
            s.formula(r, VALUE, "PvGamma-PvAlphaIsc", m.coefficients().vmpPerCForModelling(), Styles.D4);
            s.text(r, UNIT, "1/°C");
            s.text(r, NOTE, "I_mp follows I_sc, so V_mp takes the rest of P_mp's change: common practice, no source", ctx.styles.note);
            s.name("PvBetaVmp", r++, VALUE);
        }
        r = input(s, r, "Nominal operating cell temperature (NOCT)", "PvNoct", m.noctC(), "°C", Styles.D1, "");
        r = input(s, r, "Area", "PvModArea", m.areaM2(), "m²", Styles.D3, "");
        r = input(s, r, "Demo price of one module", "PvModPrice", mi.price(), "", Styles.INT, "");
        return r + 1;
    }

    private static int controller(Context ctx, SheetWriter s, PvOption o, int r) {
        ControllerItem ci = o.controller();
        s.text(r++, 0, "Charge controller (from the catalog)", ctx.styles.subtitle);
        s.text(r, LABEL, "Controller");
        s.inputText(r, VALUE, ci.id());
        s.name("PvCtlId", r, VALUE);
        s.text(r++, UNIT, ci.description(), ctx.styles.note);
        s.text(r, LABEL, "Type");
        s.inputText(r++, VALUE, ci.controller().type().name().toLowerCase(Locale.ROOT));
        r = input(s, r, "Maximum PV input voltage", "PvCtlMaxV", ci.controller().maxPvInputV(), "V", Styles.INT, "");
        r = input(s, r, "Maximum PV input current", "PvCtlMaxInA", ci.controller().maxInputCurrentA(), "A", Styles.D1, "");
        r = input(s, r, "Rated output current", "PvCtlOutA", ci.controller().ratedOutputCurrentA(), "A", Styles.D1, "");
        r = input(s, r, "Conversion efficiency", "PvCtlEff", ci.controller().efficiency(), "", Styles.PCT, "");
        r = input(s, r, "Headroom the array's V_mp needs above the battery", "PvCtlHeadroom", ci.controller().minHeadroomV(), "V",
                Styles.D1, "");
        r = input(s, r, "Demo price of one controller", "PvCtlPrice", ci.price(), "", Styles.INT, "");
        return r + 1;
    }

    private static int losses(Context ctx, SheetWriter s, DcLosses losses, int r) {
        s.text(r++, 0, "DC losses of the array (fraction lost)", ctx.styles.subtitle);
        StringBuilder f = new StringBuilder();
        for (DcLosses.LossItem i : losses.items()) {
            s.text(r, LABEL, i.name());
            s.input(r, VALUE, i.fraction(), Styles.PCT);
            s.text(r, NOTE, i.source(), ctx.styles.note);
            f.append(f.length() == 0 ? "" : "*").append("(1-").append(SheetWriter.rel(r, VALUE)).append(")");
            r++;
        }
        s.text(r, LABEL, "Power kept after the DC losses", ctx.styles.bold);
        s.formula(r, VALUE, f.toString(), losses.factor(), Styles.D4);
        s.name("PvLossFactor", r++, VALUE);
        return r + 1;
    }

    private static int battery(Context ctx, SheetWriter s, SolarDesign sd, PvOption o, SheetWriter bat, int bankRow, int r) {
        s.text(r++, 0, "Battery the array charges", ctx.styles.subtitle);
        s.text(r, LABEL, "Bank nominal voltage");
        s.formula(r, VALUE, bat.ref(bankRow, BatterySheet.BANK_V), sd.conditions().batteryNominalV(), Styles.D1);
        s.text(r, UNIT, "V");
        s.name("PvBatNomV", r++, VALUE);
        s.text(r, LABEL, "Charging (absorption) voltage");
        s.formula(r, VALUE, bat.ref(bankRow, BatterySheet.ABS_V), sd.conditions().batteryChargeV(), Styles.D1);
        s.text(r, UNIT, "V");
        s.name("PvChargeV", r++, VALUE);
        r = input(s, r, "Typical voltage while charging: share of the way from nominal to charging", "PvOperatingShare",
                PvSizing.OPERATING_SHARE, "", Styles.D2, "our choice, no source");
        s.text(r, LABEL, "Typical voltage while charging (PWM operating point, output limit)");
        s.formula(r, VALUE, "PvBatNomV+PvOperatingShare*(PvChargeV-PvBatNomV)", sd.conditions().batteryOperatingV(), Styles.D2);
        s.text(r, UNIT, "V");
        s.name("PvOperatingV", r++, VALUE);
        s.text(r, LABEL, "Battery round-trip efficiency (chemistry)");
        s.formula(r, VALUE, "INDEX(ChemRte,MATCH(" + bat.ref(bankRow, BatterySheet.CHEM) + ",ChemWord,0))",
                sd.roundTripEfficiency(), Styles.PCT);
        s.name("PvRte", r++, VALUE);
        if (sd.method() == SolarDesign.Method.REFILL) {
            s.text(r, LABEL, "Energy the hardest outage drew (to refill)");
            s.formula(r, VALUE, "EnergyDcWh", sd.refillWh(), Styles.INT);
            s.text(r, UNIT, "Wh");
            s.name("PvRefillWh", r++, VALUE);
            r = input(s, r, "Days allowed for the refill, while carrying the loads", "PvRefillDays", sd.setup().refillDays(),
                    "days", Styles.D1, "");
        }
        return r + 1;
    }

    private static int monthly(Context ctx, SheetWriter s, SolarDesign sd, PvOption o, int r) {
        boolean offGrid = sd.method() == SolarDesign.Method.WORST_MONTH;
        double[] ghiIn = sd.setup().monthlyGhiKwhM2Day();
        s.text(r++, 0, "Resource and sizing by month (sums of the PV hourly sheet)", ctx.styles.subtitle);
        s.header(r, 0, "Month", "Days", ghiIn != null ? "GHI, project mean, kWh/m²/day" : "GHI (file)", "GHI from the hours, kWh/m²/day",
                "Air, mean °C", "Peak sun hours on the array, h/day", "…after reflection loss, h/day", "Array DC, Wh/day",
                "DC performance ratio (one module)", "Derate (ratio × controller eff.)", "Loads' DC energy, Wh/day", "Array needed, W",
                "Controllers' output, Wh/day", "Output needed, Wh/day", "Output ÷ needed");
        s.sheet.getRow(r++).setHeightInPoints(58);
        int first = r;
        double[] ghi = sd.setup().weather().monthlyMeanDailyGhiKwhM2();
        double[] air = sd.setup().weather().monthlyMeanAirTempC();
        double[] pshEff = o.poa().monthlyPeakSunHours(true);
        double[] dcDay = o.dc().monthlyMeanDailyDcWh();
        double[] load = sd.loadDcWhPerDay();
        double[] req = o.sizing().requiredStcWByMonth();
        for (int m = 1; m <= 12; m++) {
            int i = m - 1;
            String R = String.valueOf(r + 1);
            java.util.function.IntFunction<String> at = c -> SheetWriter.col(c) + R;
            String days = at.apply(M_DAYS);
            s.text(r, M_MONTH, LoadsSheet.MONTHS[i]);
            s.formula(r, M_DAYS, "INDEX(MonthDays," + m + ")", ctx.r.input().loads().calendar().daysInMonth(m), Styles.INT);
            if (ghiIn != null) {
                s.input(r, M_GHI_IN, ghiIn[i], Styles.D2);
            } else {
                s.text(r, M_GHI_IN, "");
            }
            s.formula(r, M_GHI, "SUMIFS(PVH_Ghi,PVH_Month," + m + ")/" + days + "/1000", ghi[i], Styles.D3);
            s.formula(r, M_AIR, "AVERAGEIFS(PVH_Air,PVH_Month," + m + ")", air[i], Styles.D1);
            s.formula(r, M_PSH, "SUMIFS(PVH_Total,PVH_Month," + m + ")/" + days + "/1000", o.peakSunHours()[i], Styles.D3);
            s.formula(r, M_PSH_EFF, "SUMIFS(PVH_Effective,PVH_Month," + m + ")/" + days + "/1000", pshEff[i], Styles.D3);
            s.formula(r, M_DC, "SUMIFS(PVH_DcW,PVH_Month," + m + ")/" + days, dcDay[i], Styles.INT);
            s.formula(r, M_PR, "IF(" + at.apply(M_PSH) + ">0,SUMIFS(PVH_ModW,PVH_Month," + m + ")*PvLossFactor/" + days
                    + "/(PvModW*" + at.apply(M_PSH) + "),0)", o.performanceRatio()[i], Styles.D3);
            s.formula(r, M_DERATE, "IF(" + at.apply(M_PR) + ">0," + at.apply(M_PR) + "*PvCtlEff,1)", o.derate()[i], Styles.D3);
            s.formula(r, M_LOAD, "SUMIFS(H_DcW,H_Month," + m + ")/" + days, load[i], Styles.INT);
            String l = at.apply(M_LOAD);
            String psh = at.apply(M_PSH);
            String d = at.apply(M_DERATE);
            if (offGrid) {
                s.formula(r, M_REQ, "IF(" + l + "=0,0," + l + "/(" + psh + "*" + d + "*PvRte))", req[i], Styles.INT);
                s.formula(r, M_NEED, l + "/PvRte", o.needWhPerDay()[i], Styles.INT);
            } else {
                String need = "PvRefillWh/PvRte+PvRefillDays*" + l + "/PvRte";
                s.formula(r, M_REQ, "IF(" + need + "=0,0,(" + need + ")/(PvRefillDays*" + psh + "*" + d + "))", req[i], Styles.INT);
                s.formula(r, M_NEED, "(" + need + ")/PvRefillDays", o.needWhPerDay()[i], Styles.INT);
            }
            s.formula(r, M_OUT, "SUMIFS(PVH_OutW,PVH_Month," + m + ")/" + days, o.outputWhPerDay()[i], Styles.INT);
            s.formula(r, M_RATIO, "IF(" + at.apply(M_NEED) + ">0," + at.apply(M_OUT) + "/" + at.apply(M_NEED) + ","
                    + (long) PvSizing.NO_NEED_RATIO + ")", PvSizing.ratio(o.outputWhPerDay()[i], o.needWhPerDay()[i]), Styles.D3);
            r++;
        }
        int last = r - 1;
        s.name("PvMonthRequired", first, M_REQ, last, M_REQ);
        s.name("PvMonthOut", first, M_OUT, last, M_OUT);
        s.name("PvMonthNeed", first, M_NEED, last, M_NEED);
        s.name("PvMonthRatio", first, M_RATIO, last, M_RATIO);
        s.name("PvMonthPsh", first, M_PSH, last, M_PSH);
        r++;
        s.text(r, LABEL, offGrid ? "Worst month (needs the largest array)" : "Month that needs the largest array for the refill");
        s.formula(r, VALUE, "MATCH(MAX(PvMonthRequired),PvMonthRequired,0)", o.sizing().worstMonth() + 1, Styles.GENERAL);
        s.text(r, NOTE, LoadsSheet.MONTHS[o.sizing().worstMonth()], ctx.styles.note);
        s.name("PvWorstMonth", r++, VALUE);
        s.text(r, LABEL, "…its peak sun hours on the array");
        s.formula(r, VALUE, "INDEX(PvMonthPsh,PvWorstMonth)", o.peakSunHours()[o.sizing().worstMonth()], Styles.D3);
        s.text(r++, UNIT, "h/day");
        s.text(r, LABEL, "Array STC power the month needs");
        s.formula(r, VALUE, "MAX(PvMonthRequired)", o.sizing().requiredStcW(), Styles.INT);
        s.text(r++, UNIT, "W");
        r = input(s, r, "Top-up after the hourly check of the controllers (1 = none)", "PvTopUp", o.topUp(), "×", Styles.D4,
                "raised when the hourly simulation fell short in some month (PWM operating point, clipping)");
        s.text(r, LABEL, "Array STC power the wiring must reach", ctx.styles.bold);
        s.formula(r, VALUE, "MAX(PvMonthRequired)*PvTopUp", o.requiredStcW(), Styles.INT);
        s.text(r, UNIT, "W");
        s.name("PvRequiredW", r++, VALUE);
        Charts.pvMonthly(ctx, s, first, M_OUT, M_NEED, M_LOAD, r + 1);
        return r + 22;
    }

    private static int wiring(Context ctx, SheetWriter s, SolarDesign sd, PvOption o, int r) {
        ArrayCandidate c = o.candidate();
        StringWindow w = c.perController().window();
        PvModule m = o.module().module();
        boolean pwm = o.controller().controller().type() == ControllerType.PWM;
        s.text(r++, 0, "Strings and controllers (modules per string and controllers chosen by the engine)", ctx.styles.subtitle);
        if (w.coldVoc() instanceof ColdVoc.ByNecTable t) {
            r = table(ctx, s, r);
            s.text(r, LABEL, "NEC Table 690.7(A) factor at the record low (colder row when between rows)");
            s.formula(r, VALUE, "IF(INT(PvRecordLowC)>=25,1,IF(INT(PvRecordLowC)<-40,"
                    + Nec690.TABLE_690_7_A.get(Nec690.TABLE_690_7_A.size() - 1).factor()
                    + ",INDEX(PvNecFactor,MATCH(INT(PvRecordLowC),PvNecColdest,1))))", t.factor(), Styles.D2);
            s.name("PvNecVocFactor", r++, VALUE);
            s.text(r, LABEL, "Module V_oc at the record low (V_oc × factor)");
            s.formula(r, VALUE, "PvModVoc*PvNecVocFactor", w.coldVoc().moduleVocV(), Styles.D2);
        } else {
            s.text(r, LABEL, "Module V_oc at the record low: V_oc (1 + β (T − 25)), NEC 690.7(A)(1)");
            s.formula(r, VALUE, "PvModVoc*(1+PvBetaVoc*(PvRecordLowC-25))", w.coldVoc().moduleVocV(), Styles.D2);
        }
        s.text(r, UNIT, "V");
        s.name("PvModColdVoc", r++, VALUE);
        s.text(r, LABEL, "Hot cell temperature: design high + (NOCT − 20) × G ÷ 800");
        s.formula(r, VALUE, "PvDesignHighC+(PvNoct-20)*PvDesignG/800", w.hotCellTempC(), Styles.D1);
        s.text(r, UNIT, "°C");
        s.name("PvHotCellC", r++, VALUE);
        s.text(r, LABEL, "Module V_mp with hot cells");
        s.formula(r, VALUE, "PvModVmp*(1+PvBetaVmp*(PvHotCellC-25))", w.moduleVmpHotV(), Styles.D2);
        s.text(r, UNIT, "V");
        s.name("PvModVmpHot", r++, VALUE);
        s.text(r, LABEL, "String V_mp the controller needs: charging V + headroom");
        s.formula(r, VALUE, "PvChargeV+PvCtlHeadroom", w.requiredStringVmpV(), Styles.D2);
        s.text(r, UNIT, "V");
        s.name("PvRequiredVmp", r++, VALUE);
        s.text(r, LABEL, "Most modules per string: controller input voltage");
        s.formula(r, VALUE, "INT(PvCtlMaxV/PvModColdVoc+1E-12)", w.maxByControllerVoltage(), Styles.INT);
        s.name("PvMaxByCtl", r++, VALUE);
        s.text(r, LABEL, "Most modules per string: code system voltage");
        s.formula(r, VALUE, "INT(PvSystemLimitV/PvModColdVoc+1E-12)", w.maxBySystemLimit(), Styles.INT);
        s.name("PvMaxBySystem", r++, VALUE);
        s.text(r, LABEL, "Fewest modules per string: hot V_mp reaches what the controller needs");
        s.formula(r, VALUE, "MAX(1,-INT(-(PvRequiredVmp/PvModVmpHot-1E-12)))", w.minModules(), Styles.INT);
        s.name("PvMinPerString", r++, VALUE);
        r = input(s, r, "Modules per string (chosen)", "PvPerString", c.modulesPerString(), "", Styles.INT,
                "within the window above; the cheapest array that passes every check");
        r = input(s, r, "Identical controllers (chosen)", "PvCtls", c.controllerCount(), "", Styles.INT,
                "fewest that pass every check");
        double vModule = PwmOperatingPoint.moduleVoltageV(sd.conditions().batteryOperatingV(), c.modulesPerString());
        if (pwm) {
            s.text(r, LABEL, "PWM: voltage across one module at the battery's operating voltage");
            s.formula(r, VALUE, "PvOperatingV/PvPerString", vModule, Styles.D2);
            s.text(r, UNIT, "V");
            s.name("PvPwmModuleV", r++, VALUE);
            s.text(r, LABEL, "PWM: module current there (two-line I–V curve, 25 °C)");
            s.formula(r, VALUE, "IF(PvPwmModuleV<=PvModVmp,PvModIsc-(PvModIsc-PvModImp)*PvPwmModuleV/PvModVmp,"
                    + "IF(PvPwmModuleV<PvModVoc,PvModImp*(PvModVoc-PvPwmModuleV)/(PvModVoc-PvModVmp),0))",
                    PwmOperatingPoint.currentA(m, vModule, 25.0), Styles.D3);
            s.text(r, UNIT, "A");
            String i = SheetWriter.rel(r++, VALUE);
            s.text(r, LABEL, "PWM power ratio at 25 °C (power at battery voltage ÷ maximum power)");
            s.formula(r, VALUE, "MAX(0,MIN(1,PvPwmModuleV*" + i + "/(PvModVmp*PvModImp)))", c.perController().pwmPowerRatio(),
                    Styles.D4);
        } else {
            s.text(r, LABEL, "Power ratio (MPPT: the array runs at its maximum power point)");
            s.input(r, VALUE, 1.0, Styles.D4);
        }
        s.name("PvPowerRatio", r++, VALUE);
        double effString = ArrayChooser.effectiveStringW(m, c.modulesPerString(), c.perController().pwmPowerRatio());
        s.text(r, LABEL, "Effective power of one string: P_mp × modules × ratio");
        s.formula(r, VALUE, "PvModW*PvPerString*PvPowerRatio", effString, Styles.D1);
        s.text(r, UNIT, "W");
        s.name("PvStringW", r++, VALUE);
        var pin = ctx.r.search() == null || ctx.r.search().chosen() == null ? null : ctx.r.search().chosen().candidate().pin().pv();
        int searchStrings = pin == null ? 0 : pin.totalStrings();
        r = input(s, r, "Strings the system search chose in all (0: the sizing's own)", "PvSearchStrings", searchStrings, "",
                Styles.INT, "from the Alternatives sheet: more strings than the sizing needs when they make the cheapest passing system");
        if (ctx.r.generator() != null && searchStrings > 0) {
            // With a generator the search may choose fewer strings than the sizing needs: the generator covers the rest.
            s.text(r, LABEL, "Strings in all (the search's choice; the generator covers what the array leaves short)");
            s.formula(r, VALUE, "MAX(1,PvSearchStrings)", searchStrings, Styles.INT);
        } else {
            s.text(r, LABEL, "Strings needed in all");
            s.formula(r, VALUE, "MAX(1,-INT(-(PvRequiredW/PvStringW-1E-9)),PvSearchStrings)",
                    Math.max(ArrayChooser.stringsNeeded(o.requiredStcW(), effString), searchStrings), Styles.INT);
        }
        s.name("PvStringsNeeded", r++, VALUE);
        s.text(r, LABEL, "Strings on each controller");
        s.formula(r, VALUE, "-INT(-PvStringsNeeded/PvCtls)", c.stringsPerController(), Styles.INT);
        s.name("PvStringsPerCtl", r++, VALUE);
        s.text(r, LABEL, "Modules in all", ctx.styles.bold);
        s.formula(r, VALUE, "PvPerString*PvStringsPerCtl*PvCtls", c.totalModules(), Styles.INT);
        s.name("PvModules", r++, VALUE);
        s.text(r, LABEL, "Array STC power", ctx.styles.bold);
        s.formula(r, VALUE, "PvModW*PvModules", c.totalStcW(), Styles.INT);
        s.text(r, UNIT, "W");
        s.name("PvArrayStcW", r++, VALUE);
        s.text(r, LABEL, "Controllers' output limit: rated current × controllers × typical battery V");
        s.formula(r, VALUE, "PvCtlOutA*PvCtls*PvOperatingV", o.output().maxOutputW(), Styles.INT);
        s.text(r, UNIT, "W");
        s.name("PvMaxOutW", r++, VALUE);
        s.text(r, LABEL, "Demo price: modules + controllers");
        s.formula(r, VALUE, "PvModules*PvModPrice+PvCtls*PvCtlPrice", o.price(), Styles.INT);
        s.name("PvPrice", r++, VALUE);
        return r + 1;
    }

    private static int table(Context ctx, SheetWriter s, int r) {
        s.text(r++, LABEL, "NEC Table 690.7(A): V_oc correction, crystalline silicon (2017, 2020 and 2023 editions)", ctx.styles.note);
        s.header(r++, LABEL, "Lowest ambient, from … °C", "…to °C (row key)", "Factor");
        int first = r;
        List<Nec690.VocTableRow> rows = Nec690.TABLE_690_7_A;
        for (int i = rows.size() - 1; i >= 0; i--) {
            s.input(r, LABEL, rows.get(i).warmestC(), Styles.GENERAL);
            s.input(r, VALUE, rows.get(i).coldestC(), Styles.GENERAL);
            s.input(r, UNIT, rows.get(i).factor(), Styles.D2);
            r++;
        }
        s.name("PvNecColdest", first, VALUE, r - 1, VALUE);
        s.name("PvNecFactor", first, UNIT, r - 1, UNIT);
        return r;
    }

    private static int checks(Context ctx, SheetWriter s, SolarDesign sd, PvOption o, int r) {
        ArrayCandidate c = o.candidate();
        boolean pwm = c.controller().type() == ControllerType.PWM;
        s.text(r++, 0, "Checks (each controller carries its share of the strings)", ctx.styles.subtitle);
        s.header(r++, 0, "Check", "Design value", "Limit", "Unit", "Result", "Margin", "Basis");
        for (Check k : sd.checks()) {
            r = check(ctx, s, r, k, pwm, false);
        }
        for (Check k : sd.advisories()) {
            r = check(ctx, s, r, k, pwm, true);
        }
        return r + 1;
    }

    private static int check(Context ctx, SheetWriter s, int r, Check k, boolean pwm, boolean advisory) {
        String[] f = switch (k.id()) {
            case PvSizing.COLD_VOC -> new String[] {"PvModColdVoc*PvPerString", "PvCtlMaxV"};
            case PvSizing.SYSTEM_VOLTAGE -> new String[] {"PvModColdVoc*PvPerString", "PvSystemLimitV"};
            case PvSizing.RECORD_LOW_IN_TABLE -> new String[] {"PvRecordLowC+273.15", "-40+273.15"};
            case PvSizing.HOT_VMP -> new String[] {"PvModVmpHot*PvPerString", "PvRequiredVmp"};
            case PvSizing.INPUT_CURRENT -> new String[] {"1.25*(PvModIsc*PvStringsPerCtl)", "PvCtlMaxInA"};
            case PvSizing.OUTPUT_CURRENT -> pwm ? new String[] {"1.25*(PvModIsc*PvStringsPerCtl)", "PvCtlOutA"}
                    : new String[] {"PvModW*(PvPerString*PvStringsPerCtl)*PvCtlEff/PvBatNomV", "PvCtlOutA"};
            case PvSizing.ARRAY_POWER -> new String[] {"PvModW*(PvPerString*PvStringsPerCtl)*PvCtls*PvPowerRatio", "PvRequiredW"};
            case PvSizing.ENERGY -> new String[] {"INDEX(PvMonthOut,PvTightMonth)", "INDEX(PvMonthNeed,PvTightMonth)"};
            case PvSizing.CLIPPED -> new String[] {"100*SUM(PVH_ClipW)/SUM(PVH_DcW)", String.valueOf(PvSizing.CLIPPED_LIMIT_PCT)};
            case PvSizing.PWM_GIVEN_UP -> new String[] {"100*SUM(PVH_GivenUpW)/SUM(PVH_DcW)",
                String.valueOf(PvSizing.PWM_GIVEN_UP_LIMIT_PCT)};
            default -> throw new IllegalStateException("no PV sheet cells for check " + k.id());
        };
        if (k.id().equals(PvSizing.ENERGY)) {
            s.text(r, LABEL, "Month where output ÷ needed is smallest");
            s.formula(r, VALUE, "MATCH(MIN(PvMonthRatio),PvMonthRatio,0)", ctx.r.solar().chosen().tightestMonth() + 1, Styles.GENERAL);
            s.name("PvTightMonth", r++, VALUE);
        }
        String R = String.valueOf(r + 1);
        String fmt = Math.abs(k.limit()) >= 100 ? Styles.INT : Styles.D2;
        String label = k.label() + (advisory ? " (advisory)" : "");
        s.text(r, 0, label, ctx.styles.wrap);
        if (label.length() > LABEL_CHARS) {
            s.sheet.getRow(r).setHeightInPoints(15f * (int) Math.ceil(label.length() / (double) LABEL_CHARS) + 2);
        }
        s.formula(r, 1, f[0], k.value(), fmt);
        s.formula(r, 2, f[1], k.limit(), fmt);
        s.text(r, 3, k.unit());
        boolean atLeast = k.sense() == Check.Sense.AT_LEAST;
        s.formulaText(r, 4, "IF(B" + R + (atLeast ? ">=" : "<=") + "C" + R + ",\"pass\",\"FAIL\")", k.passes() ? "pass" : "FAIL");
        s.formula(r, 5, atLeast ? "B" + R + "/C" + R + "-1" : "1-B" + R + "/C" + R, k.margin(), Styles.PCT);
        s.text(r, 6, k.basis(), ctx.styles.note);
        ctx.checkCells.put(k.id(), new String[] {s.ref(r, 1), s.ref(r, 2)});
        return r + 1;
    }

    private static int year(Context ctx, SheetWriter s, PvOption o, int r) {
        s.text(r++, 0, "Energy over the year (the chain can only lose energy)", ctx.styles.subtitle);
        s.text(r, LABEL, "Sunlight on the modules: plane of array × module area");
        s.formula(r, VALUE, "SUM(PVH_Total)*(PvModArea*PvModules)", o.dc().annualPoaOnArrayWh(), Styles.INT);
        s.text(r++, UNIT, "Wh");
        s.text(r, LABEL, "Array DC after temperature, reflection and DC losses");
        s.formula(r, VALUE, "SUM(PVH_DcW)", o.dc().annualDcWh(), Styles.INT);
        s.text(r++, UNIT, "Wh");
        if (o.controller().controller().type() == ControllerType.PWM) {
            s.text(r, LABEL, "Given up by running at battery voltage (PWM)");
            s.formula(r, VALUE, "SUM(PVH_GivenUpW)", o.output().annualPwmGivenUpWh(), Styles.INT);
            s.text(r++, UNIT, "Wh");
        }
        s.text(r, LABEL, "Clipped at the controllers' rated output");
        s.formula(r, VALUE, "SUM(PVH_ClipW)", o.output().annualClippedDcWh(), Styles.INT);
        s.text(r++, UNIT, "Wh");
        s.text(r, LABEL, "Delivered to the battery bus");
        s.formula(r, VALUE, "SUM(PVH_OutW)", o.output().annualOutputWh(), Styles.INT);
        s.text(r++, UNIT, "Wh");
        return r + 1;
    }

    private static void others(Context ctx, SheetWriter s, SolarDesign sd, PvOption o, int r) {
        s.text(r++, 0, "How the engine chose (figures from the engine, for reference)", ctx.styles.subtitle);
        if (o.tiltsDeg().length > 1) {
            StringBuilder b = new StringBuilder("Array needed with this module and controller at each tilt tried: ");
            for (int i = 0; i < o.tiltsDeg().length; i++) {
                b.append(i == 0 ? "" : "; ").append(String.format(Locale.ROOT, "%.0f° %,.0f W", o.tiltsDeg()[i], o.requiredByTiltW()[i]));
            }
            r = SummarySheet.paragraph(ctx, s, r, b.append(". Chosen: ").append(String.format(Locale.ROOT, "%.0f°", o.tiltDeg()))
                    .append(" (every 5° first, then every 1° around the best).").toString());
        }
        for (PvOption x : sd.options()) {
            ArrayCandidate c = x.candidate();
            Check fail = x.firstFailure();
            String line = String.format(Locale.ROOT, "%s%s on %s × %d: %d per string × %d strings each, %,.0f W STC, tilt %.0f°,"
                    + " demo price %,.0f: %s", x == o ? "CHOSEN: " : "", x.module().id(), x.controller().id(), c.controllerCount(),
                    c.modulesPerString(), c.stringsPerController(), c.totalStcW(), x.tiltDeg(), x.price(),
                    fail == null ? (x.advisoryFailures() == 0 ? "passes" : "passes, " + x.advisoryFailures() + " advisory check(s) fail")
                            : "fails: " + fail.label().toLowerCase(Locale.ROOT) + String.format(Locale.ROOT, " (%,.2f %s against %,.2f)",
                            fail.value(), fail.unit(), fail.limit()));
            s.text(r++, 0, line);
        }
    }

    /** Rows for the Summary's system block; returns the next row. */
    static int summary(Context ctx, SheetWriter s, int row) {
        SolarDesign sd = ctx.r.solar();
        if (sd == null) {
            s.text(row, 0, "PV array");
            s.text(row++, 1, "not sized: the project has no solar section (PV is optional)", ctx.styles.note);
            return row;
        }
        if (sd.chosen() == null) {
            s.text(row, 0, "PV array");
            s.text(row++, 1, "none could be sized: " + sd.reason(), ctx.styles.note);
            return row;
        }
        PvOption o = sd.chosen();
        SheetWriter pv = ctx.sheet(Context.PV);
        s.text(row, 0, "PV module");
        s.formulaName(row, 1, "PvModId", o.module().id());
        side(ctx, s, row++, o.module().description());
        s.text(row, 0, "Modules per string × strings × controllers");
        s.formula(row, 1, "PvPerString", o.candidate().modulesPerString(), Styles.INT);
        s.formula(row, 2, "PvStringsPerCtl", o.candidate().stringsPerController(), Styles.INT);
        s.formula(row++, 3, "PvCtls", o.candidate().controllerCount(), Styles.INT);
        s.text(row, 0, "Charge controller");
        s.formulaName(row, 1, "PvCtlId", o.controller().id());
        side(ctx, s, row++, o.controller().description());
        s.text(row, 0, "Array STC power, W; tilt, °");
        s.formula(row, 1, "PvArrayStcW", o.candidate().totalStcW(), Styles.INT);
        s.formula(row++, 2, "PvTilt", o.tiltDeg(), Styles.D1);
        s.text(row, 0, sd.method() == SolarDesign.Method.WORST_MONTH ? "Worst month; peak sun hours on the array, h/day"
                : "Refill month; peak sun hours on the array, h/day");
        s.formula(row, 1, "PvWorstMonth", o.sizing().worstMonth() + 1, Styles.GENERAL);
        s.formula(row++, 2, "INDEX(PvMonthPsh,PvWorstMonth)", o.peakSunHours()[o.sizing().worstMonth()], Styles.D2);
        s.text(row, 0, "Demo price: modules + controllers");
        s.formula(row++, 1, "PvPrice", o.price(), Styles.INT);
        return row;
    }

    /** Text from column C to the right edge of the Summary, wrapped (as the Summary's own descriptions). */
    private static void side(Context ctx, SheetWriter s, int row, String text) {
        s.text(row, 2, text, ctx.styles.wrap);
        s.sheet.addMergedRegion(new org.apache.poi.ss.util.CellRangeAddress(row, row, 2, 6));
    }

    private static int input(SheetWriter s, int r, String label, String name, double value, String unit, String format,
                             String note) {
        s.text(r, LABEL, label);
        s.input(r, VALUE, value, format);
        s.text(r, UNIT, unit);
        if (!note.isEmpty()) {
            s.text(r, NOTE, note, s.styles.note);
        }
        s.name(name, r, VALUE);
        return r + 1;
    }
}
