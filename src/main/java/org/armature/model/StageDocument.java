package org.armature.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A stage file's content: one or more stages, optionally a line-up of some of them, and optionally
 * the fault hunt made on one of them.
 *
 * @param title document title
 * @param stages at least one stage
 * @param lineUp two to four of the stages side by side with what they share; every index names a stage
 * @param faultHunt the fault hunt made on one stage (symptom, meter, readings, changed priors); its
 *     index names a stage
 */
public record StageDocument(String title, List<Stage> stages, Optional<LineUp> lineUp, Optional<FaultHunt> faultHunt) {

    public StageDocument {
        title = title == null ? "" : title;
        stages = List.copyOf(stages);
        if (stages.isEmpty()) {
            throw new IllegalArgumentException("a stage document holds at least one stage");
        }
        lineUp = lineUp == null ? Optional.empty() : lineUp;
        if (lineUp.isPresent()) {
            for (int i : lineUp.get().stageIndices()) {
                if (i >= stages.size()) {
                    throw new IllegalArgumentException("the line-up names stage " + i + " of " + stages.size());
                }
            }
        }
        faultHunt = faultHunt == null ? Optional.empty() : faultHunt;
        if (faultHunt.isPresent() && faultHunt.get().stageIndex() >= stages.size()) {
            throw new IllegalArgumentException("the fault hunt names stage " + faultHunt.get().stageIndex()
                    + " of " + stages.size());
        }
    }

    /** A document without a fault hunt. */
    public StageDocument(String title, List<Stage> stages, Optional<LineUp> lineUp) {
        this(title, stages, lineUp, Optional.empty());
    }

    /** A document without a line-up or fault hunt. */
    public StageDocument(String title, List<Stage> stages) {
        this(title, stages, Optional.empty(), Optional.empty());
    }

    /** A copy with this line-up (or none). */
    public StageDocument withLineUp(Optional<LineUp> newLineUp) {
        return new StageDocument(title, stages, newLineUp, faultHunt);
    }

    /** A copy with this fault hunt (or none). */
    public StageDocument withFaultHunt(Optional<FaultHunt> newHunt) {
        return new StageDocument(title, stages, lineUp, newHunt);
    }

    /** A document of one stage, titled after it. */
    public static StageDocument of(Stage stage) {
        return new StageDocument(stage.name(), List.of(stage));
    }

    /** The first stage (the one the editor opens). */
    public Stage first() {
        return stages.get(0);
    }

    /** A copy with the stage at {@code index} replaced. */
    public StageDocument withStage(int index, Stage stage) {
        List<Stage> list = new ArrayList<>(stages);
        list.set(index, stage);
        return new StageDocument(title, list, lineUp, faultHunt);
    }

    /** A copy with a stage appended. */
    public StageDocument plus(Stage stage) {
        List<Stage> list = new ArrayList<>(stages);
        list.add(stage);
        return new StageDocument(title, list, lineUp, faultHunt);
    }
}
