package org.holdover.solar;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.holdover.testing.Fuzz;
import org.holdover.testing.Mutator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fuzzing the weather readers ({@link EpwReader}, {@link WeatherCsvReader}) with mutations of complete
 * demo years (common and leap), read from a file. Property of {@link Fuzz}.
 */
class WeatherReaderFuzzTest {

    private static final int CI_TRIES = 300;

    @Test
    void mutatedEpwFilesGiveOnlyOneLineInputProblems(@TempDir Path dir) {
        List<byte[]> seeds = List.of(Fuzz.utf8(WeatherFixtures.text(WeatherFixtures.epwLines(false))),
                Fuzz.utf8(WeatherFixtures.text(WeatherFixtures.epwLines(true))));
        Path file = dir.resolve("site.epw");
        Fuzz.of("weather-epw", 31, CI_TRIES).run(file.toString(),
                r -> Mutator.mutate(seeds.get(r.nextInt(seeds.size())), Mutator.Kind.CSV, r),
                (input, r) -> {
                    Files.write(file, input);
                    EpwReader.read(file);
                });
    }

    @Test
    void mutatedWeatherCsvFilesGiveOnlyOneLineInputProblems(@TempDir Path dir) throws IOException {
        List<byte[]> seeds = List.of(Fuzz.utf8(WeatherFixtures.text(WeatherFixtures.csvLines(8760))),
                Fuzz.utf8(WeatherFixtures.text(WeatherFixtures.csvLines(8784))));
        Path file = dir.resolve("site.csv");
        Fuzz.of("weather-csv", 32, CI_TRIES).run(file.toString(),
                r -> Mutator.mutate(seeds.get(r.nextInt(seeds.size())), Mutator.Kind.CSV, r),
                (input, r) -> {
                    Files.write(file, input);
                    WeatherCsvReader.read(file);
                });
    }
}
