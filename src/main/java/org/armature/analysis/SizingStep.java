package org.armature.analysis;

import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * One line of a calculation as an engineer writes it: what, how, how much.
 *
 * @param label what the step finds ("coil current, worst case")
 * @param formula the formula with its symbols ("IC = (VS,max − VCE(sat)) / Rcoil,min")
 * @param value the result in the coherent SI unit of {@code unit}; NaN when it cannot be had
 * @param unit the unit of {@code value}
 */
public record SizingStep(String label, String formula, double value, Unit unit) {

    public SizingStep {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("label must not be blank");
        }
        formula = formula == null ? "" : formula;
        if (unit == null) {
            throw new IllegalArgumentException("unit must not be null for " + label);
        }
    }

    /** The value in engineering notation with its unit ({@code 2.14 kΩ}). */
    public String formattedValue() {
        return EngineeringNotation.format(value, unit);
    }
}
