package org.holdover.sim;

import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Time and allocation per simulated year (8,760 hours, demo data). Run with
 * {@code mvn -B -Pbench test-compile exec:exec -Djmh.args="YearSimulation -prof gc"}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class YearSimulationBenchmark {

    private HourlyConditions year;
    private SystemDesign pvBattery;
    private SystemDesign loadFollowing;
    private SystemDesign cycleCharging;
    private AnalysisOptions full;

    @Setup
    public void setUp() {
        year = DemoYear.conditions(7);
        pvBattery = DemoYear.design(Optional.empty());
        loadFollowing = DemoYear.design(Optional.of(new DispatchStrategy.LoadFollowing()));
        cycleCharging = DemoYear.design(Optional.of(new DispatchStrategy.CycleCharging(0.8)));
        full = DemoYear.fullOptions();
    }

    /** Balance and energy metrics only. */
    @Benchmark
    public SimulationMetrics pvBatteryMetricsOnly() {
        return YearSimulation.run(pvBattery, year, AnalysisOptions.NONE);
    }

    /** Plus thresholds, rainflow counting and battery life. */
    @Benchmark
    public SimulationMetrics pvBatteryWithLife() {
        return YearSimulation.run(pvBattery, year, full);
    }

    @Benchmark
    public SimulationMetrics loadFollowingWithLife() {
        return YearSimulation.run(loadFollowing, year, full);
    }

    @Benchmark
    public SimulationMetrics cycleChargingWithLife() {
        return YearSimulation.run(cycleCharging, year, full);
    }

    /** The traced path: allocates the 21 hourly arrays. */
    @Benchmark
    public TracedYear cycleChargingTraced() {
        return YearSimulation.runTraced(cycleCharging, year, full);
    }
}
