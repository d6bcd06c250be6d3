package org.holdover.pv;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * Chooses modules per string × strings (and how many identical controllers) for the given module and
 * controller lists, returning every candidate with every check and its margin, best first.
 *
 * <p>For each module and controller, each string length in the {@link StringWindow} is tried; the
 * total strings are the fewest that reach the required power (for PWM, the effective power at the
 * battery operating voltage); they are split evenly over the fewest controllers (up to
 * {@code maxControllers}) for which every check passes, advisory ones included, else the fewest for
 * which the required ones pass, else one. When the window is empty, one candidate at the nearest
 * string length is still returned so its failing checks show why.
 *
 * <p>Order: candidates passing every required check first; then fewer failing advisory checks; then
 * the smaller total STC power; then fewer controllers; then fewer modules; then names.
 */
public final class ArrayChooser {

    private ArrayChooser() {
    }

    /**
     * @param requiredStcW   array power the sizing asks for, W, &gt; 0 and finite
     * @param modules        modules to consider
     * @param controllers    controllers to consider
     * @param conditions     site and battery conditions
     * @param maxControllers most identical controllers to parallel, in [1, 20]
     */
    public record Input(double requiredStcW, List<PvModule> modules, List<ChargeController> controllers,
            StringDesignConditions conditions, int maxControllers) {
        public Input {
            if (!(requiredStcW > 0 && Double.isFinite(requiredStcW))) {
                throw new IllegalArgumentException("requiredStcW must be > 0 and finite, got " + requiredStcW);
            }
            modules = List.copyOf(modules);
            controllers = List.copyOf(controllers);
            Objects.requireNonNull(conditions, "conditions");
            if (modules.isEmpty() || controllers.isEmpty()) {
                throw new IllegalArgumentException("need at least one module and one controller");
            }
            if (maxControllers < 1 || maxControllers > 20) {
                throw new IllegalArgumentException("maxControllers must be in [1, 20], got " + maxControllers);
            }
        }
    }

    public static final Comparator<ArrayCandidate> ORDER = Comparator
            .comparing((ArrayCandidate c) -> !c.passesRequired())
            .thenComparingLong(ArrayCandidate::advisoryFailures)
            .thenComparingDouble(ArrayCandidate::totalStcW)
            .thenComparingInt(ArrayCandidate::controllerCount)
            .thenComparingInt(ArrayCandidate::totalModules)
            .thenComparing(c -> c.module().name())
            .thenComparing(c -> c.controller().name());

    /** Every candidate, best first. */
    public static List<ArrayCandidate> choose(Input in) {
        List<ArrayCandidate> out = new ArrayList<>();
        StringDesignConditions cond = in.conditions();
        for (PvModule m : in.modules()) {
            for (ChargeController c : in.controllers()) {
                StringWindow w = StringWindow.of(m, c, cond);
                if (w.isEmpty()) {
                    int n = Math.max(1, Math.min(w.minModules(), Math.max(1, w.maxModules())));
                    out.add(best(m, c, n, in));
                } else {
                    for (int n = w.minModules(); n <= w.maxModules(); n++) {
                        out.add(best(m, c, n, in));
                    }
                }
            }
        }
        out.sort(ORDER);
        return List.copyOf(out);
    }

    /** STC power of one string × the PWM power ratio (1 for MPPT), W. */
    public static double effectiveStringW(PvModule m, int modulesPerString, double pwmRatio) {
        return m.stc().powerW() * modulesPerString * pwmRatio;
    }

    /**
     * Fewest strings that reach the required power: ⌈required ÷ effective string W − 1e-9⌉, at least 1 and at
     * most 1000 (the 1e-9 keeps a requirement met exactly from asking for one more string).
     */
    public static int stringsNeeded(double requiredStcW, double effectiveStringW) {
        int total = effectiveStringW > 0 ? (int) Math.min(1000, Math.ceil(requiredStcW / effectiveStringW - 1e-9)) : 1;
        return Math.max(1, total);
    }

    private static ArrayCandidate best(PvModule m, ChargeController c, int n, Input in) {
        StringDesignConditions cond = in.conditions();
        double ratio = c.type() == ControllerType.PWM
                ? PwmOperatingPoint.stringPowerRatio(m, n, cond.batteryOperatingV(), 25.0) : 1.0;
        int totalStrings = stringsNeeded(in.requiredStcW(), effectiveStringW(m, n, ratio));
        ArrayCandidate firstRequired = null;
        ArrayCandidate one = null;
        for (int k = 1; k <= in.maxControllers(); k++) {
            int perController = (int) Math.ceil((double) totalStrings / k);
            if (perController > 1000) {
                continue;
            }
            ArrayCandidate cand = candidate(m, c, n, perController, k, in);
            if (one == null) {
                one = cand;
            }
            if (cand.passesRequired() && cand.advisoryFailures() == 0) {
                return cand;
            }
            if (firstRequired == null && cand.passesRequired()) {
                firstRequired = cand;
            }
            if (perController == 1) {
                break;
            }
        }
        return firstRequired != null ? firstRequired : one != null ? one
                : candidate(m, c, n, Math.min(1000, totalStrings), 1, in);
    }

    /**
     * One fixed layout (a system search's choice): {@code n} modules per string, {@code strings} strings on each of
     * {@code k} controllers, with every check against the input's conditions and required power.
     */
    public static ArrayCandidate fixed(PvModule m, ChargeController c, int n, int strings, int k, Input in) {
        if (n < 1 || strings < 1 || k < 1) {
            throw new IllegalArgumentException("modules per string, strings and controllers must be >= 1");
        }
        return candidate(m, c, n, strings, k, in);
    }

    private static ArrayCandidate candidate(PvModule m, ChargeController c, int n, int strings, int k, Input in) {
        ArrayCheckReport r = ArrayChecks.evaluate(new PvArray(m, n, strings), c, in.conditions());
        double effective = r.array().stcPowerW() * k * r.pwmPowerRatio();
        String what = c.type() == ControllerType.PWM
                ? "array STC power × PWM power ratio at the battery operating voltage reaches the required power"
                : "array STC power reaches the required power";
        Check power = new Check("array-power-vs-required", what, effective, in.requiredStcW(), "W", Check.Bound.MIN,
                Check.Severity.REQUIRED);
        return new ArrayCandidate(r, k, in.requiredStcW(), power);
    }
}
