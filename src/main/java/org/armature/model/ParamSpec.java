package org.armature.model;

import org.armature.units.Unit;

/**
 * Definition of one numeric parameter of a part kind.
 *
 * <p>The key says the unit in words ({@code resistanceOhms}); {@link #unit()} carries it as a
 * {@link Unit}, so parsing, printing and checks never match symbols as text.
 * The default is a typical value for the generic part class, which the description says.
 *
 * @param key stable key used in files and commands
 * @param label short label for the part sheet
 * @param unit the SI unit of the value ({@link Unit#RATIO} for dimensionless values)
 * @param defaultValue typical value of the generic part
 * @param min smallest accepted value (inclusive)
 * @param max largest accepted value (inclusive)
 * @param description one sentence for the part sheet
 */
public record ParamSpec(String key, String label, Unit unit, double defaultValue,
                        double min, double max, String description) {

    public ParamSpec {
        if (unit == null) {
            throw new IllegalArgumentException("unit must not be null for " + key);
        }
        if (!(min <= max)) {
            throw new IllegalArgumentException("min must not exceed max for " + key);
        }
        if (!(defaultValue >= min && defaultValue <= max)) {
            throw new IllegalArgumentException("defaultValue out of range for " + key);
        }
    }

    /** The unit's printed symbol ("Ω", "V", "" for ratios). */
    public String unitSymbol() {
        return unit.symbol();
    }

    /** True when {@code value} is finite and within [min, max]. */
    public boolean accepts(double value) {
        return Double.isFinite(value) && value >= min && value <= max;
    }
}
