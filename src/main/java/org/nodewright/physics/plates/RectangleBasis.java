package org.nodewright.physics.plates;

/** Products φ_i(ξ) ψ_j(η) of edge functions over the rectangle [0, L] x [0, W]; index i·ny + j. */
final class RectangleBasis implements RitzBasis {

    final EdgeFunctions fx;
    final EdgeFunctions fy;
    final double lengthM;
    final double widthM;
    private final double[] ax = new double[3];

    RectangleBasis(double lengthM, double widthM, int nx, int ny, EdgeCondition edge) {
        this.lengthM = lengthM;
        this.widthM = widthM;
        this.fx = new EdgeFunctions(nx, edge);
        this.fy = new EdgeFunctions(ny, edge);
    }

    @Override
    public int size() {
        return fx.count() * fy.count();
    }

    @Override
    public void evaluate(double x, double y, double[] w, double[] wx, double[] wy, double[] wxx, double[] wyy,
                         double[] wxy) {
        int nx = fx.count();
        int ny = fy.count();
        double[] p = new double[nx];
        double[] p1 = new double[nx];
        double[] p2 = new double[nx];
        double[] q = new double[ny];
        double[] q1 = new double[ny];
        double[] q2 = new double[ny];
        fx.evaluate(2 * x / lengthM - 1, p, p1, p2);
        fy.evaluate(2 * y / widthM - 1, q, q1, q2);
        double sx = 2 / lengthM;
        double sy = 2 / widthM;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                int a = i * ny + j;
                w[a] = p[i] * q[j];
                wx[a] = sx * p1[i] * q[j];
                wy[a] = sy * p[i] * q1[j];
                wxx[a] = sx * sx * p2[i] * q[j];
                wyy[a] = sy * sy * p[i] * q2[j];
                wxy[a] = sx * sy * p1[i] * q1[j];
            }
        }
    }
}
