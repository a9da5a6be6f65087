package org.nodewright.physics.inverse;

import static org.nodewright.physics.Units.INCH;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.strings.Material;

/**
 * The workshop's stock gauges when the maker gives none (common practice for sold strings):
 * metal plain strings every 0.0005 in from 0.007 to 0.020 in and every 0.001 in to 0.026 in;
 * metal wound strings every 0.001 in from 0.017 to 0.080 in (outer diameter); polymer and gut
 * strings (density below 2000 kg/m³) every 0.01 mm from 0.40 to 2.00 mm.
 */
public final class GaugeStock {

    private GaugeStock() {
    }

    public static List<Double> gaugesM(Material core, boolean wound) {
        List<Double> out = new ArrayList<>();
        if (core.densityKgPerM3() < 2000) {
            for (int hundredths = 40; hundredths <= 200; hundredths++) {
                out.add(hundredths * 1e-5);
            }
        } else if (wound) {
            for (int mils = 17; mils <= 80; mils++) {
                out.add(mils * 1e-3 * INCH);
            }
        } else {
            for (int halfMils = 14; halfMils <= 40; halfMils++) {
                out.add(halfMils * 0.5e-3 * INCH);
            }
            for (int mils = 21; mils <= 26; mils++) {
                out.add(mils * 1e-3 * INCH);
            }
        }
        return List.copyOf(out);
    }
}
