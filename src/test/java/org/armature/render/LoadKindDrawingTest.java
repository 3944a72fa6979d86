package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The contact side is drawn with its load kind (issue 16, item 6). */
class LoadKindDrawingTest {

    private static RecordingPen draw(String kind) {
        Stage st = Templates.defaultStage().updatePart("E1", e -> e.withOption("loadKind", kind));
        RecordingPen pen = new RecordingPen();
        SchematicRenderer.draw(st, Annotations.NONE, RenderOptions.all(), pen);
        return pen;
    }

    private static boolean hasText(RecordingPen pen, String text) {
        return pen.ops().stream().anyMatch(op -> op instanceof RecordingPen.TextOp t && t.text().equals(text));
    }

    @ParameterizedTest
    @ValueSource(strings = {"resistive", "lamp", "motor", "solenoid", "capacitive", "led"})
    @DisplayName("each load kind gets its own symbol and its kind in the value label")
    void eachKindDrawn(String kind) {
        RecordingPen pen = draw(kind);
        assertTrue(pen.ops().stream().anyMatch(op -> op instanceof RecordingPen.TextOp t && t.text().endsWith(" " + kind)),
                "label names the kind");
        assertTrue(hasText(pen, "M") == kind.equals("motor"), "only a motor carries the letter M");
        List<RecordingPen.Op> base = draw("resistive").ops();
        if (!kind.equals("resistive")) {
            assertFalse(pen.ops().size() == base.size() && pen.ops().toString().equals(base.toString()),
                    kind + " draws differently from a resistor");
        }
    }
}
