package org.nodewright.physics.aircolumn;

import org.nodewright.physics.Require;

/**
 * The player's end of a bore, in SI units; x = 0 of the bore is its reference point (the centre of
 * an embouchure hole or window, the tip of a reed, the rim of a cup). See {@link MouthStage} for
 * the acoustic models.
 */
public sealed interface Mouth permits Mouth.Embouchure, Mouth.Window, Mouth.Reed, Mouth.Cup {

    MouthKind kind();

    /**
     * A transverse flute's embouchure hole: an ellipse (a circle when both axes are equal) through
     * a wall and lip plate, partly covered by the lip, over a headspace closed by the stopper.
     *
     * @param holeLength  hole axis along the bore, m
     * @param holeWidth   hole axis across the bore, m
     * @param wall        chimney height through the wall and lip plate, m (&gt;= 0)
     * @param headspace   bore upstream of the hole centre, m (&gt;= 0)
     * @param lipCoverage share of the hole's area covered by the lip (0..0.8)
     */
    record Embouchure(double holeLength, double holeWidth, double wall, double headspace, double lipCoverage)
            implements Mouth {
        public Embouchure {
            Require.positive("holeLength", holeLength);
            Require.positive("holeWidth", holeWidth);
            Require.nonNegative("wall", wall);
            Require.nonNegative("headspace", headspace);
            if (!(lipCoverage >= 0 && lipCoverage <= 0.8)) {
                throw new IllegalArgumentException("lipCoverage must be within 0..0.8, got " + lipCoverage);
            }
        }

        @Override
        public MouthKind kind() {
            return MouthKind.EMBOUCHURE;
        }

        /** Open (uncovered) area, m^2: the ellipse's pi a b times (1 - coverage). */
        public double openArea() {
            return Math.PI * holeLength * holeWidth / 4 * (1 - lipCoverage);
        }

        /** Full area of the hole, m^2. */
        public double holeArea() {
            return Math.PI * holeLength * holeWidth / 4;
        }
    }

    /**
     * A duct flute's window: a rectangle in the wall from the duct exit to the labium edge.
     *
     * @param length    along the bore, m
     * @param width     across the bore, m
     * @param wall      wall thickness at the window, m (&gt;= 0)
     * @param headspace closed bore upstream of the window centre, m (&gt;= 0)
     */
    record Window(double length, double width, double wall, double headspace) implements Mouth {
        public Window {
            Require.positive("length", length);
            Require.positive("width", width);
            Require.nonNegative("wall", wall);
            Require.nonNegative("headspace", headspace);
        }

        @Override
        public MouthKind kind() {
            return MouthKind.WINDOW;
        }

        public double area() {
            return length * width;
        }
    }

    /**
     * A reed's compliance (and the flow it displaces) as a volume at x = 0.
     *
     * @param equivalentVolume m^3 (&gt; 0)
     */
    record Reed(double equivalentVolume) implements Mouth {
        public Reed {
            Require.positive("equivalentVolume", equivalentVolume);
        }

        @Override
        public MouthKind kind() {
            return MouthKind.REED;
        }
    }

    /**
     * A brass mouthpiece's cup feeding its throat; the backbore and bore follow as segments.
     *
     * @param cupVolume    m^3 (&gt; 0)
     * @param throatRadius m (&gt; 0)
     * @param throatLength m (&gt; 0)
     */
    record Cup(double cupVolume, double throatRadius, double throatLength) implements Mouth {
        public Cup {
            Require.positive("cupVolume", cupVolume);
            Require.positive("throatRadius", throatRadius);
            Require.positive("throatLength", throatLength);
        }

        @Override
        public MouthKind kind() {
            return MouthKind.CUP;
        }
    }
}
