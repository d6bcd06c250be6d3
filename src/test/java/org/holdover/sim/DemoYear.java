package org.holdover.sim;

import java.util.List;
import java.util.Optional;
import java.util.Random;

/**
 * A synthetic year for tests and the benchmark. Demo data: invented load and PV shapes, not measured.
 */
final class DemoYear {

    private DemoYear() {
    }

    static final int HOURS = 8760;

    /** Load: 120 W base, 400 W mornings 06-08, 900 W evenings 17-22, seeded noise. */
    static double[] loadW(long seed) {
        Random rnd = new Random(seed);
        double[] l = new double[HOURS];
        for (int t = 0; t < HOURS; t++) {
            int h = t % 24;
            double base = h >= 17 && h < 22 ? 900 : h >= 6 && h < 9 ? 400 : 120;
            l[t] = base * (0.8 + 0.4 * rnd.nextDouble());
        }
        return l;
    }

    /** PV: half-sine 06-18 with a seasonal peak of 2.0-3.5 kW and day-to-day cloudiness in runs. */
    static double[] pvArrayW(long seed) {
        Random rnd = new Random(seed + 1);
        double[] g = new double[HOURS];
        double clearness = 1;
        for (int d = 0; d < HOURS / 24; d++) {
            if (rnd.nextDouble() < 0.3) {
                clearness = rnd.nextDouble() < 0.4 ? 0.1 + 0.2 * rnd.nextDouble() : 0.6 + 0.4 * rnd.nextDouble();
            }
            double season = 2750 - 750 * Math.cos(2 * Math.PI * (d - 172) / 365.0 + Math.PI);
            for (int h = 6; h < 18; h++) {
                g[d * 24 + h] = season * clearness * Math.sin(Math.PI * (h - 6 + 0.5) / 12);
            }
        }
        return g;
    }

    static HourlyConditions conditions(long seed) {
        return HourlyConditions.offGrid(loadW(seed), pvArrayW(seed));
    }

    /** 3 kW inverter, 10 kWh LFP-like bank, 4 kW controller; generator per argument. */
    static SystemDesign design(Optional<DispatchStrategy> strategy) {
        ChargeController controller = new ChargeController(0.97, 4000);
        InverterLossModel inverter = new InverterLossModel(3000, 0.008, 0.012, 0.04);
        BatteryBank bank = new BatteryBank(10_000, 0.1, 1.0, 0.8, 0.96, 0.96, 5000, 5000);
        Optional<Generator> gen = strategy.map(s -> new Generator(5000, 4500, 0.3, FuelCurve.FROM_MEMORY_DIESEL,
                s, 0.3));
        return new SystemDesign(controller, inverter, bank, new Charger(2500, 0.9), gen);
    }

    static AnalysisOptions fullOptions() {
        return new AnalysisOptions(List.of(0.2, 0.3, 0.5), Optional.of(new BatteryAging(
                new CycleLifeCurve(new double[] {0.1, 0.3, 0.5, 0.8, 1.0},
                        new double[] {40000, 12000, 7000, 4500, 3500}), 15)));
    }
}
