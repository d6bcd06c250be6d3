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
 */
public record Catalog(String name, String source, boolean demoData, String note, List<InverterSpec> inverters,
                      List<BatteryModule> batteryModules) {
    public Catalog {
        inverters = List.copyOf(inverters);
        batteryModules = List.copyOf(batteryModules);
    }
}
