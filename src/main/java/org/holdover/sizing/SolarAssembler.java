package org.holdover.sizing;

import java.io.StringReader;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.holdover.catalog.Catalog;
import org.holdover.project.InputException;
import org.holdover.project.InputFiles;
import org.holdover.project.Problem;
import org.holdover.project.Project;
import org.holdover.project.ProjectInput;
import org.holdover.pv.ControllerType;
import org.holdover.pv.DcLosses;
import org.holdover.pv.Nec690;
import org.holdover.pv.StringDesignConditions;
import org.holdover.solar.ClearnessSequence;
import org.holdover.solar.EpwFile;
import org.holdover.solar.EpwReader;
import org.holdover.solar.HourCalendar;
import org.holdover.solar.IncidenceAngleModifier;
import org.holdover.solar.MonthlyClimate;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.Refraction;
import org.holdover.solar.Site;
import org.holdover.solar.SkyModel;
import org.holdover.solar.SunPath;
import org.holdover.solar.SunPositions;
import org.holdover.solar.SurfaceOrientation;
import org.holdover.solar.SyntheticYear;
import org.holdover.solar.WeatherCsvReader;
import org.holdover.solar.WeatherYear;

/**
 * Turns a project's {@code solar:} section into a {@link SolarSetup}: reads the weather file (EPW or our CSV)
 * or builds the synthetic year from the monthly means, computes the sun path for the site and year, and applies
 * the defaults, each recorded as an {@link Assumption} with its source. User mistakes are
 * {@link InputException}s located at the project field (or, for a weather file, at its line).
 */
public final class SolarAssembler {

    /** Backup: days to refill the bank while carrying the loads when the project does not say (common practice, no source). */
    public static final double DEFAULT_REFILL_DAYS = 3.0;
    /** Most identical controllers in parallel considered (common practice, no source: beyond this, a larger unit). */
    public static final int DEFAULT_MAX_CONTROLLERS = 4;
    /** Tilts searched when the project gives none: 0° to 90° in 1° steps (our choice). */
    public static final double TILT_STEP_DEG = 1.0;
    /** Synthetic year with a seed: spread of daily clearness relative to the month's mean (our choice, no source). */
    public static final double CLEARNESS_SPREAD = 0.25;
    /** Synthetic year with a seed: day-to-day correlation of clearness (from memory, unconfirmed). */
    public static final double CLEARNESS_LAG1 = 0.3;
    /** Largest difference between the weather file's location and the site accepted without a warning, degrees. */
    public static final double LOCATION_WARNING_DEG = 1.0;

    static final String PRACTICE = ProjectAssembler.PRACTICE;

    private SolarAssembler() {
    }

