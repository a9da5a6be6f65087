package org.nodewright.physics.inverse;

import java.util.Arrays;
import org.nodewright.physics.Require;

/**
 * What the tone-hole solver may move: the centre of every hole from the input end, every hole's
 * diameter, and the length of the bore's last section (the foot), all in mm. Arrays are copied in
 * and out, so a layout never changes.
 */
public record HoleLayout(double[] positionsMm, double[] diametersMm, double footLengthMm) {

    public HoleLayout {
        if (positionsMm == null || diametersMm == null || positionsMm.length != diametersMm.length) {
            throw new IllegalArgumentException("positions and diameters must be given for the same holes");
        }
        positionsMm = positionsMm.clone();
        diametersMm = diametersMm.clone();
        for (int i = 0; i < positionsMm.length; i++) {
            if (!Double.isFinite(positionsMm[i]) || !(diametersMm[i] > 0) || !Double.isFinite(diametersMm[i])) {
                throw new IllegalArgumentException("hole " + i + " has position " + positionsMm[i] + " mm and diameter "
                        + diametersMm[i] + " mm");
            }
        }
        Require.positive("footLengthMm", footLengthMm);
    }

    public int holeCount() {
        return positionsMm.length;
    }

    public double position(int i) {
        return positionsMm[i];
    }

    public double diameter(int i) {
        return diametersMm[i];
    }

    @Override
    public double[] positionsMm() {
        return positionsMm.clone();
    }

    @Override
    public double[] diametersMm() {
        return diametersMm.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof HoleLayout h && Arrays.equals(positionsMm, h.positionsMm)
                && Arrays.equals(diametersMm, h.diametersMm) && footLengthMm == h.footLengthMm;
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(positionsMm) + Arrays.hashCode(diametersMm)) + Double.hashCode(footLengthMm);
    }

    @Override
    public String toString() {
        return "HoleLayout" + Arrays.toString(positionsMm) + Arrays.toString(diametersMm) + " foot " + footLengthMm;
    }
}
