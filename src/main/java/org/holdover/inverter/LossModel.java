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

    /**
     * The least-squares fit written out as its normal equations, for a reader to check by hand: per point
     * p, η, y = p·(1/η − 1) − p0, p², p³, p⁴, y·p, y·p²; the sums; and k1, k2 by Cramer's rule.
     *
     * @param p    load fractions
     * @param eta  efficiencies
     * @param y    loss above the no-load loss, per unit
     * @param p2   p²
     * @param p3   p³
     * @param p4   p⁴
     * @param yp   y·p
     * @param yp2  y·p²
     * @param sumP2 Σp²
     * @param sumP3 Σp³
     * @param sumP4 Σp⁴
     * @param sumYp Σy·p
     * @param sumYp2 Σy·p²
     * @param det  Σp²·Σp⁴ − (Σp³)²
     * @param k1   (Σy·p·Σp⁴ − Σp³·Σy·p²) ÷ det
     * @param k2   (Σp²·Σy·p² − Σp³·Σy·p) ÷ det
     */
    public record NormalEquations(double[] p, double[] eta, double[] y, double[] p2, double[] p3, double[] p4,
                                  double[] yp, double[] yp2, double sumP2, double sumP3, double sumP4, double sumYp,
                                  double sumYp2, double det, double k1, double k2) {
    }

    /** The normal equations of the fit of k1 and k2 with p0 fixed. */
    public static NormalEquations normalEquations(double p0, List<EfficiencyPoint> points) {
        int n = points.size();
        double[] p = new double[n], eta = new double[n], y = new double[n], p2 = new double[n], p3 = new double[n],
                p4 = new double[n], yp = new double[n], yp2 = new double[n];
        double s2 = 0, s3 = 0, s4 = 0, sy1 = 0, sy2 = 0;
        for (int i = 0; i < n; i++) {
            p[i] = points.get(i).loadFraction();
            eta[i] = points.get(i).efficiency();
            y[i] = p[i] * (1.0 / eta[i] - 1.0) - p0;
            p2[i] = p[i] * p[i];
            p3[i] = p2[i] * p[i];
            p4[i] = p3[i] * p[i];
            yp[i] = y[i] * p[i];
            yp2[i] = y[i] * p2[i];
            s2 += p2[i];
            s3 += p3[i];
            s4 += p4[i];
            sy1 += yp[i];
            sy2 += yp2[i];
        }
        double det = s2 * s4 - s3 * s3;
        return new NormalEquations(p, eta, y, p2, p3, p4, yp, yp2, s2, s3, s4, sy1, sy2, det,
                (sy1 * s4 - s3 * sy2) / det, (s2 * sy2 - s3 * sy1) / det);
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
