package org.holdover.catalog;

import java.util.List;
import org.holdover.battery.BatteryModule;
import org.holdover.inverter.InverterSpec;

/**
 * A validated component catalog.
 *
 * @param name           its name
 * @param source         where it was read from (a file, or the built-in resource)
 * @param demoData       invented demonstration data
 * @param note           note shown in the workbook
 * @param inverters      inverters
 * @param batteryModules battery modules
 * @param pvModules      PV modules (may be empty)
 * @param chargeControllers solar charge controllers (may be empty)
 * @param generators     engine generators (may be empty)
 */
public record Catalog(String name, String source, boolean demoData, String note, List<InverterSpec> inverters,
                      List<BatteryModule> batteryModules, List<PvModuleItem> pvModules,
                      List<ControllerItem> chargeControllers, List<GeneratorItem> generators) {
    public Catalog {
        generators = List.copyOf(generators);
        inverters = List.copyOf(inverters);
        batteryModules = List.copyOf(batteryModules);
        pvModules = List.copyOf(pvModules);
        chargeControllers = List.copyOf(chargeControllers);
    }

    /** A catalog without generators. */
    public Catalog(String name, String source, boolean demoData, String note, List<InverterSpec> inverters,
                   List<BatteryModule> batteryModules, List<PvModuleItem> pvModules, List<ControllerItem> chargeControllers) {
        this(name, source, demoData, note, inverters, batteryModules, pvModules, chargeControllers, List.of());
    }

    /** The same catalog with other generators. */
    public Catalog withGenerators(List<GeneratorItem> g) {
        return new Catalog(name, source, demoData, note, inverters, batteryModules, pvModules, chargeControllers, g);
    }

    /** A catalog without PV modules and charge controllers. */
    public Catalog(String name, String source, boolean demoData, String note, List<InverterSpec> inverters,
                   List<BatteryModule> batteryModules) {
        this(name, source, demoData, note, inverters, batteryModules, List.of(), List.of());
    }
}
