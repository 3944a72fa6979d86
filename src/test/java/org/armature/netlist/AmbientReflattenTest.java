package org.armature.netlist;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * {@link NetlistBuilder#flattensWithAmbient}: a part of a kind that does not flatten with the
 * ambient stamps and reads the same at −40 °C and at 85 °C, so an ambient change may keep it.
 */
class AmbientReflattenTest {

    /** Records every stamp call as text, in order. */
    private static final class Recorder implements Stamper {
        final List<String> calls = new ArrayList<>();

        @Override
        public void conductance(int a, int b, double siemens) {
            calls.add("g " + a + " " + b + " " + siemens);
        }

        @Override
        public void transconductance(int p, int n, int cp, int cn, double siemens) {
            calls.add("gm " + p + " " + n + " " + cp + " " + cn + " " + siemens);
        }

        @Override
        public void current(int node, double amps) {
            calls.add("i " + node + " " + amps);
        }

        @Override
        public void voltageBranch(int branch, int p, int n, double volts, double ohms) {
            calls.add("v " + branch + " " + p + " " + n + " " + volts + " " + ohms);
        }
    }

    private static List<String> stamps(PartNetwork p, Solution x) {
        Recorder r = new Recorder();
        for (Element e : p.elements()) {
            e.begin(x);
            e.stamp(r, x, StampContext.DC);
        }
        return r.calls;
    }

    @ParameterizedTest(name = "{0}: parts that do not flatten with the ambient are the same at both ends of the range")
    @EnumSource(StageTemplate.class)
    void independentOfAmbient(StageTemplate t) {
        Stage s = Templates.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        for (boolean pin : new boolean[] {true, false}) {
            Netlist cold = NetlistBuilder.flatten(s, FlattenOptions.of(pin, -40));
            Netlist hot = NetlistBuilder.flatten(s, FlattenOptions.of(pin, 85));
            Random r = new Random(17);
            double[] x = new double[cold.unknownCount()];
            for (int i = 0; i < x.length; i++) {
                x[i] = 12 * r.nextDouble();
            }
            Solution atCold = new ArraySolution(cold.nodeCount(), x, cold.initialStates());
            Solution atHot = new ArraySolution(hot.nodeCount(), x, hot.initialStates());
            int kept = 0;
            int moved = 0;
            for (int i = 0; i < cold.parts().size(); i++) {
                PartNetwork a = cold.parts().get(i);
                PartNetwork b = hot.parts().get(i);
                boolean same = stamps(a, atCold).equals(stamps(b, atHot)) && a.read(atCold).equals(b.read(atHot));
                if (!NetlistBuilder.flattensWithAmbient(a.part().kind())) {
                    assertTrue(same, a.ref() + " (" + a.part().kind() + ") must not change with the ambient");
                    kept++;
                } else if (!same) {
                    moved++;
                }
            }
            assertTrue(kept > 0, "every template has parts that ignore the ambient (supplies, resistors)");
            // the semiconductors do move with the ambient: IS and the thermal voltage follow the temperature (derived)
            assertTrue(moved > 0, "some part changes with the ambient");
            assertEquals(cold.parts().size(), hot.parts().size());
        }
    }
}