    /**
     * @param project     the validated project (its {@code solar} section must be present)
     * @param year        the calendar year of the hourly series
     * @param catalog     the catalog (checked for PV modules and controllers)
     * @param assumptions where to record the defaults used
     * @param warnings    where to add warnings
     */
    public static SolarSetup assemble(Project project, int year, Catalog catalog, List<Assumption> assumptions,
                                      List<Problem> warnings) throws InputException {
        ProjectInput p = project.input();
        ProjectInput.SolarInput s = p.solar();
        ProjectInput.SiteInput site = p.site();
        List<Problem> errors = new ArrayList<>();
        if (site.recordLowC() == null) {
            errors.add(project.problemAt("site.recordLowC", "is missing; the PV string voltage check (NEC 690.7) needs it",
                    "give the record low air temperature of the site, °C"));
        }
        if (site.designHighC() == null) {
            errors.add(project.problemAt("site.designHighC", "is missing; the hot maximum-power voltage check needs it",
                    "give the design high air temperature of the site, °C"));
        }
        if (site.recordLowC() != null && site.designHighC() != null && site.designHighC() <= site.recordLowC()) {
            errors.add(project.problemAt("site.designHighC", "is " + fmt(site.designHighC()) + " °C, not above the record low "
                    + fmt(site.recordLowC()) + " °C", "the design high must be warmer than the record low"));
        }
        if (catalog.pvModules().isEmpty() || catalog.chargeControllers().isEmpty()) {
            errors.add(project.problemAt("solar", "the catalog \"" + catalog.name() + "\" lists "
                    + (catalog.pvModules().isEmpty() ? "no PV modules (pvModules)" : "no charge controllers (chargeControllers)"),
                    "add them to the catalog, or remove the solar section"));
        }
        if (!errors.isEmpty()) {
            throw new InputException(errors);
        }

        double elevation = site.elevationM() != null ? site.elevationM() : 0.0;
        if (site.elevationM() == null) {
            assumptions.add(new Assumption("Site elevation (sun position refraction)", 0, "m", "default", PRACTICE));
        }
        ZoneId zone = zone(site);
        Site solarSite = Site.inZone(site.latitudeDeg(), site.longitudeDeg(), elevation, zone, year);
        assumptions.add(new Assumption("Standard-time offset of the hourly series from UTC", solarSite.utcOffsetHours(), "h",
                site.timeZone() != null || site.utcOffsetHours() != null ? "project" : "default",
                site.timeZone() != null ? "standard offset of " + site.timeZone() + " in " + year + " (no daylight saving)"
                        : site.utcOffsetHours() != null ? "project" : "longitude ÷ 15, rounded"));
        double deltaT = SunPositions.estimateDeltaTS(LocalDate.of(year, 7, 1));
        assumptions.add(new Assumption("Sun position: ΔT = TT − UT", deltaT, "s", "default",
                "NREL SPA (Reda and Andreas 2004) by the solarpositioning library; ΔT by the Espenak and Meeus fits"));
        int hours = HourCalendar.ofYear(year).hours();

        WeatherYear weather;
        SunPath sunPath;
        String resource;
        double[] ghi = null;
        double[] temp = null;
        if (s.weatherFile() != null) {
            String display = project.displayOf(s.weatherFile());
            Path file = project.resolve(s.weatherFile());
            String text = InputFiles.readText(file, display, InputFiles.MAX_DATA_BYTES);
            boolean epw = s.weatherFile().toLowerCase(Locale.ROOT).endsWith(".epw")
                    || text.stripLeading().regionMatches(true, 0, "LOCATION", 0, 8);
            if (epw) {
                EpwFile f = EpwReader.read(new StringReader(text), display);
                weather = f.weather();
                var loc = f.location();
                if (Math.abs(loc.utcOffsetHours() - solarSite.utcOffsetHours()) > 1e-9) {
                    throw InputException.at(org.holdover.project.SourceLocation.of(display, 1), "LOCATION",
                            "the file's hours are in UTC" + offset(loc.utcOffsetHours()) + " standard time but the site's are in UTC"
                                    + offset(solarSite.utcOffsetHours()),
                            "use a weather file for the site's time zone, or correct site.timeZone");
                }
                if (Math.abs(loc.latitudeDeg() - solarSite.latitudeDeg()) > LOCATION_WARNING_DEG
                        || Math.abs(loc.longitudeDeg() - solarSite.longitudeDeg()) > LOCATION_WARNING_DEG) {
                    warnings.add(project.problemAt("solar.weatherFile", String.format(Locale.ROOT,
                            "the weather file is for %.2f°, %.2f° (%s), more than %.0f° from the site", loc.latitudeDeg(),
                            loc.longitudeDeg(), loc.city(), LOCATION_WARNING_DEG), "use weather recorded or modelled near the site"));
                }
                resource = "hourly weather file " + display + " (EPW, " + loc.city() + ")";
            } else {
                weather = WeatherCsvReader.read(new StringReader(text), display);
                resource = "hourly weather file " + display + " (CSV)";
            }
            if (weather.hours() != hours) {
                throw new InputException(project.problemAt("solar.weatherFile", "has " + weather.hours()
                        + " hourly rows but the year " + year + " has " + hours + " hours",
                        hours == HourCalendar.HOURS_LEAP_YEAR ? "set site.year to a common year, or give 8784 rows"
                                : "set site.year to a leap year, or give 8760 rows"));
            }
            double meanC = mean(weather.airTempC());
            sunPath = SunPath.compute(solarSite, year, deltaT, Refraction.standardAtmosphere(elevation, meanC));
        } else {
            ghi = toArray(s.monthlyGhiKwhM2Day());
            temp = toArray(s.monthlyAirTempC());
            MonthlyClimate climate = MonthlyClimate.withDefaultTempRange(ghi, temp);
            double[] k = SyntheticYear.monthlyClearness(solarSite, year, climate);
            List<Problem> bad = new ArrayList<>();
            for (int m = 0; m < 12; m++) {
                if (Double.isNaN(k[m]) && ghi[m] > 0) {
                    bad.add(project.problemAt("solar.monthlyGhiKwhM2Day[" + m + "]", "is " + fmt(ghi[m])
                            + " kWh/m²/day but the sun does not rise at the site in that month", "0 in a month of polar night"));
                } else if (k[m] > SyntheticYear.MAX_MONTHLY_CLEARNESS) {
                    bad.add(project.problemAt("solar.monthlyGhiKwhM2Day[" + m + "]", String.format(Locale.ROOT,
                            "is %s kWh/m²/day: %.0f %% of what reaches the top of the atmosphere, more than clear skies let through",
                            fmt(ghi[m]), 100 * k[m]), "check the units (kWh per m² per day, on the horizontal) and the month order"));
                }
            }
            if (!bad.isEmpty()) {
                throw new InputException(bad);
            }
            double meanC = 0;
            for (double t : temp) {
                meanC += t / 12.0;
            }
            sunPath = SunPath.compute(solarSite, year, deltaT, Refraction.standardAtmosphere(elevation, meanC));
            ClearnessSequence seq = s.clearnessSeed() == null ? ClearnessSequence.uniform()
                    : new ClearnessSequence.SeededRandom(s.clearnessSeed(), CLEARNESS_SPREAD, CLEARNESS_LAG1);
            weather = SyntheticYear.generate(sunPath, climate, seq).weather();
            resource = "synthetic year from the project's monthly means (Collares-Pereira and Rabl 1979 hourly shares, "
                    + "Erbs et al. 1982 diffuse fraction), "
                    + (s.clearnessSeed() == null ? "every day of a month alike" : "day-to-day clearness seeded with " + s.clearnessSeed());
            assumptions.add(new Assumption("Synthetic year: daily air-temperature swing", MonthlyClimate.DEFAULT_DAILY_TEMP_RANGE_C,
                    "°C", "default", PRACTICE + "; cosine swing peaking at 15:00"));
            if (s.clearnessSeed() != null) {
                assumptions.add(new Assumption("Synthetic year: spread of daily clearness (fraction of the month's mean)",
                        CLEARNESS_SPREAD, "", "default", "our choice, no source"));
                assumptions.add(new Assumption("Synthetic year: day-to-day correlation of clearness", CLEARNESS_LAG1, "",
                        "default", "from memory, unconfirmed"));
            }
        }

        double albedo = s.albedo() != null ? s.albedo() : PoaSettings.DEFAULT_ALBEDO;
        assumptions.add(new Assumption("Ground reflectance (albedo)", albedo, "", given(s.albedo()),
                s.albedo() != null ? "project" : PRACTICE + " (ground without snow; fresh snow 0.7 or more)"));
        assumptions.add(new Assumption("Sky diffuse on the tilted plane: Hay and Davies (1 = used)", 1, "", "default",
                "J. E. Hay, J. A. Davies (1980); Duffie and Beckman §2.16"));
        assumptions.add(new Assumption("Reflection loss at the module glass: ASHRAE coefficient b0", IncidenceAngleModifier.DEFAULT_B0,
                "", "default", "IAM = 1 − b0 (1/cos θ − 1), Souka and Safwat (1966), ASHRAE 93-77; b0 = 0.05: " + PRACTICE));
        double azimuth = s.azimuthDeg() != null ? (s.azimuthDeg() % 360.0) : (solarSite.latitudeDeg() > 0 ? 180.0 : 0.0);
        assumptions.add(new Assumption("Array azimuth, clockwise from north", azimuth, "°", given(s.azimuthDeg()),
                s.azimuthDeg() != null ? "project" : "facing the equator"));
        double[] tilts;
        if (s.tiltDeg() != null) {
            tilts = new double[] {s.tiltDeg()};
            assumptions.add(new Assumption("Array tilt from horizontal", s.tiltDeg(), "°", "project", "project"));
        } else {
            int n = (int) Math.round(90.0 / TILT_STEP_DEG) + 1;
            tilts = new double[n];
            for (int i = 0; i < n; i++) {
                tilts[i] = i * TILT_STEP_DEG;
            }
            assumptions.add(new Assumption("Array tilt: searched from 0° to 90° to the nearest", TILT_STEP_DEG, "°", "default",
                    "the tilt that needs the smallest array for the month that decides (ties to the lower tilt);"
                            + " every 5° first, then every 1° around the best: our choice"));
        }
        PoaSettings settings = new PoaSettings(new SurfaceOrientation(tilts[0], azimuth), SkyModel.HAY_DAVIES, albedo,
                IncidenceAngleModifier.ashraeDefault());
        DcLosses losses = DcLosses.defaults();
        for (DcLosses.LossItem item : losses.items()) {
            assumptions.add(new Assumption("PV DC loss: " + item.name(), item.fraction(), "", "default", item.source()));
        }
        assumptions.add(new Assumption("PV cells: NOCT model; irradiance for the hot-cell voltage check",
                StringDesignConditions.DEFAULT_DESIGN_IRRADIANCE_W_M2, "W/m²", "default",
                "T_cell = T_air + (NOCT − 20 °C) × G ÷ 800 W/m²; 1000 W/m²: " + PRACTICE));
        double systemLimitV = s.systemVoltageLimitV() != null ? s.systemVoltageLimitV() : Nec690.DWELLING_LIMIT_V;
        assumptions.add(new Assumption(s.systemVoltageLimitV() != null ? "Maximum PV system voltage"
                : "Maximum PV system voltage (NEC 690.7, one- and two-family dwellings)", systemLimitV, "V", given(s.systemVoltageLimitV()),
                s.systemVoltageLimitV() != null ? "project"
                        : "NFPA 70 (NEC) 690.7: 600 V for dwellings, 1000 V for other buildings; the stricter limit is applied"));
        assumptions.add(new Assumption("Identical charge controllers in parallel, at most", DEFAULT_MAX_CONTROLLERS, "", "default",
                PRACTICE));
        ControllerType type = s.controller() == null ? null
                : s.controller().equalsIgnoreCase("pwm") ? ControllerType.PWM : ControllerType.MPPT;
        double refill = s.refillDays() != null ? s.refillDays() : DEFAULT_REFILL_DAYS;
        if (p.mode() == ProjectInput.Mode.BACKUP) {
            assumptions.add(new Assumption("Backup: days to refill what the hardest outage drew, while carrying the loads",
                    refill, "days", given(s.refillDays()), s.refillDays() != null ? "project" : PRACTICE));
        } else if (s.refillDays() != null) {
            warnings.add(project.problemAt("solar.refillDays", "is only used in backup mode", "remove it"));
        }
        return new SolarSetup(solarSite, year, weather, sunPath, resource, ghi, temp, s.tiltDeg(), tilts, settings, losses,
                type, refill, site.recordLowC(), site.designHighC(), StringDesignConditions.DEFAULT_DESIGN_IRRADIANCE_W_M2,
                systemLimitV, DEFAULT_MAX_CONTROLLERS);
    }

    /** The zone the project's clock times are in: the IANA zone, else the fixed offset, else longitude ÷ 15. */
    static ZoneId zone(ProjectInput.SiteInput site) {
        if (site.timeZone() != null) {
            return ZoneId.of(site.timeZone());
        }
        if (site.utcOffsetHours() != null) {
            return ZoneOffset.ofTotalSeconds((int) Math.round(site.utcOffsetHours() * 3600));
        }
        return ZoneOffset.ofHours((int) Math.round(site.longitudeDeg() / 15.0));
    }

    private static String offset(double h) {
        return (h >= 0 ? "+" : "−") + fmt(Math.abs(h));
    }

    private static double mean(double[] a) {
        double s = 0;
        for (double v : a) {
            s += v;
        }
        return s / a.length;
    }

    private static double[] toArray(List<Double> values) {
        double[] a = new double[values.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = values.get(i);
        }
        return a;
    }

    private static String given(Object o) {
        return o != null ? "project" : "default";
    }

    private static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }
}
