package org.holdover.pv;

import java.util.OptionalDouble;

/** Invented equipment and conditions for tests (demo data, not any real product). */
final class DemoEquipment {

    private DemoEquipment() {
    }

    /** Demo data: a 400 W module with all three temperature coefficients. */
    static final PvModule MODULE_400 = new PvModule("Demo 400 W module (demo data)",
            new StcRatings(400, 41.0, 9.76, 49.2, 10.35), TemperatureCoefficients.of(-0.0035, -0.0027, 0.0005), 45.0, 1.95);

    /** Demo data: a 100 W "12 V class" module whose datasheet gives no Voc coefficient. */
    static final PvModule MODULE_100_NO_VOC_COEFF = new PvModule("Demo 100 W module (demo data)",
            new StcRatings(100, 18.5, 5.41, 22.3, 5.80), new TemperatureCoefficients(-0.0040, OptionalDouble.empty(),
                    OptionalDouble.of(0.0006), OptionalDouble.empty()), 46.0, 0.65);

    /** Demo data: MPPT, 150 V, 40 A input, 60 A output. */
    static final ChargeController MPPT_150_60 =
            new ChargeController("Demo MPPT 150/60 (demo data)", ControllerType.MPPT, 150, 40, 60, 0.97, 5.0);

    /** Demo data: MPPT, 250 V, 50 A input, 100 A output. */
    static final ChargeController MPPT_250_100 =
            new ChargeController("Demo MPPT 250/100 (demo data)", ControllerType.MPPT, 250, 50, 100, 0.975, 5.0);

    /** Demo data: PWM, 50 V, 30 A. */
    static final ChargeController PWM_30 =
            new ChargeController("Demo PWM 30 A (demo data)", ControllerType.PWM, 50, 30, 30, 0.98, 0.0);

    /** Demo data: a cold northern site with a 48 V lithium bank. */
    static StringDesignConditions cold48V(double recordLowC) {
        return new StringDesignConditions(recordLowC, 35.0, StringDesignConditions.DEFAULT_DESIGN_IRRADIANCE_W_M2,
                48.0, 52.0, 57.6, OptionalDouble.empty());
    }

    /** Demo data: the same site with a 12 V lead-acid bank. */
    static StringDesignConditions cold12V(double recordLowC) {
        return new StringDesignConditions(recordLowC, 35.0, StringDesignConditions.DEFAULT_DESIGN_IRRADIANCE_W_M2,
                12.0, 13.2, 14.6, OptionalDouble.empty());
    }
}
