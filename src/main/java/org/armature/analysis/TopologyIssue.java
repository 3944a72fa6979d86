package org.armature.analysis;

import java.util.List;
import org.armature.model.Finding;

/**
 * A topology finding together with every part it concerns, so a view can mark them all.
 *
 * @param finding the finding; its {@code ref} is the first of {@code refs}
 * @param refs designators of the parts concerned, most important first; may be empty
 */
public record TopologyIssue(Finding finding, List<String> refs) {

    public TopologyIssue {
        if (finding == null) {
            throw new IllegalArgumentException("finding must not be null");
        }
        refs = List.copyOf(refs);
    }
}
