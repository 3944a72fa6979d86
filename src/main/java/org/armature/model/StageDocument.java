package org.armature.model;

import java.util.ArrayList;
import java.util.List;

/**
 * A stage file's content: one or more stages (several for a line-up).
 *
 * @param title document title
 * @param stages at least one stage
 */
public record StageDocument(String title, List<Stage> stages) {

    public StageDocument {
        title = title == null ? "" : title;
        stages = List.copyOf(stages);
        if (stages.isEmpty()) {
            throw new IllegalArgumentException("a stage document holds at least one stage");
        }
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
        return new StageDocument(title, list);
    }

    /** A copy with a stage appended. */
    public StageDocument plus(Stage stage) {
        List<Stage> list = new ArrayList<>(stages);
        list.add(stage);
        return new StageDocument(title, list);
    }
}
