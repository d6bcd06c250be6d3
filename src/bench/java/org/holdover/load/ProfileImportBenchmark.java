package org.holdover.load;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.holdover.project.InputException;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Time to import a year of 1-minute readings (525,600 rows, {@code timestamp,W}, clock time with daylight
 * saving; demo data from {@link MinuteProfiles}, about 13 MB) into hourly means. Run with
 * {@code mvn -B -Pbench test-compile exec:exec -Djmh.args="ProfileImport"}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@State(Scope.Benchmark)
public class ProfileImportBenchmark {

    private Path dir;
    private Path file;

    @Setup(Level.Trial)
    public void writeTheYear() throws IOException {
        dir = Files.createTempDirectory("holdover-bench");
        file = dir.resolve("minute-year.csv");
        MinuteProfiles.write(file);
    }

    @TearDown(Level.Trial)
    public void removeIt() throws IOException {
        Files.deleteIfExists(file);
        Files.deleteIfExists(dir);
    }

    /** Read, parse every row, place it in its standard-time hour, check, and average. */
    @Benchmark
    public MeasuredProfile importMinuteYear() throws InputException {
        return ProfileCsvReader.read(file, "minute-year.csv", MinuteProfiles.YEAR, MinuteProfiles.ZONE, 0);
    }
}
