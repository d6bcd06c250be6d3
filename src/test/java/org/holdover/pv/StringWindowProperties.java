package org.holdover.pv;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/** Monotonicity of the string window (a property of the code rules, no source needed). */
class StringWindowProperties {

    @Property(seed = "42")
    void aColderRecordLowNeverAllowsALongerString(@ForAll @DoubleRange(min = -60, max = 30) double lowA,
            @ForAll @DoubleRange(min = -60, max = 30) double lowB) {
        double colder = Math.min(lowA, lowB);
        double warmer = Math.max(lowA, lowB);
        for (PvModule m : new PvModule[] {DemoEquipment.MODULE_400, DemoEquipment.MODULE_100_NO_VOC_COEFF}) {
            for (ChargeController c : new ChargeController[] {DemoEquipment.MPPT_150_60, DemoEquipment.MPPT_250_100}) {
                StringWindow cold = StringWindow.of(m, c, DemoEquipment.cold48V(colder));
                StringWindow warm = StringWindow.of(m, c, DemoEquipment.cold48V(warmer));
                assertThat(cold.maxModules()).isLessThanOrEqualTo(warm.maxModules());
                assertThat(cold.coldVoc().moduleVocV()).isGreaterThanOrEqualTo(warm.coldVoc().moduleVocV());
            }
        }
    }

    @Property(seed = "42")
    void aHotterDesignHighNeverAllowsAShorterString(@ForAll @DoubleRange(min = 20, max = 55) double highA,
            @ForAll @DoubleRange(min = 20, max = 55) double highB) {
        double cooler = Math.min(highA, highB);
        double hotter = Math.max(highA, highB);
        for (PvModule m : new PvModule[] {DemoEquipment.MODULE_400, DemoEquipment.MODULE_100_NO_VOC_COEFF}) {
            StringWindow c = StringWindow.of(m, DemoEquipment.MPPT_250_100, conditions(cooler));
            StringWindow h = StringWindow.of(m, DemoEquipment.MPPT_250_100, conditions(hotter));
            assertThat(h.minModules()).isGreaterThanOrEqualTo(c.minModules());
        }
    }

    private static StringDesignConditions conditions(double designHighC) {
        return new StringDesignConditions(-20, designHighC, 1000, 48, 52, 57.6, java.util.OptionalDouble.empty());
    }
}
