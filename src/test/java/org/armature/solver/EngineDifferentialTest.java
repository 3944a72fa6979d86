package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.armature.model.Connectivity;
import org.armature.model.HighSideDrive;
import org.armature.model.ParamSpec;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.Validator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Warm start is only an accelerator (issue 10): one long-lived engine, edited along seeded random
 * sequences, against a fresh engine solving each final state, on all four templates and every
 * suppressor. Edits: any parameter of any part (×e^(0.7·N(0,1)), clamped to its range, kept only
 * when the document check finds no error), pin toggles, ambient steps over −40 °C to 150 °C and
 * coil-supply steps over 3 V to 60 V.
 */
class EngineDifferentialTest {

    private static final ConvergenceTolerances TOL = ConvergenceTolerances.DEFAULT;
    private static final int EDITS_PER_SEQUENCE = 250;
    /** 4 templates × 6 suppressors, over 4 times: 104 sequences of 250 edits; some end in a finding (a coil too hot), the rest give over 20,000 pairs. */
    private static final int SEQUENCES = 104;

    @Test
    @DisplayName("long-lived engine = fresh engine after every edit of 104 random sequences (NM-6 tolerances, same relay states, honest KCL)")
    void longLivedEqualsFresh() {
        Random r = new Random(20261205L);
        int pairs = 0;
        List<String> mismatches = new ArrayList<>();
        for (int s = 0; s < SEQUENCES; s++) {
            StageTemplate t = StageTemplate.values()[s % 4];
            Suppressor sup = Suppressor.values()[(s / 4) % Suppressor.values().length];
            Stage stage = Templates.build(t, sup, HighSideDrive.LEVEL_SHIFT);
            Connectivity conn = Connectivity.of(stage);
            DcAnalysis live = new DcAnalysis();
            boolean pin = true;
            double ambient = 25;
            for (int k = 0; k < EDITS_PER_SEQUENCE; k++) {
                double u = r.nextDouble();
                if (u < 0.2) {
                    pin = !pin;
                } else if (u < 0.3) {
                    ambient = -40 + 190 * r.nextDouble();
                } else if (u < 0.4) {
                    stage = stage.withPart(stage.require("V1").with("volts", 3 + 57 * r.nextDouble()));
                } else {
                    stage = valueEdit(stage, r);
                }
                SolveOptions so = SolveOptions.DEFAULT.withPinHigh(pin).withAmbient(ambient);
                Object a = outcome(live, stage, so);
                Object b = outcome(new DcAnalysis(), stage, so);
                String where = t.id() + "/" + sup.id() + " sequence " + s + " edit " + k;
                if (a instanceof OperatingPoint la && b instanceof OperatingPoint fb) {
                    pairs++;
                    HonestResidual.assertHonest(conn, la, where + " (long-lived)");
                    HonestResidual.assertHonest(conn, fb, where + " (fresh)");
                    String diff = difference(la, fb);
                    if (diff != null) {
                        mismatches.add(where + ": " + diff);
                    }
                } else if (!a.equals(b)) {
                    mismatches.add(where + ": long-lived " + a + ", fresh " + b);
                }
            }
        }
        assertTrue(pairs >= 20_000, "pairs compared: " + pairs);
        assertEquals(List.of(), mismatches.subList(0, Math.min(10, mismatches.size())), mismatches.size() + " mismatches");
    }

    /** An operating point, or the key of the engine's failure. */
    private static Object outcome(DcAnalysis engine, Stage stage, SolveOptions so) {
        try {
            return engine.solve(stage, so);
        } catch (SolverException e) {
            return e.messageKey();
        }
    }

    static Stage valueEdit(Stage stage, Random r) {
        List<Part> ps = stage.parts().stream().filter(p -> !p.kind().params().isEmpty()).toList();
        Part p = ps.get(r.nextInt(ps.size()));
        ParamSpec spec = p.kind().params().get(r.nextInt(p.kind().params().size()));
        double v = p.value(spec.key());
        double nv = v == 0 ? spec.defaultValue() * r.nextDouble() : v * Math.exp(0.7 * r.nextGaussian());
        if (p.kind() == PartKind.SUPPLY && spec.key().equals("volts")) {
            nv = Math.abs(nv);
        }
        nv = Math.max(spec.min(), Math.min(spec.max(), nv));
        Stage next = stage.withPart(p.with(spec.key(), nv));
        boolean invalid = Validator.validate(next).stream().anyMatch(f -> f.severity() == Severity.ERROR);
        return invalid ? stage : next;
    }

    /** Null when both answers agree: same relay states, every net within 2·(reltol·|v| + vntol) (NM-6, common practice). */
    static String difference(OperatingPoint a, OperatingPoint b) {
        if (!a.relayOperated().equals(b.relayOperated())) {
            return "relays " + a.relayOperated() + " against " + b.relayOperated();
        }
        for (Map.Entry<String, Double> e : b.nodeVoltages().entrySet()) {
            double v = e.getValue();
            double w = a.voltage(e.getKey());
            if (!(Math.abs(v - w) <= 2 * (TOL.reltol() * Math.abs(v) + TOL.vntolVolts()))) {
                return e.getKey() + " " + w + " V against " + v + " V";
            }
        }
        return null;
    }
}
