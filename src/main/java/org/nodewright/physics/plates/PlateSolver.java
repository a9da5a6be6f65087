package org.nodewright.physics.plates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.physics.tuning.Note;

/**
 * Natural modes of a thin orthotropic Kirchhoff plate by the Rayleigh–Ritz method.
 * <ul>
 *   <li>Rectangle: products of one-dimensional characteristic orthogonal polynomials that meet the edge
 *   condition exactly (Bhat 1985); with uniform thickness and no braces the matrices are Kronecker sums
 *   of 1-D integrals and split into the four symmetry classes about the centre lines.</li>
 *   <li>Any outline: complete Legendre polynomials of a total degree over the bounding box, the area
 *   integrals by Gauss–Green product cubature (Sommariva &amp; Vianello 2007), simply supported and clamped
 *   edges by artificial springs along the outline (penalty method), with the spring stiffness far above
 *   the plate's own so that the result is converged in it.</li>
 *   <li>Braces by Gauss line quadrature along each; graduated thickness by cubature of the interpolated field.</li>
 * </ul>
 */
public final class PlateSolver {

    /** Largest number of modes one analysis returns. */
    public static final int MAX_MODES = 40;

    /** Artificial spring stiffness relative to D/ℓ³ (translation) and D/ℓ (rotation). */
    static final double DEFAULT_SPRING_FACTOR = 1e7;

    private static final int GRID_LONG_SIDE = 41;

    private final int rectangleTerms;
    private final int polygonDegree;
    private final double springFactor;

    /** Basis sizes chosen from the number of modes asked for (see {@link #analyze(Plate, int)}). */
    public PlateSolver() {
        this(0, 0, DEFAULT_SPRING_FACTOR);
    }

    /**
     * @param rectangleTerms one-dimensional functions per direction on a rectangle (0: chosen from the modes asked for)
     * @param polygonDegree  total polynomial degree on other outlines (0: chosen)
     * @param springFactor   edge spring stiffness factor for supported outlines
     */
    public PlateSolver(int rectangleTerms, int polygonDegree, double springFactor) {
        if (rectangleTerms < 0 || polygonDegree < 0 || !(springFactor > 0)) {
            throw new IllegalArgumentException("basis sizes must be non-negative and the spring factor positive");
        }
        this.rectangleTerms = rectangleTerms;
        this.polygonDegree = polygonDegree;
        this.springFactor = springFactor;
    }

    public PlateAnalysis analyze(Plate plate, int modeCount) {
        Solved solved = solve(plate, modeCount);
        List<PlateMode> modes = modes(plate, solved.basis(), solved.pairs(), solved.rigid(), modeCount, true);
        return new PlateAnalysis(modes, solved.method(), solved.basis().size());
    }

    /**
     * As {@link #analyze(Plate, int)} but the modes carry only their frequency and shape grid: no node lines, counts
     * or names (for solvers that follow modes by their shapes over many analyses).
     */
    public PlateAnalysis shapes(Plate plate, int modeCount) {
        Solved solved = solve(plate, modeCount);
        List<PlateMode> modes = modes(plate, solved.basis(), solved.pairs(), solved.rigid(), modeCount, false);
        return new PlateAnalysis(modes, solved.method(), solved.basis().size());
    }

    /**
     * The lowest {@code modeCount} flexural frequencies only (Hz, ascending), without shapes or node lines: the
     * same basis and eigenproblem as {@link #analyze(Plate, int)}, for solvers that analyse a plate many times.
     */
    public double[] frequencies(Plate plate, int modeCount) {
        Solved solved = solve(plate, modeCount);
        double[] lambda = solved.pairs().values();
        int count = Math.max(0, Math.min(modeCount, lambda.length - solved.rigid()));
        double[] f = new double[count];
        for (int e = 0; e < count; e++) {
            f[e] = Math.sqrt(Math.max(lambda[solved.rigid() + e], 0)) / (2 * Math.PI);
        }
        return f;
    }

    private record Solved(RitzBasis basis, SymmetricEigen.Pairs pairs, int rigid, String method) {
    }

