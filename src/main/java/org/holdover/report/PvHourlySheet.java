package org.holdover.report;

import org.holdover.load.YearCalendar;
import org.holdover.pv.ArrayDcSeries;
import org.holdover.pv.ControllerSeries;
import org.holdover.pv.ControllerType;
import org.holdover.pv.PvModule;
import org.holdover.pv.PwmOperatingPoint;
import org.holdover.sizing.PvOption;
import org.holdover.sizing.SolarDesign;
import org.holdover.solar.PoaSeries;
import org.holdover.solar.SunPath;
import org.holdover.solar.WeatherYear;

/**
 * The array's year hour by hour (local standard time): the sun's position and the extraterrestrial irradiance
 * (from the NREL solar position algorithm) and the weather are inputs; the plane-of-array chain, cell temperature,
 * DC power and the controllers' output are formulas over them and the PV sheet's inputs. The PV sheet sums it by
 * month with SUMIFS.
 */
final class PvHourlySheet {

    /** Hours included in the print area. */
    static final int PRINTED_HOURS = 48;

    private PvHourlySheet() {
    }

    static void write(Context ctx) {
        SheetWriter s = ctx.sheet(Context.PV_HOURLY);
        SolarDesign sd = ctx.r.solar();
        s.text(0, 0, "PV hourly: irradiance on the array, cell temperature and power, hour by hour", ctx.styles.title);
        if (sd == null || sd.chosen() == null) {
            s.text(2, 0, sd == null ? "The project has no solar section: no PV array was sized (PV is optional)."
                    : "No PV array could be sized: see the PV sheet.");
            return;
        }
        s.text(1, 0, "Hour 0 starts at midnight on 1 January, local standard time; sun position at the middle of each hour."
                + " Yellow: inputs (sun position and extraterrestrial irradiance from the NREL solar position algorithm;"
                + " the weather). cos θ = cos Z cos β + sin Z sin β cos(sun azimuth − array azimuth); sky diffuse by Hay and Davies;"
                + " IAM = 1 − b0 (1/cos θ − 1); cell temperature = air + (NOCT − 20) × POA ÷ 800.", ctx.styles.note);
        s.text(2, 0, "Printing covers the first " + PRINTED_HOURS + " hours; the whole year is in the sheet.", ctx.styles.note);
        PvOption o = sd.chosen();
        SunPath sun = sd.setup().sunPath();
        WeatherYear w = sd.setup().weather();
        PoaSeries poa = o.poa();
        ArrayDcSeries dc = o.dc();
        ControllerSeries out = o.output();
        PvModule m = o.module().module();
        boolean pwm = o.controller().controller().type() == ControllerType.PWM;
        YearCalendar cal = ctx.r.input().loads().calendar();

        int c = 0;
        final int cHour = c++, cMonth = c++, cZen = c++, cAz = c++, cGon = c++, cGhi = c++, cDni = c++, cDhi = c++, cAir = c++;
        final int cCos = c++, cBeam = c++, cA = c++, cRb = c++, cSky = c++, cGround = c++, cTotal = c++, cIam = c++, cEff = c++;
        final int cCell = c++, cModW = c++, cBefore = c++, cDc = c++;
        final int cVmp = pwm ? c++ : -1, cVoc = pwm ? c++ : -1, cIsc = pwm ? c++ : -1, cImp = pwm ? c++ : -1;
        final int cI = pwm ? c++ : -1, cRatio = pwm ? c++ : -1, cGiven = pwm ? c++ : -1;
        final int cOut = c++, cClip = c++;
        int hr = 3;
        String[] heads = new String[c];
        heads[cHour] = "Hour";
        heads[cMonth] = "Month";
        heads[cZen] = "Sun zenith Z, °";
        heads[cAz] = "Sun azimuth, ° from north";
        heads[cGon] = "Extraterrestrial normal G_on, W/m²";
        heads[cGhi] = "GHI, W/m²";
        heads[cDni] = "DNI, W/m²";
        heads[cDhi] = "DHI, W/m²";
        heads[cAir] = "Air, °C";
        heads[cCos] = "cos θ (incidence)";
        heads[cBeam] = "Beam on the plane, W/m²";
        heads[cA] = "Anisotropy index A = DNI ÷ G_on";
        heads[cRb] = "R_b = cos θ ÷ cos Z";
        heads[cSky] = "Sky diffuse (Hay–Davies), W/m²";
        heads[cGround] = "Ground reflected, W/m²";
        heads[cTotal] = "Plane of array, W/m²";
        heads[cIam] = "Incidence angle modifier";
        heads[cEff] = "Reaching the cells, W/m²";
        heads[cCell] = "Cell temperature, °C";
        heads[cModW] = "One module, W";
        heads[cBefore] = "Array before DC losses, W";
        heads[cDc] = "Array DC, W";
        if (pwm) {
            heads[cVmp] = "Module V_mp at the cells, V";
            heads[cVoc] = "Module V_oc at the cells, V";
            heads[cIsc] = "Module I_sc at 1000 W/m², A";
            heads[cImp] = "Module I_mp at 1000 W/m², A";
            heads[cI] = "Module current at battery voltage, A";
            heads[cRatio] = "PWM power ratio";
            heads[cGiven] = "Given up at battery voltage, W";
        }
        heads[cOut] = "Controllers' output, W";
        heads[cClip] = "Clipped, W";
        for (int i = 0; i < c; i++) {
            s.text(hr, i, heads[i], ctx.styles.header);
        }
        s.sheet.getRow(hr).setHeightInPoints(58);
        int n = w.hours();
        int first = hr + 1;
        int last = first + n - 1;
        s.name("PVH_Month", first, cMonth, last, cMonth);
        s.name("PVH_Ghi", first, cGhi, last, cGhi);
        s.name("PVH_Air", first, cAir, last, cAir);
        s.name("PVH_Total", first, cTotal, last, cTotal);
        s.name("PVH_Effective", first, cEff, last, cEff);
        s.name("PVH_ModW", first, cModW, last, cModW);
        s.name("PVH_DcW", first, cDc, last, cDc);
        s.name("PVH_OutW", first, cOut, last, cOut);
        s.name("PVH_ClipW", first, cClip, last, cClip);
        if (pwm) {
            s.name("PVH_GivenUpW", first, cGiven, last, cGiven);
        }
        double vModule = PwmOperatingPoint.moduleVoltageV(sd.conditions().batteryOperatingV(), o.candidate().modulesPerString());
        for (int h = 0; h < n; h++) {
            int r = first + h;
            String R = String.valueOf(r + 1);
            java.util.function.IntFunction<String> at = col -> SheetWriter.col(col) + R;
            s.input(r, cHour, h, Styles.GENERAL);
            s.formula(r, cMonth, "MONTH(DATE(Year,1,1)+INT(" + at.apply(cHour) + "/24))", cal.month(h), Styles.GENERAL);
            s.input(r, cZen, sun.zenithDeg(h), Styles.D3);
            s.input(r, cAz, sun.azimuthDeg(h), Styles.D3);
            s.input(r, cGon, sun.extraterrestrialNormalWm2(h), Styles.D1);
            s.input(r, cGhi, w.ghiWm2(h), Styles.D1);
            s.input(r, cDni, w.dniWm2(h), Styles.D1);
            s.input(r, cDhi, w.dhiWm2(h), Styles.D1);
            s.input(r, cAir, w.airTempC(h), Styles.D1);
            String z = at.apply(cZen);
            String cos = at.apply(cCos);
            String up = z + "<90";
            s.formula(r, cCos, "MAX(-1,MIN(1,COS(RADIANS(" + z + "))*PvCosTilt+SIN(RADIANS(" + z + "))*SIN(RADIANS(PvTilt))*COS(RADIANS("
                    + at.apply(cAz) + "-PvAzimuth))))", poa.cosIncidence(h), Styles.D4);
            s.formula(r, cBeam, "IF(" + up + "," + at.apply(cDni) + "*MAX(0," + cos + "),0)", poa.beamWm2(h), Styles.D1);
            s.formula(r, cA, "IF(" + up + ",MIN(1," + at.apply(cDni) + "/" + at.apply(cGon) + "),0)", poa.anisotropyIndex(h), Styles.D4);
            s.formula(r, cRb, "IF(" + up + ",MAX(0," + cos + ")/MAX(COS(RADIANS(" + z + ")),PvCosZenithFloor),0)", poa.beamRatio(h),
                    Styles.D4);
            String a = at.apply(cA);
            s.formula(r, cSky, "IF(" + up + "," + at.apply(cDhi) + "*(" + a + "*" + at.apply(cRb) + "+(1-" + a + ")*PvIsoView),"
                    + at.apply(cDhi) + "*PvIsoView)", poa.skyDiffuseWm2(h), Styles.D1);
            s.formula(r, cGround, at.apply(cGhi) + "*PvAlbedo*(1-PvCosTilt)/2", poa.groundWm2(h), Styles.D1);
            s.formula(r, cTotal, at.apply(cBeam) + "+" + at.apply(cSky) + "+" + at.apply(cGround), poa.totalWm2(h), Styles.D1);
            s.formula(r, cIam, "IF(" + up + ",IF(" + cos + "<=0,0,MAX(0,MIN(1,1-PvIamB0*(1/" + cos + "-1)))),0)", poa.iam(h),
                    Styles.D4);
            s.formula(r, cEff, at.apply(cBeam) + "*" + at.apply(cIam) + "+" + at.apply(cSky) + "+" + at.apply(cGround),
                    poa.effectiveWm2(h), Styles.D1);
            String cell = at.apply(cCell);
            s.formula(r, cCell, at.apply(cAir) + "+(PvNoct-20)*" + at.apply(cTotal) + "/800", dc.cellTempC(h), Styles.D1);
            s.formula(r, cModW, "MAX(0,PvModW*" + at.apply(cEff) + "/1000*(1+PvGamma*(" + cell + "-25)))",
                    m.powerW(poa.effectiveWm2(h), dc.cellTempC(h)), Styles.D1);
            s.formula(r, cBefore, at.apply(cModW) + "*PvModules", dc.dcBeforeLossesW(h), Styles.D1);
            s.formula(r, cDc, at.apply(cBefore) + "*PvLossFactor", dc.dcW(h), Styles.D1);
            String drawnAtPoint = at.apply(cDc);
            if (pwm) {
                double tc = dc.cellTempC(h);
                String vmp = at.apply(cVmp);
                String voc = at.apply(cVoc);
                String isc = at.apply(cIsc);
                String imp = at.apply(cImp);
                s.formula(r, cVmp, "PvModVmp*(1+PvBetaVmp*(" + cell + "-25))", m.vmpAtCellV(tc), Styles.D2);
                s.formula(r, cVoc, "PvModVoc*(1+PvBetaVocModel*(" + cell + "-25))", m.vocAtCellV(tc), Styles.D2);
                s.formula(r, cIsc, "PvModIsc*1000/1000*(1+PvAlphaIsc*(" + cell + "-25))", m.iscAtA(1000.0, tc), Styles.D3);
                s.formula(r, cImp, "PvModImp*1000/1000*(1+PvAlphaIsc*(" + cell + "-25))", m.impAtA(1000.0, tc), Styles.D3);
                s.formula(r, cI, "IF(PvPwmModuleV<=" + vmp + "," + isc + "-(" + isc + "-" + imp + ")*PvPwmModuleV/" + vmp
                        + ",IF(PvPwmModuleV<" + voc + "," + imp + "*(" + voc + "-PvPwmModuleV)/(" + voc + "-" + vmp + "),0))",
                        PwmOperatingPoint.currentA(m, vModule, tc), Styles.D3);
                s.formula(r, cRatio, "MAX(0,MIN(1,PvPwmModuleV*" + at.apply(cI) + "/(" + vmp + "*" + imp + ")))",
                        PwmOperatingPoint.stringPowerRatio(m, o.candidate().modulesPerString(), sd.conditions().batteryOperatingV(), tc),
                        Styles.D4);
                s.formula(r, cGiven, at.apply(cDc) + "-" + at.apply(cDc) + "*" + at.apply(cRatio), out.pwmGivenUpW(h), Styles.D1);
                drawnAtPoint = at.apply(cDc) + "*" + at.apply(cRatio);
            }
            s.formula(r, cOut, "MIN(" + drawnAtPoint + "*PvCtlEff,PvMaxOutW)", out.outputW(h), Styles.D1);
            s.formula(r, cClip, "IF(" + drawnAtPoint + "*PvCtlEff>PvMaxOutW," + drawnAtPoint + "-PvMaxOutW/PvCtlEff,0)",
                    out.clippedDcW(h), Styles.D1);
        }
        s.sheet.createFreezePane(2, first);
        // A year of hours is for the screen: the print area is the first PRINTED_HOURS hours (the sheet says so).
        ctx.wb.setPrintArea(ctx.wb.getSheetIndex(s.sheet), 0, c - 1, 0, first + PRINTED_HOURS - 1);
        for (int i = 0; i < c; i++) {
            s.sheet.setColumnWidth(i, (i < 2 ? 7 : 12) * 256);
        }
    }
}
