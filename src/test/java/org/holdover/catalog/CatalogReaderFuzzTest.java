package org.holdover.catalog;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.holdover.testing.Fuzz;
import org.holdover.testing.Mutator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Fuzzing user catalog files ({@link CatalogReader#read}) with mutations of the built-in demo catalog, in
 * YAML and in JSON, and of a one-inverter, one-module catalog. Property of {@link Fuzz}.
 */
class CatalogReaderFuzzTest {

    private static final int CI_TRIES = 700;

    /** A small user catalog (demo data, invented). */
    static final String SMALL = String.join("\n",
            "name: My parts (demo data)",
            "demoData: true",
            "inverters:",
            "  - id: INV-A",
            "    busClassV: 48",
            "    dcWindowV: { min: 42, max: 64 }",
            "    ac: { voltsRms: 230, frequenciesHz: [50], splitPhase: false }",
            "    continuousW: 3000",
            "    surge: [{ seconds: 5, va: 6000 }]",
            "    efficiency: [{ loadPct: 10, pct: 90 }, { loadPct: 50, pct: 94 }, { loadPct: 100, pct: 92 }]",
            "    noLoadW: 20",
            "    price: 900",
            "batteryModules:",
            "  - id: BAT-A",
            "    chemistry: lifepo4",
            "    nominalV: 51.2",
            "    capacityAh: 100",
            "    rateHours: 5",
            "    internalResistanceMilliohm: 15",
            "    maxContinuousA: 100",
            "    maxChargeA: 50",
            "    maxParallel: 8",
            "    price: 1500",
            "");

    static String builtinText() throws IOException {
        try (InputStream in = CatalogReader.class.getResourceAsStream(CatalogReader.BUILTIN_RESOURCE)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void mutatedYamlCatalogsGiveOnlyOneLineInputProblems(@TempDir Path dir) throws Exception {
        CatalogReader.parse(SMALL, "small", false);
        List<byte[]> seeds = List.of(Fuzz.utf8(builtinText()), Fuzz.utf8(SMALL));
        run("catalog-yaml", 21, dir.resolve("my-parts.yaml"), seeds, Mutator.Kind.YAML);
    }

    @Test
    void mutatedJsonCatalogsGiveOnlyOneLineInputProblems(@TempDir Path dir) throws IOException {
        ObjectMapper yaml = new YAMLMapper();
        ObjectMapper json = new ObjectMapper();
        List<byte[]> seeds = List.of(
                json.writerWithDefaultPrettyPrinter().writeValueAsBytes(yaml.readTree(builtinText())),
                json.writeValueAsBytes(yaml.readTree(SMALL)));
        run("catalog-json", 22, dir.resolve("my-parts.json"), seeds, Mutator.Kind.JSON);
    }

    private static void run(String name, long salt, Path file, List<byte[]> seeds, Mutator.Kind kind) {
        String display = "catalogs/" + file.getFileName();
        Fuzz.of(name, salt, CI_TRIES).run(display,
                r -> Mutator.mutate(seeds.get(r.nextInt(seeds.size())), kind, r),
                (input, r) -> {
                    Files.write(file, input);
                    CatalogReader.read(file, display);
                });
    }
}
