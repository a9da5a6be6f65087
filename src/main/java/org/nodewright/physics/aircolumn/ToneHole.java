package org.nodewright.physics.aircolumn;

/**
 * A side hole, in metres, positioned by its centre along the bore from the input end.
 *
 * @param position centre of the hole from the input end, m
 * @param radius   hole radius, m (&gt; 0)
 * @param chimney  chimney height at the hole's centre line, m (&gt;= 0)
 * @param open     true when the hole is uncovered
 */
public record ToneHole(double position, double radius, double chimney, boolean open) {

    public ToneHole {
        if (!(position > 0 && Double.isFinite(position)) || !(radius > 0 && Double.isFinite(radius))
                || !(chimney >= 0 && Double.isFinite(chimney))) {
            throw new IllegalArgumentException("hole position and radius must be positive, chimney >= 0: position="
                    + position + " radius=" + radius + " chimney=" + chimney);
        }
    }

    public ToneHole withOpen(boolean isOpen) {
        return new ToneHole(position, radius, chimney, isOpen);
    }
}
