package org.holdover.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.holdover.inverter.InverterSpec;
import org.holdover.project.InputException;
import org.holdover.project.Problem;
import org.junit.jupiter.api.Test;

/** The catalog's {@code maxInParallel}: read when given, 1 when left out, a located one-line problem when out of range. */
class InParallelCatalogTest {

    private static String builtinText() throws IOException {
        try (InputStream in = CatalogReader.class.getResourceAsStream(CatalogReader.BUILTIN_RESOURCE)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void theDemoCatalogLetsSomeUnitsRunInParallelAndOthersNot() {
        Catalog c = CatalogReader.builtin();
        InverterSpec small = c.inverters().stream().filter(i -> i.id().equals("DEMO-INV-12-1200")).findFirst().orElseThrow();
        InverterSpec split = c.inverters().stream().filter(i -> i.id().equals("DEMO-INV-48-4000S")).findFirst().orElseThrow();
        assertThat(small.maxInParallel()).isEqualTo(1);
        assertThat(split.maxInParallel()).isEqualTo(4);
        assertThat(split.units()).isEqualTo(1);
    }

    @Test
    void anOutOfRangeCountIsALocatedProblem() throws IOException {
        String text = builtinText().replaceFirst("(?m)^    price: 420$", "    price: 420\n    maxInParallel: 0");
        InputException e = catchThrowableOfType(() -> CatalogReader.parse(text, "parts.yaml", false), InputException.class);
        assertThat(e).isNotNull();
        assertThat(e.problems()).hasSize(1);
        Problem p = e.problems().get(0);
        assertThat(p.oneLine()).startsWith("parts.yaml:").contains("inverters[0].maxInParallel: must be 1–12, got 0")
                .doesNotContain("\n");
        String ok = builtinText().replaceFirst("(?m)^    price: 420$", "    price: 420\n    maxInParallel: 12");
        try {
            assertThat(CatalogReader.parse(ok, "parts.yaml", false).inverters().get(0).maxInParallel()).isEqualTo(12);
        } catch (InputException ex) {
            throw new AssertionError(ex.getMessage(), ex);
        }
    }
}
