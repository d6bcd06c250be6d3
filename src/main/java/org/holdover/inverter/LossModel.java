package org.holdover.inverter;

import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The three-term inverter loss model of Schmidt &amp; Sauer (1996): in per unit of the rated output,
 * loss = p0 + k1·p + k2·p², where p = P_out ÷ P_rated; p0 is the no-load (self-consumption) loss, k1
 * the loss proportional to output (switching, voltage drops) and k2 the ohmic loss. DC input
 * P_in = P_out + P_rated·loss(p); efficiency η = p ÷ (p + loss(p)).
 *
 * <p>Fitting. p0 is fixed by the catalog's no-load draw (the same figure that is counted every hour the
 * inverter is on); k1 and k2 are the least-squares solution (Commons Math QR decomposition) of
 * p_i·(1/η_i − 1) − p0 = k1·p_i + k2·p_i² over the catalog's efficiency points. In closed form this is the
 * 2×2 normal-equation system the workbook writes out with SUM formulas.
 *
 * @param ratedW rated continuous AC output, W
 * @param p0     no-load loss, per unit
 * @param k1     linear loss coefficient, per unit
 * @param k2     ohmic loss coefficient, per unit
 */
public record LossModel(double ratedW, double p0, double k1, double k2) implements EfficiencyCurve {

    public LossModel {
        if (!(ratedW > 0)) {
            throw new IllegalArgumentException("ratedW must be > 0, got " + ratedW);
        }
        if (!(p0 >= 0) || !Double.isFinite(k1) || !Double.isFinite(k2)) {
            throw new IllegalArgumentException("loss coefficients must be finite and p0 >= 0");
        }
    }

    /** Fits k1 and k2 to the points with p0 fixed from the no-load draw. */
    public static LossModel fit(double ratedW, double noLoadW, List<EfficiencyPoint> points) {
        if (points.size() < 2) {
            throw new IllegalArgumentException("need at least two efficiency points, got " + points.size());
        }
        double p0 = noLoadW / ratedW;
        double[][] a = new double[points.size()][2];
        double[] y = new double[points.size()];
        for (int i = 0; i < points.size(); i++) {
            double p = points.get(i).loadFraction();
            double eta = points.get(i).efficiency();
            a[i][0] = p;
            a[i][1] = p * p;
            y[i] = p * (1.0 / eta - 1.0) - p0;
        }
        RealVector k = new QRDecomposition(new Array2DRowRealMatrix(a, false)).getSolver()
                .solve(new ArrayRealVector(y, false));
        return new LossModel(ratedW, p0, k.getEntry(0), k.getEntry(1));
    }

    /** Loss at a per-unit output, per unit of the rating. */
    public double lossPu(double p) {
        return p0 + k1 * p + k2 * p * p;
    }

    /**
     * DC input for an AC output, W (the no-load draw included).
     *
     * @param outputW AC output, W, ≥ 0
     */
    public double inputW(double outputW) {
        double p = outputW / ratedW;
        return outputW + ratedW * lossPu(p);
    }

    @Override
    public double efficiency(double loadFraction) {
        if (loadFraction <= 0) {
            return 0;
        }
        return loadFraction / (loadFraction + lossPu(loadFraction));
    }

    /** Largest |model − point| efficiency difference over the points. */
    public double worstResidual(List<EfficiencyPoint> points) {
        double worst = 0;
        for (EfficiencyPoint pt : points) {
            worst = Math.max(worst, Math.abs(efficiency(pt.loadFraction()) - pt.efficiency()));
        }
        return worst;
    }

    /** Whether the coefficients describe a physical inverter (losses never fall as output rises). */
    public boolean physical() {
        return k1 >= 0 && k2 >= 0;
    }
}
