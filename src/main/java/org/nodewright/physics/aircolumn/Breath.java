package org.nodewright.physics.aircolumn;

import org.nodewright.physics.Require;

/**
 * The air inside a bore while it is played: the player's breath, with its CO2 mole fraction and
 * humidity, its temperature falling linearly from the input end to the output end (the room's
 * air, {@link AirColumn#air()}, stays for what is outside).
 *
 * @param co2MoleFraction     CO2 mole fraction (0..0.2; room air 0.0004, exhaled breath about 0.04)
 * @param relativeHumidityPct relative humidity at each point's own temperature, percent (0..100)
 * @param inputTemperatureC   temperature at x = 0, C
 * @param outputTemperatureC  temperature at the output end, C
 */
public record Breath(double co2MoleFraction, double relativeHumidityPct, double inputTemperatureC,
        double outputTemperatureC) {

    public Breath {
        Require.finite("co2MoleFraction", co2MoleFraction);
        Require.finite("relativeHumidityPct", relativeHumidityPct);
        Require.finite("inputTemperatureC", inputTemperatureC);
        Require.finite("outputTemperatureC", outputTemperatureC);
        if (!(co2MoleFraction >= 0 && co2MoleFraction <= 0.2)) {
            throw new IllegalArgumentException("co2MoleFraction must be within 0..0.2, got " + co2MoleFraction);
        }
        if (!(relativeHumidityPct >= 0 && relativeHumidityPct <= 100)) {
            throw new IllegalArgumentException("relativeHumidityPct must be within 0..100, got "
                    + relativeHumidityPct);
        }
    }

    /** True when the temperature changes along the bore. */
    public boolean hasGradient() {
        return inputTemperatureC != outputTemperatureC;
    }

    /** Temperature at fraction u (0 = input, 1 = output) of the bore, C: linear. */
    public double temperatureAt(double u) {
        return inputTemperatureC + (outputTemperatureC - inputTemperatureC) * u;
    }

    /** The breath's air at fraction u of the bore. */
    public AirProperties airAt(double u) {
        return AirProperties.of(temperatureAt(u), relativeHumidityPct, co2MoleFraction);
    }
}
