package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Label;
import javafx.scene.text.Text;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The turn-off figures beside the edges plot at 1024×700 (issue 17): every figure name is shown in
 * full, wrapped if need be. Failed before: "peak suppressor curr…" was cut at a fixed 150 px.
 */
@ExtendWith(ApplicationExtension.class)
class EdgeFiguresTest {

    private MainWindow window;

    @Start
    void start(javafx.stage.Stage stage) {
        EditorViewModel vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, new EngineReadouts(),
                Runnable::run, Runnable::run,
                new Analyses(Analyses.NO_VERDICTS, Analyses.engineEdges(), Runnable::run, 0));
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(SmallWindowTest.WIDTH, SmallWindowTest.HEIGHT));
        stage.show();
    }

    private static void labels(Parent p, List<Label> out) {
        for (Node n : p.getChildrenUnmodifiable()) {
            if (n instanceof Label l) {
                out.add(l);
            } else if (n instanceof Parent q) {
                labels(q, out);
            }
        }
    }

    @Test
    @DisplayName("every turn-off figure name is shown whole at 1024×700, 'peak suppressor current' included")
    void figureNamesWhole(FxRobot robot) {
        robot.interact(() -> window.edgesDrawer().setExpanded(true));
        robot.sleep(500);
        robot.interact(() -> { });
        List<Label> all = new ArrayList<>();
        labels(window.edges(), all);
        List<String> cut = new ArrayList<>();
        boolean sawPeak = false;
        for (Label l : all) {
            if (l.getStyleClass().contains("param-label")) {
                sawPeak |= l.getText().equals("peak suppressor current");
                for (Node n : l.getChildrenUnmodifiable()) {
                    if (n instanceof Text t && t.getStyleClass().contains("text")
                            && !t.getText().replace("\n", " ").replaceAll("\\s+", " ").strip().equals(l.getText())) {
                        cut.add(l.getText() + " shown as " + t.getText());
                    }
                }
            }
        }
        assertTrue(sawPeak, "the turn-off figures are shown: " + all.stream().map(Label::getText).toList());
        assertTrue(cut.isEmpty(), String.join("; ", cut));
    }
}
