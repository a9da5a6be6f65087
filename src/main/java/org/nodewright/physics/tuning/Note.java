package org.nodewright.physics.tuning;

/**
 * An equal-tempered note and how far a measured or computed pitch sits from it.
 *
 * @param name      scientific pitch name (A4, C#3, ...)
 * @param midi      MIDI note number (A4 = 69)
 * @param frequencyHz the note's equal-tempered frequency
 * @param centsOff  cents of the given pitch above (positive) or below (negative) the note
 */
public record Note(String name, int midi, double frequencyHz, double centsOff) {
}
