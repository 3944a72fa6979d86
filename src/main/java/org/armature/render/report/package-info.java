/**
 * The design report and what feeds every export: {@link org.armature.render.report.StageSnapshot}
 * (one evaluation of a stage per export, assembled from the engines' entry points),
 * {@link org.armature.render.report.PdfPen} (the renderer's pen over a PDFBox page, with the
 * embedded fonts of {@link org.armature.render.report.PdfFonts}) and
 * {@link org.armature.render.report.DesignReport} (the PDF: cautions, schematic, operating point,
 * verdicts, sizing, edges, and the document's line-up and fault hunt where it holds them; the hunt is
 * ranked at report time by {@link org.armature.render.report.FaultHuntSection}). No JavaFX; runs
 * headless.
 */
package org.armature.render.report;
