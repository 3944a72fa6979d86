/**
 * The JavaFX editor: {@link org.armature.ui.ArmatureApp}, the {@link org.armature.ui.MainWindow},
 * the layered {@link org.armature.ui.SchematicCanvas} drawn through {@link org.armature.ui.FxPen},
 * the part sheet and verdicts, and the {@link org.armature.ui.EditorViewModel} the views bind to.
 *
 * <p>Seams for what other packages bring: {@link org.armature.ui.ReadoutSource} (the DC solver's
 * operating point turned into readouts, run on an injected executor, never on the FX thread) and
 * {@link org.armature.ui.DocumentStore} (stage files). The pure editing model is in
 * {@code org.armature.ui.edit}.
 */
package org.armature.ui;
