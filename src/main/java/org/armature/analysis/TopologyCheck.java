package org.armature.analysis;

import static org.armature.analysis.Quantities.volts;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.model.ParamKeys;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.RoleIssue;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;
import org.armature.model.Finding;

/**
 * Explains problems of a drawn stage in plain words: the structural findings of
 * {@link StageRecognition} (which roles were found, which are missing or ambiguous) plus the
 * judgements that need the parts' values but no solve. Never throws for a stage the editor can hold.
 *
 * <p>The polarity of a suppressor chain is judged by adding up the voltage at which it would conduct
 * in the on-state polarity (forward drop {@link TopologyOptions#forwardDropVolts()} per forward
 * junction, breakdown voltage per reversed one) and comparing it with the coil supply's maximum.
 *
 * <p>Keys added here, with severities (ERROR: the stage cannot work as drawn; these do not stop the
 * solver, only {@code Validator}'s errors do); the structural keys are listed on
 * {@link StageRecognition}:
 * <table>
 * <caption>value-judged topology finding keys</caption>
 * <tr><th>key</th><th>severity</th><th>meaning</th></tr>
 * <tr><td>{@code topology.high-side-cannot-turn-off}</td><td>ERROR</td><td>PNP driven from a pin whose high level is below the supply (check-values.md, beyond the hand calculation, 4)</td></tr>
 * <tr><td>{@code topology.suppressor-reversed}</td><td>ERROR</td><td>a suppressor conducts forward when the stage turns on: a short across the supply</td></tr>
 * <tr><td>{@code topology.suppressor-conducts}</td><td>WARNING</td><td>a clamp breaks down at or below the supply's maximum in normal operation</td></tr>
 * </table>
 */
public final class TopologyCheck {

    private TopologyCheck() {
    }

    /** The findings for a stage with the default {@link TopologyOptions}. */
    public static List<Finding> check(Stage stage) {
        return analyse(stage, TopologyOptions.DEFAULT).findings();
    }

    /** The recognised roles, if the stage is one of the four driver stages. */
    public static Optional<StageRoles> recognise(Stage stage) {
        return StageRecognition.of(stage).roles();
    }

    /** Roles and findings with the default options. */
    public static TopologyReport analyse(Stage stage) {
        return analyse(stage, TopologyOptions.DEFAULT);
    }

    /**
     * Roles and findings, each finding with every part it concerns.
     *
     * @param stage the stage as drawn; not modified
     * @param options the figures used to judge polarity and turn-off
     */
    public static TopologyReport analyse(Stage stage, TopologyOptions options) {
        return analyse(stage, StageRecognition.of(stage), options);
    }

    /**
     * Roles and findings from a recognition already made for this stage's structure.
     *
     * @param stage the stage as drawn (its values are judged); not modified
     * @param recognition {@link StageRecognition#of} of a stage with the same structure
     * @param options the figures used to judge polarity and turn-off
     */
    public static TopologyReport analyse(Stage stage, StageRecognition recognition, TopologyOptions options) {
        List<RoleIssue> issues = new ArrayList<>(recognition.issues());
        recognition.roles().ifPresent(r -> new Judge(stage, r, options, issues).run());
        return new TopologyReport(recognition.roles(), issues);
    }

    /** The value judgements over recognised roles. */
    private static final class Judge {
        private final Stage stage;
        private final StageRoles r;
        private final TopologyOptions options;
        private final List<RoleIssue> issues;
        private final Part k;
        private final Part sw;

        Judge(Stage stage, StageRoles roles, TopologyOptions options, List<RoleIssue> issues) {
            this.stage = stage;
            this.r = roles;
            this.options = options;
            this.issues = issues;
            this.k = stage.require(roles.relayRef());
            this.sw = stage.require(roles.switchRef());
        }

        void run() {
            r.coilSupplyRef().map(stage::require).filter(v -> !(v.value(ParamKeys.VOLTS) > 0)).ifPresent(v ->
                    add(Severity.ERROR, "topology.coil-supply-reversed", ParamKeys.VOLTS,
                            "Coil supply " + v.ref() + " is " + volts(v.value(ParamKeys.VOLTS)) + ": these stages switch a"
                                    + " positive coil rail, and a reversed one forward-biases the freewheeling diode across "
                                    + k.ref() + "'s coil (a short through the diode) while the switch cannot control the"
                                    + " relay. Make " + v.ref() + " positive.",
                            List.of(v.ref(), k.ref())));
            double supplyMax = r.coilSupplyRef().map(v -> supplyMaxVolts(stage.require(v))).orElse(Double.NaN);
            if (r.highSideDrive().equals(Optional.of(HighSideDrive.DIRECT)) && r.drivePinRef().isPresent()
                    && r.coilSupplyRef().isPresent()) {
                highSideTurnOff(stage.require(r.drivePinRef().get()), supplyMax);
            }
            for (List<StageRoles.Oriented> chain : r.coilChains()) {
                judgeChain(chain, supplyMax);
            }
            for (StageRoles.Oriented o : r.switchClamps()) {
                judgeSwitchClamp(o, supplyMax);
            }
        }

