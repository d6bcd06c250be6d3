package org.holdover.testing;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Mutations of real inputs for {@link Fuzz}: lines deleted, duplicated, swapped, repeated or re-indented;
 * the file cut short; random bytes inserted or overwritten (invalid UTF-8, NUL, control characters); a
 * value replaced by a hostile one (huge numbers, NaN and infinities, wrong types, YAML tags, anchors and
 * aliases, escapes of NUL and line separators, formula-looking text, paths of devices); deep nesting;
 * alias expansion; other line endings; a second document.
 *
 * <p>Work is done on the bytes seen as ISO-8859-1 characters, so any byte survives the round trip.
 */
public final class Mutator {

    /** What the seeds are, which decides the hostile values and structures offered. */
    public enum Kind { YAML, JSON, CSV }

    private static final String[] COMMON = {
        "", "-1", "0", "-0", "+5", ".5", "5.", "1e309", "-1e309", "1e-400", "4.9e-324", "1.7976931348623157e308",
        "99999999999999999999999999999", "-9223372036854775809", "9223372036854775807", "2147483648", "-2147483649",
        "NaN", "nan", "Infinity", "-Infinity", "inf", "0x1F", "1_000", "1,5", "12 W", "\u0661\u0662\u0663", "\u216B",
        "\u00a0", "\u200b", "\uFEFF", "\u2028", "\u0085", "\u202E", "\u2066", "\u001b[31m", "\t", "true", "null", "=1+1", "+1+1", "-2+3",
        "@SUM(A1)", "=HYPERLINK(\"http://x\")", "/dev/zero", "/", ".", "..", "../../../../etc/passwd", "nul", "C:\\x",
        "x".repeat(5000), "\u00e9\u00e8\u4e2d\u6587\ud83d\ude00"};

    private static final String[] YAML = {
        "~", "Null", ".nan", ".NaN", "-.inf", ".inf", "0o17", "017", "0b101", "1:30", "yes", "no", "on", "off", "y",
        "[]", "{}", "[1, 2]", "{a: 1}", "[[[[]]]]", "&x 5", "*x", "*undefined", "&a [*a]", "!!binary AAAA", "!!str 5",
        "!!int x", "!!float abc", "!!timestamp 2025-01-01", "!!set {a, b}", "!!omap [a: 1]", "!!python/object:os.system x",
        "!custom x", "!<tag:yaml.org,2002:int> 3", "\"\\0\"", "\"\\x00\"", "\"\\u2028\"", "\"\\e[31m\"", "\"a\\nb\"",
        "\"\\ud800\"", "'=1+1'", "|\n  block\n", ">-\n  folded\n", "<<: *x", "? complex", "\"unterminated", "'quote''s",
        "- item", "a: b: c", "%YAML 1.2", "---", "...", "#", "@", "`", "|"};

    private static final String[] JSON = {
        "\"\"", "\"\\u0000\"", "\"\\u001b[31m\"", "\"\\u2028\"", "\"a\\nb\"", "\"\\ud800\"", "[]", "{}", "[[[[[[",
        "]]]]", "{\"a\": {\"b\": {}}}", "01", "-", "1.", ".1", "0x10", "'single'", "\"=1+1\"", "\"=cmd|' /C calc'!A0\"",
        "NaN", "-Infinity", "\"unterminated", "/* comment */", "// comment", ",", ":", "\"a\":", "true", "false"};

    private static final String[] CSV = {
        "\"5\"", "\"\"", "\"", "5 W", "1e9", "1e10", "2025-03-09T02:30", "2025-11-02T01:30", "2025-02-29T00:00",
        "2024-02-29T00:00", "2025-12-31T23:59:59.999999999Z", "2025-01-01T00:00+18:00", "2025-01-01T00:00-18:59",
        "2025-01-01T00:00+14:00", "0000-01-01T00:00", "9999-12-31T23:59", "-2025-01-01T00:00", "2025-1-1T0:0",
        "2025-01-01 00:00:60", "2025-01-01T24:00", "2025-06-15T12:00:30", "2025-06-15 12:00:00.5",
        "99999999999", "-99999999999", "8759", "8760", "8783", "8784", "13", "24", "25", "99.9", "9999", "-70.1",
        "2000.1", "-90.1", "70.1", "hour", "timestamp", "W", "kWh", "a,b", ",,", "LOCATION", "DATA PERIODS", "#"};

