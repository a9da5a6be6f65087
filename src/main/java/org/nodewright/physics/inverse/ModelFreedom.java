package org.nodewright.physics.inverse;

import java.util.List;
import java.util.function.Function;

/**
 * Figures of the instrument besides its holes and foot that a solve may also move (the player's
 * end's headspace or window length, in mm), each with its start and bounds, and the model for a
 * set of their values. {@link #NONE} moves nothing and keeps the solver's own model.
 *
 * @param variables what may move, in the order {@code family} takes their values
 * @param family    the frequency model for one value of each variable
 */
public record ModelFreedom(List<Variable> variables, Function<double[], PlayingFrequencyModel> family) {

    public static final ModelFreedom NONE = new ModelFreedom(List.of(), x -> null);

    /**
     * One figure that may move.
     *
     * @param name  as the request names it (e.g. "headspaceMm")
     * @param start its value at the start, mm
     * @param min   smallest value allowed, mm
     * @param max   largest value allowed, mm
     */
    public record Variable(String name, double start, double min, double max) {
        public Variable {
            if (!(Double.isFinite(start) && Double.isFinite(min) && Double.isFinite(max) && min <= max)) {
                throw new IllegalArgumentException(name + ": bounds must be finite with min <= max, were " + min + ", "
                        + max);
            }
        }
    }

    /** What a variable became. */
    public record Change(String name, double start, double value) {
        public double moved() {
            return value - start;
        }
    }

    public ModelFreedom {
        variables = List.copyOf(variables);
    }

    public int size() {
        return variables.size();
    }

    public double[] starts() {
        return variables.stream().mapToDouble(Variable::start).toArray();
    }

    /** The same freedom starting from other values (each kept inside its bounds). */
    public ModelFreedom startingAt(double[] values) {
        if (values.length != variables.size()) {
            throw new IllegalArgumentException("one value per variable is needed");
        }
        List<Variable> moved = new java.util.ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            Variable v = variables.get(i);
            moved.add(new Variable(v.name(), Math.min(v.max(), Math.max(v.min(), values[i])), v.min(), v.max()));
        }
        return new ModelFreedom(moved, family);
    }
}
