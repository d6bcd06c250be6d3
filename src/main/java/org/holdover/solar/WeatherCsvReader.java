package org.holdover.solar;

import java.io.Reader;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.holdover.project.InputException;
import org.holdover.solar.WeatherText.Fields;
import org.holdover.solar.WeatherText.Problems;

/**
 * Reads hourly weather from our own plain CSV format.
 *
 * <h2>Format</h2>
 * <ul>
 *   <li>UTF-8 text. Lines starting with {@code #} are comments; blank lines are ignored.</li>
 *   <li>The first other line is the header; it names exactly these five columns, in any order:
 *       <pre>hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c</pre></li>
 *   <li>Then one row per hour, 8,760 rows (8,784 in a leap year), comma-separated, numbers with a
 *       decimal point and no thousands separators:
 *     <ul>
 *       <li>{@code hour}: 0, 1, 2, … in order; hour h covers [h, h + 1) hours after 1 January 00:00
 *           local standard time (no daylight saving);</li>
 *       <li>{@code ghi_w_m2}, {@code dni_w_m2}, {@code dhi_w_m2}: global horizontal, direct normal
 *           and diffuse horizontal irradiance, mean over the hour, W/m², 0 to 2000;</li>
 *       <li>{@code air_c}: air (dry-bulb) temperature, mean over the hour, °C, −90 to 70.</li>
 *     </ul></li>
 *   <li>No missing values: every cell holds a number.</li>
 * </ul>
 * Example:
 * <pre>
 * # demo data: a site's hourly weather, local standard time UTC-7
 * hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c
 * 0,0,0,0,-3.2
 * 1,0,0,0,-3.6
 * </pre>
 */
public final class WeatherCsvReader {

    /** The header this reader expects (any column order). */
    public static final String HEADER = "hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c";

    static final String HOUR = "hour";
    static final String GHI = "ghi_w_m2";
    static final String DNI = "dni_w_m2";
    static final String DHI = "dhi_w_m2";
    static final String AIR = "air_c";
    private static final List<String> COLUMNS = List.of(HOUR, GHI, DNI, DHI, AIR);

    private WeatherCsvReader() {
    }

    /** Reads a weather CSV file; the path as given is the name used in messages. */
    public static WeatherYear read(Path path) throws InputException {
        Objects.requireNonNull(path, "path");
        String name = path.toString();
        return parse(WeatherText.readLines(path, name), name);
    }

    /**
     * Reads weather CSV text from a reader.
     *
     * @param reader      the text (already decoded; UTF-8 expected)
     * @param displayName the file name to use in messages
     */
    public static WeatherYear read(Reader reader, String displayName) throws InputException {
        Objects.requireNonNull(reader, "reader");
        Objects.requireNonNull(displayName, "displayName");
        return parse(WeatherText.readLines(reader, displayName), displayName);
    }

    private static boolean skip(String line) {
        String t = line.strip();
        return t.isEmpty() || t.startsWith("#");
    }

    private static WeatherYear parse(List<String> lines, String file) throws InputException {
        Problems p = new Problems(file);
        int i = 0;
        while (i < lines.size() && skip(lines.get(i))) {
            i++;
        }
        if (i == lines.size()) {
            p.add(Math.max(1, lines.size()), 0, "", "the file has no header and no data",
                    "a header line " + HEADER + " and 8760 or 8784 hourly rows");
            p.throwIfAny();
        }
        int headerLine = i + 1;
        Fields header = Fields.split(lines.get(i));
        Map<String, Integer> index = new HashMap<>();
        for (int c = 0; c < header.size(); c++) {
            String name = header.value(c);
            if (!COLUMNS.contains(name)) {
                p.add(headerLine, header.column(c), name, "unknown column " + WeatherText.quote(name),
                        "the columns " + HEADER + " (any order)");
            } else if (index.containsKey(name)) {
                p.add(headerLine, header.column(c), name, "column " + name + " appears twice", "each column once");
            } else {
                index.put(name, c);
            }
        }
        for (String c : COLUMNS) {
            if (!index.containsKey(c)) {
                p.add(headerLine, 0, c, "column " + c + " is missing from the header", "the columns " + HEADER);
            }
        }
        p.throwIfAny();

        double[] ghi = new double[HourCalendar.HOURS_LEAP_YEAR];
        double[] dni = new double[HourCalendar.HOURS_LEAP_YEAR];
        double[] dhi = new double[HourCalendar.HOURS_LEAP_YEAR];
        double[] air = new double[HourCalendar.HOURS_LEAP_YEAR];
        int rows = 0;
        int lastLine = headerLine;
        for (int li = i + 1; li < lines.size() && !p.full(); li++) {
            String line = lines.get(li);
            if (skip(line)) {
                continue;
            }
            int lineNo = li + 1;
            lastLine = lineNo;
            Fields f = Fields.split(line);
            if (f.size() != header.size()) {
                p.add(lineNo, 0, "", "the row has " + f.size() + " fields", header.size() + " fields, as in the header");
                rows++;
                continue;
            }
            int hour = rows;
            if (hour >= HourCalendar.HOURS_LEAP_YEAR) {
                rows++;
                continue;
            }
            int hc = index.get(HOUR);
            Double h = WeatherText.parseDecimal(f.value(hc));
            if (h == null || h != hour) {
                p.add(lineNo, f.column(hc), HOUR, "got " + WeatherText.quote(f.value(hc)),
                        hour + " (hours run 0, 1, 2, … in order)");
            }
            ghi[hour] = value(p, f, lineNo, index.get(GHI), GHI, 0, WeatherYear.MAX_IRRADIANCE_W_M2);
            dni[hour] = value(p, f, lineNo, index.get(DNI), DNI, 0, WeatherYear.MAX_IRRADIANCE_W_M2);
            dhi[hour] = value(p, f, lineNo, index.get(DHI), DHI, 0, WeatherYear.MAX_IRRADIANCE_W_M2);
            air[hour] = value(p, f, lineNo, index.get(AIR), AIR, -90, 70);
            rows++;
        }
        if (!p.full() && rows != HourCalendar.HOURS_COMMON_YEAR && rows != HourCalendar.HOURS_LEAP_YEAR) {
            p.add(lastLine, 0, "", (rows < HourCalendar.HOURS_COMMON_YEAR ? "the file is cut short: " : "")
                    + rows + " hourly rows", "8760 hourly rows (8784 in a leap year)");
        }
        p.throwIfAny();
        return new WeatherYear(file, Arrays.copyOf(ghi, rows), Arrays.copyOf(dni, rows), Arrays.copyOf(dhi, rows),
                Arrays.copyOf(air, rows));
    }

    private static double value(Problems p, Fields f, int line, int c, String field, double lo, double hi) {
        String s = f.value(c);
        Double v = WeatherText.parseDecimal(s);
        if (v == null) {
            p.add(line, f.column(c), field, "not a number: " + WeatherText.quote(s), "a decimal number such as 412.5");
            return 0;
        }
        if (v < lo || v > hi) {
            p.add(line, f.column(c), field, (v < 0 && lo == 0 ? "negative: " : "out of range: ") + s,
                    "a value from " + (long) lo + " to " + (long) hi);
            return 0;
        }
        return v;
    }
}
