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
 */
public record WiringRules(double batteryToInverterM, double batteryToControllerM, double pvToControllerM,
                          double maxVoltageDropPct, double ambientC, TableSystem system,
                          boolean fineStranded, double busVoltageV) {
    public WiringRules {
        if (!(batteryToInverterM > 0) || !(maxVoltageDropPct > 0) || system == null) {
            throw new IllegalArgumentException("wiring rules need a length, a drop limit and a table system");
        }
    }
}
