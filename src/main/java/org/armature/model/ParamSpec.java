package org.armature.model;

/**
 * Definition of one numeric parameter of a part kind.
 *
 * <p>The key carries the unit ({@code resistanceOhms}); {@link #unitSymbol()} is what the UI prints.
 * The default is a typical value for the generic part class, which the description says.
 *
 * @param key stable key used in files and commands
 * @param label short label for the part sheet
 * @param unitSymbol SI symbol ("Ω", "V", "A", "H", "F", "K/W", "°C", "%", "" for ratios)
 * @param defaultValue typical value of the generic part
 * @param min smallest accepted value (inclusive)
 * @param max largest accepted value (inclusive)
 * @param description one sentence for the part sheet
 */
public record ParamSpec(String key, String label, String unitSymbol, double defaultValue,
                        double min, double max, String description) {

    public ParamSpec {
        if (!(min <= max)) {
            throw new IllegalArgumentException("min must not exceed max for " + key);
        }
        if (!(defaultValue >= min && defaultValue <= max)) {
            throw new IllegalArgumentException("defaultValue out of range for " + key);
        }
    }

    /** True when {@code value} is finite and within [min, max]. */
    public boolean accepts(double value) {
        return Double.isFinite(value) && value >= min && value <= max;
    }
}
