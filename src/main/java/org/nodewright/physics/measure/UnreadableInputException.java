package org.nodewright.physics.measure;

/**
 * A recording or a table of measurements that cannot be analysed: not a WAV file, an unsupported
 * encoding, truncated, empty, silent, or a CSV cell that is not a number. The message says which,
 * in words a user can act on.
 */
public class UnreadableInputException extends IllegalArgumentException {

    public UnreadableInputException(String message) {
        super(message);
    }
}
