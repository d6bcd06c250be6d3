package org.holdover.inverter;

import java.util.List;

/**
 * What an inverter's AC output supplies.
 *
 * @param voltsRms     line-to-line RMS voltage (240 for a 120/240 V split-phase output), V
 * @param frequenciesHz frequencies it can be set to, Hz
 * @param splitPhase   whether it supplies two 120 V legs with 240 V between them
 */
public record AcOutput(double voltsRms, List<Double> frequenciesHz, boolean splitPhase) {
    public AcOutput {
        frequenciesHz = List.copyOf(frequenciesHz);
        if (!(voltsRms > 0) || frequenciesHz.isEmpty()) {
            throw new IllegalArgumentException("an AC output needs a voltage and at least one frequency");
        }
    }

    /** Peak of the sine wave, V (√2 × RMS). */
    public double peakV() {
        return Math.sqrt(2.0) * voltsRms;
    }
}
