package org.armature.render;

/**
 * The colours of a drawing. Every text colour reaches 4.5:1 (WCAG 2.x contrast) on the paper, on
 * the tag fill and on a badge's tinted fill ({@code ThemeContrastTest}).
 *
 * <p>The colours of a drawing. {@link #LIGHT} is an engineering-paper look that prints well; {@link #DARK}
 * is for dim rooms. Voltages and currents have two distinct accents so readouts never read as ink.
 *
 * @param paper background
 * @param gridMinor grid lines every unit
 * @param gridMajor grid lines every {@link RenderOptions#GRID_MAJOR_EVERY} units
 * @param ink symbols and wires
 * @param labelInk designators
 * @param valueInk part values and test point names
 * @param voltage node voltage readouts
 * @param current branch current readouts
 * @param ok passing verdicts
 * @param warn marginal verdicts
 * @param fail failing verdicts
 * @param selection selection highlight and editing previews
 * @param tagFill fill behind readout tags
 */
public record Palette(Colour paper, Colour gridMinor, Colour gridMajor, Colour ink, Colour labelInk,
                      Colour valueInk, Colour voltage, Colour current, Colour ok, Colour warn, Colour fail,
                      Colour selection, Colour tagFill) {

    /** Warm off-white paper, faint blue-grey grid, near-black ink. */
    public static final Palette LIGHT = new Palette(
            Colour.hex("#f8f6ef"), Colour.hex("#e9e6dc"), Colour.hex("#dcd8ca"),
            Colour.hex("#1e2833"), Colour.hex("#1e2833"), Colour.hex("#4d5866"),
            Colour.hex("#0f6f8c"), Colour.hex("#9a4614"),
            Colour.hex("#256b31"), Colour.hex("#7a5600"), Colour.hex("#b3261e"),
            Colour.hex("#2f6fdc"), Colour.hex("#fffdf7"));

    /** Slate background with light ink. */
    public static final Palette DARK = new Palette(
            Colour.hex("#1a1e23"), Colour.hex("#242a30"), Colour.hex("#2d343c"),
            Colour.hex("#d9dee4"), Colour.hex("#e6eaee"), Colour.hex("#a3aeba"),
            Colour.hex("#5cc6df"), Colour.hex("#f2a462"),
            Colour.hex("#6cc47a"), Colour.hex("#e2b34f"), Colour.hex("#f4877b"),
            Colour.hex("#6ea2ff"), Colour.hex("#20262c"));

    /** The accent of a verdict state. */
    public Colour of(Annotations.State state) {
        return switch (state) {
            case OK -> ok;
            case WARN -> warn;
            case FAIL -> fail;
        };
    }
}
