package org.holdover.sizing;

import org.holdover.dc.TableSystem;

/**
 * How the DC cables run, for conductor sizing and the voltage at the inverter during a motor start.
 *
 * @param batteryToInverterM one-way length of the battery–inverter cable, m
 * @param batteryToControllerM one-way length of each controller-to-battery cable, m
 * @param pvToControllerM    one-way length of each PV output circuit, m
 * @param maxVoltageDropPct  voltage-drop limit at the continuous current, %
 * @param ambientC           ambient around the conductors, °C
 * @param system             conductor tables (NEC AWG or IEC mm²)
 * @param fineStranded       battery cables are fine-stranded
 * @param busVoltageV        consider only this bus class, V (0: choose)
 * @param busBarToInverterM  one-way length of each inverter's own leads from the common DC bus bar, when inverters run in
 *                           parallel, m
 */
public record WiringRules(double batteryToInverterM, double batteryToControllerM, double pvToControllerM,
                          double maxVoltageDropPct, double ambientC, TableSystem system,
                          boolean fineStranded, double busVoltageV, double busBarToInverterM) {

    /** With the default length of the inverters' own leads. */
    public WiringRules(double batteryToInverterM, double batteryToControllerM, double pvToControllerM,
                       double maxVoltageDropPct, double ambientC, TableSystem system, boolean fineStranded, double busVoltageV) {
        this(batteryToInverterM, batteryToControllerM, pvToControllerM, maxVoltageDropPct, ambientC, system, fineStranded,
                busVoltageV, InverterLeads.DEFAULT_LEAD_M);
    }

    public WiringRules {
        if (!(batteryToInverterM > 0) || !(maxVoltageDropPct > 0) || !(busBarToInverterM > 0) || system == null) {
            throw new IllegalArgumentException("wiring rules need a length, a drop limit and a table system");
        }
    }
}