    private Solved solve(Plate plate, int modeCount) {
        if (modeCount < 1 || modeCount > MAX_MODES) {
            throw new IllegalArgumentException("modeCount must be 1.." + MAX_MODES + ", got " + modeCount);
        }
        Outline outline = plate.outline();
        int rigid = plate.edges() == EdgeCondition.FREE ? 3 : 0;
        RitzBasis basis;
        SymmetricEigen.Pairs pairs;
        String method;
        if (outline.isRectangle()) {
            double[] b = outline.bounds();
            int[] terms = rectangleTerms(plate, modeCount);
            RectangleBasis rb = new RectangleBasis(b[2] - b[0], b[3] - b[1], terms[0], terms[1], plate.edges());
            basis = rb;
            if (plate.thickness().isUniform() && plate.braces().isEmpty()) {
                pairs = separable(rb, plate, modeCount + rigid);
            } else {
                RitzSystem system = new RitzSystem(rb);
                int extra = plate.thickness().isUniform() ? 0 : 6;
                system.addPlate(tensorRule(rb, extra), plate.material(), plate.thickness());
                addBraces(system, plate, terms[0] + terms[1] + 8);
                system.symmetrize();
                pairs = SymmetricEigen.generalized(system.k, system.m, modeCount + rigid);
            }
            method = "Rayleigh-Ritz, characteristic orthogonal polynomials (Bhat 1985), " + terms[0] + " x " + terms[1]
                    + " terms";
        } else {
            int degree = polygonDegree > 0 ? polygonDegree : polygonDegree(modeCount);
            PolygonBasis pb = new PolygonBasis(outline.bounds(), degree);
            basis = pb;
            RitzSystem system = new RitzSystem(pb);
            if (plate.thickness().isUniform()) {
                system.addUniformPlate(pb, PolygonQuadrature.rows(outline, 2 * degree), plate.material(),
                        plate.thickness().minimum());
            } else {
                system.addPlate(PolygonQuadrature.rule(outline, 2 * degree, 4), plate.material(), plate.thickness());
            }
            addBraces(system, plate, degree + 2);
            if (plate.edges() != EdgeCondition.FREE) {
                double area = outline.area();
                double ell = Math.sqrt(area);
                Rigidities d = plate.material().rigidities(plate.thickness().minimum());
                double dRef = Math.max(d.d11(), d.d22());
                double kw = springFactor * dRef / (ell * ell * ell);
                double kr = plate.edges() == EdgeCondition.CLAMPED ? springFactor * dRef / ell : 0;
                double[] box = outline.bounds();
                system.addEdgeSprings(new SmoothBoundary(outline), Math.max(box[2] - box[0], box[3] - box[1]) / 2, kw, kr,
                        2 * degree);
            }
            system.symmetrize();
            pairs = SymmetricEigen.generalized(system.k, system.m, modeCount + rigid);
            method = "Rayleigh-Ritz, Legendre polynomials of total degree " + degree
                    + ", Gauss-Green cubature (Sommariva & Vianello 2007)"
                    + (plate.edges() == EdgeCondition.FREE ? "" : ", edge springs (penalty method)");
        }
        return new Solved(basis, pairs, rigid, method);
    }

    private static void addBraces(RitzSystem system, Plate plate, int points) {
        for (Brace brace : plate.braces()) {
            system.addBrace(brace, plate.material(), plate.thickness(), points);
        }
    }

    /**
     * Terms per direction: enough polynomials for the half-wave counts of the modes asked for, estimated
     * from the simply supported orthotropic frequencies (Leissa 1969, eq. 11.15) of the same plate.
     */
    private int[] rectangleTerms(Plate plate, int modeCount) {
        if (rectangleTerms > 0) {
            return new int[] {rectangleTerms, rectangleTerms};
        }
        double[] b = plate.outline().bounds();
        double a = b[2] - b[0];
        double c = b[3] - b[1];
        Rigidities d = plate.material().rigidities(plate.thickness().minimum());
        List<double[]> list = new ArrayList<>();
        for (int m = 1; m <= 40; m++) {
            for (int n = 1; n <= 40; n++) {
                double km = Math.pow(m * Math.PI / a, 2);
                double kn = Math.pow(n * Math.PI / c, 2);
                double omega2 = d.d11() * km * km + 2 * (d.d12() + 2 * d.d66()) * km * kn + d.d22() * kn * kn;
                list.add(new double[] {omega2, m, n});
            }
        }
        list.sort(Comparator.comparingDouble(v -> v[0]));
        int mMax = 1;
        int nMax = 1;
        for (int i = 0; i < Math.min(list.size(), modeCount + 4); i++) {
            mMax = Math.max(mMax, (int) list.get(i)[1]);
            nMax = Math.max(nMax, (int) list.get(i)[2]);
        }
        return new int[] {Math.min(40, (int) Math.ceil(1.6 * mMax) + 10), Math.min(40, (int) Math.ceil(1.6 * nMax) + 10)};
    }

    private static int polygonDegree(int modeCount) {
        return Math.min(20, 14 + modeCount / 6);
    }

