package org.holdover.dc;

import java.util.Objects;

/**
 * One size and parallel count tried, with all three checks.
 *
 * @param size         the conductor size
 * @param parallelSets conductors per pole
 * @param ampacity     the ampacity check
 * @param voltageDrop  the voltage-drop check
 * @param device       the overcurrent device, or why none fits
 */
public record CandidateEvaluation(ConductorSize size, int parallelSets, AmpacityStep ampacity,
                                  VoltageDropStep voltageDrop, OvercurrentDevice device) {

    public CandidateEvaluation {
        Objects.requireNonNull(size, "size");
        Objects.requireNonNull(ampacity, "ampacity");
        Objects.requireNonNull(voltageDrop, "voltageDrop");
        Objects.requireNonNull(device, "device");
        if (ampacity.parallelSets() != parallelSets || voltageDrop.parallelSets() != parallelSets) {
            throw new IllegalArgumentException("parallel counts disagree");
        }
    }

    /** @return true when ampacity, voltage drop and the overcurrent device all pass */
    public boolean passes() {
        return ampacity.ok() && voltageDrop.ok() && device.fits();
    }
}
