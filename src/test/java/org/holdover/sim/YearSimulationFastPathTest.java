package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Optional;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The metrics-only path against the traced path on a full demo year (seeded), for each generator choice. */
class YearSimulationFastPathTest {

    /** Sums of 8,760 values recomputed in the same order: identical; in another order: rounding. */
    private static final double RELATIVE = 1e-12;

    static Stream<Optional<DispatchStrategy>> strategies() {
        return Stream.of(Optional.empty(), Optional.of(new DispatchStrategy.LoadFollowing()),
                Optional.of(new DispatchStrategy.CycleCharging(0.8)));
    }

    @ParameterizedTest
    @MethodSource("strategies")
    void fastPathEqualsTracedPathExactly(Optional<DispatchStrategy> strategy) {
        SystemDesign design = DemoYear.design(strategy);
        HourlyConditions year = DemoYear.conditions(7);
        SimulationMetrics fast = YearSimulation.run(design, year, DemoYear.fullOptions());
        TracedYear traced = YearSimulation.runTraced(design, year, DemoYear.fullOptions());
        assertThat(fast).isEqualTo(traced.metrics());

        // The trace re-summed in hour order gives the metrics exactly.
        HourlyTrace tr = traced.trace();
        double unmet = 0;
        double fuel = 0;
        int on = 0;
        double lowest = Double.POSITIVE_INFINITY;
        for (int t = 0; t < tr.hours(); t++) {
            unmet += tr.unmetW[t];
            fuel += tr.fuelL[t];
            on += tr.generatorOn[t] ? 1 : 0;
            lowest = Math.min(lowest, tr.soc[t]);
        }
        assertThat(fast.reliability().unmetWh()).isEqualTo(unmet);
        assertThat(fast.generator().fuelL()).isEqualTo(fuel);
        assertThat(fast.generator().hours()).isEqualTo(on);
        assertThat(fast.battery().lowestSoc()).isEqualTo(lowest);

        // Battery life from the public rainflow API on the traced series (initial value first) agrees with
        // the streaming count inside the simulation.
        double[] history = new double[tr.hours() + 1];
        history[0] = design.battery().initialSoc();
        System.arraycopy(tr.soc(), 0, history, 1, tr.hours());
        double damage = Rainflow.minerDamage(history, DemoYear.fullOptions().aging().orElseThrow().cycleLife(),
                YearSimulation.RAINFLOW_GATE_SOC);
        BatteryLife life = fast.battery().life().orElseThrow();
        assertThat(life.cycleDamagePerYear()).isCloseTo(damage, within(damage * RELATIVE));
        assertThat(life.lifeYears()).isCloseTo(Math.min(1 / damage, 15), within(15 * RELATIVE));
    }
}
