package org.holdover.sizing;

import java.util.List;
import java.util.Objects;
import org.holdover.pv.StringDesignConditions;

/**
 * The PV array and charge controller(s) sized for the chosen battery bank.
 *
 * @param setup                the solar setup (weather, sun path, defaults)
 * @param method               how the array was sized
 * @param roundTripEfficiency  battery round-trip efficiency of the bank's chemistry
 * @param loadDcWhPerDay       DC energy the loads draw per day, by month, Wh/day (inverter DC input)
 * @param refillWh             backup: the DC energy the hardest outage drew, Wh (0 off grid)
 * @param conditions           battery and site conditions of the string checks
 * @param busClassV            the bus class the controllers must suit, V
 * @param options              every module and controller pair considered, best first
 * @param chosen               the chosen pair, or null when none could be sized
 * @param checks               the checks that reject the system when they fail (the chosen option's, or why none)
 * @param advisories           checks worth knowing that do not reject it
 * @param reason               why no array was chosen ("" when one was)
 */
public record SolarDesign(SolarSetup setup, Method method, double roundTripEfficiency, double[] loadDcWhPerDay,
                          double refillWh, StringDesignConditions conditions, double busClassV, List<PvOption> options,
                          PvOption chosen, List<Check> checks, List<Check> advisories, String reason) {

    /** Sizing method. */
    public enum Method {
        /** Off grid: the month needing the largest array (Sandia SAND87-7023 worksheets' structure). */
        WORST_MONTH,
        /** Backup: refill what the hardest outage drew within the refill days while carrying the loads. */
        REFILL
    }

    public SolarDesign {
        Objects.requireNonNull(setup, "setup");
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(conditions, "conditions");
        loadDcWhPerDay = loadDcWhPerDay.clone();
        options = List.copyOf(options);
        checks = List.copyOf(checks);
        advisories = List.copyOf(advisories);
        reason = reason == null ? "" : reason;
    }

    @Override
    public double[] loadDcWhPerDay() {
        return loadDcWhPerDay.clone();
    }
}
