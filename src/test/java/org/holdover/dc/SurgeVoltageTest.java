package org.holdover.dc;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

class SurgeVoltageTest {

    /** Hand arithmetic carried to 6 significant digits. */
    private static final double HAND_V = 1e-4;

    /** Brent solver absolute accuracy on the current, A; the voltage then agrees to R × this. */
    private static final double BRENT_ABS_A = 1e-10;

    /**
     * Demo data: 16-cell LFP-like bank at low charge, 51.2 V open circuit, 0.020 Ω bank, 0.005 Ω cable,
     * inverter drawing 6000 W during a pump start, cutoff 44 V, battery limit 200 A.
     *
     * <pre>
     * R = 0.020 + 0.005 = 0.025 Ω
     * 4PR = 4 × 6000 × 0.025 = 600;  V_oc² = 51.2² = 2621.44;  D = 2021.44;  √D = 44.96043
     * V_inv = (51.2 + 44.96043) / 2 = 48.08021 V
     * I = 6000 / 48.08021 = 124.7915 A   (check: 51.2 − 124.7915 × 0.025 = 48.08021)
     * V_bat = 51.2 − 124.7915 × 0.020 = 48.70417 V
     * margin = 48.08021 − 44 = 4.08021 V = 9.273 % of the cutoff
     * </pre>
     */
    private static final SurgeInput DEMO = new SurgeInput(51.2, 0.020, 0.005, 6000.0, 44.0, 200.0);

    @Test
    void handCalculation() {
        SurgeResult r = SurgeVoltage.solve(DEMO);
        assertThat(r).isInstanceOf(SurgeResult.Operating.class);
        SurgeResult.Operating op = (SurgeResult.Operating) r;
        assertThat(op.inverterTerminalV()).isCloseTo(48.08021, offset(HAND_V));
        assertThat(op.currentA()).isCloseTo(124.7915, offset(HAND_V));
        assertThat(op.batteryTerminalV()).isCloseTo(48.70417, offset(HAND_V));
        assertThat(op.cutoffMarginV()).isCloseTo(4.08021, offset(HAND_V));
        assertThat(op.cutoffMarginPct()).isCloseTo(9.273, offset(0.001));
        assertThat(op.currentLimitRatio()).isCloseTo(124.7915 / 200.0, offset(1e-6));
        assertThat(op.cableDropV()).isCloseTo(124.7915 * 0.005, offset(1e-6));
        assertThat(op.passes()).isTrue();
    }

    @Test
    void agreesWithAnIndependentRootFinder() {
        // Independent method: Commons Math BrentSolver on the power-balance residual f(I) = I·(V_oc − I·R) − P
        // over [0, V_oc / (2R)], where f(0) = −P < 0 and f at the top is P_max − P > 0.
        for (SurgeInput in : List.of(DEMO,
                new SurgeInput(25.6, 0.012, 0.008, 2400.0, 22.0, 150.0),
                new SurgeInput(13.1, 0.004, 0.003, 1500.0, 10.5, 300.0),
                new SurgeInput(52.0, 0.030, 0.010, 16_000.0, 42.0, 400.0))) {
            double voc = in.openCircuitV();
            double rt = in.bankResistanceOhm() + in.cableRoundTripResistanceOhm();
            double p = in.inverterInputW();
            BrentSolver brent = new BrentSolver(1e-14, BRENT_ABS_A);
            double current = brent.solve(1000, i -> i * (voc - i * rt) - p, 0.0, voc / (2 * rt));
            double voltage = voc - current * rt;
            SurgeResult.Operating op = (SurgeResult.Operating) SurgeVoltage.solve(in);
            assertThat(op.currentA()).isCloseTo(current, offset(1e-6));
            assertThat(op.inverterTerminalV()).isCloseTo(voltage, offset(1e-6));
        }
    }

    @Test
    void voltageCollapse_isADistinctOutcome() {
        // 24 V open circuit behind 0.05 Ω can deliver at most V²/(4R) = 576 / 0.2 = 2880 W; 3000 W cannot be had
        // at any current.
        SurgeInput in = new SurgeInput(24.0, 0.04, 0.01, 3000.0, 20.0, 500.0);
        SurgeResult r = SurgeVoltage.solve(in);
        assertThat(r).isInstanceOfSatisfying(SurgeResult.Collapse.class, c -> {
            assertThat(c.maxDeliverablePowerW()).isCloseTo(2880.0, offset(1e-9));
            assertThat(c.currentAtMaxPowerA()).isCloseTo(240.0, offset(1e-9));
            assertThat(c.voltageAtMaxPowerV()).isCloseTo(12.0, offset(1e-12));
            assertThat(c.shortfallW()).isCloseTo(120.0, offset(1e-9));
        });
        assertThat(r.passes()).isFalse();
    }

