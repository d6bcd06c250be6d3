package org.holdover.project;

import java.nio.file.InvalidPathException;
import java.time.DateTimeException;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.holdover.project.ProjectInput.AcWiring;
import org.holdover.project.ProjectInput.ApplianceInput;
import org.holdover.project.ProjectInput.Leg;
import org.holdover.project.ProjectInput.Mode;
import org.holdover.project.ProjectInput.MotorInput;

/**
 * Value checks on a project whose shape is right: ranges, required fields, consistency between fields,
 * referenced files. Every problem is reported with its location; none stops the others from being found.
 */
public final class ProjectValidator {

    /** Time-of-day window: "HH-HH", hours 0–24, e.g. "06-20" or "22-06" (wraps midnight). */
    public static final Pattern WINDOW = Pattern.compile("^\\s*(\\d{1,2})\\s*-\\s*(\\d{1,2})\\s*$");
    /** NEMA MG 1 code letters in use (I, O and Q are not used). */
    public static final String CODE_LETTERS = "ABCDEFGHJKLMNPRSTUV";

    /** Errors (stop the run) and warnings (shown, run continues). */
    public record Result(List<Problem> errors, List<Problem> warnings) {
    }

    private final Project project;
    private final List<Problem> errors = new ArrayList<>();
    private final List<Problem> warnings = new ArrayList<>();

    private ProjectValidator(Project project) {
        this.project = project;
    }

    public static Result validate(Project project) {
        ProjectValidator v = new ProjectValidator(project);
        v.run();
        return new Result(List.copyOf(v.errors), List.copyOf(v.warnings));
    }

