package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.holdover.pv.ArrayDcSeries;
import org.holdover.pv.PlaneMemo;
import org.holdover.pv.PvArray;
import org.holdover.pv.PvModule;
import org.holdover.pv.TiltSearch;
import org.holdover.solar.PlaneOfArray;
import org.holdover.solar.PoaSeries;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.SurfaceOrientation;
import org.junit.jupiter.api.Test;

/** The search's memo of irradiance and performance ratios gives exactly what computing them afresh gives. */
class PlaneMemoTest {

    @Test
    void theMemoGivesTheSameNumbersBitForBit() {
        SolarSetup s = Demos.input(Demos.CABIN).solar();
        PlaneMemo memo = new PlaneMemo(s.weather(), s.sunPath(), s.losses());
        List<PvModule> modules = Demos.input(Demos.CABIN).catalog().pvModules().stream().map(m -> m.module()).toList();
        for (double tilt : new double[] {0, 35, 60, 90}) {
            PoaSettings at = s.settings().withOrientation(new SurfaceOrientation(tilt, s.settings().orientation().azimuthDeg()));
            PoaSeries fresh = PlaneOfArray.hourly(s.weather(), s.sunPath(), at);
            // Twice: the second answer comes from the memo.
            for (int k = 0; k < 2; k++) {
                assertThat(memo.poa(at).totalWm2()).isEqualTo(fresh.totalWm2());
                assertThat(memo.poa(at).effectiveWm2()).isEqualTo(fresh.effectiveWm2());
                assertThat(memo.peakSunHours(at)).isEqualTo(fresh.monthlyPeakSunHours(false));
                for (PvModule m : modules) {
                    assertThat(memo.monthlyPerformanceRatio(at, m)).isEqualTo(
                            ArrayDcSeries.compute(new PvArray(m, 1, 1), fresh, s.weather().airTempC(), s.losses()).monthlyDcPerformanceRatio());
                }
            }
            assertThat(memo.poa(at)).isSameAs(memo.poa(at));
        }
        // The tilt search with and without the memo.
        TiltSearch.Input in = new TiltSearch.Input(s.weather(), s.sunPath(), s.settings(), TiltSearch.tilts(10, 80, 10),
                modules.get(0), s.losses(), 0.97, new double[] {4000, 3800, 3600, 3400, 3200, 3000, 3000, 3200, 3400, 3600, 3800, 4000},
                0.95);
        List<TiltSearch.Result> plain = TiltSearch.searchAll(in, modules);
        List<TiltSearch.Result> memoised = TiltSearch.searchAll(in, modules, memo);
        for (int i = 0; i < modules.size(); i++) {
            assertThat(memoised.get(i).best()).isEqualTo(plain.get(i).best());
            for (int t = 0; t < plain.get(i).options().size(); t++) {
                assertThat(memoised.get(i).options().get(t).sizing().requiredStcW())
                        .isEqualTo(plain.get(i).options().get(t).sizing().requiredStcW());
                assertThat(memoised.get(i).options().get(t).derate()).isEqualTo(plain.get(i).options().get(t).derate());
            }
        }
    }

    @Test
    void aMemoForOtherInputsIsRefused() {
        SolarSetup s = Demos.input(Demos.CABIN).solar();
        SolarSetup other = Demos.input(Demos.FARM).solar();
        PlaneMemo memo = new PlaneMemo(other.weather(), other.sunPath(), other.losses());
        TiltSearch.Input in = new TiltSearch.Input(s.weather(), s.sunPath(), s.settings(), TiltSearch.tilts(10, 80, 10),
                Demos.input(Demos.CABIN).catalog().pvModules().get(0).module(), s.losses(), 0.97, new double[12], 0.95);
        assertThatThrownBy(() -> TiltSearch.searchAll(in, List.of(in.module()), memo)).isInstanceOf(IllegalArgumentException.class);
    }
}
