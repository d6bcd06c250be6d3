package org.holdover.catalog;

import java.util.Objects;
import org.holdover.pv.PvModule;

/**
 * A PV module offered in a catalog.
 *
 * @param id          identifier, unique in the catalog (also the module's name)
 * @param description plain description
 * @param module      the module's ratings
 * @param price       price of one module (demo data in the built-in catalog), ≥ 0
 */
public record PvModuleItem(String id, String description, PvModule module, double price) {
    public PvModuleItem {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(module, "module");
        if (!(price >= 0)) {
            throw new IllegalArgumentException("price must be >= 0, got " + price);
        }
    }
}
