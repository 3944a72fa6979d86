package org.armature.render;

import java.util.List;

/**
 * Where everything of one drawing went, in grid units: the renderer's return value, so that views
 * and tests can find labels without a toolkit.
 *
 * @param labels every placed label, in placement order (part labels first)
 * @param extent what the drawing covers: parts, wires and labels (the grid is not counted)
 */
public record Layout(List<PlacedLabel> labels, Box extent) {

    /** No labels over an empty extent: the "previous layout" of a first drawing. */
    public static final Layout NONE = new Layout(List.of(), new Box(0, 0, 0, 0));

    public Layout {
        labels = List.copyOf(labels);
    }

    /** The labels of one kind. */
    public List<PlacedLabel> labels(PlacedLabel.Kind kind) {
        return labels.stream().filter(l -> l.kind() == kind).toList();
    }
}