    private void run() {
        ProjectInput p = project.input();
        String name = required("name", p.name());
        if (name != null && name.isBlank()) {
            error("name", "must not be empty", "give the project a name");
        } else if (name != null && name.length() > 200) {
            error("name", "is " + name.length() + " characters long", "at most 200 characters");
        }
        required("mode", p.mode());
        site(p.site());
        loads(p.loads());
        boolean split = p.site() != null && p.site().ac() != null && p.site().ac().wiring() == AcWiring.SPLIT_PHASE;
        if (p.loads() != null && p.loads().appliances() != null) {
            Set<String> names = new HashSet<>();
            for (int i = 0; i < p.loads().appliances().size(); i++) {
                ApplianceInput a = p.loads().appliances().get(i);
                String path = "loads.appliances[" + i + "]";
                if (a == null) {
                    error(path, "is empty", "give at least name and watts");
                    continue;
                }
                appliance(a, path, split);
                if (a.name() != null && !names.add(a.name().strip().toLowerCase(Locale.ROOT))) {
                    error(path + ".name", "\"" + a.name() + "\" is used by another appliance", "give each appliance its own name");
                }
            }
        }
        if (p.mode() == Mode.BACKUP) {
            if (p.backup() == null) {
                error("backup", "is missing; backup mode needs the outage to bridge", "add backup: { outageHours: 24 }");
            } else {
                Double h = required("backup.outageHours", p.backup().outageHours());
                range("backup.outageHours", h, 0.5, 8760, "h");
            }
            if (p.offGrid() != null) {
                warning("offGrid", "is ignored in backup mode", "remove it or set mode: off-grid");
            }
        }
        if (p.mode() == Mode.OFF_GRID) {
            if (p.offGrid() == null) {
                error("offGrid", "is missing; off-grid mode needs the days of autonomy", "add offGrid: { autonomyDays: 3 }");
            } else {
                Double d = required("offGrid.autonomyDays", p.offGrid().autonomyDays());
                range("offGrid.autonomyDays", d, 0.25, 30, "days");
            }
            if (p.backup() != null) {
                warning("backup", "is ignored in off-grid mode", "remove it or set mode: backup");
            }
        }
        if (p.battery() != null) {
            if (p.battery().chemistry() != null && !knownChemistry(p.battery().chemistry())) {
                error("battery.chemistry", "unknown chemistry \"" + p.battery().chemistry() + "\"",
                        "expected one of: " + String.join(", ", CHEMISTRY_WORDS));
            }
            rangeOpenLow("battery.maxDepthOfDischargePct", p.battery().maxDepthOfDischargePct(), 0, 100, "%");
            range("battery.endOfLifeCapacityPct", p.battery().endOfLifeCapacityPct(), 50, 100, "%");
        }
        if (p.catalog() != null && !p.catalog().equals("builtin")) {
            String why = unusable(p.catalog(), InputFiles.MAX_PROJECT_BYTES);
            if (why != null) {
                error("catalog", "cannot use \"" + p.catalog() + "\": " + why,
                        "write builtin, or the path of a catalog file relative to the project file");
            }
        }
        if (p.rules() != null) {
            range("rules.inverterMargin", p.rules().inverterMargin(), 1.0, 3.0, "");
            rangeOpenLow("rules.maxBatteryCurrentA", p.rules().maxBatteryCurrentA(), 0, 5000, "A");
            if (p.rules().motorsStartingTogether() != null) {
                int n = p.rules().motorsStartingTogether();
                int motors = countMotors(p);
                if (n < 1) {
                    error("rules.motorsStartingTogether", "must be at least 1, got " + n, "");
                } else if (n > Math.max(1, motors)) {
                    error("rules.motorsStartingTogether", "is " + n + " but the loads list " + motors + " motor(s)",
                            "at most the number of motors (counting quantity)");
                }
            }
            rangeOpenLow("rules.busVoltageV", p.rules().busVoltageV(), 0, 1500, "V");
            range("rules.maxUnmetPct", p.rules().maxUnmetPct(), 0, 50, "%");
            if (p.rules().alternatives() != null && (p.rules().alternatives() < 0 || p.rules().alternatives() > 20)) {
                error("rules.alternatives", "must be 0–20, got " + p.rules().alternatives(), "");
            }
            range("rules.loadGrowthPct", p.rules().loadGrowthPct(), 0, 200, "%");
            range("rules.poorerSolarPct", p.rules().poorerSolarPct(), 0, 90, "%");
            rangeOpenLow("rules.costHorizonYears", p.rules().costHorizonYears(), 0, 100, "years");
            range("rules.discountRatePct", p.rules().discountRatePct(), 0, 100, "%");
            if (p.rules().maxParallelStrings() != null && (p.rules().maxParallelStrings() < 1 || p.rules().maxParallelStrings() > 64)) {
                error("rules.maxParallelStrings", "must be 1–64, got " + p.rules().maxParallelStrings(), "");
            }
            Integer inv = p.rules().maxInvertersInParallel();
            if (inv != null && (inv < 1 || inv > org.holdover.catalog.CatalogReader.MAX_INVERTERS_IN_PARALLEL)) {
                error("rules.maxInvertersInParallel", "must be 1–" + org.holdover.catalog.CatalogReader.MAX_INVERTERS_IN_PARALLEL
                        + ", got " + inv, "1 keeps every system to a single inverter");
            }
        }
        if (p.wiring() != null) {
            rangeOpenLow("wiring.batteryToInverterM", p.wiring().batteryToInverterM(), 0, 100, "m");
            rangeOpenLow("wiring.batteryToControllerM", p.wiring().batteryToControllerM(), 0, 100, "m");
            rangeOpenLow("wiring.pvToControllerM", p.wiring().pvToControllerM(), 0, 500, "m");
            rangeOpenLow("wiring.busBarToInverterM", p.wiring().busBarToInverterM(), 0, 100, "m");
            rangeOpenLow("wiring.maxVoltageDropPct", p.wiring().maxVoltageDropPct(), 0, 10, "%");
            range("wiring.conductorAmbientC", p.wiring().conductorAmbientC(), -40, 70, "°C");
        }
        if (p.solar() != null) {
            solar(p.solar());
        }
        if (p.generator() != null) {
            ProjectInput.GeneratorInput g = p.generator();
            range("generator.startSocPct", g.startSocPct(), 0, 95, "%");
            range("generator.setPointSocPct", g.setPointSocPct(), 5, 100, "%");
            if (g.strategy() == ProjectInput.GeneratorStrategy.LOAD_FOLLOWING && g.setPointSocPct() != null) {
                error("generator.setPointSocPct", "is only for cycle charging", "remove it or set strategy: cycle-charging");
            }
            double start = g.startSocPct() != null ? g.startSocPct() : DEFAULT_GENERATOR_START_PCT;
            double set = g.setPointSocPct() != null ? g.setPointSocPct() : DEFAULT_GENERATOR_SET_POINT_PCT;
            if (g.strategy() != ProjectInput.GeneratorStrategy.LOAD_FOLLOWING && set <= start
                    && (g.startSocPct() != null || g.setPointSocPct() != null)) {
                error(g.setPointSocPct() != null ? "generator.setPointSocPct" : "generator.startSocPct",
                        "set point " + fmt(set) + " % is not above the start " + fmt(start) + " %",
                        "a set point above the state of charge at which the generator starts");
            }
            rangeOpenLow("generator.chargerAcW", g.chargerAcW(), 0, 1e6, "W");
            range("generator.fuelPricePerL", g.fuelPricePerL(), 0, 1000, "per litre");
        }
        if (p.notes() != null) {
            for (int i = 0; i < p.notes().size(); i++) {
                String n = p.notes().get(i);
                if (n != null && n.length() > 2000) {
                    error("notes[" + i + "]", "is " + n.length() + " characters long", "at most 2000 characters per note");
                }
            }
        }
    }

