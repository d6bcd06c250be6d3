package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.holdover.load.YearCalendar;
import org.holdover.pv.ArrayCandidate;
import org.holdover.solar.PoaSeries;
import org.junit.jupiter.api.Test;

/**
 * The PV sizing chain of both demos worked again by hand: each link recomputed here from the hourly series with
 * the published formulas, independently of the sizing code, and the string checks with the catalog's datasheet
 * figures (demo data).
 *
 * <p>Sources: the worst-month method has the structure of the Sandia stand-alone PV handbook's worksheets (SAND87-7023,
 * 1988: size for the month with the largest load and lowest insolation; REFERENCES.md §12a, structure confirmed);
 * NEC 690.7(A)(1) (coefficient method for the cold open-circuit voltage) and 690.8(A)(1) (1.25 × I_sc), NFPA 70
 * 2017–2023 (REFERENCES.md §5); the NOCT cell temperature T_c = T_a + (NOCT − 20) G / 800 (common practice; the NOCT
 * test conditions from memory); the refill balance of the backup method is our own arrangement (no source).
 */
class PvSizingChainTest {

    /** The hand chain sums the same hours in another order and with other groupings: a few ulps per sum. */
    private static final double SAME_ARITHMETIC = 1e-9;
    /** Voltages and currents typed from the datasheet figures: exact to rounding. */
    private static final double TYPED = 1e-9;
    /** Demo catalog DC loss defaults, NREL/TP-6A20-62641 (from memory): soiling, mismatch, wiring, connections, LID, nameplate. */
    private static final double LOSS_FACTOR = (1 - 0.02) * (1 - 0.02) * (1 - 0.02) * (1 - 0.005) * (1 - 0.015) * (1 - 0.01);
    /** LiFePO4 round trip in the chemistry table (92–98 % vendor range, REFERENCES.md §7c). */
    private static final double LFP_ROUND_TRIP = 0.95;

    @Test
    void offGridCabinIsSizedByItsWorstMonth() {
        SizingResult r = Demos.cabin();
        PvOption o = r.solar().chosen();
        assertThat(o.module().id()).isEqualTo("DEMO-PV-330-60");
        assertThat(o.controller().id()).isEqualTo("DEMO-MPPT-150-60");
        double eta = 0.975;
        // Demo 330 W module: P 330 W, γ −0.38 %/°C, NOCT 45 °C.
        // W = E ÷ (PSH × PR × η_controller × η_round trip), each month.
        double[] w = requiredByMonth(r, o, 330, -0.0038, 45, eta * LFP_ROUND_TRIP);
        int worst = argMax(w);
        assertThat(o.sizing().worstMonth()).isEqualTo(worst);
        assertThat(o.sizing().requiredStcW()).isCloseTo(w[worst], within(SAME_ARITHMETIC * w[worst]));
        for (int m = 0; m < 12; m++) {
            assertThat(o.sizing().requiredStcWByMonth()[m]).isCloseTo(w[m], within(SAME_ARITHMETIC * w[m]));
        }
        // Strings: the fewest 3 × 330 W strings reaching the need, ⌈W ÷ 990⌉.
        ArrayCandidate c = o.candidate();
        assertThat(c.modulesPerString()).isEqualTo(3);
        assertThat(c.totalStrings()).isEqualTo((int) Math.ceil(w[worst] / (3 * 330.0)));
        assertThat(c.controllerCount()).isEqualTo(1);
        // NEC 690.7(A)(1): 3 × 40.8 V × (1 + (−0.0029/°C)(−25 − 25 °C)) = 3 × 40.8 × 1.145 = 140.148 V ≤ 150 V.
        assertThat(check(r, PvSizing.COLD_VOC).value()).isCloseTo(3 * 40.8 * (1 + (-0.0029) * (-25 - 25)), within(TYPED));
        assertThat(check(r, PvSizing.COLD_VOC).limit()).isEqualTo(150.0);
        // A fourth module would exceed the controller: ⌊150 ÷ 46.716⌋ = 3.
        assertThat(c.perController().window().maxByControllerVoltage()).isEqualTo((int) Math.floor(150 / (40.8 * 1.145)));
        // Hot cells: 30 + (45 − 20) × 1000 ÷ 800 = 61.25 °C; β_Vmp = γ − α = −0.0038 − 0.0005 per °C;
        // 3 × 33.9 V × (1 − 0.0043 × 36.25) = 85.8475 V ≥ LiFePO4 absorption 16 × 3.55 V + 5 V headroom = 61.8 V.
        assertThat(check(r, PvSizing.HOT_VMP).value()).isCloseTo(3 * 33.9 * (1 - 0.0043 * (30 + 25 * 1000.0 / 800 - 25)),
                within(TYPED));
        assertThat(check(r, PvSizing.HOT_VMP).limit()).isCloseTo(16 * 3.55 + 5, within(TYPED));
        // NEC 690.8(A)(1): 1.25 × 10.30 A × 2 strings = 25.75 A ≤ 45 A.
        assertThat(check(r, PvSizing.INPUT_CURRENT).value()).isCloseTo(1.25 * 10.30 * 2, within(TYPED));
        // Output at STC power: 6 × 330 W × 0.975 ÷ 51.2 V = 37.705 A ≤ 60 A (advisory).
        assertThat(advisory(r, PvSizing.OUTPUT_CURRENT).value()).isCloseTo(6 * 330 * 0.975 / 51.2, within(TYPED));
        assertThat(r.passes()).isTrue();
    }

