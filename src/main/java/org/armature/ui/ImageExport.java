package org.armature.ui;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.SnapshotParameters;
import javafx.scene.canvas.Canvas;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;
import org.armature.model.Stage;
import org.armature.render.Affine;
import org.armature.render.Annotations;
import org.armature.render.Box;
import org.armature.render.Palette;
import org.armature.render.RenderOptions;
import org.armature.render.SchematicRenderer;
import org.armature.render.SvgExport;

/** SVG and PNG images of a stage, drawn by the same renderer as the canvas. Call on the FX thread for PNG. */
public final class ImageExport {

    /** Pixels per grid unit of a PNG at scale 1 (the screen's size at zoom 1). */
    public static final double PNG_PIXELS_PER_GRID = SchematicCanvas.BASE_PIXELS_PER_GRID;

    private ImageExport() {
    }

    /** Renders a stage into an image; {@code hiDpi} multiplies the resolution (2 for print). */
    public static WritableImage render(Stage stage, Annotations a, Palette palette, double hiDpi) {
        double k = PNG_PIXELS_PER_GRID * hiDpi;
        Box e = SchematicRenderer.layout(stage, a).extent().inflate(SvgExport.MARGIN);
        Canvas c = new Canvas(Math.ceil(e.width() * k), Math.ceil(e.height() * k));
        var g = c.getGraphicsContext2D();
        g.setFill(FxPen.fx(palette.paper()));
        g.fillRect(0, 0, c.getWidth(), c.getHeight());
        SchematicRenderer.draw(stage, a, RenderOptions.export(palette),
                new FxPen(g, new Affine(k, 0, -e.minX() * k, 0, k, -e.minY() * k)));
        return c.snapshot(new SnapshotParameters(), null);
    }

    /** Writes a PNG file. */
    public static void writePng(Stage stage, Annotations a, Palette palette, double hiDpi, Path file) {
        BufferedImage img = SwingFXUtils.fromFXImage(render(stage, a, palette, hiDpi), null);
        try {
            ImageIO.write(img, "png", file.toFile());
        } catch (IOException ex) {
            throw new UncheckedIOException("cannot write " + file, ex);
        }
    }

    /** Writes an SVG file. */
    public static void writeSvg(Stage stage, Annotations a, Palette palette, Path file) {
        try {
            Files.writeString(file, SvgExport.toSvg(stage, a, RenderOptions.export(palette), PNG_PIXELS_PER_GRID),
                    StandardCharsets.UTF_8);
        } catch (IOException ex) {
            throw new UncheckedIOException("cannot write " + file, ex);
        }
    }
}