    private static final String[] YAML_LINES = {
        "---", "...", "%YAML 1.1", "%TAG ! tag:x,2025:", "? complex key", ": value", "<<: {}", "unknownKey: 1",
        "name: second", "mode: backup", "- orphan", "\t- tabbed", "  bad indent: 1", "notes: [\"=1+1\", \"@A1\"]",
        "inverters: 5", "batteryModules: {}", "loads: {appliances: [{name: x, watts: 1e308}]}",
        "site: {latitudeDeg: .nan}", "catalog: /dev/zero", "catalog: \"\\0\"", "catalog: .", "solar: {monthlyGhiKwhM2Day: [1]}",
        "site: {year: 0}", "site: {timeZone: \"\"}", "site: {timeZone: Mars/Olympus}"};

    private static final String[] CSV_LINES = {
        "hour,W", "timestamp,kW", "timestamp,Wh", "hour,kWh", "0,0", "8759,1", "8760,1", "-1,5", "a,b,c", ",", "",
        "2025-03-09T02:30,5", "2025-11-02T01:30,5", "2025-11-02T01:30,6", "2025-01-01T00:00Z,1",
        "2026-01-01T00:00,1", "2024-12-31T23:59,1", "2025-07-01T00:00,1e9", "2025-07-01T00:00,-0",
        "LOCATION,x,x,x,x,0,91,0,0,0", "DATA PERIODS,1,2,Data,Sunday, 1/ 1,12/31", WeatherHeader.VALUE,
        "0,1,2,3,4", "8784,0,0,0,0"};

    /** Most bytes one repetition may add (a line repeated thousands of times stays a few megabytes). */
    private static final long MAX_GROWTH = 2L * 1024 * 1024;

    private Mutator() {
    }

    /** The weather CSV header, kept here so that the mutator does not depend on the solar package. */
    private static final class WeatherHeader {
        static final String VALUE = "hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c";
    }

    /**
     * One to four mutations of a seed input (one in half the tries, so that most inputs stay close enough to
     * a real one to reach the deeper checks).
     *
     * @param seed   the real input
     * @param kind   what it is
     * @param random the try's random source
     */
    public static byte[] mutate(byte[] seed, Kind kind, SplittableRandom random) {
        byte[] b = seed;
        int dice = random.nextInt(10);
        int n = dice < 5 ? 1 : dice < 8 ? 2 : 3 + random.nextInt(2);
        for (int i = 0; i < n; i++) {
            b = once(b, kind, random);
        }
        return b;
    }

