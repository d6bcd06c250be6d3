package org.holdover.dc;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads the bundled reference CSVs: leading {@code #} lines are the source, the first other line is the header,
 * then plain comma-separated rows (no quoting; no cell contains a comma). A malformed bundled table is our bug,
 * so it throws {@link IllegalStateException}.
 */
final class CsvTables {

    private CsvTables() {
    }

    static ReferenceTable read(String name) {
        String resource = name + ".csv";
        try (InputStream in = CsvTables.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("bundled table missing: " + resource);
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String> source = new ArrayList<>();
            List<String> header = null;
            List<List<ReferenceTable.Cell>> rows = new ArrayList<>();
            String line;
            int lineNo = 0;
            while ((line = reader.readLine()) != null) {
                lineNo++;
                if (line.isBlank()) {
                    continue;
                }
                if (header == null && line.startsWith("#")) {
                    source.add(line.substring(1).trim());
                    continue;
                }
                String[] parts = line.split(",", -1);
                if (header == null) {
                    header = Arrays.stream(parts).map(String::trim).toList();
                    continue;
                }
                if (parts.length != header.size()) {
                    throw new IllegalStateException(resource + ":" + lineNo + ": " + parts.length
                            + " cells, header has " + header.size());
                }
                List<ReferenceTable.Cell> row = new ArrayList<>(parts.length);
                for (String p : parts) {
                    row.add(cell(p.trim()));
                }
                rows.add(row);
            }
            if (header == null) {
                throw new IllegalStateException(resource + " has no header");
            }
            return new ReferenceTable(name, source, header, rows);
        } catch (IOException e) {
            throw new UncheckedIOException("reading bundled table " + resource, e);
        }
    }

    private static ReferenceTable.Cell cell(String text) {
        if (text.isEmpty()) {
            return new ReferenceTable.Blank();
        }
        try {
            return new ReferenceTable.Number(Double.parseDouble(text));
        } catch (NumberFormatException notANumber) {
            return new ReferenceTable.Text(text);
        }
    }
}
