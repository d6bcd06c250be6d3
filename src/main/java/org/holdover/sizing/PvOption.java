package org.holdover.sizing;

import java.util.List;
import java.util.Objects;
import org.holdover.catalog.ControllerItem;
import org.holdover.catalog.PvModuleItem;
import org.holdover.pv.ArrayCandidate;
import org.holdover.pv.ArrayDcSeries;
import org.holdover.pv.ControllerSeries;
import org.holdover.pv.MonthlySizingResult;
import org.holdover.solar.PoaSeries;

/**
 * One PV module with one controller type from the catalog, sized for the project: the tilt, the monthly
 * sizing, the array the chooser built, its year hour by hour and every check. Arrays are shared, not copied:
 * do not change them.
 *
 * @param module               the module
 * @param controller           the controller (used {@code candidate.controllerCount()} times)
 * @param tiltDeg              the tilt used, ° from horizontal
 * @param tiltsDeg             the tilts tried (one when the project gives the tilt)
 * @param requiredByTiltW      the array each tilt would need with this controller, W (same order)
 * @param peakSunHours         plane-of-array irradiation by month at the tilt, kWh/m²/day (before reflection loss)
 * @param performanceRatio     DC performance ratio by month (reflection, temperature, DC losses); 0 in a month
 *                             without sun
 * @param derate               array-to-battery derate by month: performance ratio × controller efficiency (1 in a
 *                             month without sun)
 * @param sizing               the monthly sizing (worst month or refill) at the tilt
 * @param topUp                factor applied to the sizing's requirement after the hourly controller check (1 = none)
 * @param requiredStcW         the requirement the array was chosen for: sizing × topUp, W
 * @param candidate            the array the chooser built (modules per string × strings × controllers)
 * @param poa                  plane-of-array irradiance at the tilt, hour by hour
 * @param dc                   the whole array's DC output hour by hour
 * @param output               all controllers together hour by hour (one controller with the summed ratings)
 * @param outputWhPerDay       controller output by month, mean Wh/day
 * @param needWhPerDay         what the controller must deliver by month, Wh/day (load ÷ round trip; backup: plus
 *                             the refill spread over the refill days)
 * @param tightestMonth        0-based month where output ÷ need is smallest
 * @param checks               checks that reject the design when they fail
 * @param advisories           checks worth knowing that do not reject it
 * @param price                modules × module price + controllers × controller price
 */
public record PvOption(PvModuleItem module, ControllerItem controller, double tiltDeg, double[] tiltsDeg,
                       double[] requiredByTiltW, double[] peakSunHours, double[] performanceRatio, double[] derate,
                       MonthlySizingResult sizing, double topUp, double requiredStcW, ArrayCandidate candidate,
                       PoaSeries poa, ArrayDcSeries dc, ControllerSeries output, double[] outputWhPerDay,
                       double[] needWhPerDay, int tightestMonth, List<Check> checks, List<Check> advisories,
                       double price) {

    public PvOption {
        Objects.requireNonNull(module, "module");
        Objects.requireNonNull(controller, "controller");
        Objects.requireNonNull(candidate, "candidate");
        checks = List.copyOf(checks);
        advisories = List.copyOf(advisories);
        if (tightestMonth < 0 || tightestMonth > 11) {
            throw new IllegalArgumentException("tightestMonth must be 0–11");
        }
    }

    /** Every check that rejects the design passes. */
    public boolean passes() {
        return checks.stream().allMatch(Check::passes);
    }

    /** How many advisory checks fail. */
    public long advisoryFailures() {
        return advisories.stream().filter(c -> !c.passes()).count();
    }

    /** The first failing check, or null. */
    public Check firstFailure() {
        return checks.stream().filter(c -> !c.passes()).findFirst().orElse(null);
    }

    /** Total modules. */
    public int modules() {
        return candidate.totalModules();
    }
}
