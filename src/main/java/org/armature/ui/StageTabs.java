package org.armature.ui;

import java.util.List;
import java.util.Optional;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuButton;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TextInputDialog;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import org.armature.model.HighSideDrive;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.kordamp.ikonli.javafx.FontIcon;

/**
 * One tab per stage of the document, in file order, above the drawing. Choosing a tab edits that
 * stage (with its own selection and undo history); each tab's menu duplicates, renames, moves or
 * deletes its stage, and the button at the end adds a stage from a template.
 */
public final class StageTabs extends HBox {

    private final EditorViewModel vm;
    private final TabPane tabs = new TabPane();
    private final MenuButton add = new MenuButton();
    private boolean syncing;

    /** Tabs following the view model's stages. */
    public StageTabs(EditorViewModel vm) {
        this.vm = vm;
        getStyleClass().add("stage-tabs");
        tabs.setId("stage-tabs");
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        tabs.setMaxHeight(Region.USE_PREF_SIZE);
        tabs.setMinHeight(Region.USE_PREF_SIZE);
        HBox.setHgrow(tabs, Priority.ALWAYS);
        add.setId("stage-add");
        add.setGraphic(new FontIcon("mdi2p-plus"));
        add.setTooltip(new Tooltip("Add a stage to the document"));
        add.getItems().addAll(templateItems(), new SeparatorMenuItem(), item("Duplicate this stage", "stage-duplicate",
                vm::duplicateStage));
        getChildren().addAll(tabs, add);
        tabs.getSelectionModel().selectedIndexProperty().addListener((o, a, b) -> {
            if (!syncing && b.intValue() >= 0) {
                vm.selectStage(b.intValue());
            }
        });
        vm.stageNamesProperty().addListener((o, a, b) -> sync());
        vm.activeStageProperty().addListener((o, a, b) -> sync());
        sync();
    }

    /** The tab pane (tests). */
    public TabPane tabs() {
        return tabs;
    }

    private void sync() {
        syncing = true;
        try {
            List<String> names = vm.stageNamesProperty().get();
            while (tabs.getTabs().size() > names.size()) {
                tabs.getTabs().remove(tabs.getTabs().size() - 1);
            }
            while (tabs.getTabs().size() < names.size()) {
                Tab t = new Tab();
                t.setContextMenu(tabMenu());
                tabs.getTabs().add(t);
            }
            for (int i = 0; i < names.size(); i++) {
                Tab t = tabs.getTabs().get(i);
                t.setText(names.get(i).isEmpty() ? "Stage " + (i + 1) : names.get(i));
                t.setId("stage-tab-" + i);
            }
            int active = vm.activeStageProperty().get();
            if (tabs.getSelectionModel().getSelectedIndex() != active) {
                tabs.getSelectionModel().select(active);
            }
        } finally {
            syncing = false;
        }
    }

    /** The menu of a tab; it acts on the active stage, which a right click on a tab does not change. */
    private ContextMenu tabMenu() {
        return new ContextMenu(
                item("Rename…", "stage-rename", this::askRename),
                item("Duplicate", "stage-duplicate-tab", vm::duplicateStage),
                item("Move left", "stage-move-left", () -> vm.moveStage(-1)),
                item("Move right", "stage-move-right", () -> vm.moveStage(1)),
                new SeparatorMenuItem(),
                item("Delete stage", "stage-delete", vm::deleteStage),
                item("Restore deleted stage", "stage-restore", vm::restoreDeletedStage));
    }

    private void askRename() {
        TextInputDialog d = new TextInputDialog(vm.stage().name());
        d.setTitle("Rename stage");
        d.setHeaderText(null);
        d.setContentText("Name of the stage:");
        if (getScene() != null) {
            d.initOwner(getScene().getWindow());
        }
        Optional<String> name = d.showAndWait();
        name.ifPresent(vm::renameStage);
    }

    private Menu templateItems() {
        Menu m = new Menu("New stage from template");
        for (StageTemplate t : StageTemplate.values()) {
            m.getItems().add(item(t.title(), "stage-add-" + t.id(),
                    () -> vm.addStage(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT)));
        }
        return m;
    }

    private static MenuItem item(String text, String id, Runnable action) {
        MenuItem m = new MenuItem(text);
        m.setId(id);
        m.setOnAction(e -> action.run());
        return m;
    }

    /** The stage actions for the window's Stage menu. */
    public List<MenuItem> menuItems() {
        return List.of(templateItems(), item("Duplicate stage", "menu-stage-duplicate", vm::duplicateStage),
                item("Rename stage…", "menu-stage-rename", this::askRename),
                item("Move stage left", "menu-stage-move-left", () -> vm.moveStage(-1)),
                item("Move stage right", "menu-stage-move-right", () -> vm.moveStage(1)),
                new SeparatorMenuItem(), item("Delete stage", "menu-stage-delete", vm::deleteStage),
                item("Restore deleted stage", "menu-stage-restore", vm::restoreDeletedStage));
    }
}
