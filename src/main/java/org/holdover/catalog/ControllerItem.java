package org.holdover.catalog;

import java.util.List;
import java.util.Objects;
import org.holdover.pv.ChargeController;

/**
 * A solar charge controller offered in a catalog.
 *
 * @param id              identifier, unique in the catalog (also the controller's name)
 * @param description     plain description
 * @param controller      its ratings
 * @param batteryClassesV nominal battery (bus) voltage classes it can charge, V (12, 24, 48, …), not empty
 * @param price           price of one controller (demo data in the built-in catalog), ≥ 0
 */
public record ControllerItem(String id, String description, ChargeController controller, List<Double> batteryClassesV,
                             double price) {
    public ControllerItem {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(controller, "controller");
        batteryClassesV = List.copyOf(batteryClassesV);
        if (batteryClassesV.isEmpty()) {
            throw new IllegalArgumentException("batteryClassesV must not be empty");
        }
        if (!(price >= 0)) {
            throw new IllegalArgumentException("price must be >= 0, got " + price);
        }
    }

    /** Whether it can charge a bank on the given bus class, V. */
    public boolean suits(double busClassV) {
        return batteryClassesV.contains(busClassV);
    }
}
