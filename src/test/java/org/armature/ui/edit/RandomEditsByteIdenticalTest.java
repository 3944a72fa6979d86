package org.armature.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.LongStream;
import java.util.stream.Stream;
import org.armature.io.StageJson;
import org.armature.model.GridPoint;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * 5,000 random edit commands (20 seeds × 250) with undo and redo, compared as saved bytes (issue
 * 15): undoing all returns the file text of the start byte for byte, redoing all the text of the
 * end. Half the seeds start from a document whose stage has duplicate designators, as a file
 * from a colleague may (the validator reports them; the editor must still undo exactly).
 */
class RandomEditsByteIdenticalTest {

    private static final int SEEDS = 20;
    private static final int EDITS_PER_SEED = 250;

    static Stream<Long> seeds() {
        return LongStream.range(0, SEEDS).mapToObj(i -> 1000 + 37 * i);
    }

    /** The default stage with a second R1 and a second Q1 (a colleague's copy-and-paste slip). */
    static Stage withDuplicates() {
        Stage s = Templates.defaultStage();
        List<Part> parts = new ArrayList<>(s.parts());
        parts.add(s.require("R1").withPlacement(Placement.at(40, 30)));
        parts.add(s.require("Q1").withPlacement(Placement.at(44, 30)).with(ParamKeys.HFE_MIN, 50));
        return new Stage(s.name(), s.description(), parts, s.wires(), s.testPoints(), s.conditions());
    }

    private static String bytes(Stage s) {
        return StageJson.write(StageDocument.of(s));
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    @DisplayName("250 random edits, undo all and redo all: byte-identical saved text at both ends")
    void undoRedoByteIdentical(long seed) {
        Random rnd = new Random(seed);
        Stage start = seed % 2 == 0 ? withDuplicates() : Templates.defaultStage();
        String startText = bytes(start);
        Editor e = new Editor(start);
        Editor.Clip clip = null;
        for (int i = 0; i < EDITS_PER_SEED; i++) {
            List<String> refs = e.stage().parts().stream().map(Part::ref).toList();
            String ref = refs.isEmpty() ? "R1" : refs.get(rnd.nextInt(refs.size()));
            e.select(Selection.ofPart(ref));
            switch (rnd.nextInt(11)) {
                case 0 -> e.moveSelection(rnd.nextInt(5) - 2, rnd.nextInt(5) - 2);
                case 1 -> e.rotateSelection();
                case 2 -> e.mirrorSelection();
                case 3 -> e.deleteSelection();
                case 4 -> e.place(PartKind.values()[rnd.nextInt(PartKind.values().length)],
                        new GridPoint(rnd.nextInt(30), rnd.nextInt(20)));
                case 5 -> e.drawWire(new GridPoint(rnd.nextInt(30), rnd.nextInt(20)),
                        new GridPoint(rnd.nextInt(30), rnd.nextInt(20)));
                case 6 -> e.stage().part(ref).ifPresent(p -> p.kind().params().stream().findFirst()
                        .ifPresent(spec -> e.setValue(ref, spec.key(), spec.defaultValue() * (0.5 + rnd.nextDouble()))));
                case 7 -> e.setAmbient(-20 + rnd.nextInt(80));
                case 8 -> clip = e.copy();
                case 9 -> {
                    if (clip != null) {
                        e.paste(clip);
                    }
                }
                default -> e.setPinHigh(rnd.nextBoolean());
            }
        }
        String endText = bytes(e.stage());
        while (e.undo()) {
            // back to the start
        }
        assertEquals(startText, bytes(e.stage()), "undo all, seed " + seed);
        while (e.redo()) {
            // forward to the end
        }
        assertEquals(endText, bytes(e.stage()), "redo all, seed " + seed);
    }
}
