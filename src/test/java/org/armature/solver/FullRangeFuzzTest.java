package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.armature.model.Connectivity;
import org.armature.model.HighSideDrive;
import org.armature.model.ModelRange;
import org.armature.model.ParamSpec;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientFailureException;
import org.armature.solver.timedomain.TransientOptions;
import org.armature.solver.timedomain.TransientResult;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Seeded fuzz over each value's full range (issue 10): every parameter of every part of every
 * template and suppressor, drawn over its whole [min, max] (log-uniform where the range spans
 * decades), at a random ambient of the models' range; DC with the pin high and low, and a turn-off
 * on every eighth draw. Each outcome is an answer that passes the honest-residual invariant, or a
 * failure of the engine's documented family with a key and a reason; never another exception, never
 * NaN.
 */
class FullRangeFuzzTest {

    private static final int TRANSIENT_EVERY = 8;

    @Test
    @DisplayName("every value over its full range: an honest answer or a failure of the engine's family with a reason")
    void fullRanges() {
        Random r = new Random(20261206L);
        List<String> problems = new ArrayList<>();
        int answers = 0;
        int refusals = 0;
        int runs = 0;
        int draw = 0;
        for (StageTemplate t : StageTemplate.values()) {
            for (Suppressor sup : Suppressor.values()) {
                Stage base = Templates.build(t, sup, HighSideDrive.LEVEL_SHIFT);
                Connectivity conn = Connectivity.of(base);
                for (Part p : base.parts()) {
                    for (ParamSpec spec : p.kind().params()) {
                        draw++;
                        double v = fullRange(spec, r);
                        Stage s = base.withPart(p.with(spec.key(), v));
                        double ambient = ModelRange.AMBIENT_MIN_CELSIUS
                                + (ModelRange.AMBIENT_MAX_CELSIUS - ModelRange.AMBIENT_MIN_CELSIUS) * r.nextDouble();
                        String what = t.id() + "/" + sup.id() + " " + p.ref() + "." + spec.key() + " = " + v + ", "
                                + ambient + " °C";
                        for (boolean pin : new boolean[] {true, false}) {
                            try {
                                OperatingPoint op = new DcAnalysis().solve(s,
                                        SolveOptions.DEFAULT.withPinHigh(pin).withAmbient(ambient));
                                HonestResidual.assertHonest(conn, op, what + ", pin " + pin);
                                answers++;
                            } catch (SolverException e) {
                                refusals++;
                                reasoned(e.messageKey(), e.getMessage(), what, problems);
                            } catch (RuntimeException e) {
                                problems.add(what + ", pin " + pin + ": " + e);
                            }
                        }
                        if (draw % TRANSIENT_EVERY == 0) {
                            runs++;
                            try {
                                TransientResult tr = TransientAnalysis.run(s, new TransientOptions(
                                        TransientOptions.turnOff().drive(), TransientOptions.turnOff().durationSeconds(),
                                        TransientOptions.turnOff().step(), ambient));
                                assertEquals(0, tr.acceptedFailingKcl(), what + ": accepted points failing KCL");
                                assertTrue(Double.isFinite(tr.maxAcceptedResidualAmps()), what);
                                for (org.armature.solver.timedomain.Trace trace : tr.waveform().traces()) {
                                    for (double x : trace.values()) {
                                        assertFalse(Double.isNaN(x), what + ": NaN in " + trace.name());
                                    }
                                }
                            } catch (SolverException e) {
                                reasoned(e.messageKey(), e.getMessage(), what + " (turn-off)", problems);
                            } catch (TransientFailureException e) {
                                reasoned("transient", e.getMessage(), what + " (turn-off)", problems);
                            } catch (RuntimeException e) {
                                problems.add(what + " (turn-off): " + e);
                            }
                        }
                    }
                }
            }
        }
        assertTrue(answers > refusals, answers + " answers, " + refusals + " refusals");
        assertTrue(runs >= 100, "turn-off runs " + runs);
        assertEquals(List.of(), problems.subList(0, Math.min(10, problems.size())), problems.size() + " problems");
    }

    private static void reasoned(String key, String message, String what, List<String> problems) {
        if (key == null || key.isBlank() || message == null || message.isBlank() || message.contains("NaN")) {
            problems.add(what + ": refusal without a reason: " + key + " " + message);
        }
    }

    /** Log-uniform over a positive range of more than two decades, uniform otherwise. */
    static double fullRange(ParamSpec spec, Random r) {
        double lo = spec.min();
        double hi = spec.max();
        if (lo > 0 && hi / lo > 100) {
            return Math.exp(Math.log(lo) + (Math.log(hi) - Math.log(lo)) * r.nextDouble());
        }
        return lo + (hi - lo) * r.nextDouble();
    }
}
