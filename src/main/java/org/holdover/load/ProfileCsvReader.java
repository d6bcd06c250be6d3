package org.holdover.load;

import java.io.BufferedReader;
import java.io.FilterReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.time.zone.ZoneOffsetTransition;
import java.time.zone.ZoneRules;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.holdover.project.InputException;
import org.holdover.project.InputFiles;
import org.holdover.project.Problem;
import org.holdover.project.SourceLocation;

/**
 * Reads a load profile from a CSV file into hourly means in local standard time.
 *
 * <p>Format. Lines starting with {@code #} and blank lines are ignored. The first other line is the
 * header: two columns, the first {@code hour} or {@code timestamp}, the second the unit of the values:
 * {@code W} or {@code kW} (power readings; an hour's value is the mean of its readings) or {@code Wh} or
 * {@code kWh} (energy per interval; an hour's value is the sum of its intervals).
 * <ul>
 *   <li>{@code hour}: the hour of the year, 0 for the hour starting at midnight on 1 January, local
 *       standard time; one row per hour.</li>
 *   <li>{@code timestamp}: the start of each interval, {@code 2025-07-14T13:15} or {@code 2025-07-14 13:15}
 *       (seconds optional). Without an offset it is the site's clock time (daylight saving applies where
 *       the time zone has it; the repeated hour when it ends is read in order). With {@code Z} or
 *       {@code +hh:mm} it is that instant. Intervals may be shorter than an hour (e.g. 1, 5, 15 minutes).</li>
 * </ul>
 * Hours with no data are an error unless the gap is at most {@code maxGapHours} long, in which case it is
 * filled by linear interpolation and reported as a warning. Duplicated times, negative or non-numeric
 * values and rows outside the year are errors, each reported with its line.
 */
public final class ProfileCsvReader {

    private static final int MAX_REPORTED = 20;
    /**
     * Longest line accepted, characters. A profile line is a few dozen; a longer one means a file that is
     * not a profile, and reading it whole as one line could exhaust memory (up to the 200 MB file limit).
     */
    static final int MAX_LINE_CHARS = 10_000;

    private final String display;
    private final ZoneId zone;
    private final int maxGapHours;
    private final List<Problem> errors = new ArrayList<>();
    private final List<Problem> warnings = new ArrayList<>();
    private int suppressed;

    private ProfileCsvReader(String display, ZoneId zone, int maxGapHours) {
        this.display = display;
        this.zone = zone;
        this.maxGapHours = maxGapHours;
    }

