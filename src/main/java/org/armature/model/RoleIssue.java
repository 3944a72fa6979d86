package org.armature.model;

import java.util.List;

/**
 * A finding of role recognition together with every part it concerns, so a view can mark them all.
 *
 * @param finding the finding; its {@code ref} is the first of {@code refs}
 * @param refs designators of the parts concerned, most important first; may be empty
 */
public record RoleIssue(Finding finding, List<String> refs) {

    public RoleIssue {
        if (finding == null) {
            throw new IllegalArgumentException("finding must not be null");
        }
        refs = List.copyOf(refs);
    }
}
