package org.holdover.pv;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.SurfaceOrientation;
import org.junit.jupiter.api.Test;

class SizingTest {

    private static final double EXACT = 1e-9;

    private static double[] fill(double v) {
        double[] a = new double[12];
        Arrays.fill(a, v);
        return a;
    }

    @Test
    void worstMonthArithmetic() {
        // The worst-month method of the brief (structure as in Sandia SAND87-7023 worksheets, REFERENCES.md
        // §12a): W = E ÷ (PSH × derate × round trip). December: 1200 / (1.6 × 0.8 × 0.9) = 1041.67 W.
        double[] e = fill(1000);
        e[11] = 1200;
        double[] psh = {2.0, 2.8, 3.9, 4.6, 5.3, 5.7, 5.8, 5.0, 4.0, 2.7, 1.9, 1.6};
        MonthlySizingResult r = WorstMonthSizing.size(new WorstMonthSizing.Input(e, psh, fill(0.8), 0.9));
        assertThat(r.worstMonth()).isEqualTo(11);
        assertThat(r.requiredStcW()).isCloseTo(1200 / (1.6 * 0.8 * 0.9), within(EXACT));
        assertThat(r.requiredStcWByMonth()[0]).isCloseTo(1000 / (2.0 * 0.8 * 0.9), within(EXACT));
        assertThat(r.feasible()).isTrue();
    }

    @Test
    void aMonthWithLoadButNoSunIsInfeasible() {
        double[] psh = fill(3);
        psh[0] = 0;
        MonthlySizingResult r = WorstMonthSizing.size(new WorstMonthSizing.Input(fill(500), psh, fill(0.8), 0.9));
        assertThat(r.feasible()).isFalse();
        assertThat(r.worstMonth()).isZero();
    }

    @Test
    void backupRefillArithmeticAndMoreDaysNeedLessArray() {
        // Refill 10 kWh in 3 days while carrying 2 kWh/day: (10000/0.95 + 3 × 2000/0.9) / (3 × PSH × 0.8).
        double[] psh = {2.0, 2.8, 3.9, 4.6, 5.3, 5.7, 5.8, 5.0, 4.0, 2.7, 1.9, 1.6};
        BackupRefillSizing.Input in3 = new BackupRefillSizing.Input(10000, 3, fill(2000), psh, fill(0.8), 0.95, 0.9);
        MonthlySizingResult r3 = BackupRefillSizing.size(in3);
        assertThat(r3.worstMonth()).isEqualTo(11);
        assertThat(r3.requiredStcW()).isCloseTo((10000 / 0.95 + 3 * 2000 / 0.9) / (3 * 1.6 * 0.8), within(EXACT));
        MonthlySizingResult r5 = BackupRefillSizing.size(new BackupRefillSizing.Input(10000, 5, fill(2000), psh, fill(0.8),
                0.95, 0.9));
        assertThat(r5.requiredStcW()).isLessThan(r3.requiredStcW());
        // Carrying the loads alone (no refill) never needs more than with a refill.
        MonthlySizingResult r0 = BackupRefillSizing.size(new BackupRefillSizing.Input(0, 3, fill(2000), psh, fill(0.8),
                0.95, 0.9));
        assertThat(r0.requiredStcW()).isLessThan(r3.requiredStcW());
    }

    @Test
    void tiltSearchPicksTheTiltThatNeedsTheSmallestArray() {
        double[] load = fill(2000);
        TiltSearch.Input in = new TiltSearch.Input(DemoYear.year().weather(), DemoYear.sunPath(),
                PoaSettings.defaults(new SurfaceOrientation(0, 180)), TiltSearch.tilts(0, 90, 5),
                DemoEquipment.MODULE_400, DcLosses.defaults(), 0.97, load, 0.9);
        TiltSearch.Result r = TiltSearch.search(in);
        assertThat(r.options()).hasSize(19);
        double best = r.chosen().sizing().requiredStcW();
        for (TiltSearch.Option o : r.options()) {
            assertThat(best).isLessThanOrEqualTo(o.sizing().requiredStcW());
        }
        // With an even load all year at 44.5° N the worst month is in winter and the favoured tilt is
        // steeper than the latitude (the "latitude + 15°" winter rule: common practice, no source).
        assertThat(r.chosen().sizing().worstMonth()).isIn(0, 10, 11);
        assertThat(r.chosen().tiltDeg()).isGreaterThan(DemoYear.SITE.latitudeDeg());
        // The option's derate is the DC performance ratio × controller efficiency: between 0.5 and 1.1
        // (reflection, temperature and ~9 % DC losses; cold months can beat 25 °C): our plausibility bound.
        for (double d : r.chosen().derate()) {
            assertThat(d).isBetween(0.5, 1.1);
        }
    }

    @Test
    void worstMonthFromTheHourlyChainMatchesTheTiltSearchAtTheSameTilt() {
        // The two paths to a monthly derate must agree: DC performance ratio of the real array equals that
        // of the one-module reference (the model is linear in module count).
        PvArray array = new PvArray(DemoEquipment.MODULE_400, 2, 3);
        ArrayDcSeries dc = ArrayDcSeries.compute(array, DemoYear.poa(60), DemoYear.year().weather().airTempC(),
                DcLosses.defaults());
        TiltSearch.Result r = TiltSearch.search(new TiltSearch.Input(DemoYear.year().weather(), DemoYear.sunPath(),
                PoaSettings.defaults(new SurfaceOrientation(0, 180)), new double[] {60}, DemoEquipment.MODULE_400,
                DcLosses.defaults(), 0.97, fill(2000), 0.9));
        double[] pr = dc.monthlyDcPerformanceRatio();
        for (int m = 0; m < 12; m++) {
            assertThat(r.chosen().derate()[m]).isCloseTo(pr[m] * 0.97, within(1e-12));
        }
    }
}
