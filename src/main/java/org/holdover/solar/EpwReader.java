package org.holdover.solar;

import java.io.Reader;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.holdover.project.InputException;
import org.holdover.solar.WeatherText.Fields;
import org.holdover.solar.WeatherText.Problems;

/**
 * Reads hourly weather from an EPW file, the open comma-separated text format documented in the
 * EnergyPlus "Auxiliary Programs" manual (chapter "Weather Converter Program", EPW data dictionary).
 *
 * <p>What is read and checked:
 * <ul>
 *   <li>8 header lines; line 1 must be LOCATION (city, region, country, source, WMO, latitude,
 *       longitude, time zone, elevation), line 8 DATA PERIODS with 1 record per hour.</li>
 *   <li>Then one row per hour, 8,760 rows (8,784 when 29 February is present), in order; field 4 is
 *       the hour 1–24, hour 1 being 00:00–01:00 local standard time.</li>
 *   <li>Field 7 dry-bulb temperature °C (missing when ≥ 99.9, accepted range −70…70); field 14
 *       global horizontal, 15 direct normal, 16 diffuse horizontal radiation, Wh/m² over the
 *       preceding hour (missing when ≥ 9999; must not be negative). Fields are counted from 1.</li>
 * </ul>
 * Missing values are errors: this reader does not fill gaps. The text must be UTF-8 (plain ASCII is
 * UTF-8). Every problem (up to {@value WeatherText#MAX_PROBLEMS}) is reported with its line, column
 * and field.
 */
public final class EpwReader {

    static final int HEADER_LINES = 8;
    static final int FIELD_MONTH = 1;
    static final int FIELD_DAY = 2;
    static final int FIELD_HOUR = 3;
    static final int FIELD_DRY_BULB = 6;
    static final int FIELD_GHI = 13;
    static final int FIELD_DNI = 14;
    static final int FIELD_DHI = 15;
    /** A full EPW data row has 35 fields; we need the first 16. */
    static final int MIN_FIELDS = 16;
    static final double MISSING_DRY_BULB = 99.9;
    static final double MISSING_RADIATION = 9999;

    private EpwReader() {
    }

    /** Reads an EPW file; the path as given is the name used in messages. */
    public static EpwFile read(Path path) throws InputException {
        Objects.requireNonNull(path, "path");
        String name = path.toString();
        return parse(WeatherText.readLines(path, name), name);
    }

    /**
     * Reads EPW text from a reader.
     *
     * @param reader      the text (already decoded; the caller chooses the charset, UTF-8 expected)
     * @param displayName the file name to use in messages
     */
    public static EpwFile read(Reader reader, String displayName) throws InputException {
        Objects.requireNonNull(reader, "reader");
        Objects.requireNonNull(displayName, "displayName");
        return parse(WeatherText.readLines(reader, displayName), displayName);
    }

    private static EpwFile parse(List<String> lines, String file) throws InputException {
        Problems p = new Problems(file);
        if (lines.size() < HEADER_LINES) {
            p.add(Math.max(1, lines.size()), 0, "", "the file is cut short: " + lines.size()
                    + " lines, not even the 8 header lines", "8 header lines, then 8760 or 8784 hourly rows");
            p.throwIfAny();
        }
        EpwLocation location = parseLocation(lines.get(0), file, p);
        parseDataPeriods(lines.get(HEADER_LINES - 1), p);
        p.throwIfAny();

        int last = lines.size();
        while (last > HEADER_LINES && lines.get(last - 1).isBlank()) {
            last--;
        }
        int rows = last - HEADER_LINES;
        boolean countOk = rows == HourCalendar.HOURS_COMMON_YEAR || rows == HourCalendar.HOURS_LEAP_YEAR;
        if (!countOk) {
            p.add(Math.max(last, 1), 0, "", (rows < HourCalendar.HOURS_COMMON_YEAR ? "the file is cut short: " : "")
                    + rows + " hourly rows", "8760 hourly rows (8784 with 29 February)");
        }
        HourCalendar cal = HourCalendar.ofHours(rows == HourCalendar.HOURS_LEAP_YEAR
                ? HourCalendar.HOURS_LEAP_YEAR : HourCalendar.HOURS_COMMON_YEAR);
        int n = Math.min(rows, cal.hours());
        double[] ghi = new double[cal.hours()];
        double[] dni = new double[cal.hours()];
        double[] dhi = new double[cal.hours()];
        double[] temp = new double[cal.hours()];
        for (int i = 0; i < n && !p.full(); i++) {
            int lineNo = HEADER_LINES + i + 1;
            String line = lines.get(HEADER_LINES + i);
            Fields f = Fields.split(line);
            if (f.size() < MIN_FIELDS) {
                p.add(lineNo, 0, "", "the row has " + f.size() + " comma-separated fields",
                        "35 fields per hourly row (at least the first 16)");
                continue;
            }
            int day = cal.dayIndexOfHour(i);
            int month0 = cal.monthOfDay(day);
            int dayOfMonth = day - cal.firstDayOf(month0) + 1;
            int hourOfDay = i % 24 + 1;
            checkInteger(p, f, lineNo, FIELD_MONTH, "month", month0 + 1);
            checkInteger(p, f, lineNo, FIELD_DAY, "day", dayOfMonth);
            checkInteger(p, f, lineNo, FIELD_HOUR, "hour", hourOfDay);
            temp[i] = number(p, f, lineNo, FIELD_DRY_BULB, "dry bulb temperature (C)", MISSING_DRY_BULB, -70, 70);
            ghi[i] = number(p, f, lineNo, FIELD_GHI, "global horizontal radiation (Wh/m2)", MISSING_RADIATION, 0,
                    WeatherYear.MAX_IRRADIANCE_W_M2);
            dni[i] = number(p, f, lineNo, FIELD_DNI, "direct normal radiation (Wh/m2)", MISSING_RADIATION, 0,
                    WeatherYear.MAX_IRRADIANCE_W_M2);
            dhi[i] = number(p, f, lineNo, FIELD_DHI, "diffuse horizontal radiation (Wh/m2)", MISSING_RADIATION, 0,
                    WeatherYear.MAX_IRRADIANCE_W_M2);
        }
        p.throwIfAny();
        return new EpwFile(location, new WeatherYear(file, ghi, dni, dhi, temp));
    }

