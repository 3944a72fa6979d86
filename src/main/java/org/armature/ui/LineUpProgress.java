package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import org.armature.analysis.LineUpMetrics;
import org.armature.analysis.LineUpMetrics.Column;
import org.armature.analysis.LineUpMetrics.Phase;
import org.armature.analysis.LineUpMetrics.PhaseResult;
import org.armature.model.LineUpContext;

/**
 * How far one evaluation of a line-up has come: its generation, the stages as judged, and per stage
 * the phases that have arrived ({@link LineUpMetrics.Phase}). Immutable; {@link LineUpEvaluations}
 * publishes a new one for every phase that arrives. Plain Java, without the toolkit.
 *
 * @param generation the evaluation's number; a later submit has a larger one
 * @param stages the stages as judged, in column order
 * @param done per stage (same order), the phases arrived so far, each at most once
 */
public record LineUpProgress(long generation, List<LineUpContext.Applied> stages, List<List<PhaseResult>> done) {

    public LineUpProgress {
        stages = List.copyOf(stages);
        done = done.stream().map(List::copyOf).toList();
        if (done.size() != stages.size()) {
            throw new IllegalArgumentException("one list of phases per stage is needed");
        }
    }

    /** Nothing arrived yet. */
    public static LineUpProgress pending(long generation, List<LineUpContext.Applied> stages) {
        return new LineUpProgress(generation, stages, stages.stream().map(s -> List.<PhaseResult>of()).toList());
    }

    /** This progress with one more phase of stage {@code index}; a phase already in is replaced. */
    public LineUpProgress with(int index, PhaseResult result) {
        List<List<PhaseResult>> next = new ArrayList<>(done);
        List<PhaseResult> own = new ArrayList<>(done.get(index));
        own.removeIf(r -> r.phase() == result.phase());
        own.add(result);
        next.set(index, own);
        return new LineUpProgress(generation, stages, next);
    }

    /** True when that phase of stage {@code index} has arrived. */
    public boolean has(int index, Phase phase) {
        return done.get(index).stream().anyMatch(r -> r.phase() == phase);
    }

    /** True when that phase has arrived for every stage. */
    public boolean hasAll(Phase phase) {
        for (int i = 0; i < stages.size(); i++) {
            if (!has(i, phase)) {
                return false;
            }
        }
        return true;
    }

    /** True when every phase of every stage has arrived. */
    public boolean complete() {
        for (Phase p : Phase.values()) {
            if (!hasAll(p)) {
                return false;
            }
        }
        return true;
    }

    /** The columns as far as they go ({@link LineUpMetrics#column}); metrics of missing phases are NaN. */
    public List<Column> columns() {
        List<Column> out = new ArrayList<>();
        for (int i = 0; i < stages.size(); i++) {
            out.add(LineUpMetrics.column(stages.get(i), done.get(i)));
        }
        return out;
    }
}
