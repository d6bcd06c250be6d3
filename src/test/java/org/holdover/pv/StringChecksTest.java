package org.holdover.pv;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class StringChecksTest {

    private static final double EXACT = 1e-9;

    @Test
    void windowForTheDemoModuleOnA150VController() {
        // Cold: coefficient method, −30 °C → 49.2 × (1 + 0.0027 × 55) = 56.5064 V per module;
        // 150 V / 56.5064 = 2.65 → at most 2 modules.
        // Hot: NOCT model at 35 °C air and 1000 W/m² → 35 + 25 × 1.25 = 66.25 °C cells;
        // V_mp = 41.0 × (1 − 0.004 × 41.25) = 34.235 V; charge 57.6 + 5 V headroom = 62.6 V → at least 2.
        StringWindow w = StringWindow.of(DemoEquipment.MODULE_400, DemoEquipment.MPPT_150_60, DemoEquipment.cold48V(-30));
        assertThat(w.coldVoc().moduleVocV()).isCloseTo(49.2 * (1 + 0.0027 * 55), within(EXACT));
        assertThat(w.hotCellTempC()).isCloseTo(66.25, within(EXACT));
        assertThat(w.moduleVmpHotV()).isCloseTo(41.0 * (1 - 0.004 * 41.25), within(EXACT));
        assertThat(w.requiredStringVmpV()).isCloseTo(62.6, within(EXACT));
        assertThat(w.maxModules()).isEqualTo(2);
        assertThat(w.minModules()).isEqualTo(2);
        assertThat(w.isEmpty()).isFalse();
    }

    @Test
    void aSystemVoltageLimitNarrowsTheWindow() {
        StringDesignConditions c = new StringDesignConditions(-30, 35, 1000, 48, 52, 57.6,
                OptionalDouble.of(Nec690.DWELLING_LIMIT_V));
        ChargeController big = new ChargeController("Demo 1000 V MPPT (demo data)", ControllerType.MPPT, 1000, 30, 100,
                0.97, 5);
        StringWindow w = StringWindow.of(DemoEquipment.MODULE_400, big, c);
        assertThat(w.maxByControllerVoltage()).isEqualTo((int) Math.floor(1000 / (49.2 * 1.1485)));
        assertThat(w.maxBySystemLimit()).isEqualTo((int) Math.floor(600 / (49.2 * 1.1485)));
        assertThat(w.maxModules()).isEqualTo(w.maxBySystemLimit());
    }

    @Test
    void everyCheckReportsAMarginWithTheRightSign() {
        PvArray a = new PvArray(DemoEquipment.MODULE_400, 3, 2);
        ArrayCheckReport r = ArrayChecks.evaluate(a, DemoEquipment.MPPT_150_60, DemoEquipment.cold48V(-30));
        Check cold = r.check(ArrayChecks.COLD_VOC).orElseThrow();
        assertThat(cold.value()).isCloseTo(3 * 49.2 * 1.1485, within(EXACT));
        assertThat(cold.passes()).isFalse();
        assertThat(cold.margin()).isCloseTo((150 - cold.value()) / 150, within(EXACT)).isNegative();
        Check hot = r.check(ArrayChecks.HOT_VMP).orElseThrow();
        assertThat(hot.passes()).isTrue();
        assertThat(hot.margin()).isCloseTo((hot.value() - 62.6) / 62.6, within(EXACT)).isPositive();
        Check in = r.check(ArrayChecks.INPUT_CURRENT).orElseThrow();
        assertThat(in.value()).isCloseTo(2 * 10.35 * 1.25, within(EXACT));
        assertThat(in.passes()).isTrue();
        assertThat(r.passesRequired()).isFalse();
        assertThat(r.failures()).extracting(Check::id).containsExactly(ArrayChecks.COLD_VOC);
    }

    @Test
    void outputCurrentIsAdvisoryForMppt() {
        // 2 × 8 × 400 W = 6400 W × 0.97 / 48 V = 129.3 A against a 60 A rating: fails, but only advises.
        PvArray a = new PvArray(DemoEquipment.MODULE_400, 2, 8);
        ArrayCheckReport r = ArrayChecks.evaluate(a, DemoEquipment.MPPT_150_60, DemoEquipment.cold48V(-30));
        Check out = r.check(ArrayChecks.OUTPUT_CURRENT).orElseThrow();
        assertThat(out.value()).isCloseTo(6400 * 0.97 / 48, within(EXACT));
        assertThat(out.severity()).isEqualTo(Check.Severity.ADVISORY);
        assertThat(out.passes()).isFalse();
        // 8 strings × 10.35 A × 1.25 = 103.5 A > 40 A input: that one is required.
        assertThat(r.check(ArrayChecks.INPUT_CURRENT).orElseThrow().passes()).isFalse();
    }

    @Test
    void recordLowBelowTheTableFailsWithoutACoefficient() {
        ArrayCheckReport r = ArrayChecks.evaluate(new PvArray(DemoEquipment.MODULE_100_NO_VOC_COEFF, 1, 1),
                DemoEquipment.PWM_30, DemoEquipment.cold12V(-45));
        Check t = r.check(ArrayChecks.RECORD_LOW_IN_TABLE).orElseThrow();
        assertThat(t.passes()).isFalse();
        assertThat(t.margin()).isNegative();
        assertThat(r.passesRequired()).isFalse();
    }

    @Test
    void pwmRatioIsOneAtVmpAndFallsAwayFromIt() {
        PvModule m = DemoEquipment.MODULE_100_NO_VOC_COEFF;
        assertThat(PwmOperatingPoint.powerRatio(m, m.vmpAtCellV(25), 25)).isCloseTo(1.0, within(EXACT));
        // At 13.2 V on a 18.5 V module, the piecewise line gives I = Isc − (Isc − Imp) V / Vmp:
        double i = 5.80 - (5.80 - 5.41) * 13.2 / 18.5;
        assertThat(PwmOperatingPoint.powerRatio(m, 13.2, 25)).isCloseTo(13.2 * i / (18.5 * 5.41), within(EXACT));
        assertThat(PwmOperatingPoint.powerRatio(m, 30, 25)).isZero();
        // A 400 W high-voltage module on a 12 V battery gives up most of its power.
        assertThat(PwmOperatingPoint.powerRatio(DemoEquipment.MODULE_400, 13.2, 25)).isLessThan(0.4);
    }
}
