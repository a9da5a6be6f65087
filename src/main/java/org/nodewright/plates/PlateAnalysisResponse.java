package org.nodewright.plates;

import java.util.List;

/**
 * Answer of {@code POST /api/v1/plates/analyze}: modes ascending, rigid-body motions left out; lengths in mm.
 *
 * @param method    the numerical method used, in words
 * @param basisSize number of Ritz trial functions
 * @param cautions  notes on the model's limits for this plate (empty when none)
 */
public record PlateAnalysisResponse(List<Mode> modes, String method, int basisSize, List<String> cautions) {

    /**
     * One mode. {@code nodalLinesX}/{@code nodalLinesY}: node lines met going along x / along y (the (m, n) of a
     * rectangle mode); {@code name}: the trade's name where it has one, else empty.
     */
    public record Mode(int n, double frequencyHz, NoteJson note, String name, int nodalLinesX, int nodalLinesY,
                       Grid grid, List<List<double[]>> nodalLines) {
    }

    /** Nearest equal-tempered note (A4 = 440 Hz) and the cents the mode sits above it. */
    public record NoteJson(String name, double centsOff) {
    }

    /** w[i][j] at (xMm[i], yMm[j]); null outside the outline; max |w| = 1. */
    public record Grid(double[] xMm, double[] yMm, List<List<Double>> w) {
    }
}
