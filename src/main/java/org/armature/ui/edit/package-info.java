/**
 * The editing model, without any toolkit: one {@link org.armature.ui.edit.EditCommand} record per
 * user edit with its exact inverse, compounds for cascades, merging of consecutive drags, a plain
 * {@link org.armature.ui.edit.History} with a saved mark for the dirty flag, and the
 * {@link org.armature.ui.edit.Editor} session whose action methods build those commands. Views never
 * record undo themselves; they call the editor through the view model.
 */
package org.armature.ui.edit;
