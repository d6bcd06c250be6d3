package org.holdover.sim;

import java.util.Arrays;

/**
 * Streaming rainflow counting after ASTM E1049-85, §5.4.4. Values are fed one at a time;
 * the counter first reduces them to peaks and valleys (plateaus and points on a slope are dropped), then
 * applies the standard's rules to a stack of the points not yet discarded:
 *
 * <ol>
 * <li>push the next peak or valley; with fewer than three points, read the next;</li>
 * <li>X = range of the two most recent points, Y = range of the two before;</li>
 * <li>if X &lt; Y read the next point; otherwise, if Y contains the starting point (the stack holds
 * exactly three points), count Y as a half cycle and discard the starting point; else count Y as one
 * cycle and discard both of its points; then repeat from 2;</li>
 * <li>at the end, count every range left between consecutive points as a half cycle.</li>
 * </ol>
 *
 * Allocation happens only when the stack outgrows its array (rare: the stack holds the residue).
 *
 * <p>An optional hysteresis gate drops reversals not larger than the gate before counting (a filter
 * commonly applied to measured histories; common practice, no source). With a gate of 0 the count is the
 * standard's.
 */
abstract class RainflowCounter {

    private final double gate;

    private double[] stack = new double[64];
    private int size;
    private boolean started;
    private double candidate;
    private int direction;

    /** @param gate reversals of this size or smaller are ignored (&ge; 0; 0 counts every reversal) */
    RainflowCounter(double gate) {
        this.gate = Checks.nonNegative("gate", gate);
    }

    /** Called for each range counted: from and to are the range's points, count is 0.5 or 1. */
    abstract void cycle(double from, double to, double count);

    final void push(double value) {
        if (!started) {
            started = true;
            candidate = value;
            add(value);
            return;
        }
        if (direction == 0) {
            if (Math.abs(value - candidate) > gate) {
                direction = value > candidate ? 1 : -1;
                candidate = value;
            }
        } else if ((value - candidate) * direction > 0) {
            candidate = value;
        } else if (Math.abs(value - candidate) > gate) {
            add(candidate);
            direction = -direction;
            candidate = value;
        }
    }

    /** Ends the history: the last extreme becomes a turning point and the residue is counted as halves. */
    final void finish() {
        if (direction != 0) {
            add(candidate);
        }
        countResidue();
    }

    /** Feeds the first {@code count} values of a block, in order. */
    final void pushAll(double[] values, int count) {
        for (int i = 0; i < count; i++) {
            push(values[i]);
        }
    }

    private void countResidue() {
        for (int i = 0; i + 1 < size; i++) {
            cycle(stack[i], stack[i + 1], 0.5);
        }
        size = 0;
        started = false;
        direction = 0;
    }

    private void add(double point) {
        if (size == stack.length) {
            stack = Arrays.copyOf(stack, 2 * size);
        }
        stack[size++] = point;
        while (size >= 3) {
            double x = Math.abs(stack[size - 1] - stack[size - 2]);
            double y = Math.abs(stack[size - 2] - stack[size - 3]);
            if (x < y) {
                return;
            }
            if (size == 3) {
                cycle(stack[0], stack[1], 0.5);
                stack[0] = stack[1];
                stack[1] = stack[2];
                size = 2;
            } else {
                cycle(stack[size - 3], stack[size - 2], 1);
                stack[size - 3] = stack[size - 1];
                size -= 2;
            }
        }
    }
}
