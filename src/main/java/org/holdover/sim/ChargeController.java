package org.holdover.sim;

/**
 * The PV charge controller seen as a converter from the array's DC power to the DC bus.
 *
 * @param efficiency   conversion efficiency, fraction in (0, 1]
 * @param outputLimitW largest output to the DC bus, W (&gt; 0); power above it is clipped
 */
public record ChargeController(double efficiency, double outputLimitW) {

    public ChargeController {
        Checks.efficiency("efficiency", efficiency);
        Checks.positive("outputLimitW", outputLimitW);
    }
}
