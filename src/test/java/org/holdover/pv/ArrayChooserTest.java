package org.holdover.pv;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class ArrayChooserTest {

    private static final List<PvModule> MODULES = List.of(DemoEquipment.MODULE_400, DemoEquipment.MODULE_100_NO_VOC_COEFF);
    private static final List<ChargeController> CONTROLLERS =
            List.of(DemoEquipment.MPPT_150_60, DemoEquipment.MPPT_250_100, DemoEquipment.PWM_30);

    @Test
    void bestCandidatePassesEveryCheckAndMeetsThePower() {
        List<ArrayCandidate> all = ArrayChooser.choose(new ArrayChooser.Input(3000, MODULES, CONTROLLERS,
                DemoEquipment.cold48V(-30), 4));
        assertThat(all).isNotEmpty();
        ArrayCandidate best = all.get(0);
        assertThat(best.passesRequired()).isTrue();
        assertThat(best.advisoryFailures()).isZero();
        assertThat(best.effectiveStcW()).isGreaterThanOrEqualTo(3000);
        assertThat(best.checks()).allSatisfy(c -> assertThat(c.passes()).isTrue());
        // Every check of every candidate carries a margin consistent with pass/fail.
        for (ArrayCandidate c : all) {
            assertThat(c.checks()).isNotEmpty();
            assertThat(c.checks()).allSatisfy(k -> assertThat(k.passes()).isEqualTo(k.margin() >= 0));
        }
        // Ordered: no failing candidate ahead of a passing one.
        boolean seenFailing = false;
        for (ArrayCandidate c : all) {
            if (!c.passesRequired()) {
                seenFailing = true;
            } else {
                assertThat(seenFailing).isFalse();
            }
        }
    }

    @Test
    void aPwmControllerOnA48VBankIsRejectedWithItsReasons() {
        // A 50 V PWM controller on a 48 V bank: the hot V_mp of one 100 W module cannot reach 57.6 V and
        // two modules' cold V_oc exceed 50 V; the candidate is still returned with the failing checks.
        List<ArrayCandidate> all = ArrayChooser.choose(new ArrayChooser.Input(600, List.of(DemoEquipment.MODULE_100_NO_VOC_COEFF),
                List.of(DemoEquipment.PWM_30), DemoEquipment.cold48V(-30), 2));
        assertThat(all).hasSize(1);
        assertThat(all.get(0).passesRequired()).isFalse();
        assertThat(all.get(0).checks()).anyMatch(c -> !c.passes()
                && (c.id().equals(ArrayChecks.HOT_VMP) || c.id().equals(ArrayChecks.COLD_VOC)));
    }

    @Test
    void pwmCandidatesAreSizedOnTheirEffectivePower() {
        // 250 W at battery voltage from 100 W modules held at 13.2 V (power ratio ≈ 0.73 at 25 °C cells):
        // 4 strings of 1; 4 × 5.8 A × 1.25 = 29 A fits the 30 A PWM rating (5 strings would not).
        List<ArrayCandidate> all = ArrayChooser.choose(new ArrayChooser.Input(250, List.of(DemoEquipment.MODULE_100_NO_VOC_COEFF),
                List.of(DemoEquipment.PWM_30), DemoEquipment.cold12V(-20), 1));
        ArrayCandidate c = all.get(0);
        assertThat(c.passesRequired()).isTrue();
        assertThat(c.modulesPerString()).isEqualTo(1);
        assertThat(c.perController().pwmPowerRatio()).isLessThan(1.0);
        // More than 3 × 100 W nameplate is needed to deliver 250 W at battery voltage.
        assertThat(c.totalModules()).isEqualTo(4);
        assertThat(c.effectiveStcW()).isGreaterThanOrEqualTo(250);
    }

    @Test
    void aLargeArraySpreadsOverParallelControllers() {
        List<ArrayCandidate> all = ArrayChooser.choose(new ArrayChooser.Input(9000, List.of(DemoEquipment.MODULE_400),
                List.of(DemoEquipment.MPPT_150_60), DemoEquipment.cold48V(-30), 6));
        ArrayCandidate best = all.get(0);
        assertThat(best.passesRequired()).isTrue();
        assertThat(best.controllerCount()).isGreaterThan(1);
        ArrayCheckReport per = best.perController();
        assertThat(per.maxCircuitCurrentA()).isLessThanOrEqualTo(DemoEquipment.MPPT_150_60.maxInputCurrentA());
    }
}
