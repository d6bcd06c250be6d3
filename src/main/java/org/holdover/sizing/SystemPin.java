package org.holdover.sizing;

import java.util.Objects;

/**
 * One system fixed component by component (a system search's choice), for the sizing to write out in full.
 *
 * @param busClassV       DC bus class, V
 * @param inverterId      catalog inverter
 * @param inverters       identical inverters in parallel (at least 1)
 * @param batteryModuleId catalog battery module
 * @param strings         parallel battery strings (at least what the bank's requirement asks for)
 * @param pv              the PV layout, or null without PV
 * @param generatorId     catalog generator, or null without one
 */
public record SystemPin(double busClassV, String inverterId, int inverters, String batteryModuleId, int strings, PvPin pv,
                        String generatorId) {

    /** A system with one inverter. */
    public SystemPin(double busClassV, String inverterId, String batteryModuleId, int strings, PvPin pv, String generatorId) {
        this(busClassV, inverterId, 1, batteryModuleId, strings, pv, generatorId);
    }

    /** A system with one inverter and without a generator. */
    public SystemPin(double busClassV, String inverterId, String batteryModuleId, int strings, PvPin pv) {
        this(busClassV, inverterId, 1, batteryModuleId, strings, pv, null);
    }

    public SystemPin {
        Objects.requireNonNull(inverterId, "inverterId");
        Objects.requireNonNull(batteryModuleId, "batteryModuleId");
        if (strings < 1 || inverters < 1) {
            throw new IllegalArgumentException("strings and inverters must be >= 1");
        }
    }

    /** Whether an inverter (a catalog unit or units in parallel) is the pinned one. */
    public boolean isInverter(org.holdover.inverter.InverterSpec s) {
        return s.id().equals(inverterId) && s.units() == inverters;
    }

    /**
     * @param moduleId             catalog PV module
     * @param controllerId         catalog charge controller
     * @param modulesPerString     modules in series in each string
     * @param stringsPerController strings on each controller
     * @param controllers          identical controllers
     */
    public record PvPin(String moduleId, String controllerId, int modulesPerString, int stringsPerController, int controllers) {
        public PvPin {
            Objects.requireNonNull(moduleId, "moduleId");
            Objects.requireNonNull(controllerId, "controllerId");
            if (modulesPerString < 1 || stringsPerController < 1 || controllers < 1) {
                throw new IllegalArgumentException("modules per string, strings and controllers must be >= 1");
            }
        }

        /** Strings in all. */
        public int totalStrings() {
            return stringsPerController * controllers;
        }
    }
}
