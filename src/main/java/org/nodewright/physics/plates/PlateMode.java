package org.nodewright.physics.plates;

import org.nodewright.physics.tuning.Note;

/**
 * One flexural mode of a plate.
 *
 * @param n              1 for the lowest flexural mode (rigid-body motions are not counted)
 * @param frequencyHz    natural frequency
 * @param note           nearest equal-tempered note and cents off it
 * @param nodalLinesX    node lines met going along x (the m of an (m, n) rectangle mode)
 * @param nodalLinesY    node lines met going along y (the n)
 * @param name           the trade's name where it has one, else empty
 * @param shape          displacement grid and node lines
 */
public record PlateMode(int n, double frequencyHz, Note note, int nodalLinesX, int nodalLinesY, String name,
                        ModeShape shape) {
}
