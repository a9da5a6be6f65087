package org.nodewright.physics.strings;

/**
 * @param fret            fret number (1 = first fret)
 * @param fromNutM        distance from the nut
 * @param fromPreviousM   distance from the previous fret (from the nut for fret 1)
 */
public record Fret(int fret, double fromNutM, double fromPreviousM) {
}