    /** Tensor Gauss–Legendre over the rectangle, exact for the uniform plate's integrands. */
    private static double[][] tensorRule(RectangleBasis rb, int extra) {
        double[][] gx = Legendre.gauss(rb.fx.count() + 3 + extra);
        double[][] gy = Legendre.gauss(rb.fy.count() + 3 + extra);
        int n = gx[0].length * gy[0].length;
        double[][] rule = new double[3][n];
        int q = 0;
        for (int i = 0; i < gx[0].length; i++) {
            for (int j = 0; j < gy[0].length; j++) {
                rule[0][q] = (gx[0][i] + 1) * rb.lengthM / 2;
                rule[1][q] = (gy[0][j] + 1) * rb.widthM / 2;
                rule[2][q] = gx[1][i] * gy[1][j] * rb.lengthM * rb.widthM / 4;
                q++;
            }
        }
        return rule;
    }

    /**
     * Uniform rectangle: K as a Kronecker sum of 1-D integrals (M = ρh·(L/2)(W/2)·I since the functions are
     * orthonormal), solved per symmetry class (even/odd about x = L/2 and y = W/2).
     */
    private static SymmetricEigen.Pairs separable(RectangleBasis rb, Plate plate, int count) {
        int nx = rb.fx.count();
        int ny = rb.fy.count();
        double[][][] ex = rb.fx.integrals();
        double[][][] ey = rb.fy.integrals();
        double h = plate.thickness().minimum();
        Rigidities d = plate.material().rigidities(h);
        double sx = 2 / rb.lengthM;
        double sy = 2 / rb.widthM;
        double jac = rb.lengthM * rb.widthM / 4;
        double massFactor = plate.material().densityKgPerM3() * h * jac;
        double c11 = d.d11() * Math.pow(sx, 4) * jac / massFactor;
        double c22 = d.d22() * Math.pow(sy, 4) * jac / massFactor;
        double c12 = d.d12() * sx * sx * sy * sy * jac / massFactor;
        double c66 = 4 * d.d66() * sx * sx * sy * sy * jac / massFactor;
        List<double[]> values = new ArrayList<>();
        int n = nx * ny;
        for (int cls = 0; cls < 4; cls++) {
            int px = cls / 2;
            int py = cls % 2;
            List<Integer> idx = new ArrayList<>();
            for (int i = px; i < nx; i += 2) {
                for (int j = py; j < ny; j += 2) {
                    idx.add(i * ny + j);
                }
            }
            int m = idx.size();
            if (m == 0) {
                continue;
            }
            double[][] k = new double[m][m];
            for (int r = 0; r < m; r++) {
                int i = idx.get(r) / ny;
                int j = idx.get(r) % ny;
                for (int s = 0; s < m; s++) {
                    int kk = idx.get(s) / ny;
                    int l = idx.get(s) % ny;
                    double v = c66 * ex[0][i][kk] * ey[0][j][l]
                            + c12 * (ex[2][i][kk] * ey[2][l][j] + ex[2][kk][i] * ey[2][j][l]);
                    if (j == l) {
                        v += c11 * ex[1][i][kk];
                    }
                    if (i == kk) {
                        v += c22 * ey[1][j][l];
                    }
                    k[r][s] = v;
                }
            }
            for (int r = 0; r < m; r++) {
                for (int s = r + 1; s < m; s++) {
                    double avg = (k[r][s] + k[s][r]) / 2;
                    k[r][s] = avg;
                    k[s][r] = avg;
                }
            }
            SymmetricEigen.Pairs p = SymmetricEigen.standard(k, count);
            for (int e = 0; e < p.values().length; e++) {
                double[] full = new double[n + 1];
                full[0] = p.values()[e];
                for (int r = 0; r < m; r++) {
                    full[1 + idx.get(r)] = p.vectors()[e][r] / Math.sqrt(massFactor);
                }
                values.add(full);
            }
        }
        values.sort(Comparator.comparingDouble(v -> v[0]));
        int take = Math.min(count, values.size());
        double[] lambda = new double[take];
        double[][] vectors = new double[take][];
        for (int e = 0; e < take; e++) {
            lambda[e] = values.get(e)[0];
            vectors[e] = Arrays.copyOfRange(values.get(e), 1, n + 1);
        }
        return new SymmetricEigen.Pairs(lambda, vectors);
    }

