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
        double[][] px = RitzBasis.axis(nx);
        double[][] qy = RitzBasis.axis(ny);
        fx.evaluate(2 * x / lengthM - 1, px[0], px[1], px[2]);
        fy.evaluate(2 * y / widthM - 1, qy[0], qy[1], qy[2]);
        double sx = 2 / lengthM;
        double sy = 2 / widthM;
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                RitzBasis.product(i * ny + j, px, i, sx, qy, j, sy, w, wx, wy, wxx, wyy, wxy);
            }
        }
    }
}
