package org.nodewright.physics.bars;

import java.util.ArrayList;
import java.util.List;

/** Turns an interpolated mode line into a {@link BarMode}: scaling, samples, nodes and antinodes. */
final class ModeLines {

    /** Shape samples per mode (every 0.5 % of the length). */
    static final int SAMPLES = 201;

    private ModeLines() {
    }

    static BarMode mode(ModeFamily family, int n, double frequencyHz, ModeLine raw, BarEnds ends) {
        double len = raw.length();
        double[] xs = new double[SAMPLES];
        for (int i = 0; i < SAMPLES; i++) {
            xs[i] = len * i / (SAMPLES - 1);
        }
        double[] w = raw.sample(xs);
        int big = 0;
        for (int i = 1; i < SAMPLES; i++) {
            if (Math.abs(w[i]) > Math.abs(w[big])) {
                big = i;
            }
        }
        double peak = w[big];
        double scale = 1.0 / peak;
        for (int i = 0; i < SAMPLES; i++) {
            w[i] = w[i] / peak;
        }
        ModeLine line = raw.scaled(scale);
        List<Double> nodes = new ArrayList<>();
        if (ends.start() != BarEnds.End.FREE) {
            nodes.add(0.0);
        }
        nodes.addAll(line.interiorZeros());
        if (ends.finish() != BarEnds.End.FREE) {
            nodes.add(len);
        }
        List<Double> antinodes = new ArrayList<>();
        if (ends.start() == BarEnds.End.FREE) {
            antinodes.add(0.0);
        }
        antinodes.addAll(line.interiorMaxima());
        if (ends.finish() == BarEnds.End.FREE) {
            antinodes.add(len);
        }
        return new BarMode(family, n, frequencyHz, nodes, antinodes, xs, w, line);
    }
}
