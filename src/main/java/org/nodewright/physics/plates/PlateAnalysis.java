package org.nodewright.physics.plates;

import java.util.List;

/**
 * The modes of a plate and how they were computed.
 *
 * @param modes      ascending in frequency, rigid-body motions removed
 * @param method     the numerical method, in words
 * @param basisSize  number of Ritz trial functions
 */
public record PlateAnalysis(List<PlateMode> modes, String method, int basisSize) {

    public PlateAnalysis {
        modes = List.copyOf(modes);
    }
}
