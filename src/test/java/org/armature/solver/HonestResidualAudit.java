package org.armature.solver;

import org.armature.model.Stage;

/**
 * The test suite's audit of every DC answer ({@link AnswerAudit}, registered in
 * {@code META-INF/services}): the honest-residual invariant of {@link HonestResidual} on each
 * operating point any test produces. {@link #audited()} counts them, so a test can prove the audit
 * ran.
 */
public final class HonestResidualAudit implements AnswerAudit {

    private static final java.util.concurrent.atomic.AtomicLong AUDITED = new java.util.concurrent.atomic.AtomicLong();

    @Override
    public void check(Stage stage, OperatingPoint answer) {
        HonestResidual.assertHonest(stage, answer, "audit of " + stage.name());
        AUDITED.incrementAndGet();
    }

    /** @return the answers audited so far in this JVM */
    public static long audited() {
        return AUDITED.get();
    }
}