    private static byte[] once(byte[] in, Kind kind, SplittableRandom r) {
        String s = new String(in, StandardCharsets.ISO_8859_1);
        List<String> lines = new ArrayList<>(Arrays.asList(s.split("\n", -1)));
        int op = r.nextInt(18);
        switch (op) {
            case 0 -> {
                if (lines.size() > 1) {
                    lines.remove(r.nextInt(lines.size()));
                }
            }
            case 1 -> {
                int i = r.nextInt(lines.size());
                lines.add(i, lines.get(i));
            }
            case 2 -> {
                int i = r.nextInt(lines.size());
                int j = r.nextInt(lines.size());
                String t = lines.get(i);
                lines.set(i, lines.get(j));
                lines.set(j, t);
            }
            case 3 -> {
                return Arrays.copyOf(in, in.length == 0 ? 0 : r.nextInt(in.length));
            }
            case 4 -> {
                byte[] extra = new byte[1 + r.nextInt(16)];
                for (int k = 0; k < extra.length; k++) {
                    extra[k] = (byte) r.nextInt(256);
                }
                return insert(in, r.nextInt(in.length + 1), extra);
            }
            case 5 -> {
                byte[] out = in.clone();
                int flips = 1 + r.nextInt(4);
                for (int k = 0; k < flips && out.length > 0; k++) {
                    out[r.nextInt(out.length)] = (byte) r.nextInt(256);
                }
                return out;
            }
            case 6, 7, 8 -> {
                return latin(replaceToken(s, hostile(kind, r), kind, r));
            }
            case 9 -> {
                int i = r.nextInt(lines.size());
                int times = r.nextInt(10) == 0 ? 2000 + r.nextInt(3000) : 2 + r.nextInt(50);
                times = (int) Math.min(times, MAX_GROWTH / (lines.get(i).length() + 1L));
                for (int k = 0; k < times; k++) {
                    lines.add(i, lines.get(i));
                }
            }
            case 10 -> {
                String[] table = kind == Kind.CSV ? CSV_LINES : YAML_LINES;
                String line = kind == Kind.JSON && r.nextBoolean() ? "\"" + utf8AsLatin(pick(COMMON, r)) + "\": 1,"
                        : utf8AsLatin(pick(table, r));
                lines.add(r.nextInt(lines.size() + 1), line);
            }
            case 11 -> {
                String ending = r.nextBoolean() ? "\r\n" : "\r";
                return latin(String.join(ending, lines));
            }
            case 12 -> {
                int i = r.nextInt(lines.size());
                String l = lines.get(i);
                lines.set(i, r.nextBoolean() ? " ".repeat(1 + r.nextInt(4)) + l : l.replaceFirst("^ {1,4}", ""));
            }
            case 13 -> {
                return latin(replaceToken(s, nesting(kind, r), kind, r));
            }
            case 14 -> {
                if (kind == Kind.YAML) {
                    lines.add(aliasExpansion(r));
                } else {
                    lines.add(r.nextInt(lines.size() + 1), utf8AsLatin(pick(COMMON, r)));
                }
            }
            case 15 -> {
                byte[][] marks = {{(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, {0}, {(byte) 0xC3}, {(byte) 0xFF, (byte) 0xFE},
                    {(byte) 0xED, (byte) 0xA0, (byte) 0x80}, {(byte) 0xF4, (byte) 0x90, (byte) 0x80, (byte) 0x80}, {0x1b}};
                return insert(in, r.nextInt(in.length + 1), marks[r.nextInt(marks.length)]);
            }
            case 16 -> {
                if (kind == Kind.YAML) {
                    lines.add("---");
                    lines.add("name: second document");
                } else if (kind == Kind.JSON) {
                    lines.add("{}");
                } else {
                    lines.add(lines.get(r.nextInt(lines.size())) + "," + lines.get(r.nextInt(lines.size())));
                }
            }
            default -> {
                int i = r.nextInt(lines.size());
                String l = lines.get(i);
                if (!l.isEmpty()) {
                    int k = r.nextInt(l.length());
                    char c = (char) (kind == Kind.CSV ? ",.-+:eE0123456789 \"".charAt(r.nextInt(19))
                            : ":-[]{}&*!|>'\"#%@` \t,".charAt(r.nextInt(20)));
                    lines.set(i, l.substring(0, k) + c + l.substring(k + (r.nextBoolean() ? 1 : 0)));
                }
            }
        }
        return latin(String.join("\n", lines));
    }

    private static String hostile(Kind kind, SplittableRandom r) {
        String[] table = switch (kind) {
            case YAML -> YAML;
            case JSON -> JSON;
            case CSV -> CSV;
        };
        return utf8AsLatin(r.nextInt(3) == 0 ? pick(COMMON, r) : pick(table, r));
    }

    private static String nesting(Kind kind, SplittableRandom r) {
        int depth = r.nextBoolean() ? 2 + r.nextInt(60) : 60 + r.nextInt(5000);
        if (kind == Kind.JSON || kind == Kind.CSV || r.nextBoolean()) {
            return "[".repeat(depth) + "1" + "]".repeat(depth);
        }
        return "{a: ".repeat(depth) + "1" + "}".repeat(depth);
    }

    /** Top-level keys whose values grow tenfold with each alias level. */
    private static String aliasExpansion(SplittableRandom r) {
        int levels = 2 + r.nextInt(8);
        StringBuilder b = new StringBuilder("x0: &a0 [1, 1, 1, 1, 1, 1, 1, 1, 1, 1]\n");
        for (int k = 1; k < levels; k++) {
            b.append("x").append(k).append(": &a").append(k).append(" [");
            for (int j = 0; j < 10; j++) {
                b.append(j == 0 ? "" : ", ").append("*a").append(k - 1);
            }
            b.append("]\n");
        }
        return b.toString();
    }

    /**
     * Replaces a random token (a run of characters other than separators: in CSV a field, in YAML and JSON
     * a key or a scalar) with {@code with}.
     */
    private static String replaceToken(String s, String with, Kind kind, SplittableRandom r) {
        String separators = kind == Kind.CSV ? ",\r\n" : " \t\r\n,:[]{}\"'#";
        if (s.isEmpty()) {
            return with;
        }
        int at = r.nextInt(s.length());
        int start = at;
        while (start > 0 && separators.indexOf(s.charAt(start - 1)) < 0) {
            start--;
        }
        int end = at;
        while (end < s.length() && separators.indexOf(s.charAt(end)) < 0) {
            end++;
        }
        return s.substring(0, start) + with + s.substring(end);
    }

    private static String pick(String[] table, SplittableRandom r) {
        return table[r.nextInt(table.length)];
    }

    private static String utf8AsLatin(String s) {
        return new String(s.getBytes(StandardCharsets.UTF_8), StandardCharsets.ISO_8859_1);
    }

    private static byte[] latin(String s) {
        return s.getBytes(StandardCharsets.ISO_8859_1);
    }

    private static byte[] insert(byte[] in, int at, byte[] extra) {
        byte[] out = new byte[in.length + extra.length];
        System.arraycopy(in, 0, out, 0, at);
        System.arraycopy(extra, 0, out, at, extra.length);
        System.arraycopy(in, at, out, at + extra.length, in.length - at);
        return out;
    }
}