    /** State of charge at which the generator starts when not given, % (common practice, no source). */
    public static final double DEFAULT_GENERATOR_START_PCT = 30;
    /** Cycle-charging set point when not given, % (common practice, no source). */
    public static final double DEFAULT_GENERATOR_SET_POINT_PCT = 80;

    /** Chemistry words the project file accepts. */
    public static final List<String> CHEMISTRY_WORDS = List.of("lifepo4", "agm", "gel", "flooded");

    private static boolean knownChemistry(String s) {
        return CHEMISTRY_WORDS.contains(s.toLowerCase(Locale.ROOT).replace("-", "").replace("_", ""));
    }

    private static int countMotors(ProjectInput p) {
        int n = 0;
        if (p.loads() != null && p.loads().appliances() != null) {
            for (ApplianceInput a : p.loads().appliances()) {
                if (a != null && a.motor() != null) {
                    n += a.quantity() == null ? 1 : Math.max(0, a.quantity());
                }
            }
        }
        return n;
    }

    private void solar(ProjectInput.SolarInput s) {
        boolean monthly = s.monthlyGhiKwhM2Day() != null || s.monthlyAirTempC() != null;
        if (monthly && s.weatherFile() != null) {
            error("solar.weatherFile", "both monthly means and a weather file are given", "give one of them");
        }
        if (!monthly && s.weatherFile() == null) {
            error("solar", "gives no solar resource", "give monthlyGhiKwhM2Day and monthlyAirTempC (12 values each), or weatherFile");
        }
        if (monthly) {
            twelve("solar.monthlyGhiKwhM2Day", s.monthlyGhiKwhM2Day(), 0, 12, "kWh/m²/day");
            twelve("solar.monthlyAirTempC", s.monthlyAirTempC(), -60, 50, "°C");
        }
        if (s.weatherFile() != null) {
            String why = unusable(s.weatherFile(), InputFiles.MAX_DATA_BYTES);
            if (why != null) {
                error("solar.weatherFile", "cannot use \"" + s.weatherFile() + "\": " + why,
                        "give the path of an EPW or CSV weather file relative to the project file");
            }
        }
        range("solar.tiltDeg", s.tiltDeg(), 0, 90, "°");
        range("solar.azimuthDeg", s.azimuthDeg(), 0, 360, "°");
        range("solar.albedo", s.albedo(), 0, 1, "");
        if (s.controller() != null && !List.of("mppt", "pwm").contains(s.controller().toLowerCase(Locale.ROOT))) {
            error("solar.controller", "unknown controller type \"" + s.controller() + "\"", "mppt or pwm");
        }
        rangeOpenLow("solar.refillDays", s.refillDays(), 0, 30, "days");
        rangeOpenLow("solar.systemVoltageLimitV", s.systemVoltageLimitV(), 0, 1500, "V");
    }

