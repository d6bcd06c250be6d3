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
        return count(history, 0);
    }

    /**
     * Counts the cycles of a history after dropping reversals not larger than a hysteresis gate.
     *
     * @param history values in time order (finite)
     * @param gate    reversals of this size or smaller are ignored, in the history's unit (&ge; 0)
     * @return the ranges counted
     */
    public static List<RainflowCycle> count(double[] history, double gate) {
        List<RainflowCycle> out = new ArrayList<>();
        RainflowCounter counter = new RainflowCounter(gate) {
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
        return minerDamage(socHistory, curve, 0);
    }

    /**
     * Miner's-rule damage after a hysteresis gate (see {@link #count(double[], double)}).
     *
     * @param socHistory state of charge, fraction, in time order
     * @param curve      cycles against depth of discharge
     * @param gate       reversals of this size or smaller are ignored, fraction (&ge; 0)
     * @return damage (1 = end of life)
     */
    public static double minerDamage(double[] socHistory, CycleLifeCurve curve, double gate) {
        double d = 0;
        for (RainflowCycle c : count(socHistory, gate)) {
            if (c.range() > 0) {
                d += c.count() * curve.damagePerCycle(c.range());
            }
        }
        return d;
    }
}
