package org.armature.analysis;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.armature.model.Stage;

/**
 * A corner or a Monte Carlo sample: the levels chosen for each factor and the stage they give.
 *
 * @param index position in its set (corner number or sample number)
 * @param levels normalised level in [−1, 1] per factor id, in factor order
 * @param stage the modified stage
 */
public record Variant(int index, Map<String, Double> levels, Stage stage) {

    public Variant {
        levels = Collections.unmodifiableMap(new LinkedHashMap<>(levels));
        if (stage == null) {
            throw new IllegalArgumentException("stage must not be null");
        }
    }

    /** The level of a factor; 0 (the middle) for a factor not varied. */
    public double level(String factorId) {
        Double level = levels.get(factorId);
        return level == null ? 0.0 : level;
    }
}