    private void twelve(String path, List<Double> values, double lo, double hi, String unit) {
        if (values == null) {
            error(path, "is missing", "12 values, January first");
            return;
        }
        if (values.size() != 12) {
            error(path, "has " + values.size() + " values", "12 values, January first");
            return;
        }
        for (int i = 0; i < 12; i++) {
            Double v = values.get(i);
            if (v == null) {
                error(path + "[" + i + "]", "is empty", "a number");
            } else {
                range(path + "[" + i + "]", v, lo, hi, unit);
            }
        }
    }

    private void site(ProjectInput.SiteInput s) {
        if (s == null) {
            error("site", "is missing", "add site: with latitudeDeg, longitudeDeg and ac");
            return;
        }
        range("site.latitudeDeg", required("site.latitudeDeg", s.latitudeDeg()), -90, 90, "°");
        range("site.longitudeDeg", required("site.longitudeDeg", s.longitudeDeg()), -180, 180, "°");
        range("site.elevationM", s.elevationM(), -450, 9000, "m");
        range("site.utcOffsetHours", s.utcOffsetHours(), -12, 14, "h");
        if (s.timeZone() != null) {
            try {
                ZoneId.of(s.timeZone());
            } catch (DateTimeException e) {
                error("site.timeZone", "unknown time zone \"" + s.timeZone() + "\"", "an IANA name such as America/Denver or Europe/Lisbon");
            }
        }
        if (s.year() != null && (s.year() < 1950 || s.year() > 2100)) {
            error("site.year", "must be 1950–2100, got " + s.year(), "");
        }
        if (s.ac() == null) {
            error("site.ac", "is missing", "add ac: { voltsRms: 240, frequencyHz: 60, wiring: split-phase }");
        } else {
            Double v = required("site.ac.voltsRms", s.ac().voltsRms());
            range("site.ac.voltsRms", v, 100, 480, "V");
            Double f = required("site.ac.frequencyHz", s.ac().frequencyHz());
            if (f != null && f != 50.0 && f != 60.0) {
                error("site.ac.frequencyHz", "must be 50 or 60, got " + fmt(f), "");
            }
            if (s.ac().wiring() == AcWiring.SPLIT_PHASE && v != null && v != 240.0) {
                error("site.ac.voltsRms", "a split-phase service is 120/240 V: voltsRms must be 240, got " + fmt(v),
                        "write 240 (the voltage between the two legs)");
            }
        }
        if (s.batteryAmbientC() != null) {
            Double cold = s.batteryAmbientC().coldest();
            Double design = s.batteryAmbientC().design();
            range("site.batteryAmbientC.coldest", cold, -40, 60, "°C");
            range("site.batteryAmbientC.design", design, -40, 60, "°C");
            if (cold != null && design != null && cold > design) {
                error("site.batteryAmbientC.coldest", "is " + fmt(cold) + " °C, above the design " + fmt(design) + " °C",
                        "coldest must not exceed design");
            }
        }
        range("site.inverterAmbientC", s.inverterAmbientC(), -40, 60, "°C");
        range("site.recordLowC", s.recordLowC(), -70, 30, "°C");
        range("site.designHighC", s.designHighC(), -10, 60, "°C");
    }

    private void loads(ProjectInput.LoadsInput l) {
        if (l == null) {
            error("loads", "is missing", "add loads: with appliances (and optionally a profile)");
            return;
        }
        boolean noAppliances = l.appliances() == null || l.appliances().isEmpty();
        if (noAppliances && l.profile() == null) {
            error("loads", "lists no appliances and no profile", "give an appliance list, a profile file, or both");
        }
        if (l.profile() != null) {
            ProjectInput.ProfileInput pr = l.profile();
            String file = required("loads.profile.file", pr.file());
            if (file != null) {
                String why = unusable(file, InputFiles.MAX_DATA_BYTES);
                if (why != null) {
                    error("loads.profile.file", "cannot use \"" + file + "\": " + why,
                            "give the path of a CSV file relative to the project file");
                }
            }
            rangeOpenLow("loads.profile.powerFactor", pr.powerFactor(), 0, 1, "");
            if (pr.maxGapHours() != null && (pr.maxGapHours() < 0 || pr.maxGapHours() > 24)) {
                error("loads.profile.maxGapHours", "must be 0–24, got " + pr.maxGapHours(), "");
            }
            rangeOpenLow("loads.profile.scale", pr.scale(), 0, 10, "");
        }
    }