    /**
     * @param file        the CSV file
     * @param display     how to name it in messages
     * @param year        the project's year, or null to take it from the data (2025 for hour-of-year files)
     * @param zone        the site's time zone (or a fixed offset) for clock-time stamps
     * @param maxGapHours longest gap filled by interpolation, h
     */
    public static MeasuredProfile read(Path file, String display, Integer year, ZoneId zone, int maxGapHours)
            throws InputException {
        InputFiles.checkReadable(file, display, InputFiles.MAX_DATA_BYTES);
        // Bad bytes become U+FFFD and are reported with their line by parse (a decoding exception would come
        // from the read-ahead buffer, lines before the parser knows where it is).
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPLACE).onUnmappableCharacter(CodingErrorAction.REPLACE);
        ProfileCsvReader r = new ProfileCsvReader(display, zone, maxGapHours);
        try (InputStream in = Files.newInputStream(file);
             BufferedReader br = new BufferedReader(new LineLimit(new InputStreamReader(in, decoder)), 1 << 16)) {
            return r.parse(br, year);
        } catch (LineLimit.TooLong e) {
            throw InputException.at(SourceLocation.of(display, e.line), "", "the line is longer than "
                    + MAX_LINE_CHARS + " characters", "a CSV profile has one short line per reading; check it is the right file");
        } catch (IOException e) {
            throw InputException.at(SourceLocation.of(display), "", "cannot read the file: " + e.getMessage(), "");
        }
    }

    private int lineNo;

    /**
     * Refuses a line longer than {@link #MAX_LINE_CHARS} as the text streams by, before it is collected whole
     * (it counts lines itself: the buffer reads ahead of the parser).
     */
    private static final class LineLimit extends FilterReader {

        /** The line that is too long (1-based). */
        static final class TooLong extends IOException {
            final int line;

            TooLong(int line) {
                super("line " + line + " is too long");
                this.line = line;
            }
        }

        private int line = 1;
        private int run;
        private boolean afterCr;

        LineLimit(Reader in) {
            super(in);
        }

        @Override
        public int read() throws IOException {
            int c = super.read();
            if (c >= 0) {
                see((char) c);
            }
            return c;
        }

        @Override
        public int read(char[] buf, int off, int len) throws IOException {
            int n = super.read(buf, off, len);
            for (int i = off; i < off + n; i++) {
                see(buf[i]);
            }
            return n;
        }

        private void see(char c) throws TooLong {
            if (c == '\n' || c == '\r') {
                if (c == '\r' || !afterCr) {
                    line++;
                }
                afterCr = c == '\r';
                run = 0;
                return;
            }
            afterCr = false;
            if (++run > MAX_LINE_CHARS) {
                throw new TooLong(line);
            }
        }
    }

    private enum Kind { HOUR, TIMESTAMP }

    private MeasuredProfile parse(BufferedReader br, Integer projectYear) throws IOException, InputException {
        String line;
        Kind kind = null;
        double toW = 1;
        boolean energy = false;
        String valueName = "";
        // Samples: standard-time epoch second (or hour index) and value, with source line.
        long[] times = new long[1024];
        double[] values = new double[1024];
        int[] lines = new int[1024];
        int count = 0;
        Map<LocalDateTime, Integer> ambiguousSeen = new HashMap<>();
        int dstRepeats = 0;
        int firstDstRepeatLine = 0;
        while ((line = br.readLine()) != null) {
            lineNo++;
            if (lineNo == 1 && !line.isEmpty() && line.charAt(0) == '\uFEFF') {
                line = line.substring(1);
            }
            if (line.indexOf('\uFFFD') >= 0) {
                throw InputException.at(SourceLocation.of(display, lineNo), "", "is not valid UTF-8 text",
                        "save the file as UTF-8 (plain CSV)");
            }
            String t = line.strip();
            if (t.isEmpty() || t.charAt(0) == '#') {
                continue;
            }
            if (t.indexOf('\0') >= 0) {
                throw InputException.at(SourceLocation.of(display, lineNo), "", "contains a NUL byte: this looks like a binary file",
                        "expected a CSV text file");
            }
            if (kind == null) {
                String[] h = t.split(",", -1);
                if (h.length != 2) {
                    throw InputException.at(SourceLocation.of(display, lineNo), "header",
                            "expected two columns, found " + h.length + ": \"" + clip(t) + "\"",
                            "a header such as hour,kW or timestamp,W");
                }
                String first = unquote(h[0]).toLowerCase(Locale.ROOT);
                if (first.equals("hour")) {
                    kind = Kind.HOUR;
                } else if (first.equals("timestamp")) {
                    kind = Kind.TIMESTAMP;
                } else {
                    throw InputException.at(SourceLocation.of(display, lineNo), "header", "first column is \"" + clip(h[0])
                            + "\"", "hour (hour of the year from 0) or timestamp (start of each interval)");
                }
                valueName = unquote(h[1]);
                switch (valueName.toLowerCase(Locale.ROOT)) {
                    case "w" -> toW = 1;
                    case "kw" -> toW = 1000;
                    case "wh" -> { toW = 1; energy = true; }
                    case "kwh" -> { toW = 1000; energy = true; }
                    default -> throw InputException.at(SourceLocation.of(display, lineNo), "header",
                            "second column is \"" + clip(h[1]) + "\"", "the unit of the values: W, kW (power) or Wh, kWh (energy per interval)");
                }
                continue;
            }
            int comma = t.indexOf(',');
            if (comma < 0 || t.indexOf(',', comma + 1) >= 0) {
                error(lineNo, "", "expected two values separated by a comma, got \"" + clip(t) + "\"", "");
                continue;
            }
            String a = unquote(t.substring(0, comma));
            String b = unquote(t.substring(comma + 1));
            double v = parseNumber(b);
            if (Double.isNaN(v)) {
                error(lineNo, valueName, "\"" + clip(b) + "\" is not a number", "a plain number in " + valueName);
                continue;
            }
            if (v < 0) {
                error(lineNo, valueName, "negative value " + b, "consumption ≥ 0 (export is not a load)");
                continue;
            }
            if (v > 1e9) {
                error(lineNo, valueName, "value " + b + " is implausibly large", "check the unit in the header");
                continue;
            }
            long time;
            if (kind == Kind.HOUR) {
                long hr = parseLong(a);
                if (hr == Long.MIN_VALUE) {
                    error(lineNo, "hour", "\"" + clip(a) + "\" is not a whole hour number", "0 for the first hour of the year");
                    continue;
                }
                time = hr;
            } else {
                Parsed p = parseTimestamp(a);
                if (p == null) {
                    error(lineNo, "timestamp", "\"" + clip(a) + "\" is not a timestamp", "like 2025-07-14T13:15 or 2025-07-14 13:15");
                    continue;
                }
                long epoch;
                if (p.offsetSeconds != Integer.MIN_VALUE) {
                    epoch = p.local.toEpochSecond(ZoneOffset.ofTotalSeconds(p.offsetSeconds));
                } else {
                    ZoneRules rules = zone.getRules();
                    List<ZoneOffset> offsets = rules.getValidOffsets(p.local);
                    if (offsets.isEmpty()) {
                        error(lineNo, "timestamp", a + " does not exist in " + zone + " (clocks jump forward then)",
                                "remove the row, or give times with an offset");
                        continue;
                    }
                    ZoneOffset off = offsets.get(0);
                    if (offsets.size() > 1) {
                        // Clocks fall back: the first time this clock time appears is daylight time, the second standard.
                        Integer seen = ambiguousSeen.putIfAbsent(p.local, lineNo);
                        ZoneOffsetTransition tr = rules.getTransition(p.local);
                        off = seen == null ? tr.getOffsetBefore() : tr.getOffsetAfter();
                        if (seen != null) {
                            dstRepeats++;
                            if (firstDstRepeatLine == 0) {
                                firstDstRepeatLine = lineNo;
                            }
                        }
                    }
                    epoch = p.local.toEpochSecond(off);
                }
                time = epoch;
            }
            if (count == times.length) {
                times = java.util.Arrays.copyOf(times, count * 2);
                values = java.util.Arrays.copyOf(values, count * 2);
                lines = java.util.Arrays.copyOf(lines, count * 2);
            }
            times[count] = time;
            values[count] = v * toW;
            lines[count] = lineNo;
            count++;
        }
        if (kind == null) {
            throw InputException.at(SourceLocation.of(display), "", "the file has no header and no data",
                    "a header such as hour,kW followed by one row per hour");
        }
        if (count == 0 && errors.isEmpty()) {
            throw InputException.at(SourceLocation.of(display, lineNo), "", "the file has a header but no data rows",
                    "one row per hour (or per interval)");
        }
        throwIfErrors();
        if (dstRepeats > 0) {
            warnings.add(new Problem(SourceLocation.of(display, firstDstRepeatLine), "timestamp",
                    dstRepeats + " row(s) repeat clock times when daylight saving time ends; read in order as the second (standard-time) hour", ""));
        }
        return kind == Kind.HOUR
                ? byHour(times, values, lines, count, projectYear == null ? 2025 : projectYear, energy)
                : byTimestamp(times, values, lines, count, projectYear, energy);
    }

    private MeasuredProfile byHour(long[] hours, double[] values, int[] lines, int count, int year, boolean energy)
            throws InputException {
        YearCalendar cal = new YearCalendar(year);
        int n = cal.hours();
        double[] w = new double[n];
        int[] lineOfHour = new int[n];
        for (int i = 0; i < count; i++) {
            long h = hours[i];
            if (h < 0 || h >= n) {
                error(lines[i], "hour", "hour " + h + " is outside the year " + year + " (0–" + (n - 1) + ")",
                        "hours count from 0 for the hour starting at midnight on 1 January");
                continue;
            }
            if (lineOfHour[(int) h] != 0) {
                error(lines[i], "hour", "hour " + h + " appears again (first on line " + lineOfHour[(int) h] + ")",
                        "one row per hour");
                continue;
            }
            lineOfHour[(int) h] = lines[i];
            w[(int) h] = values[i];
        }
        throwIfErrors();
        boolean[] has = new boolean[n];
        for (int h = 0; h < n; h++) {
            has[h] = lineOfHour[h] != 0;
        }
        fillGaps(w, has, lineOfHour, cal);
        throwIfErrors();
        return new MeasuredProfile(w, year, count, 3600, warnings);
    }

    private MeasuredProfile byTimestamp(long[] epochs, double[] values, int[] lines, int count, Integer projectYear,
                                        boolean energy) throws InputException {
        // Standard-time offset of the site (the offset in January, when no daylight saving applies in the north,
        // or the zone's declared standard offset).
        ZoneRules rules = zone.getRules();
        int interval = typicalInterval(epochs, count);
        if (interval <= 0 || 3600 % interval != 0) {
            throw InputException.at(SourceLocation.of(display, lines[Math.min(1, count - 1)]), "timestamp",
                    "the readings are " + (interval <= 0 ? "not in time order" : interval + " s apart, which does not divide an hour"),
                    "readings at a regular interval that divides an hour (1, 5, 10, 15, 30 or 60 minutes), in time order");
        }
        int year;
        if (projectYear != null) {
            year = projectYear;
        } else {
            long e0 = epochs[0];
            int std = rules.getStandardOffset(java.time.Instant.ofEpochSecond(e0)).getTotalSeconds();
            year = LocalDateTime.ofEpochSecond(e0 + std, 0, ZoneOffset.UTC).getYear();
        }
        YearCalendar cal = new YearCalendar(year);
        int n = cal.hours();
        long yearStart = LocalDateTime.of(year, 1, 1, 0, 0).toEpochSecond(ZoneOffset.UTC);
        double[] sum = new double[n];
        int[] samples = new int[n];
        int[] lineOfHour = new int[n];
        Map<Long, Integer> seen = new HashMap<>(count * 2);
        int wrapped = 0;
        for (int i = 0; i < count; i++) {
            Integer before = seen.putIfAbsent(epochs[i], lines[i]);
            if (before != null) {
                error(lines[i], "timestamp", "this time appears again (first on line " + before + ")", "one row per interval");
                continue;
            }
            int std = rules.getStandardOffset(java.time.Instant.ofEpochSecond(epochs[i])).getTotalSeconds();
            long local = epochs[i] + std - yearStart;
            long h = Math.floorDiv(local, 3600);
            if (h < 0 || h >= n) {
                if (h >= -48 && h < n + 48) {
                    h = Math.floorMod(h, n);
                    wrapped++;
                } else {
                    error(lines[i], "timestamp", "is outside the year " + year, "data for one calendar year (" + year + ")");
                    continue;
                }
            }
            sum[(int) h] += values[i];
            samples[(int) h]++;
            if (lineOfHour[(int) h] == 0) {
                lineOfHour[(int) h] = lines[i];
            }
        }
        throwIfErrors();
        if (wrapped > 0) {
            warnings.add(new Problem(SourceLocation.of(display), "timestamp", wrapped
                    + " reading(s) fall just outside " + year + " in local standard time and were wrapped to the other end of the year", ""));
        }
        int perHour = 3600 / interval;
        double[] w = new double[n];
        boolean[] has = new boolean[n];
        int partial = 0;
        int firstPartialLine = 0;
        for (int h = 0; h < n; h++) {
            if (samples[h] == 0) {
                continue;
            }
            has[h] = true;
            if (samples[h] > perHour) {
                error(lineOfHour[h], "timestamp", "the hour starting here has " + samples[h] + " readings, more than the "
                        + perHour + " its " + interval + " s interval allows", "one reading per interval");
                continue;
            }
            if (energy) {
                w[h] = sum[h] * perHour / samples[h];
            } else {
                w[h] = sum[h] / samples[h];
            }
            if (samples[h] < perHour) {
                partial++;
                if (firstPartialLine == 0) {
                    firstPartialLine = lineOfHour[h];
                }
            }
        }
        throwIfErrors();
        if (partial > 0) {
            warnings.add(new Problem(SourceLocation.of(display, firstPartialLine), "timestamp", partial
                    + " hour(s) have fewer readings than the interval implies; their mean is taken over the readings present", ""));
        }
        fillGaps(w, has, lineOfHour, cal);
        throwIfErrors();
        return new MeasuredProfile(w, year, count, interval, warnings);
    }

    private void fillGaps(double[] w, boolean[] has, int[] lineOfHour, YearCalendar cal) {
        int n = w.length;
        int h = 0;
        while (h < n) {
            if (has[h]) {
                h++;
                continue;
            }
            int start = h;
            while (h < n && !has[h]) {
                h++;
            }
            int len = h - start;
            int prev = start - 1;
            int next = h;
            int lineBefore = prev >= 0 ? lineOfHour[prev] : 0;
            int lineAfter = next < n ? lineOfHour[next] : 0;
            String span = describeHour(cal, start) + (len > 1 ? " to " + describeHour(cal, start + len - 1) : "");
            String between = lineBefore > 0 && lineAfter > 0 ? ", between lines " + lineBefore + " and " + lineAfter
                    : lineAfter > 0 ? ", before line " + lineAfter : lineBefore > 0 ? ", after line " + lineBefore : "";
            int reportLine = lineAfter > 0 ? lineAfter : lineBefore;
            if (len > maxGapHours || prev < 0 && next >= n) {
                error(reportLine, "", "no data for " + len + " hour(s), " + span + " (local standard time)" + between,
                        maxGapHours == 0 ? "a value for every hour, or set loads.profile.maxGapHours to fill short gaps"
                                : "gaps of at most " + maxGapHours + " h are filled; supply the missing data");
                continue;
            }
            double a = prev >= 0 ? w[prev] : w[next];
            double b = next < n ? w[next] : w[prev];
            for (int i = 0; i < len; i++) {
                w[start + i] = a + (b - a) * (i + 1) / (len + 1);
            }
            warnings.add(new Problem(SourceLocation.of(display, reportLine), "", "filled " + len + " missing hour(s), "
                    + span + ", by linear interpolation" + between, ""));
        }
    }

    private static String describeHour(YearCalendar cal, int h) {
        return String.format(Locale.ROOT, "%s %02d:00", cal.date(h), cal.hourOfDay(h));
    }

    private static int typicalInterval(long[] epochs, int count) {
        if (count < 2) {
            return 3600;
        }
        Map<Long, Integer> freq = new HashMap<>();
        for (int i = 1; i < count; i++) {
            long d = epochs[i] - epochs[i - 1];
            if (d > 0 && d <= 3600) {
                freq.merge(d, 1, Integer::sum);
            }
        }
        long best = -1;
        int bestCount = 0;
        for (Map.Entry<Long, Integer> e : freq.entrySet()) {
            if (e.getValue() > bestCount || e.getValue() == bestCount && e.getKey() < best) {
                best = e.getKey();
                bestCount = e.getValue();
            }
        }
        return (int) best;
    }

    private void error(int line, String field, String message, String expected) {
        if (errors.size() >= MAX_REPORTED) {
            suppressed++;
            return;
        }
        errors.add(new Problem(SourceLocation.of(display, line), field, message, expected));
    }

    private void throwIfErrors() throws InputException {
        if (!errors.isEmpty()) {
            List<Problem> all = new ArrayList<>(errors);
            if (suppressed > 0) {
                all.add(new Problem(SourceLocation.of(display), "", "and " + suppressed + " more problem(s) like these", ""));
            }
            throw new InputException(all);
        }
    }

    private static String unquote(String s) {
        String t = s.strip();
        if (t.length() >= 2 && t.charAt(0) == '"' && t.charAt(t.length() - 1) == '"') {
            t = t.substring(1, t.length() - 1).strip();
        }
        return t;
    }

    private static String clip(String s) {
        String t = s.replaceAll("\\p{Cntrl}", "?");
        return t.length() > 40 ? t.substring(0, 40) + "…" : t;
    }

    /** A plain decimal number (no thousands separators, no NaN or infinity), or NaN when it is not one. */
    static double parseNumber(String s) {
        if (s.isEmpty() || s.length() > 40) {
            return Double.NaN;
        }
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!(c >= '0' && c <= '9' || c == '.' || c == '-' || c == '+' || c == 'e' || c == 'E')) {
                return Double.NaN;
            }
        }
        try {
            double v = Double.parseDouble(s);
            return Double.isFinite(v) ? v : Double.NaN;
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static long parseLong(String s) {
        if (s.isEmpty() || s.length() > 10) {
            return Long.MIN_VALUE;
        }
        long v = 0;
        int i = 0;
        boolean neg = false;
        if (s.charAt(0) == '-') {
            neg = true;
            i = 1;
            if (s.length() == 1) {
                return Long.MIN_VALUE;
            }
        }
        for (; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return Long.MIN_VALUE;
            }
            v = v * 10 + (c - '0');
        }
        return neg ? -v : v;
    }

    private record Parsed(LocalDateTime local, int offsetSeconds) {
    }

    /** yyyy-MM-dd[T ]HH:mm[:ss][Z|±HH:mm]; null when malformed. */
    static Parsed parseTimestamp(String s) {
        int len = s.length();
        if (len < 16) {
            return null;
        }
        int year = digits(s, 0, 4);
        int month = digits(s, 5, 2);
        int day = digits(s, 8, 2);
        int hour = digits(s, 11, 2);
        int minute = digits(s, 14, 2);
        if (year < 0 || month < 0 || day < 0 || hour < 0 || minute < 0 || s.charAt(4) != '-' || s.charAt(7) != '-'
                || (s.charAt(10) != 'T' && s.charAt(10) != ' ') || s.charAt(13) != ':') {
            return null;
        }
        int i = 16;
        int second = 0;
        if (i < len && s.charAt(i) == ':') {
            second = digits(s, i + 1, 2);
            if (second < 0) {
                return null;
            }
            i += 3;
            if (i < len && s.charAt(i) == '.') {
                i++;
                while (i < len && Character.isDigit(s.charAt(i))) {
                    i++;
                }
            }
        }
        int offset = Integer.MIN_VALUE;
        if (i < len) {
            char c = s.charAt(i);
            if (c == 'Z' && i == len - 1) {
                offset = 0;
            } else if ((c == '+' || c == '-') && len - i == 6 && s.charAt(i + 3) == ':') {
                int oh = digits(s, i + 1, 2);
                int om = digits(s, i + 4, 2);
                if (oh < 0 || om < 0 || om > 59 || oh * 60 + om > 18 * 60) {
                    return null;
                }
                offset = (c == '-' ? -1 : 1) * (oh * 3600 + om * 60);
            } else {
                return null;
            }
        }
        try {
            return new Parsed(LocalDateTime.of(year, month, day, hour, minute, second), offset);
        } catch (java.time.DateTimeException e) {
            return null;
        }
    }

    private static int digits(String s, int from, int n) {
        if (from + n > s.length()) {
            return -1;
        }
        int v = 0;
        for (int i = from; i < from + n; i++) {
            char c = s.charAt(i);
            if (c < '0' || c > '9') {
                return -1;
            }
            v = v * 10 + (c - '0');
        }
        return v;
    }
}
