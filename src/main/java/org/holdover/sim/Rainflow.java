package org.holdover.sim;

import java.util.ArrayList;
import java.util.List;

/** Rainflow counting (ASTM E1049-85 §5.4.4) and Miner's-rule damage; see {@link RainflowCounter}. */
public final class Rainflow {

    private Rainflow() {
    }

    /**
     * Counts the cycles of a history, in the order the standard counts them.
     *
     * @param history values in time order (any unit, finite); points that are not peaks or valleys are
     *                dropped first
     * @return the ranges counted; half cycles for the residue
     */
    public static List<RainflowCycle> count(double[] history) {
        List<RainflowCycle> out = new ArrayList<>();
        RainflowCounter counter = new RainflowCounter() {
            @Override
            void cycle(double from, double to, double count) {
                out.add(new RainflowCycle(Math.abs(to - from), (from + to) / 2, count));
            }
        };
        for (double v : history) {
            counter.push(Checks.finite("history value", v));
        }
        counter.finish();
        return List.copyOf(out);
    }

    /**
     * Miner's-rule damage of a state-of-charge history: the sum over counted ranges of
     * {@code count / cyclesToFailure(range)}, the range taken as the depth of discharge.
     *
     * @param socHistory state of charge, fraction, in time order
     * @param curve      cycles against depth of discharge
     * @return damage (1 = end of life)
     */
    public static double minerDamage(double[] socHistory, CycleLifeCurve curve) {
        double d = 0;
        for (RainflowCycle c : count(socHistory)) {
            if (c.range() > 0) {
                d += c.count() * curve.damagePerCycle(c.range());
            }
        }
        return d;
    }
}
