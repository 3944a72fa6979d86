package org.armature.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.armature.model.GridPoint;
import org.armature.model.HighSideDrive;
import org.armature.model.OptionSpec;
import org.armature.model.ParamKeys;
import org.armature.model.ParamSpec;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.PartKind;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The Undo and Redo menus name each kind of change in the user's words (issue 11: "R1 resistance
 * 1 kΩ → 1.5 kΩ", never "Change R1 resistanceOhms"). The list below is every edit the window offers,
 * each with the words the menu shows; Redo shows the same words after an Undo.
 *
 * <p>Failed before the fix for three of them: an option set for the first time read "V1 waveform
 * default → ac-rms" (now the default's own value), and the stage settings read "Release time at
 * most 10 ms" and "Monte Carlo samples 500", without the figure they replaced.
 */
class UndoLabelsTest {

    /** Every parameter and option key the model knows: none may reach a menu. */
    private static final List<String> KEYS = keys();

    static Stream<Arguments> edits() {
        return Stream.of(
                edit("a typed value", e -> e.setValue("R1", ParamKeys.RESISTANCE_OHMS, 1500), "R1 resistance 1 kΩ → 1.5 kΩ"),
                edit("a slider drag, merged", e -> {
                    e.setValueMerging("V1", ParamKeys.VOLTS, 12.5, "supply:V1");
                    e.setValueMerging("V1", ParamKeys.VOLTS, 13, "supply:V1");
                }, "V1 voltage 12 V → 13 V"),
                edit("arrow keys through preferred values, merged", e -> {
                    e.stepPreferred("R2", ParamKeys.RESISTANCE_OHMS, 1);
                    e.stepPreferred("R2", ParamKeys.RESISTANCE_OHMS, 1);
                }, "R2 resistance 10 kΩ → 12 kΩ"),
                edit("an option", e -> e.setOption("E1", ParamKeys.LOAD_KIND, "motor"), "E1 kind lamp → motor"),
                edit("an option set for the first time", e -> e.setOption("V1", ParamKeys.WAVEFORM, "ac-rms"),
                        "V1 waveform dc → ac-rms"),
                edit("a move", e -> {
                    e.select(Selection.ofPart("R1"));
                    e.moveSelection(1, 0);
                }, "Move R1"),
                edit("a move of two parts", e -> {
                    e.select(new Selection(Set.of("R1", "R2"), Set.of()));
                    e.moveSelection(0, 1);
                }, "Move 2 parts"),
                edit("a rotation", e -> {
                    e.select(Selection.ofPart("R2"));
                    e.rotateSelection();
                }, "Rotate R2"),
                edit("a mirror", e -> {
                    e.select(Selection.ofPart("Q1"));
                    e.mirrorSelection();
                }, "Mirror Q1"),
                edit("a part added from the palette", e -> e.place(PartKind.RESISTOR, new GridPoint(40, 40)), "Place R3"),
                edit("a part deleted", e -> {
                    e.select(Selection.ofPart("R2"));
                    e.deleteSelection();
                }, "Delete R2"),
                edit("a wire", e -> e.drawWire(new GridPoint(40, 40), new GridPoint(44, 40)), "Draw wire"),
                edit("a part renamed", e -> e.renamePart("R1", "R9"), "Rename R1 to R9"),
                edit("a test point added", e -> e.nameTestPoint("K1", "b", "coil-low"), "Add test point coil-low"),
                edit("a test point renamed", e -> e.nameTestPoint("Q1", "b", "base"), "Rename test point control to base"),
                edit("a test point removed", e -> e.removeTestPoint("switch"), "Remove test point switch"),
                edit("the pin state", e -> e.setPinHigh(false), "Drive pin high → low"),
                edit("the ambient", e -> e.setAmbient(40), "Ambient 25 °C → 40 °C"),
                edit("the ambient range", e -> e.setAmbientRange(0, 40), "Ambient range -10 °C to 50 °C → 0 °C to 40 °C"),
                edit("the stage name", e -> e.rename("Zone 2 valve"), "Rename stage to Zone 2 valve"),
                edit("the stage description", e -> e.describe("Second zone."), "Change stage description"),
                edit("a release-time requirement", e -> e.setSettings(
                        e.stage().settings().withReleaseTimeRequirement(OptionalDouble.of(0.01))),
                        "Release-time requirement none → 10 ms"),
                edit("Monte Carlo samples", e -> e.setSettings(e.stage().settings().withMonteCarlo(500, 1)),
                        "Monte Carlo samples 0 → 500"),
                edit("the Monte Carlo seed", e -> e.setSettings(e.stage().settings().withMonteCarlo(0, 7)),
                        "Monte Carlo seed 1 → 7"),
                edit("the sizing assistant's values", e -> e.setValues("Size base network",
                        List.of(new Editor.ValueChange("R1", ParamKeys.RESISTANCE_OHMS, 2200),
                                new Editor.ValueChange("R2", ParamKeys.RESISTANCE_OHMS, 22000))), "Size base network"));
    }

