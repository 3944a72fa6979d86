package org.armature.analysis;

import java.util.List;
import java.util.Optional;
import org.armature.model.Finding;

/**
 * Everything the checks found for one stage.
 *
 * @param checks the verdicts, in the order of the table in {@link StageChecks}
 * @param yield the Monte Carlo estimate, when samples were asked for
 * @param findings topology findings, solver failures ({@code check.not-solved}) and safety
 *     cautions ({@code caution.*}); never a claim that the design is safe
 * @param cornerCount corners solved
 */
public record CheckReport(List<CheckResult> checks, Optional<YieldResult> yield, List<Finding> findings,
                          int cornerCount) {

    public CheckReport {
        checks = List.copyOf(checks);
        findings = List.copyOf(findings);
    }

    /** The verdict with this id. */
    public Optional<CheckResult> check(String id) {
        return checks.stream().filter(c -> c.id().equals(id)).findFirst();
    }

    /** The worst status of all checks (PASS when there are none). */
    public CheckStatus overall() {
        return checks.stream().map(CheckResult::status).reduce(CheckStatus.PASS, CheckStatus::worse);
    }
}
