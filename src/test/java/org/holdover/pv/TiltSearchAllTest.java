package org.holdover.pv;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.List;
import org.holdover.solar.PlaneOfArray;
import org.holdover.solar.PoaSeries;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.SurfaceOrientation;
import org.junit.jupiter.api.Test;

/** The search for several modules at once (one plane-of-array series per tilt) equals the plain per-module chain. */
class TiltSearchAllTest {

    @Test
    void sharingThePlaneOfArraySeriesChangesNothing() {
        double[] load = new double[12];
        Arrays.fill(load, 1500);
        load[6] = 2500;
        List<PvModule> modules = List.of(DemoEquipment.MODULE_400, DemoEquipment.MODULE_100_NO_VOC_COEFF);
        TiltSearch.Input in = new TiltSearch.Input(DemoYear.year().weather(), DemoYear.sunPath(),
                PoaSettings.defaults(new SurfaceOrientation(0, 180)), TiltSearch.tilts(20, 80, 15), modules.get(0),
                DcLosses.defaults(), 0.96, load, 0.9);
        List<TiltSearch.Result> all = TiltSearch.searchAll(in, modules);
        assertThat(all).hasSize(2);
        for (int i = 0; i < modules.size(); i++) {
            TiltSearch.Result r = all.get(i);
            int best = 0;
            for (int t = 0; t < in.tiltsDeg().length; t++) {
                double tilt = in.tiltsDeg()[t];
                // The plain chain, written out: plane of array, one module's DC, the worst-month sizing.
                PoaSeries poa = PlaneOfArray.hourly(in.weather(), in.sunPath(),
                        in.settings().withOrientation(new SurfaceOrientation(tilt, 180)));
                double[] pr = ArrayDcSeries.compute(new PvArray(modules.get(i), 1, 1), poa, in.weather().airTempC(),
                        in.losses()).monthlyDcPerformanceRatio();
                double[] derate = new double[12];
                for (int m = 0; m < 12; m++) {
                    derate[m] = pr[m] * 0.96;
                }
                MonthlySizingResult plain = WorstMonthSizing.size(new WorstMonthSizing.Input(load,
                        poa.monthlyPeakSunHours(false), derate, 0.9));
                TiltSearch.Option o = r.options().get(t);
                assertThat(o.tiltDeg()).isEqualTo(tilt);
                assertThat(o.sizing().requiredStcWByMonth()).containsExactly(plain.requiredStcWByMonth());
                assertThat(o.peakSunHours()).containsExactly(poa.monthlyPeakSunHours(false));
                if (plain.requiredStcW() < r.options().get(best).sizing().requiredStcW()) {
                    best = t;
                }
            }
            assertThat(r.best()).isEqualTo(best);
        }
        // The single-module search is the first of them.
        assertThat(TiltSearch.search(in).chosen().tiltDeg()).isEqualTo(all.get(0).chosen().tiltDeg());
    }
}
