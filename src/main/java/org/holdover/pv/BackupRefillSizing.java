package org.holdover.pv;

/**
 * Backup-system array sizing: the array must put back the energy an outage took from the bank within
 * a stated number of days while also carrying the loads. For each month:
 * <pre>
 *   required STC W = (refill ÷ η_charge + days × daily load ÷ η_load) ÷ (days × peak sun hours × derate)
 * </pre>
 * and the design takes the worst month (an outage can end in any month), unless the caller reads a
 * single month from the result. Our own arrangement of the energy balance (no source); η_load = the
 * battery round-trip efficiency treats all load as cycled through the battery (conservative).
 */
public final class BackupRefillSizing {

    private BackupRefillSizing() {
    }

    /**
     * @param refillWh         energy to put back into the bank, Wh, ≥ 0 (what the outage drew, as
     *                         stored energy)
     * @param days             days allowed for the refill, &gt; 0
     * @param dailyLoadWh      energy the loads draw per day meanwhile, by month, Wh/day at the battery
     *                         terminals, each ≥ 0
     * @param peakSunHours     plane-of-array kWh/m²/day by month, each ≥ 0
     * @param derate           array-to-battery derate by month, in (0, 1.5] (it can
     *                                    exceed 1 a little in cold sunny months, when cells run below 25 °C)
     * @param chargeEfficiency battery charge efficiency (energy stored ÷ energy in), in (0, 1]; √(round
     *                         trip) is a common convention (from memory)
     * @param loadEfficiency   efficiency of serving the loads from the array, in (0, 1]; the battery
     *                         round-trip efficiency when all load cycles through the battery
     */
    public record Input(double refillWh, double days, double[] dailyLoadWh, double[] peakSunHours, double[] derate,
            double chargeEfficiency, double loadEfficiency) {
        public Input {
            if (!(refillWh >= 0 && Double.isFinite(refillWh))) {
                throw new IllegalArgumentException("refillWh must be >= 0, got " + refillWh);
            }
            if (!(days > 0 && days <= 365)) {
                throw new IllegalArgumentException("days must be in (0, 365], got " + days);
            }
            dailyLoadWh = WorstMonthSizing.twelve("dailyLoadWh", dailyLoadWh, 0, Double.MAX_VALUE);
            peakSunHours = WorstMonthSizing.twelve("peakSunHours", peakSunHours, 0, 24);
            derate = WorstMonthSizing.twelve("derate", derate, Double.MIN_VALUE, 1.5);
            if (!(chargeEfficiency > 0 && chargeEfficiency <= 1)) {
                throw new IllegalArgumentException("chargeEfficiency must be in (0, 1], got " + chargeEfficiency);
            }
            if (!(loadEfficiency > 0 && loadEfficiency <= 1)) {
                throw new IllegalArgumentException("loadEfficiency must be in (0, 1], got " + loadEfficiency);
            }
        }

        @Override
        public double[] dailyLoadWh() {
            return dailyLoadWh.clone();
        }

        @Override
        public double[] peakSunHours() {
            return peakSunHours.clone();
        }

        @Override
        public double[] derate() {
            return derate.clone();
        }
    }

    /** The monthly needs and the worst month. */
    public static MonthlySizingResult size(Input in) {
        double[] load = in.dailyLoadWh();
        double[] psh = in.peakSunHours();
        double[] d = in.derate();
        double[] w = new double[12];
        for (int m = 0; m < 12; m++) {
            double need = in.refillWh() / in.chargeEfficiency() + in.days() * load[m] / in.loadEfficiency();
            double perW = in.days() * psh[m] * d[m];
            w[m] = need == 0 ? 0 : perW > 0 ? need / perW : Double.POSITIVE_INFINITY;
        }
        return MonthlySizingResult.of(w);
    }
}
