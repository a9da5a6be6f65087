package org.nodewright.physics.plates;

/** Trial functions of a Rayleigh–Ritz solution, evaluated with their derivatives at a point (metres). */
interface RitzBasis {

    int size();

    /** Fills w, w_x, w_y, w_xx, w_yy, w_xy of every trial function at (x, y); arrays of length size(). */
    void evaluate(double x, double y, double[] w, double[] wx, double[] wy, double[] wxx, double[] wyy, double[] wxy);
}
