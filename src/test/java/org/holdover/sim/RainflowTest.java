package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class RainflowTest {

    /** ASTM E1049-85 Fig. 6 history (REFERENCES.md §8, confirmed C). */
    private static final double[] FIG6 = {-2, 1, -3, 5, -1, 3, -4, 4, -2};

    /** The ranges are differences of small integers: exact in binary floating point. */
    private static final double EXACT = 0;

    @Test
    void countsTheFigure6RangesInTheStandardsOrder() throws IOException {
        // Source: ASTM E1049-85 §5.4.4, Fig. 6 (REFERENCES.md §8), rows of the CSV in counting order.
        List<RainflowCycle> expected = new ArrayList<>();
        try (var in = getClass().getResourceAsStream("astm-e1049-fig6-cycles.csv");
             var reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split(",");
                expected.add(new RainflowCycle(Double.parseDouble(f[0]), Double.parseDouble(f[1]),
                        Double.parseDouble(f[2])));
            }
        }
        assertThat(expected).hasSize(7);
        assertThat(Rainflow.count(FIG6)).containsExactlyElementsOf(expected);
    }

    @Test
    void figure6TotalsByRange() {
        // ASTM E1049-85 Fig. 6 totals (REFERENCES.md §8): range 3: 0.5, 4: 1.5, 6: 0.5, 8: 1.0, 9: 0.5;
        // 4.0 cycles in all, one full and six halves.
        Map<Double, Double> byRange = new TreeMap<>();
        for (RainflowCycle c : Rainflow.count(FIG6)) {
            byRange.merge(c.range(), c.count(), Double::sum);
        }
        assertThat(byRange).containsExactlyEntriesOf(new TreeMap<>(Map.of(3.0, 0.5, 4.0, 1.5, 6.0, 0.5, 8.0, 1.0,
                9.0, 0.5)));
        List<RainflowCycle> all = Rainflow.count(FIG6);
        assertThat(all.stream().mapToDouble(RainflowCycle::count).sum()).isCloseTo(4.0, within(EXACT));
        assertThat(all.stream().filter(c -> c.count() == 1)).hasSize(1);
        assertThat(all.stream().filter(c -> c.count() == 0.5)).hasSize(6);
        // Largest range = max - min of the history (REFERENCES.md §8).
        assertThat(all.stream().mapToDouble(RainflowCycle::range).max().orElseThrow()).isEqualTo(9.0);
    }

    @Test
    void pointsThatAreNotPeaksOrValleysAreDroppedFirst() {
        // The standard counts peaks and valleys only (ASTM E1049-85 §3 definitions, §5.4.4): the same
        // history with plateaus and intermediate points on its slopes must count the same.
        double[] padded = {-2, -2, 0, 1, 1, 0.5, -3, 0, 2, 5, 5, -1, 1, 3, 0, -4, 4, 4, 1, -2, -2};
        assertThat(Rainflow.count(padded)).isEqualTo(Rainflow.count(FIG6));
    }

    @Test
    void minerDamageSumsCountsOverCyclesToFailure() {
        // Miner's rule by hand for the Fig. 6 history scaled to a state of charge (÷ 10): ranges 0.3 (0.5),
        // 0.4 (0.5 + 1), 0.8 (0.5 + 0.5), 0.9 (0.5), 0.6 (0.5), against a two-point curve N = 1000 at
        // DoD 0.1 and N = 100 at DoD 1.0: a power law N = 100 * DoD^-1, so damage per cycle = DoD / 100.
        double[] soc = new double[FIG6.length];
        for (int i = 0; i < soc.length; i++) {
            soc[i] = 0.5 + FIG6[i] / 10;
        }
        CycleLifeCurve curve = new CycleLifeCurve(new double[] {0.1, 1.0}, new double[] {1000, 100});
        double expected = (0.5 * 0.3 + 1.5 * 0.4 + 1.0 * 0.8 + 0.5 * 0.9 + 0.5 * 0.6) / 100;
        assertThat(Rainflow.minerDamage(soc, curve)).isCloseTo(expected, within(1e-15));
    }
}
