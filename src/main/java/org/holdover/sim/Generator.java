package org.holdover.sim;

/**
 * An engine generator on the AC bus.
 *
 * @param ratedW        nameplate rating, W (&gt; 0); the fuel curve's no-load term and the minimum load
 *                      are taken from it
 * @param availableW    largest output at the site after derating (altitude, temperature), W, in (0, ratedW]
 * @param minLoadRatio  smallest output as a fraction of {@code ratedW} while running, in [0, 1]; output
 *                      forced up to it is dumped unless the strategy charges the battery with it
 * @param fuel          fuel curve
 * @param strategy      dispatch strategy
 * @param startSoc      the generator starts rather than let the battery fall below this state of charge,
 *                      fraction in [0, 1]; below {@code max(floorSoc, startSoc)} the battery serves only
 *                      what the running generator cannot
 */
public record Generator(double ratedW, double availableW, double minLoadRatio, FuelCurve fuel,
                        DispatchStrategy strategy, double startSoc) {

    public Generator {
        Checks.positive("ratedW", ratedW);
        Checks.positive("availableW", availableW);
        if (availableW > ratedW) {
            throw new IllegalArgumentException(
                    "availableW must be <= ratedW, got " + availableW + " > " + ratedW);
        }
        Checks.fraction("minLoadRatio", minLoadRatio);
        if (fuel == null || strategy == null) {
            throw new IllegalArgumentException("fuel and strategy are required");
        }
        Checks.fraction("startSoc", startSoc);
        if (strategy instanceof DispatchStrategy.CycleCharging cc && cc.setPointSoc() < startSoc) {
            throw new IllegalArgumentException("cycle-charging set point must be >= startSoc, got "
                    + cc.setPointSoc() + " < " + startSoc);
        }
    }
}
