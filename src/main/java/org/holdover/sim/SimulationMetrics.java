package org.holdover.sim;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The year's results. All energies are sums of hourly values, Wh; hour counts are whole hours.
 *
 * @param hours       number of hours simulated
 * @param reliability load served and not served
 * @param pv          PV energy and what was lost of it
 * @param inverter    inverter energies
 * @param battery     battery state, throughput and life
 * @param generator   generator running, fuel and output
 * @param grid        grid energy (backup mode)
 */
public record SimulationMetrics(int hours, Reliability reliability, Pv pv, Inverter inverter, Battery battery,
                                GeneratorRun generator, Grid grid) {

    public SimulationMetrics {
        if (hours <= 0) {
            throw new IllegalArgumentException("hours must be > 0, got " + hours);
        }
        Objects.requireNonNull(reliability, "reliability");
        Objects.requireNonNull(pv, "pv");
        Objects.requireNonNull(inverter, "inverter");
        Objects.requireNonNull(battery, "battery");
        Objects.requireNonNull(generator, "generator");
        Objects.requireNonNull(grid, "grid");
        if (reliability.unmetHours() > hours || generator.hours() > hours) {
            throw new IllegalArgumentException("hour counts exceed the " + hours + " hours simulated");
        }
    }

    /**
     * Load served and not served. Unmet load is counted on the AC side: the AC load of the hour less what
     * the inverter, the generator and the grid delivered to it.
     *
     * @param loadWh                AC load demanded
     * @param servedWh              AC load served
     * @param unmetWh               AC load not served
     * @param unmetHours            hours with any unmet load (unmet &gt; 0 Wh)
     * @param lossOfLoadProbability unmetHours / hours
     * @param unmetEnergyFraction   unmetWh / loadWh (0 when there is no load)
     */
    public record Reliability(double loadWh, double servedWh, double unmetWh, int unmetHours,
                              double lossOfLoadProbability, double unmetEnergyFraction) {
        public Reliability {
            Checks.nonNegative("loadWh", loadWh);
            Checks.nonNegative("servedWh", servedWh);
            Checks.nonNegative("unmetWh", unmetWh);
            if (unmetHours < 0) {
                throw new IllegalArgumentException("unmetHours must be >= 0, got " + unmetHours);
            }
            Checks.fraction("lossOfLoadProbability", lossOfLoadProbability);
            Checks.fraction("unmetEnergyFraction", unmetEnergyFraction);
        }
    }

    /**
     * PV energy.
     *
     * @param arrayWh            PV array DC output before the controller
     * @param controllerOutputWh controller output to the DC bus (after efficiency and output limit)
     * @param clippedWh          lost to the controller's output limit
     * @param curtailedWh        controller output that neither the load nor the battery could take
     */
    public record Pv(double arrayWh, double controllerOutputWh, double clippedWh, double curtailedWh) {
        public Pv {
            Checks.nonNegative("arrayWh", arrayWh);
            Checks.nonNegative("controllerOutputWh", controllerOutputWh);
            Checks.nonNegative("clippedWh", clippedWh);
            Checks.nonNegative("curtailedWh", curtailedWh);
        }
    }

    /**
     * Inverter energies.
     *
     * @param inputWh  DC input
     * @param outputWh AC output
     * @param lossWh   inputWh - outputWh (no-load and load-dependent losses)
     */
    public record Inverter(double inputWh, double outputWh, double lossWh) {
        public Inverter {
            Checks.nonNegative("inputWh", inputWh);
            Checks.nonNegative("outputWh", outputWh);
            Checks.finite("lossWh", lossWh);
        }
    }

    /**
     * Battery state and throughput.
     *
     * @param lowestSoc            lowest end-of-hour state of charge, fraction
     * @param finalSoc             state of charge at the end of the last hour, fraction
     * @param hoursBelow           hours below each requested threshold, in the order requested
     * @param chargeWh             DC energy into the terminals
     * @param dischargeWh          DC energy out of the terminals (the throughput)
     * @param equivalentFullCycles dischargeWh / nominal energy
     * @param life                 life estimate, when requested
     */
    public record Battery(double lowestSoc, double finalSoc, List<SocThresholdHours> hoursBelow, double chargeWh,
                          double dischargeWh, double equivalentFullCycles, Optional<BatteryLife> life) {
        public Battery {
            Checks.finite("lowestSoc", lowestSoc);
            Checks.finite("finalSoc", finalSoc);
            hoursBelow = List.copyOf(hoursBelow);
            Checks.nonNegative("chargeWh", chargeWh);
            Checks.nonNegative("dischargeWh", dischargeWh);
            Checks.nonNegative("equivalentFullCycles", equivalentFullCycles);
            Objects.requireNonNull(life, "life");
        }
    }

    /**
     * Generator running.
     *
     * @param hours      hours run (a running hour counts whole)
     * @param starts     starts (hours run after an hour not run; the hour before the period counts as not run)
     * @param fuelL      fuel, L
     * @param outputWh   electrical output
     * @param toLoadWh   output to the AC load
     * @param toChargerWh output to the charger (AC side)
     * @param dumpedWh   output forced by the minimum load and not used
     */
    public record GeneratorRun(int hours, int starts, double fuelL, double outputWh, double toLoadWh,
                               double toChargerWh, double dumpedWh) {
        public GeneratorRun {
            if (hours < 0 || starts < 0 || starts > hours) {
                throw new IllegalArgumentException("need 0 <= starts <= hours, got " + starts + " starts, "
                        + hours + " hours");
            }
            Checks.nonNegative("fuelL", fuelL);
            Checks.nonNegative("outputWh", outputWh);
            Checks.nonNegative("toLoadWh", toLoadWh);
            Checks.nonNegative("toChargerWh", toChargerWh);
            Checks.nonNegative("dumpedWh", dumpedWh);
        }
    }

    /**
     * Grid energy in backup mode.
     *
     * @param toLoadWh    grid energy to the AC load
     * @param toChargerWh grid energy into the charger (AC side)
     */
    public record Grid(double toLoadWh, double toChargerWh) {
        public Grid {
            Checks.nonNegative("toLoadWh", toLoadWh);
            Checks.nonNegative("toChargerWh", toChargerWh);
        }
    }
}
