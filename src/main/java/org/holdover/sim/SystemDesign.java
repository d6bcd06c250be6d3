package org.holdover.sim;

import java.util.Objects;
import java.util.Optional;

/**
 * The equipment the year is simulated with.
 *
 * @param controller PV charge controller
 * @param inverter   inverter loss model
 * @param battery    battery bank
 * @param charger    charger fed by the generator or the grid ({@link Charger#NONE} if there is none)
 * @param generator  the generator, if any
 */
public record SystemDesign(ChargeController controller, InverterLossModel inverter, BatteryBank battery,
                           Charger charger, Optional<Generator> generator) {

    public SystemDesign {
        Objects.requireNonNull(controller, "controller");
        Objects.requireNonNull(inverter, "inverter");
        Objects.requireNonNull(battery, "battery");
        Objects.requireNonNull(charger, "charger");
        Objects.requireNonNull(generator, "generator");
        if (generator.isPresent()) {
            Generator g = generator.get();
            if (g.strategy() instanceof DispatchStrategy.CycleCharging cc
                    && cc.setPointSoc() > battery.ceilingSoc()) {
                throw new IllegalArgumentException("cycle-charging set point must be <= the battery ceiling "
                        + battery.ceilingSoc() + ", got " + cc.setPointSoc());
            }
        }
    }

    /** The same design with another battery. */
    public SystemDesign withBattery(BatteryBank other) {
        return new SystemDesign(controller, inverter, other, charger, generator);
    }

    /** The same design with another generator (or none). */
    public SystemDesign withGenerator(Optional<Generator> other) {
        return new SystemDesign(controller, inverter, battery, charger, other);
    }
}
