package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.holdover.pv.ArrayCandidate;
import org.holdover.pv.ControllerSeries;
import org.holdover.pv.StringWindow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * String length and the NEC 690.7 / 690.8 checks through the whole sizing, the direction of the record low's
 * effect, and the energy balance of the chain. Sources beside each check.
 */
class PvChecksTest {

    /** Values typed from the datasheet and the table: exact to rounding. */
    private static final double TYPED = 1e-9;
    /** A year of hourly energies in Wh (up to ~1e8) summed in different orders. */
    private static final double BALANCE_WH = 1e-6;

    /** A small off-grid cabin on the test catalog (demo data), tilt fixed so the run is short. */
    static String project(double recordLowC) {
        return String.join("\n",
                "name: Test cabin with a Table 690.7(A) module (demo data)",
                "mode: off-grid",
                "site:",
                "  latitudeDeg: 45.0",
                "  longitudeDeg: 7.0",
                "  timeZone: Europe/Rome",
                "  year: 2025",
                "  ac: { voltsRms: 230, frequencyHz: 50, wiring: single }",
                "  batteryAmbientC: { coldest: 5, design: 15 }",
                "  recordLowC: " + recordLowC,
                "  designHighC: 30",
                "loads:",
                "  appliances:",
                "    - name: Fridge",
                "      watts: 120",
                "      powerFactor: 0.75",
                "      dutyCycle: 0.35",
                "      motor: { startMultiple: 6, startSeconds: 0.5 }",
                "    - name: Lights",
                "      watts: 100",
                "      hoursPerDay: 4",
                "      hours: [\"18-23\"]",
                "offGrid:",
                "  autonomyDays: 2",
                "catalog: pv-table-catalog.yaml",
                "solar:",
                "  monthlyGhiKwhM2Day: [1.8, 2.8, 4.0, 4.9, 5.6, 6.2, 6.4, 5.5, 4.3, 2.9, 1.9, 1.5]",
                "  monthlyAirTempC: [0, 2, 6, 10, 14, 18, 21, 20, 16, 11, 5, 1]",
                "  tiltDeg: 50",
                "");
    }

    static SizingResult sizeTableProject(Path dir, double recordLowC) throws IOException, InputException {
        try (InputStream in = PvChecksTest.class.getResourceAsStream("pv-table-catalog.yaml")) {
            Files.write(dir.resolve("pv-table-catalog.yaml"), in.readAllBytes());
        }
        Path p = dir.resolve("project.yaml");
        Files.writeString(p, project(recordLowC), StandardCharsets.UTF_8);
        return Sizing.run(ProjectAssembler.assemble(ProjectReader.read(p, p.toString())));
    }

    /**
     * NEC Table 690.7(A) (NFPA 70, same factors in the 2017, 2020 and 2023 editions; REFERENCES.md §5a, confidence C):
     * a module without a V_oc coefficient takes the table factor of the record low's row, the colder row between rows.
     */
    @ParameterizedTest(name = "record low {0} °C: factor {1}")
    @CsvSource({"-25, 1.20", "-22.5, 1.20", "-7, 1.14", "-35.5, 1.25", "3, 1.10"})
    void aModuleWithoutVocCoefficientTakesTheTableFactor(double recordLowC, double factor, @TempDir Path dir)
            throws IOException, InputException {
        SizingResult r = sizeTableProject(dir, recordLowC);
        ArrayCandidate c = r.solar().chosen().candidate();
        int n = c.modulesPerString();
        // V_oc 22.4 V per module on the test datasheet.
        assertThat(PvSizingChainTest.check(r, PvSizing.COLD_VOC).value()).isCloseTo(n * 22.4 * factor, within(TYPED));
        // The string is as long as the 100 V controller allows, or as short as charging needs (whichever the price picks),
        // and never longer than ⌊100 ÷ (22.4 × factor)⌋.
        assertThat(n).isLessThanOrEqualTo((int) Math.floor(100 / (22.4 * factor)));
        // NEC 690.8(A)(1): 1.25 × I_sc 5.75 A × strings ≤ 30 A.
        assertThat(PvSizingChainTest.check(r, PvSizing.INPUT_CURRENT).value())
                .isCloseTo(1.25 * 5.75 * c.stringsPerController(), within(TYPED));
        assertThat(PvSizingChainTest.check(r, PvSizing.INPUT_CURRENT).limit()).isEqualTo(30.0);
        assertThat(r.checks()).noneMatch(k -> k.id().equals(PvSizing.RECORD_LOW_IN_TABLE));
        assertThat(r.passes()).as(r.checks().toString()).isTrue();
    }