    @Test
    void justBelowCollapseStillSolves_atHalfTheOpenCircuitVoltage() {
        // At P = P_max the discriminant is 0 and V = V_oc / 2 (the maximum-power point).
        SurgeResult r = SurgeVoltage.solve(new SurgeInput(24.0, 0.04, 0.01, 2880.0, 10.0, 500.0));
        assertThat(r).isInstanceOfSatisfying(SurgeResult.Operating.class,
                op -> assertThat(op.inverterTerminalV()).isCloseTo(12.0, offset(1e-6)));
    }

    @Test
    void belowCutoffAndOverCurrentAreReported() {
        SurgeResult.Operating low = (SurgeResult.Operating) SurgeVoltage.solve(DEMO.withInverterInputW(6000.0)
                .withBankResistanceOhm(0.05));
        // R = 0.055: D = 2621.44 − 1320 = 1301.44, √D = 36.0755, V = 43.638 V < 44 V
        assertThat(low.inverterTerminalV()).isCloseTo(43.638, offset(0.001));
        assertThat(low.aboveCutoff()).isFalse();
        assertThat(low.cutoffMarginV()).isNegative();
        assertThat(low.passes()).isFalse();

        SurgeResult.Operating hot = (SurgeResult.Operating) SurgeVoltage.solve(
                new SurgeInput(51.2, 0.020, 0.005, 6000.0, 44.0, 100.0));
        assertThat(hot.aboveCutoff()).isTrue();
        assertThat(hot.withinCurrentLimit()).isFalse(); // 124.8 A > 100 A
        assertThat(hot.passes()).isFalse();
    }

    @Test
    void zeroResistanceAndZeroPower() {
        SurgeResult.Operating ideal = (SurgeResult.Operating) SurgeVoltage.solve(
                new SurgeInput(48.0, 0.0, 0.0, 4800.0, 40.0, 200.0));
        assertThat(ideal.inverterTerminalV()).isEqualTo(48.0);
        assertThat(ideal.currentA()).isCloseTo(100.0, offset(1e-12));
        SurgeResult.Operating idle = (SurgeResult.Operating) SurgeVoltage.solve(DEMO.withInverterInputW(0.0));
        assertThat(idle.currentA()).isZero();
        assertThat(idle.inverterTerminalV()).isEqualTo(51.2);
    }

