package org.armature.analysis;

import java.util.List;
import java.util.function.BiFunction;
import java.util.function.DoubleUnaryOperator;
import org.armature.model.Stage;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * One toleranced parameter of a stage, as a "what-if" change to the document: {@link #apply} sets
 * it to a normalised level u in [−1, 1] (−1 and +1 its limits, 0 the middle) and returns a new
 * stage; the solver is never told about corners.
 *
 * <p>Identifiers are stable: {@code supply}, {@code ambient}, {@code coil-resistance},
 * {@code gain}, {@code vbe}, {@code threshold}, {@code pin-level}, {@code resistor:R1}, and
 * {@code resistors} when the resistors are grouped (see {@link CornerOptions}).
 */
public final class Factor {

    private final String id;
    private final String label;
    private final Unit unit;
    private final List<String> refs;
    private final Spread spread;
    private final DoubleUnaryOperator valueAt;
    private final BiFunction<Stage, Double, Stage> apply;
    /** Name in corner descriptions. */
    private final String word;

    /**
     * @param id stable identifier
     * @param label plain words ("coil supply V1")
     * @param unit unit of {@link #valueAt}
     * @param refs the parts it changes
     * @param spread distribution for Monte Carlo draws
     * @param valueAt the parameter's value at a level (for reports), in SI units of {@code unit}
     * @param apply the what-if change at a level
     */
    public Factor(String id, String label, Unit unit, List<String> refs, Spread spread, DoubleUnaryOperator valueAt,
                  BiFunction<Stage, Double, Stage> apply) {
        this(id, label, unit, refs, spread, valueAt, apply, id);
    }

    private Factor(String id, String label, Unit unit, List<String> refs, Spread spread, DoubleUnaryOperator valueAt,
                   BiFunction<Stage, Double, Stage> apply, String word) {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("id must not be blank");
        }
        this.id = id;
        this.label = label == null ? id : label;
        this.unit = unit == null ? Unit.RATIO : unit;
        this.refs = List.copyOf(refs);
        this.spread = spread == null ? Spread.UNIFORM : spread;
        this.valueAt = valueAt;
        this.apply = apply;
        this.word = word;
    }

    /** Stable identifier. */
    public String id() {
        return id;
    }

    /** Plain-words name. */
    public String label() {
        return label;
    }

    /** Unit of {@link #valueAt}. */
    public Unit unit() {
        return unit;
    }

    /** Parts changed. */
    public List<String> refs() {
        return refs;
    }

    /** Monte Carlo distribution. */
    public Spread spread() {
        return spread;
    }

    /** The parameter's value at a level, in SI units. */
    public double valueAt(double level) {
        return valueAt.applyAsDouble(level);
    }

    /**
     * The name of the factor in a corner's plain-words description: its identifier unless
     * {@link #describedAs} gave another (a factor whose value is an offset says so: "vbe shift").
     */
    public String word() {
        return word;
    }

    /**
     * This factor with another name in corner descriptions (the identifier stays).
     *
     * @param words the name, for example "vbe shift" so an offset of 30 mV does not read as a VBE of 30 mV
     * @return a copy
     */
    public Factor describedAs(String words) {
        return new Factor(id, label, unit, refs, spread, valueAt, apply, words);
    }

    /** The value at a level with its unit ({@code 10.8 V}). */
    public String describe(double level) {
        return EngineeringNotation.format(valueAt(level), unit);
    }

    /**
     * The stage with this parameter at a level.
     *
     * @param stage not modified
     * @param level in [−1, 1]
     * @return a new stage
     * @throws IllegalArgumentException if the level is outside [−1, 1]
     */
    public Stage apply(Stage stage, double level) {
        if (!(level >= -1 && level <= 1)) {
            throw new IllegalArgumentException("level must lie in [-1, 1]: " + level);
        }
        return apply.apply(stage, level);
    }

    @Override
    public String toString() {
        return id;
    }
}
