package org.nodewright.physics.plates;

import java.util.List;

/**
 * Thickness between control points by Shepard's inverse-distance weighting with power 2
 * (Shepard 1968, "A two-dimensional interpolation function for irregularly-spaced data"):
 * h(p) = Σ h_i / d_i² / Σ 1 / d_i². Smooth away from the points, and never outside the control
 * values (so never thin to zero or negative between them).
 */
final class ShepardThickness implements ThicknessField {

    private final double[] px;
    private final double[] py;
    private final double[] h;
    private final double min;

    ShepardThickness(List<ThicknessPoint> points) {
        if (points.isEmpty()) {
            throw new IllegalArgumentException("a graduation needs at least one control point");
        }
        int n = points.size();
        px = new double[n];
        py = new double[n];
        h = new double[n];
        double m = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            px[i] = points.get(i).x();
            py[i] = points.get(i).y();
            h[i] = points.get(i).thicknessM();
            m = Math.min(m, h[i]);
        }
        min = m;
    }

    @Override
    public double at(double x, double y) {
        double num = 0;
        double den = 0;
        for (int i = 0; i < h.length; i++) {
            double d2 = (x - px[i]) * (x - px[i]) + (y - py[i]) * (y - py[i]);
            if (d2 < 1e-18) {
                return h[i];
            }
            num += h[i] / d2;
            den += 1 / d2;
        }
        return num / den;
    }

    @Override
    public boolean isUniform() {
        return h.length == 1;
    }

    @Override
    public double minimum() {
        return min;
    }

    @Override
    public List<ThicknessPoint> controlPoints() {
        List<ThicknessPoint> out = new java.util.ArrayList<>(h.length);
        for (int i = 0; i < h.length; i++) {
            out.add(new ThicknessPoint(px[i], py[i], h[i]));
        }
        return out;
    }
}
