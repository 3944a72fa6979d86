package org.armature.ui;

import java.time.LocalDate;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.image.WritableImage;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import org.armature.model.Stage;
import org.armature.render.Annotations;
import org.armature.render.ExportTheme;
import org.armature.render.Palette;
import org.armature.render.PngExport;
import org.armature.render.Sheet;
import org.armature.render.report.StageSnapshot;

/**
 * The window's side of the image exports: the Java2D rendering of {@link PngExport} (the same sheet
 * and pen as the files) turned into JavaFX images, and the drawing copied to the clipboard. Nothing
 * here draws on its own; the renderer is the canvas's.
 */
public final class ImageExport {

    /** Scale of the image put on the clipboard: 2×, sharp on high-density screens and in documents. */
    public static final double CLIPBOARD_SCALE = 2;

    private ImageExport() {
    }

    /**
     * The bare drawing of a stage (no title block) as a JavaFX image; any thread.
     *
     * @param scale image pixels per sheet unit (1 is the canvas at zoom 1)
     */
    public static WritableImage render(Stage stage, Annotations a, Palette palette, double scale) {
        return SwingFXUtils.toFXImage(PngExport.image(Sheet.bare(stage, a, palette), scale, false), null);
    }

    /** The sheet (drawing and title block) of a snapshot as a JavaFX image; any thread. */
    public static WritableImage render(StageSnapshot snapshot, ExportTheme theme, double scale) {
        return SwingFXUtils.toFXImage(PngExport.image(snapshot.sheet(theme.palette()), scale, false), null);
    }

    /**
     * Copies the annotated drawing of a stage, with its title block, to the system clipboard as an
     * image. Call on the FX thread (the clipboard's rule); the one DC solve takes milliseconds.
     *
     * @param documentTitle the stage file's title for the title block
     * @param stage the stage as shown
     * @return one sentence for the status line
     */
    public static String copyToClipboard(String documentTitle, Stage stage) {
        StageSnapshot snap = StageSnapshot.evaluate(documentTitle, stage, stage.conditions().pinHigh(),
                StageSnapshot.Depth.DRAWING, LocalDate.now());
        WritableImage img = render(snap, ExportTheme.LIGHT, CLIPBOARD_SCALE);
        ClipboardContent content = new ClipboardContent();
        content.putImage(img);
        Clipboard.getSystemClipboard().setContent(content);
        return "Copied the drawing of " + stage.name() + " (" + (int) img.getWidth() + " × " + (int) img.getHeight()
                + " pixels).";
    }
}