        private void add(Severity severity, String key, String field, String message, List<String> refs) {
            String ref = refs.isEmpty() ? "" : refs.get(0);
            issues.add(new RoleIssue(new Finding(severity, key, ref, field, message), refs));
        }

        private void highSideTurnOff(Part pin, double supplyMax) {
            double high = pin.value(ParamKeys.HIGH_VOLTS);
            double needed = supplyMax - options.pnpOffMarginVolts();
            if (high < needed) {
                List<String> refs = new ArrayList<>(List.of(sw.ref(), pin.ref()));
                r.inputResistorRef().ifPresent(refs::add);
                add(Severity.ERROR, "topology.high-side-cannot-turn-off", "b",
                        sw.ref() + " (PNP, emitter on " + r.coilSupplyRef().orElseThrow() + " at up to " + volts(supplyMax)
                                + ") is driven straight from " + pin.ref() + ", whose high level is only "
                                + volts(high) + ": the base can never rise to within "
                                + volts(options.pnpOffMarginVolts()) + " of the emitter, so " + sw.ref()
                                + " cannot turn off, and current flows from the base"
                                + r.inputResistorRef().map(s -> " through " + s).orElse("")
                                + " into the pin's protection diode. Use an NPN level shift with a base–emitter"
                                + " pull-up on " + sw.ref() + ".", refs);
            }
        }

        /** Judges a chain across the coil in the on-state polarity (from the high end to the low end). */
        private void judgeChain(List<StageRoles.Oriented> chain, double supplyMax) {
            if (chain.stream().anyMatch(o -> !isJunction(part(o)))) {
                return; // a resistor or capacitor in the chain: a load across the coil, never a short
            }
            double conduct = 0;
            boolean allForward = true;
            for (StageRoles.Oriented o : chain) {
                boolean forward = isForward(o);
                allForward &= forward;
                conduct += forward ? options.forwardDropVolts() : part(o).value(ParamKeys.BREAKDOWN_VOLTS);
            }
            if (Double.isNaN(supplyMax) || conduct > supplyMax) {
                return;
            }
            List<String> refs = new ArrayList<>(chain.stream().map(StageRoles.Oriented::ref).toList());
            refs.add(k.ref());
            if (allForward) {
                add(Severity.ERROR, "topology.suppressor-reversed", "",
                        names(chain) + " conduct" + (chain.size() == 1 ? "s" : "") + " forward as soon as " + sw.ref()
                                + " turns on: " + (chain.size() == 1 ? "it is" : "they are") + " the wrong way round"
                                + " and short the coil supply through " + sw.ref() + ". Turn "
                                + chain.get(0).ref() + " so its cathode faces the coil's supply end.",
                        refs);
            } else {
                add(Severity.WARNING, "topology.suppressor-conducts", "",
                        names(chain) + " would conduct at about " + volts(conduct) + ", not above the coil supply's maximum "
                                + volts(supplyMax) + ": " + (chain.size() == 1 ? "it draws" : "they draw")
                                + " current whenever " + sw.ref() + " is on. Choose a breakdown voltage above the"
                                + " supply's maximum.", refs);
            }
        }

        /** Judges a zener or TVS from the switch node to ground (off state: it sees the supply). */
        private void judgeSwitchClamp(StageRoles.Oriented o, double supplyMax) {
            if (Double.isNaN(supplyMax)) {
                return;
            }
            Part p = part(o);
            if (isForward(o)) {
                add(Severity.ERROR, "topology.suppressor-reversed", "",
                        p.ref() + " across " + sw.ref() + " conducts forward whenever " + sw.ref() + " is off: it"
                                + " holds " + k.ref() + " energised. Turn it so its cathode faces the switch node.",
                        List.of(p.ref(), sw.ref(), k.ref()));
            } else if (p.value(ParamKeys.BREAKDOWN_VOLTS) <= supplyMax) {
                add(Severity.WARNING, "topology.suppressor-conducts", "",
                        p.ref() + " across " + sw.ref() + " breaks down at " + volts(p.value(ParamKeys.BREAKDOWN_VOLTS))
                                + ", not above the coil supply's maximum " + volts(supplyMax) + ": it energises "
                                + k.ref() + " while " + sw.ref() + " is off. Choose a breakdown voltage above the"
                                + " supply's maximum.", List.of(p.ref(), sw.ref(), k.ref()));
            }
        }

        private Part part(StageRoles.Oriented o) {
            return stage.require(o.ref());
        }

        private static boolean isJunction(Part p) {
            return p.kind() == PartKind.DIODE || p.kind() == PartKind.ZENER || p.kind() == PartKind.TVS;
        }

        /** True when the part conducts forward from its "from" pin: a diode or zener entered at its anode. */
        private boolean isForward(StageRoles.Oriented o) {
            PartKind kind = part(o).kind();
            return (kind == PartKind.DIODE || kind == PartKind.ZENER) && o.fromPin().equals("a");
        }

        private static String names(List<StageRoles.Oriented> chain) {
            return String.join(" and ", chain.stream().map(StageRoles.Oriented::ref).toList());
        }
    }

    private static double supplyMaxVolts(Part supply) {
        return Math.abs(supply.value(ParamKeys.VOLTS)) * (1 + supply.value(ParamKeys.TOLERANCE_PERCENT) / 100);
    }
}
