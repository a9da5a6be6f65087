package org.nodewright.physics.strings;

/** The wanted pitch or tension cannot be reached with the given string (e.g. below its beam pitch). */
public class PitchUnreachableException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    public PitchUnreachableException(String message) {
        super(message);
    }
}
