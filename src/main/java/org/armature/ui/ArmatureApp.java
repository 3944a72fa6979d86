package org.armature.ui;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.armature.model.Templates;

/**
 * The desktop application: opens the editor window on the default example stage, with no file.
 * Readouts are computed on one background thread and published on the FX thread.
 */
public final class ArmatureApp extends Application {

    private ExecutorService solver;

    /** Starts the JavaFX application (the jar's launcher calls this by reflection). */
    public static void main(String[] args) {
        launch(ArmatureApp.class, args);
    }

    @Override
    public void start(Stage primary) {
        solver = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "armature-solver");
            t.setDaemon(true);
            return t;
        });
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, ReadoutSource.NONE,
                solver, Platform::runLater);
        MainWindow w = new MainWindow(vm, new RecentFiles());
        primary.setScene(w.scene(1560, 960));
        Runnable title = () -> primary.setTitle("Armature — " + vm.fileName() + (vm.dirtyProperty().get() ? " ●" : ""));
        title.run();
        vm.fileProperty().addListener((o, a, b) -> title.run());
        vm.dirtyProperty().addListener((o, a, b) -> title.run());
        primary.show();
        Platform.runLater(w.canvas()::fit);
    }

    @Override
    public void stop() {
        if (solver != null) {
            solver.shutdownNow();
        }
    }
}
