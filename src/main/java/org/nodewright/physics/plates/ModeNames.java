package org.nodewright.physics.plates;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Names of plate modes: the (m, n) node-line counts of a rectangle mode (m lines met going along x, n
 * going along y; Leissa 1969 numbers free and clamped plate modes this way), and for free plates the
 * names luthiers give the first tap-tone modes (common practice): the twisting mode with one node line
 * each way ("mode 1"), the cross-grain bending mode with two node lines along the grain ("mode 2"), and
 * the ring mode whose node line closes on itself ("mode 5").
 */
final class ModeNames {

    /** Values closer to zero than this (of max |w| = 1) do not count as a sign. */
    private static final double SIGN_THRESHOLD = 0.05;

    private ModeNames() {
    }

    /** {m, n}: the most frequent count of sign changes along grid rows (x) and columns (y); NaN cells skipped. */
    static int[] nodalLineCounts(double[][] w) {
        int gx = w.length;
        int gy = w[0].length;
        Map<Integer, Integer> alongX = new HashMap<>();
        for (int j = 1; j + 1 < gy; j++) {
            double[] line = new double[gx];
            for (int i = 0; i < gx; i++) {
                line[i] = w[i][j];
            }
            alongX.merge(signChanges(line), 1, Integer::sum);
        }
        Map<Integer, Integer> alongY = new HashMap<>();
        for (int i = 1; i + 1 < gx; i++) {
            alongY.merge(signChanges(w[i]), 1, Integer::sum);
        }
        return new int[] {mostFrequent(alongX), mostFrequent(alongY)};
    }

    private static int signChanges(double[] line) {
        int changes = 0;
        int last = 0;
        for (double v : line) {
            if (Double.isNaN(v) || Math.abs(v) < SIGN_THRESHOLD) {
                continue;
            }
            int sign = v > 0 ? 1 : -1;
            if (last != 0 && sign != last) {
                changes++;
            }
            last = sign;
        }
        return changes;
    }

    private static int mostFrequent(Map<Integer, Integer> counts) {
        int best = 0;
        int bestCount = -1;
        for (Map.Entry<Integer, Integer> e : counts.entrySet()) {
            if (e.getValue() > bestCount || (e.getValue() == bestCount && e.getKey() < best)) {
                best = e.getKey();
                bestCount = e.getValue();
            }
        }
        return best;
    }

    /** A node line that closes on itself away from the outline. */
    static boolean hasRing(List<double[][]> lines, Outline outline) {
        double[] b = outline.bounds();
        double tol = 1e-6 * Math.max(b[2] - b[0], b[3] - b[1]);
        for (double[][] line : lines) {
            double[] first = line[0];
            double[] last = line[line.length - 1];
            if (line.length > 4 && Math.hypot(first[0] - last[0], first[1] - last[1]) <= tol) {
                return true;
            }
        }
        return false;
    }

    static String name(EdgeCondition edges, boolean rectangle, int m, int n, boolean ring) {
        String counts = "(" + m + ", " + n + ")";
        if (edges != EdgeCondition.FREE) {
            return rectangle ? counts : "";
        }
        String trade;
        if (ring) {
            trade = "ring mode (mode 5)";
        } else if (m == 1 && n == 1) {
            trade = "twisting mode (mode 1)";
        } else if (m == 0 && n == 2) {
            trade = "cross-grain bending (mode 2)";
        } else if (m == 2 && n == 0) {
            trade = "long-grain bending";
        } else {
            trade = "";
        }
        if (!rectangle) {
            return trade;
        }
        return trade.isEmpty() ? counts : counts + " " + trade;
    }
}
