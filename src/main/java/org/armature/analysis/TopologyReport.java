package org.armature.analysis;

import java.util.List;
import java.util.Optional;
import org.armature.model.Finding;
import org.armature.model.RoleIssue;
import org.armature.model.StageRoles;

/**
 * The result of {@link TopologyCheck#analyse}: the recognised roles, if any, and the issues.
 *
 * @param roles what each part does; empty when the stage is not a recognised driver stage
 * @param issues findings with the parts they concern, in a stable order
 */
public record TopologyReport(Optional<StageRoles> roles, List<RoleIssue> issues) {

    public TopologyReport {
        issues = List.copyOf(issues);
    }

    /** The findings alone. */
    public List<Finding> findings() {
        return issues.stream().map(RoleIssue::finding).toList();
    }
}