    private static Arguments edit(String what, Consumer<Editor> action, String words) {
        return Arguments.of(what, action, words);
    }

    @ParameterizedTest(name = "{0}: \"{2}\"")
    @MethodSource("edits")
    @DisplayName("each edit names itself in the user's words, in Undo and again in Redo")
    void labels(String what, Consumer<Editor> action, String words) {
        Editor e = new Editor(Templates.defaultStage());
        action.accept(e);
        assertEquals(words, e.history().undoLabel().orElseThrow(), what);
        assertTrue(e.undo());
        assertEquals(words, e.history().redoLabel().orElseThrow(), what);
        noKey(words);
    }

    @Test
    @DisplayName("every parameter and option of every part of every template names itself by its label, not its key")
    void everyParameterAndOption() {
        int seen = 0;
        for (StageTemplate t : StageTemplate.values()) {
            Stage s = Templates.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
            for (Part p : s.parts()) {
                for (ParamSpec spec : p.kind().params()) {
                    Editor e = new Editor(s);
                    double now = p.value(spec.key());
                    double next = spec.accepts(now * 1.5) ? now * 1.5 : spec.accepts(now + 1) ? now + 1 : now * 0.5;
                    if (!spec.accepts(next) || next == now) {
                        continue;
                    }
                    e.setValue(p.ref(), spec.key(), next);
                    String label = e.history().undoLabel().orElseThrow();
                    assertTrue(label.startsWith(p.ref() + " " + spec.label().toLowerCase(Locale.ROOT) + " "), label);
                    assertTrue(label.contains(" → "), label);
                    noKey(label);
                    seen++;
                }
                for (OptionSpec o : p.kind().options()) {
                    Editor e = new Editor(s);
                    String other = o.allowed().get(o.allowed().size() - 1);
                    e.setOption(p.ref(), o.key(), other.equals(p.options().get(o.key())) ? o.allowed().get(0) : other);
                    e.history().undoLabel().ifPresent(UndoLabelsTest::noKey);
                    seen++;
                }
            }
        }
        assertTrue(seen > 50, "parameters tried: " + seen);
    }

    private static void noKey(String label) {
        for (String k : KEYS) {
            // a key that is also an English word ("volts") may appear as a word; a camel-case key may not
            boolean camel = !k.equals(k.toLowerCase(Locale.ROOT));
            assertFalse(camel && label.contains(k), "\"" + label + "\" shows the internal key " + k);
        }
        assertFalse(label.contains("default"), "\"" + label + "\" says default instead of the value");
    }

    private static List<String> keys() {
        List<String> out = new ArrayList<>();
        for (Field f : ParamKeys.class.getFields()) {
            if (Modifier.isStatic(f.getModifiers()) && f.getType() == String.class) {
                try {
                    out.add((String) f.get(null));
                } catch (IllegalAccessException e) {
                    throw new IllegalStateException(e);
                }
            }
        }
        return out;
    }
}
