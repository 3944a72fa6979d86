package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The honest-residual audit is registered for the whole suite and runs on every returned answer. */
class AnswerAuditTest {

    @Test
    @DisplayName("every operating point the engine returns in the test suite goes through the honest-residual audit")
    void auditRunsOnEveryAnswer() {
        long before = HonestResidualAudit.audited();
        new DcAnalysis().solve(Templates.defaultStage());
        assertTrue(HonestResidualAudit.audited() > before, "the audit saw the answer");
    }
}