    /** Below −40 °C the table has no row (NEC Table 690.7(A)'s last row is −36 to −40 °C): the system fails. */
    @Test
    void aRecordLowBelowTheTableFailsTheSystem(@TempDir Path dir) throws IOException, InputException {
        SizingResult r = sizeTableProject(dir, -45);
        Check below = PvSizingChainTest.check(r, PvSizing.RECORD_LOW_IN_TABLE);
        assertThat(below.passes()).isFalse();
        assertThat(below.value()).isCloseTo(-45 + 273.15, within(TYPED));
        assertThat(below.margin()).isNegative();
        assertThat(r.passes()).isFalse();
    }

    /**
     * The string window of every module and controller pair, and the string chosen for it, never grows as the record low
     * gets colder: V_oc rises in the cold (NEC 690.7(A)(1): V_oc,max = V_oc (1 + β (T_min − 25)) with β &lt; 0).
     */
    @Test
    void aColderRecordLowNeverAllowsALongerString() {
        SizingResult base = Demos.cabin();
        SizingInput in = base.input();
        Map<String, Integer> lastMax = new HashMap<>();
        Map<String, Integer> lastChosen = new HashMap<>();
        int windows = 0;
        for (double low = 20; low >= -50; low -= 5) {
            SolarSetup s = Demos.withRecordLow(in.solar(), low, 60.0);
            SolarDesign d = PvSizing.size(Demos.withSolar(in, s), base.chosen(), base.energy());
            for (PvOption o : d.options()) {
                String key = o.module().id() + " on " + o.controller().id();
                StringWindow w = o.candidate().perController().window();
                int max = w.maxModules();
                int n = o.candidate().modulesPerString();
                if (lastMax.containsKey(key)) {
                    assertThat(max).as("%s: most modules at %s °C", key, low).isLessThanOrEqualTo(lastMax.get(key));
                    if (!w.isEmpty()) {
                        assertThat(n).as("%s: chosen string at %s °C", key, low).isLessThanOrEqualTo(lastChosen.get(key));
                    }
                }
                lastMax.put(key, max);
                if (!w.isEmpty()) {
                    lastChosen.put(key, n);
                    windows++;
                }
                // The chosen string's cold V_oc never exceeds the controller's limit when the window is not empty.
                if (!w.isEmpty()) {
                    assertThat(n * w.coldVoc().moduleVocV()).isLessThanOrEqualTo(o.controller().controller().maxPvInputV());
                }
            }
        }
        assertThat(windows).as("pairs with a usable window").isGreaterThan(20);
        // At −50 °C the 150 V controller still takes three 60-cell modules, 3 × 40.8 × (1 + 0.0029 × 75) = 149.0 V, never four.
        assertThat(lastMax.get("DEMO-PV-330-60 on DEMO-MPPT-150-60")).isEqualTo((int) Math.floor(150 / (40.8 * (1 + 0.0029 * 75))));
    }

    /**
     * First law on the chain of every option of both demos: sunlight on the modules ≥ array DC ≥ drawn by the
     * controllers ≥ delivered; each hour the array's DC is drawn, given up (PWM) or clipped, nothing else.
     */
    @Test
    void energyOnlyLeavesTheChain() {
        for (SizingResult r : new SizingResult[] {Demos.cabin(), Demos.farm()}) {
            for (PvOption o : r.solar().options()) {
                ControllerSeries out = o.output();
                double poa = o.dc().annualPoaOnArrayWh();
                double dc = o.dc().annualDcWh();
                assertThat(poa).isGreaterThan(dc);
                assertThat(dc).isCloseTo(out.annualAvailableDcWh(), within(BALANCE_WH));
                assertThat(out.annualDrawnDcWh()).isLessThanOrEqualTo(dc + BALANCE_WH);
                assertThat(out.annualOutputWh()).isLessThan(out.annualDrawnDcWh());
                assertThat(out.annualOutputWh()).isPositive();
                for (int h = 0; h < out.hours(); h++) {
                    double balance = out.availableDcW(h) - out.drawnDcW(h) - out.pwmGivenUpW(h) - out.clippedDcW(h);
                    assertThat(Math.abs(balance)).isLessThanOrEqualTo(1e-9 * Math.max(1, out.availableDcW(h)));
                    assertThat(o.poa().effectiveWm2(h)).isLessThanOrEqualTo(o.poa().totalWm2(h) + 1e-9);
                    assertThat(out.outputW(h)).isLessThanOrEqualTo(out.maxOutputW() + 1e-9);
                }
                // The module converts at most its STC efficiency of the sunlight at 25 °C; cold cells do a little better.
                assertThat(dc / poa).isLessThan(o.module().module().efficiencyStc() * 1.1);
            }
        }
    }
}
