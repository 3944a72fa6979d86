package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.armature.model.Connectivity;
import org.armature.model.GridPoint;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.xml.sax.InputSource;

class RendererTest {

    static Stream<Arguments> stages() {
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (Suppressor s : Suppressor.values()) {
                out.add(Arguments.of(t.id() + "/" + s.id(), Templates.build(t, s, HighSideDrive.LEVEL_SHIFT)));
            }
        }
        out.add(Arguments.of("high-side direct", Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE, HighSideDrive.DIRECT)));
        return out.stream();
    }

    /** A dense set of readouts: a voltage on every net, currents at two pins, a badge, a gauge, markers. */
    static Annotations dense(Stage st) {
        Connectivity c = Connectivity.of(st);
        List<Annotations.NodeVoltage> v = new ArrayList<>();
        double volts = 0.1;
        for (String n : c.nets()) {
            if (!n.equals(Connectivity.GROUND)) {
                v.add(new Annotations.NodeVoltage(n, volts += 1.3));
            }
        }
        String sw = st.parts().stream().filter(p -> p.kind().isSwitch()).findFirst().orElseThrow().ref();
        List<Annotations.FindingMarker> markers = new ArrayList<>();
        for (Part p : st.parts()) {
            if (p.kind() == PartKind.RESISTOR) {
                markers.add(new Annotations.FindingMarker(p.ref(), Annotations.State.WARN, "check"));
            }
        }
        return new Annotations(v,
                List.of(new Annotations.BranchCurrent(new PinRef("K1", "a1"), 0.0296),
                        new Annotations.BranchCurrent(new PinRef("R1", "b"), -0.00262)),
                List.of(new Annotations.PartBadge(sw, "saturated, ×6.1 margin", Annotations.State.OK)),
                List.of(new Annotations.RelayGauge("K1", 0.0296, 0.003, 0.0225)), markers);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stages")
    @DisplayName("no two label boxes intersect and no label covers a part body, with dense readouts")
    void labelsNeverCollide(String name, Stage st) {
        Layout layout = SchematicRenderer.layout(st, dense(st));
        List<PlacedLabel> labels = layout.labels();
        for (int i = 0; i < labels.size(); i++) {
            for (int j = i + 1; j < labels.size(); j++) {
                assertFalse(labels.get(i).box().intersects(labels.get(j).box()),
                        labels.get(i).kind() + " " + labels.get(i).owner() + " overlaps " + labels.get(j).kind() + " "
                                + labels.get(j).owner());
            }
            for (Part p : st.parts()) {
                for (Box b : PartGeometry.bodies(p)) {
                    assertFalse(b.intersects(labels.get(i).box()),
                            labels.get(i).kind() + " " + labels.get(i).owner() + " covers " + p.ref());
                }
            }
        }
        long partLabels = st.parts().stream().filter(p -> p.kind() != PartKind.GROUND).count();
        assertEquals(partLabels, layout.labels(PlacedLabel.Kind.PART).size());
        assertTrue(layout.labels(PlacedLabel.Kind.VOLTAGE).size() > 3);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stages")
    @DisplayName("the SVG export is well-formed XML and names every designator but the ground symbols'")
    void svgNamesEveryDesignator(String name, Stage st) throws Exception {
        String svg = SvgExport.toSvg(st, dense(st), RenderOptions.export(Palette.LIGHT), 20);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
        for (Part p : st.parts()) {
            if (p.kind() != PartKind.GROUND) {
                assertTrue(svg.contains(">" + p.ref() + "</text>"), p.ref());
            }
        }
    }

    @Test
    @DisplayName("the default stage draws its designators and values once each, e.g. R1 with 1 kΩ")
    void designatorsAndValues() {
        RecordingPen pen = new RecordingPen();
        SchematicRenderer.draw(Templates.defaultStage(), Annotations.NONE, RenderOptions.all(), pen);
        List<String> texts = pen.texts();
        for (String t : List.of("K1", "Q1", "R1", "R2", "D1", "U1", "V1", "V2", "E1", "1 kΩ", "10 kΩ", "+12 V", "400 Ω")) {
            assertEquals(1, texts.stream().filter(t::equals).count(), t);
        }
        assertTrue(texts.contains("HIGH"), "the drive pin shows its level");
        assertEquals(Affine.IDENTITY, pen.transform(), "the pen's transform is left as found");
    }

    @Test
    @DisplayName("layers are independent: the grid layer alone draws no text; wires alone draw no text; labels alone draw the designators, annotations the test point tags")
    void layerSubsets() {
        Stage st = Templates.defaultStage();
        RecordingPen grid = new RecordingPen();
        SchematicRenderer.draw(st, Annotations.NONE, RenderOptions.all().withLayers(EnumSet.of(Layer.GRID)), grid);
        assertTrue(grid.texts().isEmpty());
        assertFalse(grid.ops().isEmpty());
        RecordingPen wires = new RecordingPen();
        SchematicRenderer.draw(st, Annotations.NONE, RenderOptions.all().withLayers(EnumSet.of(Layer.WIRES)), wires);
        assertTrue(wires.texts().isEmpty());
        RecordingPen labels = new RecordingPen();
        SchematicRenderer.draw(st, Annotations.NONE, RenderOptions.all().withLayers(EnumSet.of(Layer.LABELS)), labels);
        assertTrue(labels.texts().containsAll(List.of("K1", "Q1")));
        assertFalse(labels.texts().contains("control"), "test point tags go with the readouts");
        RecordingPen tags = new RecordingPen();
        SchematicRenderer.draw(st, Annotations.NONE, RenderOptions.all().withLayers(EnumSet.of(Layer.ANNOTATIONS)), tags);
        assertTrue(tags.texts().contains("control"));
    }

    @Test
    @DisplayName("junction dots where three ends meet on the default stage: coil ends with the diode, base node")
    void junctions() {
        Set<GridPoint> j = SchematicRenderer.junctions(Templates.defaultStage());
        // template layout: D1 wires meet the coil at (20,4) and (20,8); R2 tees into the base line at (15,12)
        assertTrue(j.containsAll(Set.of(new GridPoint(20, 4), new GridPoint(20, 8), new GridPoint(15, 12))), j.toString());
        assertFalse(j.contains(new GridPoint(20, 0)), "the supply pin meets one wire only");
    }

    @Test
    @DisplayName("a current into a pin is drawn as an arrow on its wire pointing at the pin")
    void currentArrowPointsIntoPin() {
        Stage st = Templates.defaultStage();
        Annotations a = new Annotations(List.of(), List.of(new Annotations.BranchCurrent(new PinRef("K1", "a1"), 0.03)),
                List.of(), List.of(), List.of());
        RecordingPen pen = new RecordingPen();
        SchematicRenderer.draw(st, a, RenderOptions.all().withLayers(EnumSet.of(Layer.ANNOTATIONS)), pen);
        RecordingPen.FillOp arrow = (RecordingPen.FillOp) pen.ops().stream().filter(o -> o instanceof RecordingPen.FillOp)
                .findFirst().orElseThrow();
        // K1.a1 is at (20,4) and its wire runs up to (20,0): the tip is the lowest point, on x = 20
        assertEquals(20, arrow.xs()[0], 1e-9);
        assertTrue(arrow.ys()[0] > arrow.ys()[1] && arrow.ys()[0] < 4);
        assertTrue(pen.texts().contains("30 mA"));
    }
}
