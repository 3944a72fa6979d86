package org.armature.model;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Two to four stages of a document put side by side, with what they share.
 *
 * @param stageIndices the stages, by index into {@link StageDocument#stages()} from 0, in column
 *     order; 2 to 4, no repeats
 * @param context what the stages share
 */
public record LineUp(List<Integer> stageIndices, LineUpContext context) {

    /** Fewest stages in a line-up. */
    public static final int MIN_STAGES = 2;
    /** Most stages in a line-up (four columns stay readable at 1280 px). */
    public static final int MAX_STAGES = 4;

    public LineUp {
        stageIndices = List.copyOf(stageIndices);
        if (context == null) {
            throw new IllegalArgumentException("context must not be null");
        }
        if (stageIndices.size() < MIN_STAGES || stageIndices.size() > MAX_STAGES) {
            throw new IllegalArgumentException("a line-up holds " + MIN_STAGES + " to " + MAX_STAGES
                    + " stages, not " + stageIndices.size());
        }
        Set<Integer> seen = new HashSet<>();
        for (int i : stageIndices) {
            if (i < 0 || !seen.add(i)) {
                throw new IllegalArgumentException("stageIndices must be distinct and not negative: " + stageIndices);
            }
        }
    }

    /** The same stages sharing another context (changing a shared value changes it for every stage). */
    public LineUp withContext(LineUpContext newContext) {
        return new LineUp(stageIndices, newContext);
    }

    /** Each stage of the line-up as it is judged: with the shared settings applied, in column order. */
    public List<LineUpContext.Applied> applied(StageDocument doc) {
        return stageIndices.stream().map(i -> context.applyTo(doc.stages().get(i))).toList();
    }
}
