package org.armature.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A stage file's content: one or more stages, and optionally a line-up of some of them.
 *
 * @param title document title
 * @param stages at least one stage
 * @param lineUp two to four of the stages side by side with what they share; every index names a stage
 */
public record StageDocument(String title, List<Stage> stages, Optional<LineUp> lineUp) {

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
    }

    /** A document without a line-up. */
    public StageDocument(String title, List<Stage> stages) {
        this(title, stages, Optional.empty());
    }

    /** A copy with this line-up (or none). */
    public StageDocument withLineUp(Optional<LineUp> newLineUp) {
        return new StageDocument(title, stages, newLineUp);
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
        return new StageDocument(title, list, lineUp);
    }

    /** A copy with a stage appended. */
    public StageDocument plus(Stage stage) {
        List<Stage> list = new ArrayList<>(stages);
        list.add(stage);
        return new StageDocument(title, list, lineUp);
    }
}
