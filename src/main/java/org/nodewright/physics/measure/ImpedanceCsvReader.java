package org.nodewright.physics.measure;

import java.util.List;

/**
 * Reads a measured impedance curve: three columns, frequency (Hz), magnitude, phase; phase in
 * radians unless the header's third cell mentions "deg" or degrees are asked for. Frequencies must
 * rise strictly; magnitudes must be positive.
 */
public final class ImpedanceCsvReader {

    /** At most this many points (a fine sweep to 20 kHz at 0.1 Hz steps). */
    public static final int MAX_ROWS = 200_000;

    private ImpedanceCsvReader() {
    }

    /**
     * @param phaseInDegrees true for degrees, false for radians, null to take the header's word
     * @throws UnreadableInputException naming the line and column of the first bad cell
     */
    public static ImpedanceCurve read(String text, Boolean phaseInDegrees) {
        int width = CsvTable.width(text);
        if (width != 3) {
            throw new UnreadableInputException("an impedance table has three columns (frequencyHz, magnitude, phase), found "
                    + width);
        }
        String[] header = CsvTable.header(text);
        boolean degrees = phaseInDegrees != null ? phaseInDegrees : header.length == 3 && header[2].contains("deg");
        List<CsvTable.Row> rows = CsvTable.rows(text, 3, MAX_ROWS);
        if (rows.size() < 3) {
            throw new UnreadableInputException("an impedance table needs at least 3 rows, found " + rows.size());
        }
        double[] f = new double[rows.size()];
        double[] m = new double[rows.size()];
        double[] p = new double[rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            CsvTable.Row r = rows.get(i);
            f[i] = CsvTable.number(r.cells()[0], r.line(), "frequencyHz");
            m[i] = CsvTable.number(r.cells()[1], r.line(), "magnitude");
            p[i] = CsvTable.number(r.cells()[2], r.line(), "phase");
            if (!(f[i] > 0)) {
                throw new UnreadableInputException("line " + r.line() + ", column frequencyHz: must be positive");
            }
            if (i > 0 && !(f[i] > f[i - 1])) {
                throw new UnreadableInputException("line " + r.line() + ", column frequencyHz: frequencies must rise from row to row");
            }
            if (!(m[i] > 0)) {
                throw new UnreadableInputException("line " + r.line() + ", column magnitude: must be positive");
            }
            if (degrees) {
                p[i] = Math.toRadians(p[i]);
            }
        }
        return new ImpedanceCurve(f, m, p);
    }
}