    @Test
    void backupFarmRefillsTheOutageWhileCarryingTheLoads() {
        SizingResult r = Demos.farmRules();
        PvOption o = r.solar().chosen();
        assertThat(o.module().id()).isEqualTo("DEMO-PV-400-72");
        assertThat(o.controller().id()).isEqualTo("DEMO-MPPT-250-100");
        double eta = 0.98;
        double days = 4;
        // The energy the hardest 48 h outage drew, by hand: the largest sum of 48 consecutive hours of DC input.
        double[] dc = r.energy().dcInputW();
        double refill = 0;
        for (int s = 0; s + 48 <= dc.length; s++) {
            double sum = 0;
            for (int h = s; h < s + 48; h++) {
                sum += dc[h];
            }
            refill = Math.max(refill, sum);
        }
        assertThat(r.solar().refillWh()).isCloseTo(refill, within(SAME_ARITHMETIC * refill));
        double finalRefill = refill;
        // W = (refill ÷ η_rt + days × E ÷ η_rt) ÷ (days × PSH × PR × η_c); here per month with E the month's DC energy per day.
        double[] e = dailyDcWh(r);
        double[] w = new double[12];
        double[] pshPr = pshTimesPr(r, o, 400, -0.0036, 44);
        for (int m = 0; m < 12; m++) {
            w[m] = (finalRefill / LFP_ROUND_TRIP + days * e[m] / LFP_ROUND_TRIP) / (days * pshPr[m] * eta);
        }
        int worst = argMax(w);
        assertThat(o.sizing().worstMonth()).isEqualTo(worst);
        assertThat(o.sizing().requiredStcW()).isCloseTo(w[worst], within(SAME_ARITHMETIC * w[worst]));
        ArrayCandidate c = o.candidate();
        // Strings: ⌈W ÷ (3 × 400 W)⌉ in all, shared evenly over the controllers.
        int needed = (int) Math.ceil(w[worst] / (3 * 400.0));
        assertThat(c.modulesPerString()).isEqualTo(3);
        assertThat(c.stringsPerController()).isEqualTo((int) Math.ceil((double) needed / c.controllerCount()));
        // NEC 690.7(A)(1): 3 × 48.9 V × (1 + (−0.0028)(−32 − 25)) = 170.11 V ≤ 250 V; the window allows ⌊250 ÷ 56.70⌋ = 4.
        assertThat(check(r, PvSizing.COLD_VOC).value()).isCloseTo(3 * 48.9 * (1 + (-0.0028) * (-32 - 25)), within(TYPED));
        assertThat(c.perController().window().maxModules()).isEqualTo((int) Math.floor(250 / (48.9 * (1 + 0.0028 * 57))));
        // Hot cells 32 + 24 × 1.25 = 62 °C; 3 × 40.6 × (1 − 0.00408 × 37) = 103.41 V ≥ 61.8 V; fewest ⌈61.8 ÷ 34.47⌉ = 2.
        double vmpHot = 40.6 * (1 - (0.0036 + 0.00048) * (32 + 24 * 1000.0 / 800 - 25));
        assertThat(check(r, PvSizing.HOT_VMP).value()).isCloseTo(3 * vmpHot, within(TYPED));
        assertThat(c.perController().window().minModules()).isEqualTo((int) Math.ceil(61.8 / vmpHot));
        // NEC 690.8(A)(1): 1.25 × 10.42 A × strings per controller ≤ 70 A.
        assertThat(check(r, PvSizing.INPUT_CURRENT).value()).isCloseTo(1.25 * 10.42 * c.stringsPerController(), within(TYPED));
        assertThat(r.passes()).isTrue();
    }

