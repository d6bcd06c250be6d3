package org.holdover.solar;

import java.io.IOException;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import org.holdover.project.InputException;
import org.holdover.project.InputFiles;
import org.holdover.project.Problem;
import org.holdover.project.SourceLocation;

/** Shared plumbing of the weather-file readers: strict UTF-8 text, lines, fields, numbers, problems. */
final class WeatherText {

    /** Stop collecting after this many problems: the first ones are what the user needs. */
    static final int MAX_PROBLEMS = 25;

    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private WeatherText() {
    }

    /**
     * The text of a file as lines (line 1 first), decoded strictly as UTF-8. A file larger than
     * {@link InputFiles#MAX_DATA_BYTES}, or one that is not a regular file, is refused before it is read.
     */
    static List<String> readLines(Path path, String displayName) throws InputException {
        InputFiles.checkReadable(path, displayName, InputFiles.MAX_DATA_BYTES);
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(path);
        } catch (IOException e) {
            throw InputException.at(SourceLocation.of(displayName), "", "cannot read the file: " + e.getMessage(),
                    "a readable file");
        }
        CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult r = dec.decode(in, out, true);
        if (r.isError()) {
            int bad = in.position();
            int line = 1;
            for (int i = 0; i < bad; i++) {
                if (bytes[i] == '\n') {
                    line++;
                }
            }
            throw InputException.at(SourceLocation.of(displayName, line), "",
                    String.format(Locale.ROOT, "the file is not valid UTF-8: byte 0x%02X at byte offset %d", bytes[bad] & 0xFF,
                            bad),
                    "save the file as UTF-8 text");
        }
        dec.flush(out);
        out.flip();
        return splitLines(out.toString(), displayName);
    }

    /** The text from a reader as lines; a U+FFFD replacement character is taken as a decoding failure. */
    static List<String> readLines(Reader reader, String displayName) throws InputException {
        StringBuilder b = new StringBuilder();
        char[] buf = new char[8192];
        try {
            int n;
            while ((n = reader.read(buf)) >= 0) {
                b.append(buf, 0, n);
            }
        } catch (IOException e) {
            throw InputException.at(SourceLocation.of(displayName), "", "cannot read the file: " + e.getMessage(),
                    "a readable file");
        }
        return splitLines(b.toString(), displayName);
    }

    private static List<String> splitLines(String text, String displayName) throws InputException {
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
            text = text.substring(1);
        }
        List<String> lines = new ArrayList<>();
        int start = 0;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                lines.add(text.substring(start, i));
                if (c == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') {
                    i++;
                }
                start = i + 1;
            }
        }
        if (start < n) {
            lines.add(text.substring(start));
        }
        for (int i = 0; i < lines.size(); i++) {
            int col = lines.get(i).indexOf('\uFFFD');
            if (col >= 0) {
                throw InputException.at(new SourceLocation(displayName, i + 1, col + 1), "",
                        "the text contains U+FFFD, the mark left where bytes were not valid UTF-8",
                        "save the file as UTF-8 text");
            }
        }
        return lines;
    }

    /** A line split at commas, remembering where each field starts (1-based character column). */
    record Fields(List<String> values, List<Integer> columns) {
        static Fields split(String line) {
            List<String> v = new ArrayList<>();
            List<Integer> c = new ArrayList<>();
            int start = 0;
            for (int i = 0; i <= line.length(); i++) {
                if (i == line.length() || line.charAt(i) == ',') {
                    v.add(line.substring(start, i));
                    c.add(start + 1);
                    start = i + 1;
                }
            }
            return new Fields(v, c);
        }

        int size() {
            return values.size();
        }

        String value(int i) {
            return values.get(i).trim();
        }

        int column(int i) {
            return columns.get(i);
        }
    }

    /** The number in a field, or null when it is not a plain decimal number. */
    static Double parseDecimal(String s) {
        String t = s.trim();
        if (!DECIMAL.matcher(t).matches()) {
            return null;
        }
        double v = Double.parseDouble(t);
        return Double.isFinite(v) ? v : null;
    }

    /** Collects problems up to {@link #MAX_PROBLEMS}. */
    static final class Problems {
        private final String file;
        private final List<Problem> list = new ArrayList<>();

        Problems(String file) {
            this.file = file;
        }

        void add(int line, int column, String field, String message, String expected) {
            if (list.size() < MAX_PROBLEMS) {
                list.add(new Problem(new SourceLocation(file, line, column), field, message, expected));
            }
        }

        boolean full() {
            return list.size() >= MAX_PROBLEMS;
        }

        boolean isEmpty() {
            return list.isEmpty();
        }

        void throwIfAny() throws InputException {
            if (!list.isEmpty()) {
                throw new InputException(list);
            }
        }
    }

    static String quote(String s) {
        String t = s.length() > 40 ? s.substring(0, 40) + "…" : s;
        return "\"" + t + "\"";
    }
}
