package org.holdover.pv;

import java.util.List;

/**
 * The array's DC losses other than temperature and reflection, each a fraction of power lost.
 * The combined factor is Π(1 − loss) · (1 − degradationPerYear · ageYears).
 *
 * <p>Defaults and where they come from ("from memory" = recalled, not re-read, from the default loss
 * table of A. P. Dobos, NREL Technical Report NREL/TP-6A20-62641, 2014; soiling, wiring, connections,
 * light-induced degradation and nameplate also match the defaults reproduced in a 2019 California
 * building-energy compliance reference manual):
 * <ul>
 *   <li>soiling 2 % — from memory (NREL/TP-6A20-62641)</li>
 *   <li>shading 0 % — the report's 3 % assumes some shade; ours assumes an unshaded site: enter the
 *       site's own figure</li>
 *   <li>snow 0 % — site specific</li>
 *   <li>mismatch 2 % — from memory (NREL/TP-6A20-62641)</li>
 *   <li>DC wiring 2 % — from memory (NREL/TP-6A20-62641); replace with the computed cable loss</li>
 *   <li>connections 0.5 % — from memory (NREL/TP-6A20-62641)</li>
 *   <li>light-induced degradation 1.5 % — from memory (NREL/TP-6A20-62641)</li>
 *   <li>nameplate rating 1 % — from memory (NREL/TP-6A20-62641)</li>
 *   <li>degradation 0.5 %/year — the median rate in D. C. Jordan, S. R. Kurtz, "Photovoltaic
 *       degradation rates — an analytical review", Prog. Photovolt. 21:12–29 (2013), from memory;
 *       age 0 years (a new array)</li>
 * </ul>
 *
 * @param soiling            fraction in [0, 1)
 * @param shading            fraction in [0, 1)
 * @param snow               fraction in [0, 1)
 * @param mismatch           fraction in [0, 1)
 * @param dcWiring           fraction in [0, 1)
 * @param connections        fraction in [0, 1)
 * @param lightInduced       fraction in [0, 1)
 * @param nameplate          fraction in [0, 1)
 * @param degradationPerYear fraction per year in [0, 0.05]
 * @param ageYears           years in service, in [0, 50]
 */
public record DcLosses(double soiling, double shading, double snow, double mismatch, double dcWiring,
        double connections, double lightInduced, double nameplate, double degradationPerYear, double ageYears) {

    public DcLosses {
        for (double f : new double[] {soiling, shading, snow, mismatch, dcWiring, connections, lightInduced, nameplate}) {
            if (!(f >= 0 && f < 1)) {
                throw new IllegalArgumentException("loss fractions must be in [0, 1), got " + f);
            }
        }
        if (!(degradationPerYear >= 0 && degradationPerYear <= 0.05)) {
            throw new IllegalArgumentException("degradationPerYear must be in [0, 0.05], got " + degradationPerYear);
        }
        if (!(ageYears >= 0 && ageYears <= 50)) {
            throw new IllegalArgumentException("ageYears must be in [0, 50], got " + ageYears);
        }
    }

    /** The defaults listed above. */
    public static DcLosses defaults() {
        return new DcLosses(0.02, 0.0, 0.0, 0.02, 0.02, 0.005, 0.015, 0.01, 0.005, 0.0);
    }

    /** No losses at all (for checks against the bare model). */
    public static DcLosses none() {
        return new DcLosses(0, 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }

    public DcLosses withAgeYears(double years) {
        return new DcLosses(soiling, shading, snow, mismatch, dcWiring, connections, lightInduced, nameplate,
                degradationPerYear, years);
    }

    /** The fraction of power kept: Π(1 − loss) · (1 − degradationPerYear · ageYears). */
    public double factor() {
        double f = 1.0;
        for (LossItem i : items()) {
            f *= 1.0 - i.fraction();
        }
        return f;
    }

    /** One loss with its source, for display. */
    public record LossItem(String name, double fraction, String source) {
    }

    /** Each loss with its fraction and source; aging appears as degradationPerYear · ageYears. */
    public List<LossItem> items() {
        String memo = "from memory: NREL/TP-6A20-62641 (2014) default";
        return List.of(
                new LossItem("soiling", soiling, memo),
                new LossItem("shading", shading, "site specific; default 0 assumes no shade"),
                new LossItem("snow", snow, "site specific; default 0"),
                new LossItem("mismatch", mismatch, memo),
                new LossItem("DC wiring", dcWiring, memo),
                new LossItem("connections", connections, memo),
                new LossItem("light-induced degradation", lightInduced, memo),
                new LossItem("nameplate rating", nameplate, memo),
                new LossItem("aging", Math.min(0.999, degradationPerYear * ageYears),
                        "from memory: Jordan & Kurtz (2013) median 0.5 %/year × years in service"));
    }
}