    @Test
    void bankResistanceHelper() {
        // 16 modules of 2 mΩ in series, 2 strings: 0.002 × 16 / 2 = 0.016 Ω.
        assertThat(BankResistance.ofModules(0.002, 16, 2)).isCloseTo(0.016, offset(1e-15));
        assertThatThrownBy(() -> BankResistance.ofModules(0.002, 0, 1)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void fixes_eachEvaluatedAgainstTheSameStart() {
        // A failing start (demo data): 25.6 V bank, 0.030 Ω, 0.010 Ω cable, 3000 W, cutoff 22 V.
        // R = 0.040: D = 655.36 − 480 = 175.36, √D = 13.2424, V = 19.421 V < 22 V → fails.
        SurgeInput present = new SurgeInput(25.6, 0.030, 0.010, 3000.0, 22.0, 250.0);
        assertThat(SurgeVoltage.solve(present).passes()).isFalse();

        ConductorTables tables = ConductorTables.standard();
        List<SurgeFix.HeavierCable> cables = SurgeFixes.heavierCables(tables,
                tables.sizeOrThrow(TableSystem.NEC, "2 AWG"), 1, 3.0, 75.0, false, 2);
        assertThat(cables).extracting(SurgeFix.HeavierCable::label)
                .containsExactly("1 AWG, 1 set(s)", "1/0 AWG, 1 set(s)");
        // 1 AWG: Table 8 0.154 Ω/kft at 75 °C; 6 m round trip = 19.685 ft → 0.0030315 Ω
        assertThat(cables.get(0).roundTripResistanceOhm()).isCloseTo(0.154 * 6.0 / 0.3048 / 1000, offset(1e-12));

        List<SurgeFix> candidates = List.of(
                new SurgeFix.HigherBusVoltage("48 V bus", 51.2, 0.060, 44.0, 250.0),
                new SurgeFix.ParallelStrings(1, 1),
                cables.get(0),
                new SurgeFix.ShorterCable(3.0, 1.0),
                new SurgeFix.SoftStarter(0.5));
        List<SurgeFixes.Evaluation> out = SurgeFixes.evaluate(present, candidates);
        assertThat(out).hasSize(5);

        // Each fix's modified input, solved independently from the closed form here.
        // 48 V bus: R = 0.070, D = 2621.44 − 840 = 1781.44, V = (51.2 + 42.2071)/2 = 46.7036 V ≥ 44 → passes
        assertThat(out.get(0).passes()).isTrue();
        assertThat(vInv(out.get(0))).isCloseTo(closedForm(51.2, 0.070, 3000.0), offset(1e-9));
        assertThat(vInv(out.get(0))).isCloseTo(46.7036, offset(1e-3));
        // two strings: R = 0.015 + 0.010 = 0.025, D = 655.36 − 300 = 355.36, V = 22.2256 V ≥ 22 → passes
        assertThat(out.get(1).after().bankResistanceOhm()).isCloseTo(0.015, offset(1e-15));
        assertThat(out.get(1).after().peakCurrentLimitA()).isCloseTo(500.0, offset(1e-9));
        assertThat(vInv(out.get(1))).isCloseTo(22.2256, offset(1e-3));
        assertThat(out.get(1).passes()).isTrue();
        // 1 AWG cable: R = 0.030 + 0.0030315 = 0.0330315: D = 655.36 − 396.378 = 258.982, V = 20.8465 V → fails
        assertThat(vInv(out.get(2))).isCloseTo(closedForm(25.6, 0.0330315, 3000.0), offset(1e-6));
        assertThat(out.get(2).passes()).isFalse();
        // shorter cable 1 m instead of 3 m: R = 0.030 + 0.00333 → same as above within 0.0003 Ω → fails
        assertThat(out.get(3).after().cableRoundTripResistanceOhm()).isCloseTo(0.010 / 3, offset(1e-15));
        assertThat(out.get(3).passes()).isFalse();
        // soft starter 0.5: P = 1500, R = 0.040, D = 655.36 − 240 = 415.36, V = 22.9902 V → passes
        assertThat(vInv(out.get(4))).isCloseTo(22.9902, offset(1e-3));
        assertThat(out.get(4).passes()).isTrue();
    }

    private static double vInv(SurgeFixes.Evaluation e) {
        return ((SurgeResult.Operating) e.result()).inverterTerminalV();
    }

    private static double closedForm(double voc, double r, double p) {
        return (voc + Math.sqrt(voc * voc - 4 * p * r)) / 2;
    }

    @Test
    void shortCircuit_prospectiveCurrentAndFlags() {
        // 51.2 V / 0.002 Ω = 25 600 A at the terminals; with 0.005 Ω of cable 51.2 / 0.007 = 7314.3 A.
        ShortCircuit.Result r = ShortCircuit.assess(new ShortCircuit.Input(51.2, 0.002, 0.005, 20_000.0,
                ShortCircuit.COMMON_ORDINARY_DEVICE_LIMIT_A));
        assertThat(r.atBatteryTerminalsA()).isCloseTo(25_600.0, offset(1e-9));
        assertThat(r.atCableEndA()).isCloseTo(7314.2857, offset(1e-4));
        assertThat(r.exceedsDeviceRating()).isTrue();
        assertThat(r.exceedsOrdinaryDeviceLimit()).isTrue();

        ShortCircuit.Result small = ShortCircuit.assess(new ShortCircuit.Input(12.8, 0.004, 0.002, 20_000.0,
                ShortCircuit.COMMON_ORDINARY_DEVICE_LIMIT_A));
        assertThat(small.atBatteryTerminalsA()).isCloseTo(3200.0, offset(1e-9));
        assertThat(small.exceedsDeviceRating()).isFalse();
        assertThat(small.exceedsOrdinaryDeviceLimit()).isFalse();
    }
}
