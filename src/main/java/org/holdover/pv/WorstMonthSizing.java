package org.holdover.pv;

/**
 * Off-grid array sizing by the worst month: for each month, required STC power =
 * daily energy needed ÷ (plane-of-array peak sun hours × derate × battery round-trip efficiency),
 * and the array must meet the month that needs most (the structure of the Sandia stand-alone PV
 * design handbook's worksheets, SAND87-7023 (1988), which size for the worst month; REFERENCES.md
 * §12a).
 *
 * <p>Treating all energy as passing through the battery (the round-trip efficiency applies to the
 * whole load) is the conservative common practice, no source.
 */
public final class WorstMonthSizing {

    private WorstMonthSizing() {
    }

    /**
     * Inputs of the worst-month method.
     *
     * @param dailyEnergyWh               energy the system must deliver per day, by month, Wh/day,
     *                                    counted at the battery's DC terminals (AC loads already
     *                                    divided by the inverter efficiency), each ≥ 0
     * @param peakSunHours                plane-of-array irradiation per day, by month, kWh/m²/day
     *                                    (= hours/day at 1 kW/m²), each ≥ 0
     * @param derate                      array-to-battery derate by month, in (0, 1.5] (it can
     *                                    exceed 1 a little in cold sunny months, when cells run below 25 °C): temperature,
     *                                    reflection, DC losses and controller efficiency together
     *                                    (e.g. {@link ArrayDcSeries#monthlyDcPerformanceRatio()} ×
     *                                    controller efficiency)
     * @param batteryRoundTripEfficiency  in (0, 1]
     */
    public record Input(double[] dailyEnergyWh, double[] peakSunHours, double[] derate,
            double batteryRoundTripEfficiency) {
        public Input {
            dailyEnergyWh = twelve("dailyEnergyWh", dailyEnergyWh, 0, Double.MAX_VALUE);
            peakSunHours = twelve("peakSunHours", peakSunHours, 0, 24);
            derate = twelve("derate", derate, Double.MIN_VALUE, 1.5);
            if (!(batteryRoundTripEfficiency > 0 && batteryRoundTripEfficiency <= 1)) {
                throw new IllegalArgumentException("batteryRoundTripEfficiency must be in (0, 1], got "
                        + batteryRoundTripEfficiency);
            }
        }

        @Override
        public double[] dailyEnergyWh() {
            return dailyEnergyWh.clone();
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
        double[] e = in.dailyEnergyWh();
        double[] psh = in.peakSunHours();
        double[] d = in.derate();
        double[] w = new double[12];
        for (int m = 0; m < 12; m++) {
            if (e[m] == 0) {
                w[m] = 0;
            } else {
                double yield = psh[m] * d[m] * in.batteryRoundTripEfficiency();
                w[m] = yield > 0 ? e[m] / yield : Double.POSITIVE_INFINITY;
            }
        }
        return MonthlySizingResult.of(w);
    }

    static double[] twelve(String name, double[] v, double lo, double hi) {
        if (v == null || v.length != 12) {
            throw new IllegalArgumentException(name + " needs 12 monthly values");
        }
        double[] c = v.clone();
        for (int m = 0; m < 12; m++) {
            if (!(c[m] >= lo && c[m] <= hi)) {
                throw new IllegalArgumentException(name + "[" + m + "] must be in [" + lo + ", " + hi + "], got " + c[m]);
            }
        }
        return c;
    }
}