    private void appliance(ApplianceInput a, String path, boolean split) {
        String name = required(path + ".name", a.name());
        if (name != null && name.isBlank()) {
            error(path + ".name", "must not be empty", "");
        } else if (name != null && name.length() > 100) {
            error(path + ".name", "is " + name.length() + " characters long", "at most 100 characters");
        }
        if (a.quantity() != null && (a.quantity() < 1 || a.quantity() > 1000)) {
            error(path + ".quantity", "must be 1–1000, got " + a.quantity(), "");
        }
        Double w = required(path + ".watts", a.watts());
        if (w != null && w <= 0) {
            error(path + ".watts", "must be > 0 W, got " + fmt(w), "the running power of one unit in watts");
        } else if (w != null && w > 1e6) {
            error(path + ".watts", "is " + fmt(w) + " W, above the 1,000,000 W limit", "the running power of one unit in watts");
        }
        rangeOpenLow(path + ".powerFactor", a.powerFactor(), 0, 1, "");
        double windowHours = 24;
        if (a.hours() != null) {
            windowHours = windows(a.hours(), path + ".hours");
        }
        if (a.hoursPerDay() != null && a.dutyCycle() != null) {
            error(path + ".dutyCycle", "both hoursPerDay and dutyCycle are given", "give one of them");
        }
        if (a.hoursPerDay() != null) {
            double h = a.hoursPerDay();
            if (h < 0 || h > 24) {
                error(path + ".hoursPerDay", "must be 0–24 h, got " + fmt(h), "hours per day cannot exceed 24");
            } else if (h > windowHours + 1e-9) {
                error(path + ".hoursPerDay", fmt(h) + " h is longer than its time windows (" + fmt(windowHours) + " h)",
                        "widen hours: or lower hoursPerDay");
            }
        }
        rangeOpenLow(path + ".dutyCycle", a.dutyCycle(), 0, 1, "");
        if (a.months() != null) {
            Set<Integer> seen = new HashSet<>();
            for (int i = 0; i < a.months().size(); i++) {
                Integer m = a.months().get(i);
                if (m == null || m < 1 || m > 12) {
                    error(path + ".months[" + i + "]", "must be a month number 1–12, got " + m, "");
                } else if (!seen.add(m)) {
                    error(path + ".months[" + i + "]", "month " + m + " is listed twice", "");
                }
            }
            if (a.months().isEmpty()) {
                error(path + ".months", "is an empty list", "leave it out for all months");
            }
        }
        if (a.leg() != null && a.leg() != Leg.AUTO && !split) {
            error(path + ".leg", "is set but the service is not split-phase", "leave it out, or set site.ac.wiring: split-phase");
        }
        if (a.motor() != null) {
            motor(a.motor(), path + ".motor");
        }
    }

    private double windows(List<String> windows, String path) {
        boolean[] hours = new boolean[24];
        double total = 0;
        if (windows.isEmpty()) {
            error(path, "is an empty list", "leave it out for all day, or give windows such as \"06-20\"");
            return 24;
        }
        for (int i = 0; i < windows.size(); i++) {
            String w = windows.get(i);
            String p = path + "[" + i + "]";
            Matcher m = w == null ? null : WINDOW.matcher(w);
            if (m == null || !m.matches()) {
                error(p, "\"" + w + "\" is not a time window", "write start-end in whole hours, e.g. \"06-20\" or \"22-06\"");
                continue;
            }
            int start = Integer.parseInt(m.group(1));
            int end = Integer.parseInt(m.group(2));
            if (start > 23 || end > 24 || end == 0 && start == 0) {
                error(p, "\"" + w + "\" has hours out of range", "start 0–23, end 1–24, e.g. \"00-24\" for all day");
                continue;
            }
            if (start == end) {
                error(p, "\"" + w + "\" starts and ends at the same hour", "for all day write \"00-24\"");
                continue;
            }
            int h = start;
            boolean overlap = false;
            do {
                if (hours[h]) {
                    overlap = true;
                }
                hours[h] = true;
                total++;
                h = (h + 1) % 24;
            } while (h != end % 24);
            if (overlap) {
                error(p, "\"" + w + "\" overlaps another window of the same appliance", "windows must not overlap");
            }
        }
        return total;
    }

