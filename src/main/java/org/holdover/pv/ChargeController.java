package org.holdover.pv;

import java.util.Objects;

/**
 * A solar charge controller's ratings.
 *
 * @param name                a label (demo data unless the user supplies real ones)
 * @param type                MPPT or PWM
 * @param maxPvInputV         highest PV open-circuit voltage the input withstands, V, &gt; 0
 * @param maxInputCurrentA    highest PV input (short-circuit) current allowed, A, &gt; 0; compared with
 *                            the NEC 690.8(A)(1) maximum circuit current 1.25 × I_sc
 * @param ratedOutputCurrentA rated battery-side current, A, &gt; 0 (for PWM also the array current)
 * @param efficiency          power conversion efficiency, in (0, 1]
 * @param minHeadroomV        how far the array's maximum-power voltage must stay above the battery
 *                            voltage for the controller to charge, V, ≥ 0 (0 for PWM is usual)
 */
public record ChargeController(String name, ControllerType type, double maxPvInputV, double maxInputCurrentA,
        double ratedOutputCurrentA, double efficiency, double minHeadroomV) {

    public ChargeController {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(type, "type");
        if (!(maxPvInputV > 0 && maxPvInputV <= 2000)) {
            throw new IllegalArgumentException("maxPvInputV must be in (0, 2000], got " + maxPvInputV);
        }
        if (!(maxInputCurrentA > 0)) {
            throw new IllegalArgumentException("maxInputCurrentA must be > 0, got " + maxInputCurrentA);
        }
        if (!(ratedOutputCurrentA > 0)) {
            throw new IllegalArgumentException("ratedOutputCurrentA must be > 0, got " + ratedOutputCurrentA);
        }
        if (!(efficiency > 0 && efficiency <= 1)) {
            throw new IllegalArgumentException("efficiency must be in (0, 1], got " + efficiency);
        }
        if (!(minHeadroomV >= 0 && minHeadroomV < maxPvInputV)) {
            throw new IllegalArgumentException("minHeadroomV must be in [0, maxPvInputV), got " + minHeadroomV);
        }
    }
}
