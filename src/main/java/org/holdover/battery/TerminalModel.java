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
 * What a bank's terminals do under load: its open-circuit voltage against state of charge and its
 * internal resistance against temperature, each a table per chemistry family (lead-acid, LiFePO4) with
 * linear interpolation and the end rows held outside the table. Sources are in the table files (both from
 * memory, marked so).
 */
public final class TerminalModel {

    /** A two-column table (x, lead-acid value, LiFePO4 value) with its source lines. */
    public record Table(String resource, List<String> source, double[] x, double[] leadAcid, double[] lifepo4) {

        /** The value for a chemistry at x, interpolated linearly, end rows held. */
        public double at(Chemistry c, double xValue) {
            double[] y = c.leadAcid() ? leadAcid : lifepo4;
            double t = Math.min(Math.max(xValue, x[0]), x[x.length - 1]);
            int i = 0;
            while (i < x.length - 2 && x[i + 1] <= t) {
                i++;
            }
            return y[i] + (t - x[i]) * (y[i + 1] - y[i]) / (x[i + 1] - x[i]);
        }
    }

    /** Rested cell open-circuit voltage against state of charge (0–1), V. */
    public static final Table OCV = load("open-circuit-voltage.csv");
    /** Internal resistance factor against cell temperature, °C. */
    public static final Table RESISTANCE = load("resistance-temperature.csv");

    private TerminalModel() {
    }

    /**
     * @param c   chemistry
     * @param soc state of charge, 0–1
     * @return rested cell voltage, V
     */
    public static double ocvCellV(Chemistry c, double soc) {
        return OCV.at(c, soc);
    }

    /**
     * @param c     chemistry
     * @param tempC cell temperature, °C
     * @return internal resistance ÷ its 25 °C value
     */
    public static double resistanceFactor(Chemistry c, double tempC) {
        return RESISTANCE.at(c, tempC);
    }

    private static Table load(String name) {
        try (InputStream in = TerminalModel.class.getResourceAsStream(name)) {
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String> source = new ArrayList<>();
            List<double[]> rows = new ArrayList<>();
            boolean header = false;
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#")) {
                    source.add(line.substring(1).strip());
                } else if (!header) {
                    header = true;
                } else if (!line.isBlank()) {
                    String[] f = line.split(",");
                    rows.add(new double[] {Double.parseDouble(f[0]), Double.parseDouble(f[1]), Double.parseDouble(f[2])});
                }
            }
            double[] x = new double[rows.size()], a = new double[rows.size()], b = new double[rows.size()];
            for (int i = 0; i < rows.size(); i++) {
                x[i] = rows.get(i)[0];
                a[i] = rows.get(i)[1];
                b[i] = rows.get(i)[2];
            }
            return new Table(name, List.copyOf(source), x, a, b);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
