package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.model.Finding;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.render.Annotations;
import org.armature.render.ReadoutBuilder;

/**
 * Everything the window shows about one version of one stage, as one immutable value: the stage,
 * its validation findings, the readouts (both pin states' operating points, annotations, solver
 * status and findings), the verdicts and the edges. Each of the last three is either ready or
 * pending. Views read only evaluations, so nothing on the screen shows half of one stage version and
 * half of another: a newer edit makes a new generation, and a result of an older one is dropped
 * rather than merged.
 *
 * <p>Plain Java (no toolkit): built by {@link Evaluations}, tested without a display.
 *
 * @param generation increases with every stage version submitted; equal generations hold the same stage
 * @param stage the stage version evaluated
 * @param validation the validator's findings of {@code stage}
 * @param readouts the solved readouts; empty while pending
 * @param verdicts the corner checks; empty while pending
 * @param edges the turn-on and turn-off runs; empty while pending
 */
public record Evaluation(long generation, Stage stage, List<Finding> validation,
                         Optional<ReadoutSource.Readouts> readouts, Optional<Analyses.Verdicts> verdicts,
                         Optional<Analyses.Edges> edges) {

    /** Status line while the readouts of a generation are being solved. */
    public static final String SOLVING = "Solving…";

    public Evaluation {
        if (stage == null || readouts == null || verdicts == null || edges == null) {
            throw new IllegalArgumentException("an evaluation needs a stage and its parts (empty for pending)");
        }
        validation = List.copyOf(validation);
    }

    /** A new generation of a stage: validated, everything else pending. */
    public static Evaluation pending(long generation, Stage stage, List<Finding> validation) {
        return new Evaluation(generation, stage, validation, Optional.empty(), Optional.empty(), Optional.empty());
    }

    /** The same generation with its readouts. */
    public Evaluation withReadouts(ReadoutSource.Readouts r) {
        return new Evaluation(generation, stage, validation, Optional.of(r), verdicts, edges);
    }

    /** The same generation with its verdicts. */
    public Evaluation withVerdicts(Analyses.Verdicts v) {
        return new Evaluation(generation, stage, validation, readouts, Optional.of(v), edges);
    }

    /** The same generation with its edges. */
    public Evaluation withEdges(Analyses.Edges e) {
        return new Evaluation(generation, stage, validation, readouts, verdicts, Optional.of(e));
    }

    /** True when the validator found an error: nothing is solved or judged. */
    public boolean hasErrors() {
        return validation.stream().anyMatch(f -> f.severity() == Severity.ERROR);
    }

    /** True when the readouts are in. */
    public boolean readoutsReady() {
        return readouts.isPresent();
    }

    /** What to draw: the solved readouts, or while pending only the validator's markers. */
    public Annotations annotations() {
        return readouts.map(ReadoutSource.Readouts::annotations)
                .orElseGet(() -> validation.isEmpty() ? Annotations.NONE : ReadoutBuilder.markersOnly(stage, validation));
    }

    /** The solver's status line ({@value #SOLVING} while pending). */
    public String status() {
        return readouts.map(ReadoutSource.Readouts::status).orElse(SOLVING);
    }

    /** Validation findings, then the readouts' findings not already among them. */
    public List<Finding> findings() {
        List<Finding> all = new ArrayList<>(validation);
        readouts.ifPresent(r -> r.findings().stream().filter(f -> !all.contains(f)).forEach(all::add));
        return List.copyOf(all);
    }

    /** The verdicts, or {@link Analyses.Verdicts#NONE} while pending. */
    public Analyses.Verdicts verdictsOrNone() {
        return verdicts.orElse(Analyses.Verdicts.NONE);
    }

    /** The edges, or {@link Analyses.Edges#NONE} while pending. */
    public Analyses.Edges edgesOrNone() {
        return edges.orElse(Analyses.Edges.NONE);
    }
}
