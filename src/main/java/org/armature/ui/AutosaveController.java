package org.armature.ui;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Function;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.stage.Window;
import javafx.util.Duration;
import org.armature.io.Autosave;
import org.armature.io.StageFileException;
import org.armature.model.StageDocument;

/**
 * Keeps unsaved work safe: every {@value #INTERVAL_SECONDS} s and whenever the window loses focus,
 * a dirty document is written to the per-user recovery folder ({@link Autosave}), keyed by its
 * file's full path or, for untitled work, by an id of this window. At the next start after a
 * crash, {@link #offerRecovery(Window)} offers each autosave left behind with the time it was
 * written. Saving the document, or dropping it (opening another, a new stage, closing the window
 * after the unsaved-changes question), removes its autosave.
 *
 * <p>The logic (what to write, when to remove, how to recover) works without the toolkit and is
 * tested headless; only {@link #start(Window)} (timer, focus) and {@link #offerRecovery(Window)}
 * (the question) need JavaFX.
 */
public final class AutosaveController {

    /** Seconds between autosaves of unsaved work. */
    public static final int INTERVAL_SECONDS = 30;

    private static final DateTimeFormatter TIME =
            DateTimeFormatter.ofPattern("d MMM yyyy, HH:mm:ss", Locale.ROOT).withZone(ZoneId.systemDefault());

    private final EditorViewModel vm;
    private final Autosave store;
    private final String untitledId = Autosave.newUntitledId();
    private String key;
    private Timeline timer;

    /**
     * @param vm the editor whose document is kept safe
     * @param store the recovery folder
     */
    public AutosaveController(EditorViewModel vm, Autosave store) {
        this.vm = vm;
        this.store = store;
        this.key = currentKey();
        vm.fileProperty().addListener((o, before, after) -> {
            String old = key;
            key = currentKey();
            if (!old.equals(key)) {
                // saved under another name, or the work was dropped for another file: the old entry goes
                discardQuietly(old);
            }
        });
        vm.dirtyProperty().addListener((o, was, dirty) -> {
            if (!dirty) {
                discardQuietly(key); // saved, or replaced by a clean document
            }
        });
    }

    /** The key the present document autosaves under. */
    public String key() {
        return key;
    }

    /** Starts the 30-second timer and the autosave on focus loss (FX thread). */
    public void start(Window window) {
        timer = new Timeline(new KeyFrame(Duration.seconds(INTERVAL_SECONDS), e -> autosaveNow()));
        timer.setCycleCount(Timeline.INDEFINITE);
        timer.play();
        window.focusedProperty().addListener((o, was, focused) -> {
            if (!focused) {
                autosaveNow();
            }
        });
    }

    /**
     * Writes the autosave if the document has unsaved changes.
     *
     * @return true when an autosave was written
     */
    public boolean autosaveNow() {
        if (!vm.dirtyProperty().get()) {
            return false;
        }
        try {
            store.write(vm.document(), vm.fileProperty().get(), untitledId);
            return true;
        } catch (StageFileException e) {
            vm.say("Autosave failed: " + e.getMessage());
            return false;
        }
    }

    /** Autosaves left by earlier runs (a crash), newest first; this window's own is not among them. */
    public List<Autosave.Recovery> pending() {
        return store.pending().stream().filter(r -> !r.key().equals(key)).toList();
    }

    /**
     * Shows an autosave's work in the editor, unsaved, with its file.
     *
     * @return false (and a message) when it cannot be read
     */
    public boolean recover(Autosave.Recovery r) {
        StageDocument doc;
        try {
            doc = store.read(r);
        } catch (StageFileException e) {
            vm.say("The autosave could not be read: " + e.getMessage());
            return false;
        }
        vm.restore(doc, r.original(), "Recovered unsaved work autosaved " + TIME.format(r.autosavedAt().toInstant())
                + "; save it to keep it.");
        autosaveNow();
        if (!r.key().equals(key)) {
            discardQuietly(r.key()); // untitled work now lives under this window's id
        }
        return true;
    }

    /** Throws an autosave away. */
    public void discard(Autosave.Recovery r) {
        discardQuietly(r.key());
    }

    /** What the user chose for one autosave. */
    public enum Choice {
        /** Show it in the editor (the other autosaves wait for the next start). */
        RECOVER,
        /** Throw it away. */
        DISCARD,
        /** Keep it for the next start. */
        LATER
    }

    /**
     * Asks about each autosave left behind, newest first, with a dialog (FX thread).
     */
    public void offerRecovery(Window owner) {
        offerRecovery(r -> ask(owner, r));
    }

    /**
     * Asks about each autosave left behind, newest first: recover one (then the others wait for the
     * next start), discard, or keep for later.
     *
     * @param ask the question; the window shows a dialog, tests answer directly
     */
    public void offerRecovery(Function<Autosave.Recovery, Choice> ask) {
        for (Autosave.Recovery r : pending()) {
            Choice c = ask.apply(r);
            if (c == Choice.RECOVER && recover(r)) {
                return;
            }
            if (c == Choice.DISCARD) {
                discard(r);
            }
        }
    }

    private static Choice ask(Window owner, Autosave.Recovery r) {
        ButtonType recover = new ButtonType("Recover", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Discard", ButtonBar.ButtonData.NO);
        ButtonType later = new ButtonType("Later", ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, question(r), recover, discard, later);
        a.setTitle("Recover unsaved work");
        a.setHeaderText("Unsaved work was found");
        a.initOwner(owner);
        Optional<ButtonType> choice = a.showAndWait();
        if (choice.isPresent() && choice.get() == recover) {
            return Choice.RECOVER;
        }
        return choice.isPresent() && choice.get() == discard ? Choice.DISCARD : Choice.LATER;
    }

    /** The question for one autosave: what, when, and against which saved file. */
    static String question(Autosave.Recovery r) {
        String what = r.original().map(p -> p.getFileName() + " (" + p.getParent() + ")").orElse("untitled work");
        String saved = r.savedAt().map(t -> " The file was last saved " + TIME.format(t.toInstant()) + ".")
                .orElse(r.original().isPresent() ? " The file itself is missing." : "");
        return "Changes to " + what + " were autosaved " + TIME.format(r.autosavedAt().toInstant())
                + " and never saved." + saved + " Recover them?";
    }

    /** Stops the timer and removes this window's autosave (the window closed normally). */
    public void stop() {
        if (timer != null) {
            timer.stop();
        }
        discardQuietly(key);
    }

    private String currentKey() {
        return Autosave.keyFor(vm.fileProperty().get(), untitledId);
    }

    private void discardQuietly(String k) {
        try {
            store.discard(k);
        } catch (StageFileException e) {
            vm.say(e.getMessage());
        }
    }
}
