package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

class OutageWindowsTest {

    /** Sums of at most 8,760 values below 1e4: rounding stays far below a milliwatt-hour. */
    private static final double WH = 1e-6;

    @Test
    void findsAPlantedCloudySpell() {
        // Demo data: 300 W load every hour, 1 kW of PV 09-16 every day except days 200-201 (no sun).
        double[] load = new double[8760];
        double[] pv = new double[8760];
        for (int t = 0; t < 8760; t++) {
            load[t] = 300;
            int day = t / 24;
            int hour = t % 24;
            if (hour >= 9 && hour < 17 && day != 200 && day != 201) {
                pv[t] = 1000;
            }
        }
        OutageWindows.Window w = OutageWindows.hardest(load, pv, 48);
        // Net load is 300 W in every sunless hour; days 200-201 give 48 such hours in a row, and the window
        // may start up to 9 hours earlier or end 7 hours later without taking in sun: the earliest wins.
        assertThat(w.startHour()).isEqualTo(200 * 24 - 7);
        assertThat(w.netLoadWh()).isCloseTo(48 * 300, within(WH));
    }

    @Test
    void agreesWithBruteForceOnSeededRandomData() {
        // Independent check: every window summed from scratch, O(n * N). Seeded, so repeatable.
        Random rnd = new Random(42);
        int n = 2000;
        double[] load = new double[n];
        double[] pv = new double[n];
        for (int t = 0; t < n; t++) {
            load[t] = 100 + 900 * rnd.nextDouble();
            pv[t] = rnd.nextDouble() < 0.4 ? 2000 * rnd.nextDouble() : 0;
        }
        for (int duration : new int[] {1, 24, 72, 500}) {
            int best = -1;
            double bestSum = Double.NEGATIVE_INFINITY;
            for (int s = 0; s + duration <= n; s++) {
                double sum = 0;
                for (int t = s; t < s + duration; t++) {
                    sum += load[t] - pv[t];
                }
                if (sum > bestSum + WH) {
                    best = s;
                    bestSum = sum;
                }
            }
            OutageWindows.Window w = OutageWindows.hardest(load, pv, duration);
            assertThat(w.startHour()).as("duration " + duration).isEqualTo(best);
            assertThat(w.netLoadWh()).isCloseTo(bestSum, within(WH));
        }
    }

    @Test
    void flagsOutagesAtGivenStarts() {
        boolean[] up = OutageWindows.gridAvailable(10, 3, 1, 6);
        assertThat(up).containsExactly(true, false, false, false, true, true, false, false, false, true);
        assertThatThrownBy(() -> OutageWindows.gridAvailable(10, 3, 8))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("does not fit");
    }
}
