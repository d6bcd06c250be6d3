package org.holdover.sim;

/**
 * A generator's fuel use as a straight line in its output (the form used by Skarstein and Uhlen, Wind
 * Engineering 13(2):72-87, 1989, and in later hybrid-system literature such as Dufo-López and
 * Bernal-Agustín, Solar Energy 79:33-46, 2005):
 *
 * <pre>
 *   fuel [L/h] = F0 * rated [kW] + F1 * output [kW]
 * </pre>
 *
 * <p>The coefficients are inputs: take them from the set's fuel table where one is available
 * ({@link #fitTwoPoints} fits them from two rows of it). {@link #FROM_MEMORY_DIESEL} holds the values
 * usually quoted for diesel sets; they are <b>from memory, not confirmed</b> in a readable copy of the
 * 1989 paper, and a variant of the intercept with transposed digits (0.08145) circulates as widely.
 *
 * @param noLoadLPerHPerRatedKw F0, fuel at no load per kW of rating, L/h/kW (&ge; 0)
 * @param slopeLPerKwh          F1, added fuel per kWh of output, L/kWh (&ge; 0)
 */
public record FuelCurve(double noLoadLPerHPerRatedKw, double slopeLPerKwh) {

    /**
     * F0 = 0.08415 L/h/kW, F1 = 0.246 L/kWh: the diesel coefficients as usually quoted from Skarstein and
     * Uhlen (1989). From memory, unconfirmed; 0.08415 rather than the variant 0.08145 because the larger
     * value is the conservative one for fuel (it gives 0.3301 L/kWh at full load).
     */
    public static final FuelCurve FROM_MEMORY_DIESEL = new FuelCurve(0.08415, 0.246);

    public FuelCurve {
        Checks.nonNegative("noLoadLPerHPerRatedKw", noLoadLPerHPerRatedKw);
        Checks.nonNegative("slopeLPerKwh", slopeLPerKwh);
    }

    /**
     * Fuel rate of a running set.
     *
     * @param ratedW  the set's rating, W (&gt; 0)
     * @param outputW electrical output, W (&ge; 0)
     * @return fuel rate, L/h (equal to litres over one hour)
     */
    public double litresPerHour(double ratedW, double outputW) {
        return noLoadLPerHPerRatedKw * (ratedW / 1000) + slopeLPerKwh * (outputW / 1000);
    }

    /**
     * Fits the line through two measured points of one set: {@code F1 = (f2 - f1) / (P2 - P1)},
     * {@code F0 = (f1 - F1 * P1) / rated} (powers in kW).
     *
     * @param ratedW   the set's rating, W (&gt; 0)
     * @param output1W first output, W
     * @param fuel1LPerH fuel rate at the first output, L/h
     * @param output2W second output, W (different from the first)
     * @param fuel2LPerH fuel rate at the second output, L/h
     * @return the fitted curve
     */
    public static FuelCurve fitTwoPoints(double ratedW, double output1W, double fuel1LPerH, double output2W,
                                         double fuel2LPerH) {
        Checks.positive("ratedW", ratedW);
        if (output1W == output2W) {
            throw new IllegalArgumentException("the two outputs must differ, got " + output1W + " W twice");
        }
        double slope = (fuel2LPerH - fuel1LPerH) / ((output2W - output1W) / 1000);
        double f0 = (fuel1LPerH - slope * output1W / 1000) / (ratedW / 1000);
        return new FuelCurve(f0, slope);
    }
}
