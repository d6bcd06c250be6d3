package org.holdover.sizing;

import java.util.Objects;
import org.holdover.sim.DispatchStrategy;
import org.holdover.sim.GeneratorSizing;

/**
 * The project's rules for an engine generator (the {@code generator:} section with its defaults applied).
 *
 * @param allowed       the system search may add a catalog generator
 * @param strategy      how a running generator is dispatched
 * @param startSoc      the generator starts rather than let the battery fall below this state of charge, fraction
 * @param altitudeM     site altitude for derating, m
 * @param derating      altitude derating rule
 * @param chargerAcW    the charger's largest AC input from the generator, W, or NaN: from the bank
 *                      ({@link #CHARGE_RATE_PER_H} of its rated energy per hour, within its charge limit)
 * @param fuelPricePerL fuel price, currency per litre (0: not costed)
 */
public record GeneratorRules(boolean allowed, DispatchStrategy strategy, double startSoc, double altitudeM,
                             GeneratorSizing.AltitudeDerating derating, double chargerAcW, double fuelPricePerL) {

    /**
     * Charging rate of the generator's charger when the project does not give its input: 0.2 of the bank's rated
     * energy per hour (C/5), common practice, no source.
     */
    public static final double CHARGE_RATE_PER_H = 0.2;

    /** No generator. */
    public static final GeneratorRules NONE = new GeneratorRules(false, new DispatchStrategy.LoadFollowing(), 0, 0,
            GeneratorSizing.AltitudeDerating.TRADE_RULE, Double.NaN, 0);

    public GeneratorRules {
        Objects.requireNonNull(strategy, "strategy");
        Objects.requireNonNull(derating, "derating");
        if (!(startSoc >= 0 && startSoc <= 1)) {
            throw new IllegalArgumentException("startSoc must be in [0, 1], got " + startSoc);
        }
        if (strategy instanceof DispatchStrategy.CycleCharging cc && cc.setPointSoc() < startSoc) {
            throw new IllegalArgumentException("set point below the start state of charge");
        }
        if (!Double.isNaN(chargerAcW) && !(chargerAcW > 0)) {
            throw new IllegalArgumentException("chargerAcW must be > 0 or NaN, got " + chargerAcW);
        }
        if (!(fuelPricePerL >= 0)) {
            throw new IllegalArgumentException("fuelPricePerL must be >= 0, got " + fuelPricePerL);
        }
    }
}
