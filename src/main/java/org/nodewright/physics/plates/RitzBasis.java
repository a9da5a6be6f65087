package org.nodewright.physics.plates;

/** Trial functions of a Rayleigh–Ritz solution, evaluated with their derivatives at a point (metres). */
interface RitzBasis {

    int size();

    /** Fills w, w_x, w_y, w_xx, w_yy, w_xy of every trial function at (x, y); arrays of length size(). */
    void evaluate(double x, double y, double[] w, double[] wx, double[] wy, double[] wxx, double[] wyy, double[] wxy);

    /** Room for one axis's 1-D functions at a point: values, first and second derivatives ({v, v', v''}). */
    static double[][] axis(int n) {
        return new double[][] {new double[n], new double[n], new double[n]};
    }

    /**
     * Trial function a = X_i(x) Y_j(y) of a product basis with its derivatives (the product and chain rules),
     * from one axis's {X, X', X''} and the other's {Y, Y', Y''} in their own coordinates; sx and sy turn d/du and
     * d/dv into d/dx and d/dy.
     */
    static void product(int a, double[][] x, int i, double sx, double[][] y, int j, double sy,
            double[] w, double[] wx, double[] wy, double[] wxx, double[] wyy, double[] wxy) {
        w[a] = x[0][i] * y[0][j];
        wx[a] = sx * x[1][i] * y[0][j];
        wy[a] = sy * x[0][i] * y[1][j];
        wxx[a] = sx * sx * x[2][i] * y[0][j];
        wyy[a] = sy * sy * x[0][i] * y[2][j];
        wxy[a] = sx * sy * x[1][i] * y[1][j];
    }
}