    private static EpwLocation parseLocation(String line, String file, Problems p) {
        Fields f = Fields.split(line);
        if (!f.value(0).equalsIgnoreCase("LOCATION")) {
            p.add(1, 1, "LOCATION", "the first line starts with " + WeatherText.quote(f.value(0)),
                    "an EPW file starts with a LOCATION line");
            return null;
        }
        if (f.size() < 10) {
            p.add(1, 0, "LOCATION", "the LOCATION line has " + f.size() + " fields",
                    "10 fields: LOCATION, city, region, country, source, WMO, latitude, longitude, time zone, elevation");
            return null;
        }
        double lat = headerNumber(p, f, 6, "LOCATION latitude", -90, 90);
        double lon = headerNumber(p, f, 7, "LOCATION longitude", -180, 180);
        double tz = headerNumber(p, f, 8, "LOCATION time zone", -12, 14);
        double elev = headerNumber(p, f, 9, "LOCATION elevation", -500, 9000);
        return new EpwLocation(f.value(1), f.value(2), f.value(3), lat, lon, tz, elev);
    }

    private static void parseDataPeriods(String line, Problems p) {
        Fields f = Fields.split(line);
        if (!f.value(0).equalsIgnoreCase("DATA PERIODS")) {
            p.add(HEADER_LINES, 1, "DATA PERIODS", "line 8 starts with " + WeatherText.quote(f.value(0)),
                    "line 8 of an EPW file is DATA PERIODS");
            return;
        }
        if (f.size() < 3) {
            p.add(HEADER_LINES, 0, "DATA PERIODS", "the DATA PERIODS line has " + f.size() + " fields",
                    "at least: DATA PERIODS, number of periods, records per hour");
            return;
        }
        String perHour = f.value(2);
        if (!perHour.equals("1")) {
            p.add(HEADER_LINES, f.column(2), "DATA PERIODS records per hour", "records per hour is "
                    + WeatherText.quote(perHour), "1 (hourly data)");
        }
    }

    private static double headerNumber(Problems p, Fields f, int i, String field, double lo, double hi) {
        Double v = WeatherText.parseDecimal(f.value(i));
        if (v == null) {
            p.add(1, f.column(i), field, "not a number: " + WeatherText.quote(f.value(i)), "a decimal number");
            return 0;
        }
        if (v < lo || v > hi) {
            p.add(1, f.column(i), field, "out of range: " + f.value(i), "a value from " + fmt(lo) + " to " + fmt(hi));
            return 0;
        }
        return v;
    }

    private static void checkInteger(Problems p, Fields f, int line, int i, String field, int expected) {
        Double v = WeatherText.parseDecimal(f.value(i));
        if (v == null || v != expected) {
            p.add(line, f.column(i), field, "got " + WeatherText.quote(f.value(i)),
                    expected + " (rows must run hour by hour from 1 January, hour 1 to 24)");
        }
    }

    private static double number(Problems p, Fields f, int line, int i, String field, double missing, double lo,
            double hi) {
        String s = f.value(i);
        Double v = WeatherText.parseDecimal(s);
        if (v == null) {
            p.add(line, f.column(i), field, "not a number: " + WeatherText.quote(s), "a decimal number");
            return 0;
        }
        if (v >= missing) {
            p.add(line, f.column(i), field, "missing-value code " + s,
                    "a measured value (this reader does not fill gaps; fill them before use)");
            return 0;
        }
        if (v < lo || v > hi) {
            p.add(line, f.column(i), field, (v < 0 && lo == 0 ? "negative: " : "out of range: ") + s,
                    "a value from " + fmt(lo) + " to " + fmt(hi));
            return 0;
        }
        return v;
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
