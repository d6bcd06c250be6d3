package org.holdover.sizing;

import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The system search's rates on the cabin demo (demo data): whole systems through the cheap checks per second,
 * candidate systems simulated per second (one thread, and all cores in batches as the search runs them; each
 * candidate is two simulated years: a warm-up year and the year measured), and the whole search. Run with
 * {@code mvn -B -Pbench test-compile exec:exec -Djmh.args="SystemSearch"}; add {@code -prof gc} for allocation.
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 3, time = 4)
@Fork(value = 1, jvmArgs = {"-Xmx2g"})
@State(Scope.Benchmark)
public class SystemSearchBenchmark {

    static final int BATCH = 256;

    private SizingInput cabin;
    private List<SystemSearch.Cand> candidates;
    private double[] batteryTemp;
    private int next;

    @Setup(Level.Trial)
    public void setUp() throws InputException {
        String f = "examples/ridge-cabin-offgrid.yaml";
        cabin = ProjectAssembler.assemble(ProjectReader.read(java.nio.file.Path.of(f), f));
        candidates = SystemSearch.candidates(cabin);
        batteryTemp = new double[cabin.loads().calendar().hours()];
        Arrays.fill(batteryTemp, cabin.batteryDesignC());
        System.out.println("candidates passing the cheap checks: " + candidates.size());
    }

    /** Every component check of the cabin and the systems whose parts pass (one operation = one whole system). */
    @Benchmark
    public int cheapChecksWholeCatalog() {
        return SystemSearch.candidates(cabin).size();
    }

    /** One candidate's simulated year on one thread. */
    @Benchmark
    public double simulateOneCandidate() {
        SystemSearch.Cand c = candidates.get(next++ % candidates.size());
        return SystemSearch.simulate(cabin, c, batteryTemp, "", SearchResult.Objective.CAPITAL).unmetWh();
    }

    private final SystemSearch.Conditions cache = new SystemSearch.Conditions();

    /**
     * A batch of candidates on all cores, as the search runs them: the next {@value #BATCH} in cost order, handed to the
     * threads grouped by inverter and battery module, sharing conditions (one operation = one candidate).
     */
    @Benchmark
    @OperationsPerInvocation(BATCH)
    public double simulateBatchAllCores() {
        int from = next;
        next += BATCH;
        List<SystemSearch.Cand> batch = new java.util.ArrayList<>(BATCH);
        for (int k = 0; k < BATCH; k++) {
            batch.add(candidates.get((from + k) % candidates.size()));
        }
        return SystemSearch.simulateBatch(cabin, batch, batteryTemp, SearchResult.Objective.CAPITAL, cache)[0].unmetWh();
    }

    /** The whole search with its frontier and sensitivity cases (one operation = one search). */
    @Benchmark
    public Object wholeSearch() {
        return SystemSearch.run(cabin, SystemSearch.Options.defaults());
    }
}