    /**
     * Array STC W each month needs off grid: E ÷ (PSH × PR × efficiencies), the hourly chain worked here: PSH from
     * the plane-of-array hours, PR from one module's DC by the NOCT model and the P_mp coefficient.
     */
    private static double[] requiredByMonth(SizingResult r, PvOption o, double pStc, double gamma, double noct,
                                            double efficiencies) {
        double[] e = dailyDcWh(r);
        double[] pshPr = pshTimesPr(r, o, pStc, gamma, noct);
        double[] w = new double[12];
        for (int m = 0; m < 12; m++) {
            w[m] = e[m] == 0 ? 0 : e[m] / (pshPr[m] * efficiencies);
        }
        return w;
    }

    /** The loads' DC energy per day by month: the hourly inverter input summed by month ÷ days. */
    private static double[] dailyDcWh(SizingResult r) {
        YearCalendar cal = r.input().loads().calendar();
        double[] dc = r.energy().dcInputW();
        double[] e = new double[12];
        for (int h = 0; h < dc.length; h++) {
            e[cal.month(h) - 1] += dc[h];
        }
        for (int m = 1; m <= 12; m++) {
            e[m - 1] /= cal.daysInMonth(m);
        }
        return e;
    }

    /**
     * Peak sun hours × DC performance ratio of one module, by month: Σ P_dc ÷ days ÷ P_stc, with
     * P_dc = P_stc × G_eff ÷ 1000 × (1 + γ (T_c − 25)) × losses and T_c = T_air + (NOCT − 20) × G_poa ÷ 800.
     * Also checks PSH and PR one by one against the engine.
     */
    private static double[] pshTimesPr(SizingResult r, PvOption o, double pStc, double gamma, double noct) {
        YearCalendar cal = r.input().loads().calendar();
        PoaSeries poa = o.poa();
        double[] air = r.solar().setup().weather().airTempC();
        double[] poaSum = new double[12];
        double[] dcSum = new double[12];
        for (int h = 0; h < poa.hours(); h++) {
            int m = cal.month(h) - 1;
            double g = poa.totalWm2(h);
            double tc = air[h] + (noct - 20) * g / 800;
            poaSum[m] += g;
            dcSum[m] += Math.max(0, pStc * poa.effectiveWm2(h) / 1000 * (1 + gamma * (tc - 25))) * LOSS_FACTOR;
        }
        double[] out = new double[12];
        for (int m = 1; m <= 12; m++) {
            double psh = poaSum[m - 1] / cal.daysInMonth(m) / 1000;
            double pr = dcSum[m - 1] / cal.daysInMonth(m) / (pStc * psh);
            assertThat(o.peakSunHours()[m - 1]).as("peak sun hours, month %d", m).isCloseTo(psh, within(SAME_ARITHMETIC * psh));
            assertThat(o.performanceRatio()[m - 1]).as("performance ratio, month %d", m).isCloseTo(pr, within(SAME_ARITHMETIC));
            out[m - 1] = psh * pr;
        }
        return out;
    }

    private static int argMax(double[] w) {
        int best = 0;
        for (int m = 1; m < w.length; m++) {
            if (w[m] > w[best]) {
                best = m;
            }
        }
        return best;
    }

    static Check check(SizingResult r, String id) {
        return r.checks().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }

    static Check advisory(SizingResult r, String id) {
        return r.advisories().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }
}
