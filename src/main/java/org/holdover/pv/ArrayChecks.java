package org.holdover.pv;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The string and controller checks of one array on one controller.
 *
 * <ul>
 *   <li>{@value #COLD_VOC}: string V_oc at the record low (coefficient method, else Table
 *       690.7(A)) ≤ the controller's maximum PV input voltage (NEC 690.7(A); required).</li>
 *   <li>{@value #RECORD_LOW_IN_TABLE}: only when Table 690.7(A) is used: the record low is not below
 *       −40 °C, the table's last row (required).</li>
 *   <li>{@value #SYSTEM_VOLTAGE}: when a code limit is given, string cold V_oc ≤ it (NEC 690.7;
 *       required).</li>
 *   <li>{@value #HOT_VMP}: string V_mp at the hot cell temperature ≥ battery charge voltage +
 *       controller headroom (required; common practice, no source, for the headroom's use).</li>
 *   <li>{@value #INPUT_CURRENT}: 1.25 × array I_sc (NEC 690.8(A)(1)) ≤ the controller's maximum
 *       input current (required).</li>
 *   <li>{@value #OUTPUT_CURRENT}: MPPT, STC power × efficiency ÷ nominal battery voltage ≤ rated
 *       output current (advisory: above it the controller limits its output, see the clipped energy
 *       of {@link ControllerSimulation}); PWM, 1.25 × array I_sc ≤ rated current (required: a PWM
 *       controller passes the array current; common practice, no source).</li>
 * </ul>
 */
public final class ArrayChecks {

    public static final String COLD_VOC = "cold-voc-vs-controller";
    public static final String RECORD_LOW_IN_TABLE = "record-low-within-table-690.7A";
    public static final String SYSTEM_VOLTAGE = "cold-voc-vs-system-limit";
    public static final String HOT_VMP = "hot-vmp-vs-charge-voltage";
    public static final String INPUT_CURRENT = "input-current-690.8";
    public static final String OUTPUT_CURRENT = "output-current";

    private ArrayChecks() {
    }

    /**
     * All checks of {@code array} on {@code controller}.
     */
    public static ArrayCheckReport evaluate(PvArray array, ChargeController controller, StringDesignConditions c) {
        PvModule m = array.module();
        StringWindow w = StringWindow.of(m, controller, c);
        int n = array.modulesPerString();
        double coldVoc = w.coldVoc().moduleVocV() * n;
        double hotVmp = w.moduleVmpHotV() * n;
        double maxCircuit = Nec690.maxCircuitCurrentA(array.arrayIscA());
        double conductor = Nec690.conductorSizingCurrentA(array.arrayIscA());
        List<Check> checks = new ArrayList<>();
        String method = w.coldVoc() instanceof ColdVoc.ByCoefficient b
                ? String.format(Locale.ROOT, "coefficient method, %.4f/°C at %.1f °C", b.vocPerC(), b.recordLowC())
                : String.format(Locale.ROOT, "Table 690.7(A) factor %.2f (%s)",
                        ((ColdVoc.ByNecTable) w.coldVoc()).factor(), ((ColdVoc.ByNecTable) w.coldVoc()).row());
        checks.add(new Check(COLD_VOC, "string open-circuit voltage at the record low (" + method
                + ") within the controller's maximum PV input voltage (NEC 690.7(A))",
                coldVoc, controller.maxPvInputV(), "V", Check.Bound.MAX, Check.Severity.REQUIRED));
        if (w.coldVoc() instanceof ColdVoc.ByNecTable t && t.belowTable()) {
            checks.add(new Check(RECORD_LOW_IN_TABLE, "record low within Table 690.7(A) (down to -40 °C); colder"
                    + " sites need the module's Voc temperature coefficient", c.recordLowC(), -40.0, "°C",
                    Check.Bound.MIN, Check.Severity.REQUIRED));
        }
        if (c.systemVoltageLimitV().isPresent()) {
            checks.add(new Check(SYSTEM_VOLTAGE, "string open-circuit voltage at the record low within the code's"
                    + " maximum PV system voltage (NEC 690.7)", coldVoc, c.systemVoltageLimitV().getAsDouble(), "V",
                    Check.Bound.MAX, Check.Severity.REQUIRED));
        }
        checks.add(new Check(HOT_VMP, String.format(Locale.ROOT,
                "string maximum-power voltage at %.1f °C cells (NOCT model, %.0f °C air, %.0f W/m²) reaches the"
                        + " battery charge voltage plus the controller's headroom",
                w.hotCellTempC(), c.designHighAirC(), c.designIrradianceWm2()),
                hotVmp, w.requiredStringVmpV(), "V", Check.Bound.MIN, Check.Severity.REQUIRED));
        checks.add(new Check(INPUT_CURRENT, "maximum PV circuit current 1.25 × Isc (NEC 690.8(A)(1)) within the"
                + " controller's maximum input current", maxCircuit, controller.maxInputCurrentA(), "A",
                Check.Bound.MAX, Check.Severity.REQUIRED));
        double outputA;
        double pwmRatio = 1.0;
        if (controller.type() == ControllerType.MPPT) {
            outputA = array.stcPowerW() * controller.efficiency() / c.batteryNominalV();
            checks.add(new Check(OUTPUT_CURRENT, "battery-side current at STC power (array STC power × efficiency ÷"
                    + " nominal battery voltage) within the rated output current; above it the controller limits"
                    + " its output (clipping)", outputA, controller.ratedOutputCurrentA(), "A", Check.Bound.MAX,
                    Check.Severity.ADVISORY));
        } else {
            outputA = maxCircuit;
            pwmRatio = PwmOperatingPoint.stringPowerRatio(m, n, c.batteryOperatingV(), 25.0);
            checks.add(new Check(OUTPUT_CURRENT, "array current 1.25 × Isc within the PWM controller's rated current",
                    outputA, controller.ratedOutputCurrentA(), "A", Check.Bound.MAX, Check.Severity.REQUIRED));
        }
        return new ArrayCheckReport(array, controller, c, w, coldVoc, hotVmp, maxCircuit, conductor, outputA, pwmRatio,
                checks);
    }
}
