package org.armature.analysis;

/**
 * A value the sizing assistant proposes for one part parameter.
 *
 * @param ref designator of the part, or the role's usual designator when the stage lacks the part
 * @param paramKey the parameter ({@code resistanceOhms})
 * @param value proposed value in SI units (a preferred value of the chosen series)
 * @param tolerancePercent the tolerance that goes with the series (IEC 60063, PV-7)
 * @param role what the part does ("base resistor", "pull-down")
 * @param rule the rule the value follows, in plain words
 */
public record Suggestion(String ref, String paramKey, double value, double tolerancePercent, String role,
                         String rule) {

    public Suggestion {
        if (ref == null || ref.isBlank()) {
            throw new IllegalArgumentException("ref must not be blank");
        }
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be positive and finite for " + ref);
        }
    }
}
