package org.holdover.battery;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * A capacity temperature-correction table (factor to multiply the capacity needed at 25 °C by), keyed
 * by temperature in °F as the source tables are, with linear interpolation between rows. Below the table
 * the first row is used and the result is flagged; factors below 1 are not credited.
 */
public final class TemperatureTable {

    /** One row. */
    public record Row(double tempF, double factor, boolean confirmed) {
    }

    private final String resource;
    private final List<String> sourceLines;
    private final List<Row> rows;

    private TemperatureTable(String resource, List<String> sourceLines, List<Row> rows) {
        this.resource = resource;
        this.sourceLines = List.copyOf(sourceLines);
        this.rows = List.copyOf(rows);
    }

    private static final TemperatureTable LEAD_ACID = load("lead-acid-temperature.csv");
    private static final TemperatureTable LIFEPO4 = load("lifepo4-temperature.csv");

    /** The table for a chemistry. */
    public static TemperatureTable of(Chemistry c) {
        return c.leadAcid() ? LEAD_ACID : LIFEPO4;
    }

    public List<Row> rows() {
        return rows;
    }

    /** The comment lines at the top of the table file: its source. */
    public List<String> sourceLines() {
        return sourceLines;
    }

    public String resource() {
        return resource;
    }

    /** °C → °F. */
    public static double toF(double tempC) {
        return tempC * 9.0 / 5.0 + 32.0;
    }

    /**
     * The capacity factor at a battery temperature: linear interpolation in °F, clamped to the table's
     * range, never below 1.
     *
     * @param tempC battery temperature, °C
     */
    public double factor(double tempC) {
        double f = toF(tempC);
        double lo = rows.get(0).tempF();
        double hi = rows.get(rows.size() - 1).tempF();
        double t = Math.min(Math.max(f, lo), hi);
        int i = 0;
        while (i < rows.size() - 2 && rows.get(i + 1).tempF() <= t) {
            i++;
        }
        Row a = rows.get(i);
        Row b = rows.get(i + 1);
        double v = a.factor() + (t - a.tempF()) * (b.factor() - a.factor()) / (b.tempF() - a.tempF());
        return Math.max(1.0, v);
    }

    /** Whether a temperature lies below the table (the factor is then the table's coldest, an underestimate). */
    public boolean belowTable(double tempC) {
        return toF(tempC) < rows.get(0).tempF();
    }

    private static TemperatureTable load(String name) {
        try (InputStream in = TemperatureTable.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + name);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String> source = new ArrayList<>();
            List<Row> rows = new ArrayList<>();
            String line;
            boolean header = false;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#")) {
                    source.add(line.substring(1).strip());
                } else if (!header) {
                    header = true;
                } else if (!line.isBlank()) {
                    String[] f = line.split(",");
                    rows.add(new Row(Double.parseDouble(f[0]), Double.parseDouble(f[1]), f[2].strip().equals("C")));
                }
            }
            return new TemperatureTable(name, source, rows);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
