package org.holdover.sim;

import java.util.List;
import java.util.Optional;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;

/**
 * Random systems and hourly series for the property tests (demo data). Every scalar is decoded from a
 * number in [0, 1], so jqwik shrinks a failing case toward the simplest system.
 */
final class Scenarios {

    private Scenarios() {
    }

    /** Which generator a scenario may have. */
    enum GeneratorChoice {
        ANY, NONE_OR_LOAD_FOLLOWING, LOAD_FOLLOWING
    }

    record Scenario(SystemDesign design, HourlyConditions conditions, AnalysisOptions options) {
        @Override
        public String toString() {
            return design + ", load " + java.util.Arrays.toString(conditions.loadW) + ", pv "
                    + java.util.Arrays.toString(conditions.pvArrayW) + ", noCharge "
                    + java.util.Arrays.toString(conditions.chargeForbidden) + ", grid "
                    + java.util.Arrays.toString(conditions.gridAvailable);
        }
    }

    private static final int UNITS = 32;

    static Arbitrary<Scenario> scenarios(GeneratorChoice choice) {
        return Arbitraries.integers().between(1, 120).flatMap(n -> Combinators.combine(
                Arbitraries.doubles().between(0, 1).list().ofSize(UNITS),
                Arbitraries.doubles().between(0, 3000).list().ofSize(n),
                Arbitraries.doubles().between(0, 4000).list().ofSize(n),
                Arbitraries.of(true, false).list().ofSize(n),
                Arbitraries.of(true, false).list().ofSize(n))
                .as((u, load, pv, nc, grid) -> decode(choice, u, load, pv, nc, grid)));
    }

    /** Extra PV per hour for the more-PV property, W. */
    static Arbitrary<List<Double>> extraPv() {
        return Arbitraries.doubles().between(0, 2000).list().ofSize(120);
    }

    private static double lerp(double lo, double hi, double u) {
        return lo + (hi - lo) * u;
    }

    private static Scenario decode(GeneratorChoice choice, List<Double> u, List<Double> load, List<Double> pv,
                                   List<Boolean> nc, List<Boolean> grid) {
        int n = load.size();
        ChargeController controller = new ChargeController(lerp(0.8, 1, u.get(0)), lerp(200, 5000, u.get(1)));
        InverterLossModel inverter = new InverterLossModel(lerp(500, 5000, u.get(2)), lerp(0, 0.03, u.get(3)),
                lerp(0, 0.05, u.get(4)), lerp(0, 0.1, u.get(5)));
        double floor = lerp(0, 0.5, u.get(6));
        double ceiling = floor + (1 - floor) * lerp(0.2, 1, u.get(7));
        double initial = floor + (ceiling - floor) * u.get(8);
        BatteryBank bank = new BatteryBank(lerp(500, 30000, u.get(9)), floor, ceiling, initial,
                lerp(0.8, 1, u.get(10)), lerp(0.8, 1, u.get(11)), lerp(0, 5000, u.get(12)),
                lerp(0, 5000, u.get(13)));
        Charger charger = u.get(14) < 0.2 ? Charger.NONE
                : new Charger(lerp(0, 3000, u.get(15)), lerp(0.8, 1, u.get(16)));

        Optional<Generator> gen = Optional.empty();
        boolean wantGen = switch (choice) {
            case ANY, NONE_OR_LOAD_FOLLOWING -> u.get(17) >= 0.3;
            case LOAD_FOLLOWING -> true;
        };
        if (wantGen) {
            boolean cycle = choice == GeneratorChoice.ANY && u.get(18) < 0.5;
            double start = floor + (ceiling - floor) * lerp(0, 0.6, u.get(19));
            DispatchStrategy strategy = cycle
                    ? new DispatchStrategy.CycleCharging(Math.min(ceiling, start + (ceiling - start) * u.get(20)))
                    : new DispatchStrategy.LoadFollowing();
            double rated = lerp(500, 8000, u.get(21));
            gen = Optional.of(new Generator(rated, rated * lerp(0.5, 1, u.get(22)), lerp(0, 0.5, u.get(23)),
                    new FuelCurve(lerp(0.05, 0.1, u.get(24)), lerp(0.2, 0.3, u.get(25))), strategy, start));
        }
        SystemDesign design = new SystemDesign(controller, inverter, bank, charger, gen);

        HourlyConditions c = HourlyConditions.offGrid(toArray(load), toArray(pv));
        if (u.get(26) < 0.4) {
            c = c.withChargeForbidden(toBooleans(nc));
        }
        if (u.get(27) < 0.4) {
            c = c.withGridAvailable(toBooleans(grid));
        }
        AnalysisOptions options = new AnalysisOptions(List.of(floor + 0.1 * (ceiling - floor), 0.5),
                Optional.of(new BatteryAging(new CycleLifeCurve(new double[] {0.1, 0.5, 1.0},
                        new double[] {20000, 5000, 2000}), 15)));
        return new Scenario(design, c, options);
    }

    static double[] toArray(List<Double> values) {
        double[] a = new double[values.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = values.get(i);
        }
        return a;
    }

    private static boolean[] toBooleans(List<Boolean> values) {
        boolean[] a = new boolean[values.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = values.get(i);
        }
        return a;
    }
}
