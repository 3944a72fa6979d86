package org.armature.analysis;

import org.armature.model.DriverTopology;
import java.util.List;
import java.util.Optional;
import org.armature.model.Finding;

/**
 * What the sizing assistant found: the calculation, the values it proposes and what it could not do.
 *
 * @param topology the stage sized; empty when it was not recognised
 * @param steps the calculation in order
 * @param suggestions proposed part values
 * @param findings problems met on the way (keys {@code sizing.*}), never thrown
 */
public record SizingResult(Optional<DriverTopology> topology, List<SizingStep> steps, List<Suggestion> suggestions,
                           List<Finding> findings) {

    public SizingResult {
        steps = List.copyOf(steps);
        suggestions = List.copyOf(suggestions);
        findings = List.copyOf(findings);
    }

    /** The first step with this label. */
    public Optional<SizingStep> step(String label) {
        return steps.stream().filter(s -> s.label().equals(label)).findFirst();
    }

    /** The suggestion for a part's role. */
    public Optional<Suggestion> suggestion(String role) {
        return suggestions.stream().filter(s -> s.role().equals(role)).findFirst();
    }
}
