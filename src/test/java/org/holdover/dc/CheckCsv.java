package org.holdover.dc;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Reads one numeric column of a test check CSV (comment lines and the header skipped). */
final class CheckCsv {

    private CheckCsv() {
    }

    static List<Double> column(String resource, int index) throws Exception {
        List<Double> out = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                CheckCsv.class.getResourceAsStream(resource), StandardCharsets.UTF_8))) {
            boolean header = true;
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                out.add(Double.parseDouble(line.split(",")[index].trim()));
            }
        }
        return out;
    }
}
