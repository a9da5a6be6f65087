package org.nodewright.physics.inverse;

/**
 * What a calibration may fit: the mouth's uncertain figure (a window's effective length, an
 * embouchure's lip coverage, a reed's equivalent volume, a cup's volume) and the air's temperature
 * inside the instrument (the room temperature, or a shift of the breath's temperatures).
 */
public enum CalibrationParameter {
    MOUTH,
    AIR_TEMPERATURE
}
