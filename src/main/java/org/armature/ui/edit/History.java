package org.armature.ui.edit;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import org.armature.model.Stage;

/**
 * Undo and redo of {@link EditCommand}s, with a saved mark that gives the dirty flag. Plain Java:
 * nothing here knows a view.
 *
 * <p>Every step carries a serial number; the document is clean when the step on top of the undo
 * stack is the one that was on top when it was last saved (or both stacks' tops are empty). A
 * command merges into the step on top when their merge keys are equal, unless that step is the
 * saved one (so that a save always has a step to return to).
 */
public final class History {

    private record Step(long serial, EditCommand command) {
    }

    private final Deque<Step> undo = new ArrayDeque<>();
    private final Deque<Step> redo = new ArrayDeque<>();
    private long nextSerial = 1;
    private long savedSerial;

    /** Applies a command to a stage and records it; returns the new stage. */
    public Stage execute(Stage stage, EditCommand command) {
        Stage after = command.apply(stage);
        redo.clear();
        Step top = undo.peek();
        if (top != null && top.serial != savedSerial && command.mergeKey().isPresent()
                && command.mergeKey().equals(top.command.mergeKey())) {
            undo.pop();
            EditCommand merged = new EditCommand.Compound(EditCommand.mergedLabel(top.command, command),
                    List.of(top.command, command), command.mergeKey());
            undo.push(new Step(nextSerial++, merged));
        } else {
            undo.push(new Step(nextSerial++, command));
        }
        return after;
    }

    /** Undoes the last step; empty when there is none. */
    public Optional<Stage> undo(Stage stage) {
        Step s = undo.poll();
        if (s == null) {
            return Optional.empty();
        }
        redo.push(s);
        return Optional.of(s.command.inverse().apply(stage));
    }

    /** Redoes the last undone step; empty when there is none. */
    public Optional<Stage> redo(Stage stage) {
        Step s = redo.poll();
        if (s == null) {
            return Optional.empty();
        }
        undo.push(s);
        return Optional.of(s.command.apply(stage));
    }

    /** The command Undo would take back (not taken back here). */
    public Optional<EditCommand> nextUndo() {
        return Optional.ofNullable(undo.peek()).map(Step::command);
    }

    /** The command Redo would repeat (not repeated here). */
    public Optional<EditCommand> nextRedo() {
        return Optional.ofNullable(redo.peek()).map(Step::command);
    }

    /** True when there is a step to undo. */
    public boolean canUndo() {
        return !undo.isEmpty();
    }

    /** True when there is a step to redo. */
    public boolean canRedo() {
        return !redo.isEmpty();
    }

    /** The label of the step Undo would take back. */
    public Optional<String> undoLabel() {
        return Optional.ofNullable(undo.peek()).map(s -> s.command.label());
    }

    /** The label of the step Redo would repeat. */
    public Optional<String> redoLabel() {
        return Optional.ofNullable(redo.peek()).map(s -> s.command.label());
    }

    /** Records that the document as it stands now was saved. */
    public void markSaved() {
        Step top = undo.peek();
        savedSerial = top == null ? 0 : top.serial;
    }

    /**
     * Records that the document as it stands now is not saved anywhere (work recovered from an
     * autosave): it stays dirty until the next {@link #markSaved()}.
     */
    public void markUnsaved() {
        savedSerial = -1;
    }

    /** True when the document differs from the last saved state (or was never saved and has been edited). */
    public boolean isDirty() {
        Step top = undo.peek();
        return (top == null ? 0 : top.serial) != savedSerial;
    }

    /** Forgets every step; the present document counts as saved (a file just opened). */
    public void clear() {
        undo.clear();
        redo.clear();
        savedSerial = 0;
    }

    /** Number of steps that can be undone. */
    public int depth() {
        return undo.size();
    }
}
