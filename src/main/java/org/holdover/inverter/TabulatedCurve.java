package org.holdover.inverter;

import java.util.List;
import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * The catalog's efficiency points joined by straight lines (Commons Math linear interpolation). Outside
 * the tabulated range — below the first point, where the no-load draw makes efficiency fall towards zero,
 * and above the last — the loss model answers instead, since a straight line cannot.
 */
public final class TabulatedCurve implements EfficiencyCurve {

    private final PolynomialSplineFunction line;
    private final double first;
    private final double last;
    private final LossModel outside;

    /**
     * @param points  at least two points in increasing load fraction
     * @param outside the model used outside the tabulated range
     */
    public TabulatedCurve(List<EfficiencyPoint> points, LossModel outside) {
        if (points.size() < 2) {
            throw new IllegalArgumentException("need at least two points");
        }
        double[] x = new double[points.size()];
        double[] y = new double[points.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = points.get(i).loadFraction();
            y[i] = points.get(i).efficiency();
            if (i > 0 && x[i] <= x[i - 1]) {
                throw new IllegalArgumentException("points must be in increasing load fraction");
            }
        }
        this.line = new LinearInterpolator().interpolate(x, y);
        this.first = x[0];
        this.last = x[x.length - 1];
        this.outside = outside;
    }

    /** Whether the load fraction lies within the tabulated points. */
    public boolean tabulated(double loadFraction) {
        return loadFraction >= first && loadFraction <= last;
    }

    @Override
    public double efficiency(double loadFraction) {
        return tabulated(loadFraction) ? line.value(loadFraction) : outside.efficiency(loadFraction);
    }
}
