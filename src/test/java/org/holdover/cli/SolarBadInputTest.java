package org.holdover.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad input in the solar section, in a weather file and in a catalog's PV entries: one line per problem naming the
 * file and line, exit code 2, nothing written. And a PV check that fails: exit code 1 with the reason.
 */
class SolarBadInputTest {

    static final String SITE_TEMPS = "  recordLowC: -20\n  designHighC: 32\n";
    static final String SOLAR = "solar:\n"
            + "  monthlyGhiKwhM2Day: [1.8, 2.8, 4.0, 4.9, 5.6, 6.2, 6.4, 5.5, 4.3, 2.9, 1.9, 1.5]\n"
            + "  monthlyAirTempC: [0, 2, 6, 10, 14, 18, 21, 20, 16, 11, 5, 1]\n"
            + "  tiltDeg: 45\n";
    /** BadInputTest's small cabin with the site temperatures and a solar section (demo data). */
    static final String WITH_SOLAR = BadInputTest.BASE.replace("  batteryAmbientC: { coldest: 5, design: 15 }\n",
            "  batteryAmbientC: { coldest: 5, design: 15 }\n" + SITE_TEMPS) + SOLAR;

    static Stream<Arguments> cases() {
        return Stream.of(
                Arguments.of("no record low", WITH_SOLAR.replace("  recordLowC: -20\n", ""),
                        "site.recordLowC: is missing; the PV string voltage check (NEC 690.7) needs it"),
                Arguments.of("design high below the record low", WITH_SOLAR.replace("recordLowC: -20", "recordLowC: 5")
                        .replace("designHighC: 32", "designHighC: 0"), "site.designHighC: is 0 °C, not above the record low 5 °C"),
                Arguments.of("eleven months", WITH_SOLAR.replace("[1.8, 2.8, 4.0,", "[2.8, 4.0,"),
                        "solar.monthlyGhiKwhM2Day: has 11 values; 12 values, January first"),
                Arguments.of("more sun than the sky lets through", WITH_SOLAR.replace(", 1.9, 1.5]", ", 1.9, 9.5]"),
                        "solar.monthlyGhiKwhM2Day[11]: is 9.5 kWh/m²/day"),
                Arguments.of("monthly means and a weather file", WITH_SOLAR + "  weatherFile: w.csv\n",
                        "solar.weatherFile: both monthly means and a weather file are given"),
                Arguments.of("unknown controller type", WITH_SOLAR + "  controller: shunt\n",
                        "solar.controller: unknown controller type \"shunt\"; mppt or pwm"),
                Arguments.of("tilt beyond vertical", WITH_SOLAR.replace("tiltDeg: 45", "tiltDeg: 95"),
                        "solar.tiltDeg: must be 0–90 °, got 95"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reportsTheSolarSectionsProblemsAndWritesNothing(String name, String text, String expected, @TempDir Path dir)
            throws IOException {
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, text, StandardCharsets.UTF_8);
        Path out = dir.resolve("out.xlsx");
        Cli r = Cli.run("size", project.toString(), "-o", out.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains(expected);
        BadInputTest.assertOneLineProblems(r.err, project.toString());
        assertThat(Files.exists(out)).isFalse();
    }

    /** A weather file with a bad value: the one line names the weather file, its line and column. */
    @Test
    void aWeatherFileWithAnErrorIsReportedAtItsLine(@TempDir Path dir) throws IOException {
        List<String> lines = csv(8760);
        lines.set(2 + 100, "100,350.0,abc,120.0,4.5");
        Files.write(dir.resolve("weather.csv"), lines, StandardCharsets.UTF_8);
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, WITH_SOLAR.replaceAll("(?m)^  monthly.*\\n", "") + "  weatherFile: weather.csv\n",
                StandardCharsets.UTF_8);
        Path out = dir.resolve("out.xlsx");
        Cli r = Cli.run("size", project.toString(), "-o", out.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        String weather = dir.resolve("weather.csv").toString();
        assertThat(r.err.strip()).isEqualTo(weather + ":103:11: dni_w_m2: not a number: \"abc\"; a decimal number such as 412.5");
        BadInputTest.assertOneLineProblems(r.err, weather);
        assertThat(Files.exists(out)).isFalse();
    }

    /** A weather file of a leap year for a common year: the project field is named. */
    @Test
    void aWeatherFileOfTheWrongLength(@TempDir Path dir) throws IOException {
        Files.write(dir.resolve("weather.csv"), csv(8784), StandardCharsets.UTF_8);
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, WITH_SOLAR.replaceAll("(?m)^  monthly.*\\n", "") + "  weatherFile: weather.csv\n",
                StandardCharsets.UTF_8);
        Cli r = Cli.run("check", project.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains("solar.weatherFile: has 8784 hourly rows but the year 2025 has 8760 hours");
        BadInputTest.assertOneLineProblems(r.err, project.toString());
    }

    /** A catalog PV module whose V_mp is not below its V_oc: the catalog file, line and field. */
    @Test
    void aBadPvModuleInTheCatalog(@TempDir Path dir) throws IOException {
        String catalog = catalog().replace("vmpV: 18.6", "vmpV: 23.0");
        Files.writeString(dir.resolve("parts.yaml"), catalog, StandardCharsets.UTF_8);
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, WITH_SOLAR + "catalog: parts.yaml\n", StandardCharsets.UTF_8);
        Cli r = Cli.run("check", project.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        String parts = dir.resolve("parts.yaml").toString();
        int line = lineOf(catalog, "vmpV: 23.0");
        assertThat(r.err).contains(parts + ":" + line + ":").contains("pvModules[0].vmpV: 23.0 V is not below the open-circuit 22.4 V");
        BadInputTest.assertOneLineProblems(r.err, parts);
    }

    /** A catalog without PV modules cannot serve a solar section. */
    @Test
    void aCatalogWithoutPvModules(@TempDir Path dir) throws IOException {
        String catalog = catalog();
        catalog = catalog.substring(0, catalog.indexOf("pvModules:")) + catalog.substring(catalog.indexOf("chargeControllers:"));
        Files.writeString(dir.resolve("parts.yaml"), catalog, StandardCharsets.UTF_8);
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, WITH_SOLAR + "catalog: parts.yaml\n", StandardCharsets.UTF_8);
        Cli r = Cli.run("check", project.toString());
        assertThat(r.exit).as(r.err).isEqualTo(Main.BAD_INPUT);
        assertThat(r.err).contains("solar: the catalog \"test catalog, module without a Voc coefficient (demo data)\" lists no PV"
                + " modules (pvModules); add them to the catalog, or remove the solar section");
        BadInputTest.assertOneLineProblems(r.err, project.toString());
    }

    /**
     * A record low colder than NEC Table 690.7(A)'s last row (−40 °C) with a module that gives no V_oc coefficient: the
     * PV check fails, so the system fails (exit 1) and says why; the workbook is still written.
     */
    @Test
    void aFailingPvCheckFailsTheSystem(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("parts.yaml"), catalog(), StandardCharsets.UTF_8);
        Path project = dir.resolve("project.yaml");
        Files.writeString(project, WITH_SOLAR.replace("recordLowC: -20", "recordLowC: -45") + "catalog: parts.yaml\n",
                StandardCharsets.UTF_8);
        Path out = dir.resolve("out.xlsx");
        Cli r = Cli.run("size", project.toString(), "-o", out.toString());
        assertThat(r.exit).as(r.out + r.err).isEqualTo(Main.FAILS_CHECKS);
        assertThat(r.out).containsPattern("FAIL +Record low within NEC Table 690.7\\(A\\) \\(kelvin\\) +228");
        assertThat(Files.exists(out)).isTrue();
    }

    static String catalog() throws IOException {
        try (InputStream in = SolarBadInputTest.class.getResourceAsStream("/org/holdover/sizing/pv-table-catalog.yaml")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static int lineOf(String text, String needle) {
        return (int) text.substring(0, text.indexOf(needle)).chars().filter(c -> c == '\n').count() + 1;
    }

    /** Two comment lines, the header, then {@code hours} rows of a plain demo day (demo data). */
    static List<String> csv(int hours) {
        List<String> lines = new ArrayList<>();
        lines.add("# demo data: a plain day repeated, local standard time UTC+1");
        lines.add("hour,ghi_w_m2,dni_w_m2,dhi_w_m2,air_c");
        for (int h = 0; h < hours; h++) {
            int k = h % 24;
            double ghi = k >= 8 && k <= 16 ? 300.0 + 20 * k : 0.0;
            lines.add(String.format(Locale.ROOT, "%d,%.1f,%.1f,%.1f,%.1f", h, ghi, ghi > 0 ? 400.0 : 0.0, ghi > 0 ? 120.0 : 0.0,
                    5.0 + 0.3 * k));
        }
        return lines;
    }
}
