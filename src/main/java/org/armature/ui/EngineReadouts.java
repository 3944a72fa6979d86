package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.analysis.TopologyCheck;
import org.armature.analysis.TopologyOptions;
import org.armature.model.Finding;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.Validator;
import org.armature.render.Notation;
import org.armature.render.ReadoutBuilder;
import org.armature.solver.DcAnalysis;
import org.armature.solver.NonConvergenceException;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SingularCircuitException;
import org.armature.solver.SolverException;

/**
 * The readouts over the DC engine: validates the stage, runs the topology check, solves the
 * operating point of each pin state and hands the one of the stage's own state to
 * {@link ReadoutBuilder}. The stage's roles are found once ({@link StageRecognition#of}, memoized
 * per drawing) and passed to both the topology check and the readouts. Solver failures become one plain sentence
 * in the status line and a finding (keys of {@link SolverException#messageKey()}); the readouts are
 * then empty rather than stale.
 *
 * <p>Holds one {@link DcAnalysis} (compile once, solve many), so an instance must be used from one
 * thread at a time: the view model's {@link LatestWins} guarantees that.
 */
public final class EngineReadouts implements ReadoutSource {

    private final DcAnalysis dc;

    /** Readouts with the engine's default options. */
    public EngineReadouts() {
        this(new DcAnalysis());
    }

    /** @param dc the engine to solve with; used from one thread at a time */
    public EngineReadouts(DcAnalysis dc) {
        this.dc = dc;
    }

    @Override
    public Readouts compute(Stage stage) {
        List<Finding> invalid = Validator.validate(stage).stream().filter(f -> f.severity() == Severity.ERROR).toList();
        if (!invalid.isEmpty()) {
            return new Readouts(ReadoutBuilder.markersOnly(stage, invalid),
                    "Not solved: " + invalid.get(0).message(), List.of());
        }
        // one recognition per drawing (its memo): a value edit finds no roles anew
        StageRecognition recognition = StageRecognition.of(stage);
        List<Finding> findings = new ArrayList<>(
                TopologyCheck.analyse(stage, recognition, TopologyOptions.DEFAULT).findings());
        try {
            OperatingPoint op = dc.solve(stage);
            boolean high = stage.conditions().pinHigh();
            Optional<OperatingPoint> other = otherPinState(stage);
            return new Readouts(ReadoutBuilder.build(stage, recognition, op, findings), status(op), findings,
                    high ? Optional.of(op) : other, high ? other : Optional.of(op));
        } catch (SolverException e) {
            Finding f = failure(e);
            findings.add(0, f);
            return new Readouts(ReadoutBuilder.markersOnly(stage, findings), f.message(), findings);
        }
    }

    /**
     * The operating point with the pin in the other state (the engine keeps one compiled netlist per
     * pin state, so this is a warm re-solve); empty when it has none. Its failure is not a finding of
     * the stage as drawn: the readouts show the state the user chose.
     */
    private Optional<OperatingPoint> otherPinState(Stage stage) {
        try {
            return Optional.of(dc.solve(stage.withConditions(stage.conditions().withPinHigh(!stage.conditions().pinHigh()))));
        } catch (SolverException e) {
            return Optional.empty();
        }
    }

    /** "Converged in 14 iterations, largest KCL residual 2.1 pA". */
    static String status(OperatingPoint op) {
        String s = "Converged in " + op.iterations() + " iteration" + (op.iterations() == 1 ? "" : "s")
                + ", largest KCL residual " + Notation.format(op.maxKclResidualAmps(), "A");
        return op.converged() ? s : s + "; the relay loop did not settle (contacts feeding their own coil?)";
    }

    /** One plain sentence for a solver failure, as a finding naming the first part concerned. */
    static Finding failure(SolverException e) {
        if (e instanceof SingularCircuitException s) {
            String ref = s.parts().isEmpty() ? "" : s.parts().get(0);
            String text = switch (s.singularCause()) {
                case FLOATING_NODE -> "No operating point: " + join(s.nodes(), "node", "nodes")
                        + " ha" + (s.nodes().size() == 1 ? "s" : "ve") + " no DC path to ground"
                        + (s.parts().isEmpty() ? "." : " (" + String.join(", ", s.parts()) + ").");
                case VOLTAGE_SOURCE_LOOP -> "No operating point: voltage sources form a loop"
                        + (s.parts().isEmpty() ? "." : " (" + String.join(", ", s.parts()) + ").");
                case SINGULAR_MATRIX -> "No operating point: the circuit equations are singular"
                        + (s.nodes().isEmpty() ? "." : " at " + String.join(", ", s.nodes()) + ".");
            };
            return new Finding(Severity.ERROR, e.messageKey(), ref, "", text);
        }
        NonConvergenceException n = (NonConvergenceException) e;
        return new Finding(Severity.ERROR, e.messageKey(), "", "", "No operating point found after "
                + n.iterations() + " Newton iterations; node " + n.worstNode() + " would not settle.");
    }

    private static String join(List<String> names, String one, String many) {
        return (names.size() == 1 ? one + " " : many + " ") + String.join(", ", names);
    }
}