    /**
     * A supported edge is itself a line of w = 0, not a node line: nodes on or beyond it take a tiny value of the
     * sign of the plate next to them, so that node lines run up to the edge and never along it.
     */
    private static double[][] supportedContour(double[][] grid, boolean[][] inside, Outline outline) {
        int gx = grid.length;
        int gy = grid[0].length;
        boolean[][] interior = new boolean[gx][gy];
        for (int i = 0; i < gx; i++) {
            for (int j = 0; j < gy; j++) {
                interior[i][j] = outline.isRectangle() ? i > 0 && j > 0 && i < gx - 1 && j < gy - 1 : inside[i][j];
            }
        }
        double[][] out = new double[gx][gy];
        for (int i = 0; i < gx; i++) {
            for (int j = 0; j < gy; j++) {
                if (interior[i][j]) {
                    out[i][j] = grid[i][j];
                    continue;
                }
                double sum = 0;
                for (int di = -1; di <= 1; di++) {
                    for (int dj = -1; dj <= 1; dj++) {
                        int a = i + di;
                        int b = j + dj;
                        if (a >= 0 && b >= 0 && a < gx && b < gy && interior[a][b]) {
                            sum += grid[a][b];
                        }
                    }
                }
                out[i][j] = sum == 0 ? grid[i][j] : 1e-9 * sum;
            }
        }
        return out;
    }

    private static List<PlateMode> modes(Plate plate, RitzBasis basis, SymmetricEigen.Pairs pairs, int rigid,
                                         int modeCount, boolean withLines) {
        Outline outline = plate.outline();
        double[] b = outline.bounds();
        double lx = b[2] - b[0];
        double ly = b[3] - b[1];
        double longer = Math.max(lx, ly);
        int gx = Math.max(9, (int) Math.round((GRID_LONG_SIDE - 1) * lx / longer) + 1);
        int gy = Math.max(9, (int) Math.round((GRID_LONG_SIDE - 1) * ly / longer) + 1);
        double[] xs = new double[gx];
        double[] ys = new double[gy];
        for (int i = 0; i < gx; i++) {
            xs[i] = b[0] + lx * i / (gx - 1);
        }
        for (int j = 0; j < gy; j++) {
            ys[j] = b[1] + ly * j / (gy - 1);
        }
        int n = basis.size();
        double[][][] values = new double[gx][gy][];
        boolean[][] inside = new boolean[gx][gy];
        double[] w = new double[n];
        double[] scratch = new double[n];
        for (int i = 0; i < gx; i++) {
            for (int j = 0; j < gy; j++) {
                basis.evaluate(xs[i], ys[j], w, scratch, scratch, scratch, scratch, scratch);
                values[i][j] = w.clone();
                inside[i][j] = outline.isRectangle() || outline.contains(xs[i], ys[j]);
            }
        }
        EqualTemperament et = EqualTemperament.iso16();
        List<PlateMode> modes = new ArrayList<>();
        for (int e = rigid; e < pairs.values().length && modes.size() < modeCount; e++) {
            double omega2 = Math.max(pairs.values()[e], 0);
            double f = Math.sqrt(omega2) / (2 * Math.PI);
            double[] c = pairs.vectors()[e];
            double[][] grid = new double[gx][gy];
            double maxAbs = 0;
            double signed = 0;
            for (int i = 0; i < gx; i++) {
                for (int j = 0; j < gy; j++) {
                    double s = 0;
                    double[] v = values[i][j];
                    for (int a = 0; a < n; a++) {
                        s += c[a] * v[a];
                    }
                    grid[i][j] = s;
                    if (inside[i][j] && Math.abs(s) > maxAbs) {
                        maxAbs = Math.abs(s);
                        signed = s;
                    }
                }
            }
            double scale = signed == 0 ? 1 : 1 / signed;
            for (double[] row : grid) {
                for (int j = 0; j < gy; j++) {
                    row[j] *= scale;
                }
            }
            double[][] shown = new double[gx][gy];
            for (int i = 0; i < gx; i++) {
                for (int j = 0; j < gy; j++) {
                    shown[i][j] = inside[i][j] ? Math.max(-1, Math.min(1, grid[i][j])) : Double.NaN;
                }
            }
            Note note = f > 0 ? et.nearest(f) : null;
            if (!withLines) {
                modes.add(new PlateMode(modes.size() + 1, f, note, 0, 0, "", new ModeShape(xs, ys, shown, List.of())));
                continue;
            }
            double[][] contour = plate.edges() == EdgeCondition.FREE ? grid : supportedContour(grid, inside, outline);
            List<double[][]> lines = NodalLines.trace(xs, ys, contour, inside, outline);
            int[] counts = ModeNames.nodalLineCounts(shown);
            boolean ring = ModeNames.hasRing(lines, outline);
            String name = ModeNames.name(plate.edges(), outline.isRectangle(), counts[0], counts[1], ring);
            modes.add(new PlateMode(modes.size() + 1, f, note, counts[0], counts[1], name,
                    new ModeShape(xs, ys, shown, lines)));
        }
        return modes;
    }
}