    private void motor(MotorInput m, String path) {
        boolean byLetter = m.horsepower() != null || m.codeLetter() != null;
        boolean byAmps = m.lockedRotorAmps() != null;
        boolean byMultiple = m.startMultiple() != null;
        if (!byLetter && !byAmps && !byMultiple) {
            error(path, "gives no starting data", "give lockedRotorAmps (nameplate), or horsepower with codeLetter, or startMultiple");
        }
        if (m.horsepower() != null && m.codeLetter() == null && !byAmps) {
            error(path + ".codeLetter", "is missing; horsepower alone does not give the starting demand",
                    "add the nameplate code letter (A–V), or lockedRotorAmps");
        }
        if (m.codeLetter() != null && m.horsepower() == null && !byAmps) {
            error(path + ".horsepower", "is missing; a code letter gives kVA per horsepower", "add horsepower");
        }
        rangeOpenLow(path + ".horsepower", m.horsepower(), 0, 100, "hp");
        if (m.codeLetter() != null) {
            String c = m.codeLetter().strip().toUpperCase(Locale.ROOT);
            if (c.length() != 1 || CODE_LETTERS.indexOf(c.charAt(0)) < 0) {
                error(path + ".codeLetter", "\"" + m.codeLetter() + "\" is not a NEMA code letter",
                        "one of A B C D E F G H J K L M N P R S T U V (I, O and Q are not used)");
            }
        }
        rangeOpenLow(path + ".lockedRotorAmps", m.lockedRotorAmps(), 0, 2000, "A");
        range(path + ".volts", m.volts(), 100, 480, "V");
        if (m.volts() != null && !byAmps) {
            warning(path + ".volts", "is only used with lockedRotorAmps", "");
        }
        range(path + ".startMultiple", m.startMultiple(), 1, 15, "×");
        rangeOpenLow(path + ".startSeconds", m.startSeconds(), 0, 60, "s");
        rangeOpenLow(path + ".starterFactor", m.starterFactor(), 0, 1, "");
        if (m.starterFactor() != null && (m.starter() == null || m.starter() == ProjectInput.Starter.DIRECT)) {
            error(path + ".starterFactor", "is set but the starter is direct-on-line", "set starter: soft or vfd, or remove starterFactor");
        }
        rangeOpenLow(path + ".lockedRotorPowerFactor", m.lockedRotorPowerFactor(), 0, 1, "");
    }

    /**
     * Why the file a field names cannot be used (missing, a folder or device, too large, unreadable, or not
     * a path at all, e.g. with a NUL character), or null when it can.
     */
    private String unusable(String written, long maxBytes) {
        try {
            InputFiles.checkReadable(project.resolve(written), project.displayOf(written), maxBytes);
            return null;
        } catch (InputException e) {
            return e.problems().get(0).message();
        } catch (InvalidPathException e) {
            return "not a usable path (" + e.getReason() + ")";
        }
    }

    private <T> T required(String path, T value) {
        if (value == null) {
            error(path, "is missing", "this field is required");
        }
        return value;
    }

    private void range(String path, Double v, double lo, double hi, String unit) {
        if (v != null && (v < lo || v > hi)) {
            error(path, "must be " + fmt(lo) + "–" + fmt(hi) + (unit.isEmpty() ? "" : " " + unit) + ", got " + fmt(v), "");
        }
    }

    private void rangeOpenLow(String path, Double v, double lo, double hi, String unit) {
        if (v != null && (v <= lo || v > hi)) {
            String u = unit.isEmpty() ? "" : " " + unit;
            error(path, "must be greater than " + fmt(lo) + u + " and at most " + fmt(hi) + u + ", got " + fmt(v), "");
        }
    }

    private void error(String path, String message, String expected) {
        errors.add(project.problemAt(path, message, expected));
    }

    private void warning(String path, String message, String expected) {
        warnings.add(project.problemAt(path, message, expected));
    }

    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return String.valueOf((long) v);
        }
        return String.valueOf(v);
    }
}
