package org.holdover.battery;

/**
 * The battery sizing chain.
 *
 * <ol>
 *   <li>effective capacity, Ah = DC energy ÷ (bank nominal V × depth of discharge) × temperature factor
 *       × aging factor (1 ÷ end-of-life fraction) — the stand-alone PV handbook chain (Sandia SAND87-7023
 *       worksheets; IEEE 1013/1562) in energy form;</li>
 *   <li>rate: Peukert in rated-time form t = H·(C/(I·H))^k (smartgauge; electrotechnik.net) gives the
 *       delivered capacity C(I) = C^k·(I·H)^(1−k); the rated capacity that delivers the effective capacity
 *       at the mean discharge current I is C_H = C_eff^(1/k)·(I·H)^((k−1)/k). No credit is taken for
 *       discharging more slowly than the rated time (factor ≥ 1), common practice, no source;</li>
 *   <li>strings = the most of: rated capacity ÷ module Ah, continuous current ÷ module limit, surge
 *       current ÷ module surge limit (the continuous limit when the start outlasts the surge rating),
 *       each rounded up; a shortfall under 10⁻⁹ of a unit is treated as none, so that a spreadsheet
 *       recomputing the chain rounds the same way.</li>
 * </ol>
 */
public final class BankSizing {

    /** Relative slack before rounding a count up (the same constant is written into the workbook). */
    public static final double ROUNDING_SLACK = 1e-9;

    private BankSizing() {
    }

    /**
     * @param module the module type
     * @param r      the requirement
     * @return the design, or a design marked infeasible with the reason
     */
    public static BankDesign size(BatteryModule module, BankRequirement r) {
        Chemistry c = module.chemistry();
        int series = module.seriesFor(r.busClassV());
        if (series == 0) {
            return new BankDesign(module, r, 0, 0, 1, false, 1, 0, 0, 1, 0, 0, 0, 0, 0, 0, false,
                    module.nominalV() + " V modules do not make a " + fmt(r.busClassV()) + " V " + c.word() + " bank");
        }
        double bankV = series * module.nominalV();
        TemperatureTable table = TemperatureTable.of(c);
        double tempFactor = table.factor(r.batteryTempC());
        double aging = 1.0 / r.endOfLife();
        double effectiveAh = r.energyDcWh() / (bankV * r.depthOfDischarge()) * tempFactor * aging;
        double dischargeA = r.energyDcWh() / bankV / r.dischargeHours();
        double rateFactor = rateFactor(effectiveAh, dischargeA, module.rateHours(), c.peukertExponent());
        double ratedAh = effectiveAh * rateFactor;
        int forEnergy = Math.max(1, roundUp(ratedAh / module.capacityAh()));
        int forContinuous = roundUp(r.continuousA() / module.maxContinuousA());
        double surgeLimit = r.surgeS() <= module.surgeS() ? module.maxSurgeA() : module.maxContinuousA();
        int forSurge = roundUp(r.surgeA() / surgeLimit);
        int strings = Math.max(forEnergy, Math.max(forContinuous, forSurge));
        // The project's rule, when given, replaces the chemistry's practice; the module's own limit always holds.
        int maxParallel = Math.min(module.maxParallel(), r.maxParallel() > 0 ? r.maxParallel() : c.defaultMaxParallel());
        boolean feasible = strings <= maxParallel;
        String limit = "";
        if (!feasible) {
            String why = strings == forEnergy ? "capacity" : strings == forContinuous ? "continuous current" : "surge current";
            limit = strings + " parallel strings needed (for " + why + "), at most " + maxParallel + " allowed";
        }
        return new BankDesign(module, r, series, bankV, tempFactor, table.belowTable(r.batteryTempC()), aging,
                effectiveAh, dischargeA, rateFactor, ratedAh, forEnergy, forContinuous, forSurge, strings, maxParallel,
                feasible, limit);
    }

    /**
     * Peukert correction: rated capacity ÷ effective capacity, never below 1.
     *
     * @param effectiveAh capacity needed at the actual rate, Ah
     * @param currentA    mean discharge current, A
     * @param rateHours   the module rating's discharge time, h
     * @param k           Peukert exponent
     */
    public static double rateFactor(double effectiveAh, double currentA, double rateHours, double k) {
        if (effectiveAh <= 0 || currentA <= 0) {
            return 1.0;
        }
        return Math.max(1.0, Math.pow(currentA * rateHours / effectiveAh, (k - 1.0) / k));
    }

    /**
     * Peukert run time in rated-time form, t = H·(C/(I·H))^k, h.
     *
     * @param ratedAh   capacity at the H-hour rate, Ah
     * @param rateHours H, h
     * @param currentA  discharge current, A
     * @param k         Peukert exponent
     */
    public static double peukertHours(double ratedAh, double rateHours, double currentA, double k) {
        return rateHours * Math.pow(ratedAh / (currentA * rateHours), k);
    }

    static int roundUp(double x) {
        return Math.max(0, (int) Math.ceil(x - ROUNDING_SLACK));
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }
}
