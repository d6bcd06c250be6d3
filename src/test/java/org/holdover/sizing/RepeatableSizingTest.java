package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.holdover.project.ProjectReader;
import org.holdover.testing.Leaves;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The same inputs give the same numbers on every run: each demo project is read, assembled and sized
 * twice from scratch, and every value of the two results (every number of every record, list and array,
 * the hourly series included) must be identical, bit for bit (the search's timings aside).
 */
class RepeatableSizingTest {

    @ParameterizedTest
    @ValueSource(strings = {"examples/farm-shop-backup.yaml", "examples/ridge-cabin-offgrid.yaml"})
    void sizingTwiceGivesTheSameResultBitForBit(String demo) throws Exception {
        Map<String, Object> first = Leaves.of(Sizing.run(ProjectAssembler.assemble(ProjectReader.read(Path.of(demo), demo))));
        Map<String, Object> second = Leaves.of(Sizing.run(ProjectAssembler.assemble(ProjectReader.read(Path.of(demo), demo))));
        long numbers = Leaves.numbers(first);
        System.out.println(demo + ": " + first.size() + " values compared, " + numbers + " of them numbers");
        assertThat(numbers).as("the comparison reaches the hourly series").isGreaterThan(8760 * 3);
        assertThat(differences(first, second)).isEmpty();
    }

    /** The first differences between two leaf maps (Double.equals: bit for bit, so -0.0 differs from 0.0). */
    static List<String> differences(Map<String, Object> a, Map<String, Object> b) {
        List<String> out = new ArrayList<>();
        if (!a.keySet().equals(b.keySet())) {
            out.add("different shapes: " + a.size() + " vs " + b.size() + " values");
        }
        for (Map.Entry<String, Object> e : a.entrySet()) {
            if (e.getKey().startsWith("search.stats.") && e.getKey().endsWith("Millis")) {
                continue; // how long the search took is not a result
            }
            Object other = b.get(e.getKey());
            if (!Objects.equals(e.getValue(), other) && out.size() < 20) {
                out.add(e.getKey() + ": " + e.getValue() + " vs " + other);
            }
        }
        return out;
    }
}
