package org.holdover.pv;

import java.util.Objects;

/**
 * The range of modules per string one module type allows on one controller.
 *
 * @param coldVoc                  module V_oc at the record low
 * @param hotCellTempC             cell temperature at the design high air temperature and design
 *                                 irradiance (NOCT model), °C
 * @param moduleVmpHotV            module V_mp at that cell temperature, V
 * @param requiredStringVmpV       the lowest string V_mp that still charges: battery charge voltage +
 *                                 the controller's headroom, V
 * @param maxByControllerVoltage   most modules whose cold V_oc stays within the controller's maximum
 * @param maxBySystemLimit         most modules within the code system-voltage limit (Integer.MAX_VALUE
 *                                 when none applies)
 * @param minModules               fewest modules whose hot V_mp reaches the required voltage
 */
public record StringWindow(ColdVoc coldVoc, double hotCellTempC, double moduleVmpHotV, double requiredStringVmpV,
        int maxByControllerVoltage, int maxBySystemLimit, int minModules) {

    public StringWindow {
        Objects.requireNonNull(coldVoc, "coldVoc");
    }

    /** The most modules per string allowed. */
    public int maxModules() {
        return Math.min(maxByControllerVoltage, maxBySystemLimit);
    }

    /** True when no string length satisfies both the cold and the hot voltage checks. */
    public boolean isEmpty() {
        return minModules > maxModules() || maxModules() < 1;
    }

    /**
     * Works out the window.
     *
     * @param module     the module
     * @param controller the controller
     * @param conditions site and battery conditions
     */
    public static StringWindow of(PvModule module, ChargeController controller, StringDesignConditions conditions) {
        ColdVoc cold = ColdVoc.of(module, conditions.recordLowC());
        double hotCell = CellTemperature.noct(conditions.designHighAirC(), conditions.designIrradianceWm2(),
                module.noctC());
        double vmpHot = module.vmpAtCellV(hotCell);
        double required = conditions.batteryChargeV() + controller.minHeadroomV();
        int maxCtrl = (int) Math.floor(controller.maxPvInputV() / cold.moduleVocV() + 1e-12);
        int maxSys = conditions.systemVoltageLimitV().isPresent()
                ? (int) Math.floor(conditions.systemVoltageLimitV().getAsDouble() / cold.moduleVocV() + 1e-12)
                : Integer.MAX_VALUE;
        int min = vmpHot > 0 ? (int) Math.ceil(required / vmpHot - 1e-12) : Integer.MAX_VALUE;
        return new StringWindow(cold, hotCell, vmpHot, required, maxCtrl, maxSys, Math.max(1, min));
    }
}
