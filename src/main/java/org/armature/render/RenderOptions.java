package org.armature.render;

import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.armature.model.GridPoint;
import org.armature.model.Wire;

/**
 * How to draw: colours, which layers, what is selected and any editing previews.
 *
 * @param palette colours
 * @param layers layers to draw (a subset of {@link Layer}; order is always the enum's)
 * @param gridArea area to cover with grid lines, in grid units; empty: the drawing's extent plus a margin
 * @param selection what to highlight
 * @param previewWires wire segments being drawn, shown in the selection colour
 * @param rubberBand selection rectangle being dragged, in grid units
 * @param hoverPin a pin or wire end under the pointer, marked with a ring
 */
public record RenderOptions(Palette palette, Set<Layer> layers, Optional<Box> gridArea, Selection selection,
                            List<Wire> previewWires, Optional<Box> rubberBand, Optional<GridPoint> hoverPin) {

    /** Major grid lines every this many units. */
    public static final int GRID_MAJOR_EVERY = 5;

    public RenderOptions {
        if (palette == null || layers == null || gridArea == null || selection == null || rubberBand == null
                || hoverPin == null) {
            throw new IllegalArgumentException("render options must not hold nulls");
        }
        layers = layers.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(layers));
        previewWires = List.copyOf(previewWires);
    }

    /** Light palette, every layer but the grid, nothing selected: the look of an export. */
    public static RenderOptions export(Palette palette) {
        return new RenderOptions(palette, EnumSet.complementOf(EnumSet.of(Layer.GRID, Layer.SELECTION)),
                Optional.empty(), Selection.EMPTY, List.of(), Optional.empty(), Optional.empty());
    }

    /** Every layer with the light palette. */
    public static RenderOptions all() {
        return new RenderOptions(Palette.LIGHT, EnumSet.allOf(Layer.class), Optional.empty(), Selection.EMPTY,
                List.of(), Optional.empty(), Optional.empty());
    }

    /** The same options drawing only these layers. */
    public RenderOptions withLayers(Set<Layer> only) {
        return new RenderOptions(palette, only, gridArea, selection, previewWires, rubberBand, hoverPin);
    }

    /** The same options with another palette. */
    public RenderOptions withPalette(Palette p) {
        return new RenderOptions(p, layers, gridArea, selection, previewWires, rubberBand, hoverPin);
    }

    /** The same options with a grid area. */
    public RenderOptions withGridArea(Box area) {
        return new RenderOptions(palette, layers, Optional.of(area), selection, previewWires, rubberBand, hoverPin);
    }

    /** The same options with a selection. */
    public RenderOptions withSelection(Selection s) {
        return new RenderOptions(palette, layers, gridArea, s, previewWires, rubberBand, hoverPin);
    }

    /** The same options with editing previews. */
    public RenderOptions withPreview(List<Wire> wires, Optional<Box> band, Optional<GridPoint> hover) {
        return new RenderOptions(palette, layers, gridArea, selection, wires, band, hover);
    }

    /** True when the layer is to be drawn. */
    public boolean draws(Layer layer) {
        return layers.contains(layer);
    }
}
