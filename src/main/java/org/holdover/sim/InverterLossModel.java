package org.holdover.sim;

/**
 * An inverter's conversion losses by the three-term model of Schmidt and Sauer (1996): with the per-unit
 * output {@code p = P_out / P_rated},
 *
 * <pre>
 *   P_in = P_out + P_rated * (p0 + k1 * p + k2 * p^2)
 * </pre>
 *
 * <p>{@code p0} is the no-load loss (the draw of an inverter that is on with nothing connected), {@code k1}
 * the loss proportional to output (voltage drops across semiconductors) and {@code k2} the loss proportional
 * to the square of output (resistive). Source of the form: H. Schmidt and D. U. Sauer, "Wechselrichter-
 * Wirkungsgrade: Praxisgerechte Modellierung und Abschätzung", Sonnenenergie 4/1996, pp. 43-47 (from
 * memory; the form itself is as given in the project brief). The model is applied at any output, also
 * above the rating; whether the inverter may carry that load is the sizing package's check.
 *
 * @param ratedW          continuous AC rating, W (&gt; 0)
 * @param noLoadLossPu    p0, no-load loss per unit of the rating (&ge; 0)
 * @param linearLossPu    k1, loss per unit of the rating per unit of output (&ge; 0)
 * @param quadraticLossPu k2, loss per unit of the rating per unit of output squared (&ge; 0)
 */
public record InverterLossModel(double ratedW, double noLoadLossPu, double linearLossPu, double quadraticLossPu) {

    public InverterLossModel {
        Checks.positive("ratedW", ratedW);
        Checks.nonNegative("noLoadLossPu", noLoadLossPu);
        Checks.nonNegative("linearLossPu", linearLossPu);
        Checks.nonNegative("quadraticLossPu", quadraticLossPu);
    }

    /** The no-load loss, W: {@code P_rated * p0}. */
    public double noLoadLossW() {
        return ratedW * noLoadLossPu;
    }

    /**
     * DC input the inverter needs to deliver an AC output, W.
     *
     * @param outputW AC output, W (&ge; 0); 0 gives the no-load loss
     * @return DC input, W
     */
    public double inputW(double outputW) {
        double p = outputW / ratedW;
        return outputW + ratedW * (noLoadLossPu + linearLossPu * p + quadraticLossPu * p * p);
    }

    /**
     * The largest AC output a DC input can sustain: the inverse of {@link #inputW(double)} in closed form,
     * with {@code u = P_in / P_rated - p0}:
     *
     * <pre>
     *   P_out = 0                                                      if u &lt;= 0
     *   P_out = P_rated * 2u / ((1 + k1) + SQRT((1 + k1)^2 + 4 k2 u))    otherwise
     * </pre>
     *
     * (the root of {@code k2 p^2 + (1 + k1) p - u = 0}, written without the cancellation of the textbook
     * form and valid for {@code k2 = 0}).
     *
     * @param inputW DC input, W (&ge; 0)
     * @return AC output, W (&ge; 0); 0 when the input does not cover the no-load loss
     */
    public double outputW(double inputW) {
        return outputW(inputW, ratedW, noLoadLossPu, 1 + linearLossPu, quadraticLossPu);
    }

    /** The inverse with the constants unpacked, for the simulation's hot loop; {@code b = 1 + k1}. */
    static double outputW(double inputW, double ratedW, double p0, double b, double k2) {
        double u = inputW / ratedW - p0;
        if (u <= 0) {
            return 0;
        }
        return ratedW * (2 * u / (b + Math.sqrt(b * b + 4 * k2 * u)));
    }
}
