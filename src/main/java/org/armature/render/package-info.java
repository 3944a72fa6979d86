/**
 * One drawing of a stage and its readouts onto an abstract {@link org.armature.render.Pen}, used by
 * the live canvas, comparison panes and every export: the {@link org.armature.render.Sheet} (drawing
 * and title block) through the {@link org.armature.render.Graphics2DPen} for SVG (JFreeSVG) and PNG
 * (Java2D), and through the PDF pen of {@code render.report} for the design report; plus the pure
 * geometry the editor needs: part bounds ({@link org.armature.render.PartGeometry}), hit testing
 * ({@link org.armature.render.HitTester}), snapping ({@link org.armature.render.Snap}) and orthogonal
 * routing ({@link org.armature.render.Router}).
 *
 * <p>Everything works in grid units of the model; only a pen's base transform knows pixels. No
 * JavaFX here: the JavaFX pen lives in {@code org.armature.ui}. {@link org.armature.render.Annotations}
 * is plain data that a view model fills from a solve; the renderer never solves.
 */
package org.armature.render;
