package org.armature.render;

/**
 * The layers of a drawing, in the order {@link SchematicRenderer} draws them (later ones on top).
 * A layered canvas draws subsets of them onto stacked surfaces so that, for example, the grid is only
 * redrawn when the view changes.
 */
public enum Layer {
    /** Faint grid lines. */
    GRID,
    /** Wire segments and junction dots. */
    WIRES,
    /** Part symbols and open-pin marks. */
    PARTS,
    /** Designators and values. */
    LABELS,
    /** Test point tags and readouts: voltages, currents, badges, gauges, finding markers. */
    ANNOTATIONS,
    /** Selection highlight and editing previews (wire being drawn, rubber band). */
    SELECTION
}
