package org.holdover.inverter;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The three-term loss model (Schmidt &amp; Sauer, 1996) and its least-squares fit. */
class LossModelTest {

    @Test
    void fitRecoversCoefficientsFromExactPoints() {
        // Points generated from known coefficients must give them back (a least-squares fit of an exact model).
        double p0 = 0.006, k1 = 0.021, k2 = 0.034;
        List<EfficiencyPoint> pts = new ArrayList<>();
        for (double p : new double[] {0.1, 0.2, 0.3, 0.5, 0.75, 1.0}) {
            pts.add(new EfficiencyPoint(p, p / (p + p0 + k1 * p + k2 * p * p)));
        }
        LossModel m = LossModel.fit(4000, p0 * 4000, pts);
        assertThat(m.p0()).isCloseTo(p0, within(1e-15));
        assertThat(m.k1()).isCloseTo(k1, within(1e-12));
        assertThat(m.k2()).isCloseTo(k2, within(1e-12));
        assertThat(m.worstResidual(pts)).isLessThan(1e-12);
    }

    @Test
    void normalEquationsGiveTheSameSolutionAsTheQrFit() {
        // The workbook solves the 2x2 normal equations by Cramer's rule; the engine uses a QR decomposition.
        Random rnd = new Random(42);
        for (int trial = 0; trial < 50; trial++) {
            List<EfficiencyPoint> pts = new ArrayList<>();
            double p = 0.05;
            for (int i = 0; i < 6; i++) {
                p += 0.05 + 0.2 * rnd.nextDouble();
                pts.add(new EfficiencyPoint(Math.min(p, 1.5), 0.85 + 0.1 * rnd.nextDouble()));
                if (p > 1.5) {
                    break;
                }
            }
            double noLoad = 10 + 40 * rnd.nextDouble();
            LossModel qr = LossModel.fit(5000, noLoad, pts);
            LossModel.NormalEquations ne = LossModel.normalEquations(noLoad / 5000, pts);
            assertThat(ne.k1()).isCloseTo(qr.k1(), within(1e-9 * Math.max(1, Math.abs(qr.k1()))));
            assertThat(ne.k2()).isCloseTo(qr.k2(), within(1e-9 * Math.max(1, Math.abs(qr.k2()))));
        }
    }

    @Test
    void inputCountsTheNoLoadDrawAndRisesWithOutput() {
        LossModel m = new LossModel(5000, 0.006, 0.02, 0.03);
        // At zero output the inverter still draws its no-load power: 0.006 × 5000 = 30 W.
        assertThat(m.inputW(0)).isCloseTo(30.0, within(1e-12));
        // At rated output: 5000 + 5000 × (0.006 + 0.02 + 0.03) = 5280 W.
        assertThat(m.inputW(5000)).isCloseTo(5280.0, within(1e-9));
        assertThat(m.efficiency(1.0)).isCloseTo(5000.0 / 5280.0, within(1e-15));
        assertThat(m.efficiency(0)).isZero();
        double last = 0;
        for (double w = 0; w <= 8000; w += 50) {
            assertThat(m.inputW(w)).isGreaterThan(last);
            last = m.inputW(w);
        }
    }

    @Test
    void efficiencyBehavesBelowTheFirstPoint() {
        // Below the first tabulated point the model falls smoothly to zero, where a straight line could not.
        LossModel m = LossModel.fit(5000, 30, Inverters.POINTS);
        TabulatedCurve tab = new TabulatedCurve(Inverters.POINTS, m);
        assertThat(tab.efficiency(0.05)).isEqualTo(m.efficiency(0.05));
        assertThat(m.efficiency(0.01)).isLessThan(m.efficiency(0.05)).isGreaterThan(0);
        // Within the points, the tabulated curve interpolates linearly: halfway between 0.2 (92 %) and 0.5 (94 %).
        assertThat(tab.efficiency(0.35)).isCloseTo(0.93, within(1e-12));
        assertThat(tab.efficiency(0.2)).isCloseTo(0.92, within(1e-15));
    }
}
