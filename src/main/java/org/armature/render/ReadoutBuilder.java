package org.armature.render;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.armature.model.ParamKeys;
import org.armature.netlist.Readings;
import org.armature.netlist.Region;
import org.armature.model.Finding;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.TestPoint;
import org.armature.solver.OperatingPoint;
import org.armature.solver.PartResult;
import org.armature.solver.SwitchVerdict;

/**
 * Turns a solved operating point into the readouts drawn on the schematic. Pure: the same stage and
 * operating point always give the same {@link Annotations}; nothing is solved here.
 *
 * <p>What it shows:
 * <ul>
 *   <li>a voltage tag at every test point's net, and at the nets the stage's roles name (the drive
 *       pin's output, the switch's control input, the switch's terminal on the coil, the coil
 *       supply), so a stage drawn part by part without test points reads like its template;</li>
 *   <li>a current arrow with its magnitude at the drive pin's output, at each transistor's control
 *       pin (base, gate, channel input) and main terminal (collector, drain, channel output), and at
 *       the contact-side load; the arrow points the way conventional current flows;</li>
 *   <li>one badge per transistor: for the switch (the part {@link OperatingPoint#switchVerdict()}
 *       names) the verdict in short words ("saturated, ×6.1 margin", "not saturated: needs 230 µA
 *       more base current"), for any other transistor its region;</li>
 *   <li>a badge on the drive pin with its output current against its limit;</li>
 *   <li>a gauge per relay: coil current against drop-out and pick-up, and the contacts' state;</li>
 *   <li>markers on parts named by findings of severity warning or error.</li>
 * </ul>
 *
 * <p>Verdict states: with the pin high, a switch fully on with at least {@link #COMFORTABLE_MARGIN}
 * reads OK, fully on with less reads WARN, not fully on reads FAIL; with the pin low a cut-off
 * switch reads OK and a conducting one FAIL. A pin current reads WARN above
 * {@link #PIN_WARN_FRACTION} of its limit and FAIL above the limit.
 */
public final class ReadoutBuilder {

    /**
     * Drive margin above which the switch verdict reads OK rather than WARN: ×2, the overdrive over
     * the minimum gain usually asked for (common practice; the same figure as the checks' default).
     */
    public static final double COMFORTABLE_MARGIN = 2.0;

    /** Share of the pin current limit above which the pin badge warns: 80 % (common practice derating). */
    public static final double PIN_WARN_FRACTION = 0.8;

    /**
     * Currents smaller than this are not drawn as arrows: 1 µA, below anything a bench meter on a
     * relay stage would show as other than leakage (common practice).
     */
    public static final double SMALLEST_SHOWN_AMPS = 1e-6;

    private ReadoutBuilder() {
    }

    /**
     * The readouts of a stage at an operating point.
     *
     * @param stage the stage that was solved (its drawing gives the pins and test points)
     * @param op the operating point of exactly that stage
     * @param findings findings to mark on the drawing (topology, solver); only warnings and errors
     *     that name a part are marked
     * @return the annotations; never null
     */
    public static Annotations build(Stage stage, OperatingPoint op, List<Finding> findings) {
        return build(stage, StageRecognition.of(stage), op, findings);
    }

    /**
     * The readouts of a stage at an operating point, with the stage's roles already found (a
     * caller that keeps one recognition per stage version passes it here).
     *
     * @param stage the stage that was solved
     * @param recognition {@link StageRecognition#of} of that stage (or of one with the same structure)
     * @param op the operating point of exactly that stage
     * @param findings findings to mark on the drawing, as for {@link #build(Stage, OperatingPoint, List)}
     * @return the annotations; never null
     */
    public static Annotations build(Stage stage, StageRecognition recognition, OperatingPoint op,
                                    List<Finding> findings) {
        List<Annotations.NodeVoltage> voltages = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        List<String> nets = new ArrayList<>();
        for (TestPoint tp : stage.testPoints()) {
            nets.add(tp.net());
        }
        recognition.roles().ifPresent(r -> {
            r.pinNet().ifPresent(nets::add);
            nets.add(r.switchControlNet());
            nets.add(r.switchNet());
            r.coilSupplyRef().ifPresent(v -> nets.add(recognition.connectivity().net(v, "p")));
        });
        for (String net : nets) {
            Double v = op.nodeVoltages().get(net);
            if (v != null && seen.add(net)) {
                voltages.add(new Annotations.NodeVoltage(net, v));
            }
        }
        List<Annotations.BranchCurrent> currents = new ArrayList<>();
        List<Annotations.PartBadge> badges = new ArrayList<>();
        List<Annotations.RelayGauge> gauges = new ArrayList<>();
        Optional<SwitchVerdict> verdict = op.switchVerdict();
        for (Part p : stage.parts()) {
            Optional<PartResult> found = op.part(p.ref());
            if (found.isEmpty()) {
                continue;
            }
            PartResult r = found.get();
            switch (p.kind()) {
                case DRIVE_PIN -> {
                    current(currents, p.ref(), "out", r);
                    pinBadge(p, r).ifPresent(badges::add);
                }
                case NPN, PNP -> {
                    current(currents, p.ref(), "b", r);
                    current(currents, p.ref(), "c", r);
                    badges.add(transistorBadge(p, r, verdict, op.pinHigh()));
                }
                case NMOS -> {
                    current(currents, p.ref(), "d", r);
                    badges.add(transistorBadge(p, r, verdict, op.pinHigh()));
                }
                case DARLINGTON -> {
                    current(currents, p.ref(), "in", r);
                    current(currents, p.ref(), "out", r);
                    badges.add(transistorBadge(p, r, verdict, op.pinHigh()));
                }
                case LOAD -> current(currents, p.ref(), "a", r);
                case RELAY -> gauge(p, r, op).ifPresent(gauges::add);
                default -> {
                }
            }
        }
        return new Annotations(voltages, currents, badges, gauges, markers(stage, findings));
    }

    /** Only the finding markers: what is drawn when the stage could not be solved. */
    public static Annotations markersOnly(Stage stage, List<Finding> findings) {
        return new Annotations(List.of(), List.of(), List.of(), List.of(), markers(stage, findings));
    }

    /** Markers for findings that name a part of the stage, worst first, one per part. */
    public static List<Annotations.FindingMarker> markers(Stage stage, List<Finding> findings) {
        List<Annotations.FindingMarker> out = new ArrayList<>();
        Set<String> marked = new LinkedHashSet<>();
        for (Severity sev : List.of(Severity.ERROR, Severity.WARNING)) {
            for (Finding f : findings) {
                if (f.severity() == sev && !f.ref().isEmpty() && stage.part(f.ref()).isPresent() && marked.add(f.ref())) {
                    out.add(new Annotations.FindingMarker(f.ref(),
                            sev == Severity.ERROR ? Annotations.State.FAIL : Annotations.State.WARN, shortWords(f)));
                }
            }
        }
        return out;
    }

    /** The verdict in a few words for the badge beside the switch. */
    public static String verdictWords(SwitchVerdict v, Part part, PartResult r) {
        PartKind kind = part.kind();
        boolean mos = kind == PartKind.NMOS;
        if (r.region().orElse(Region.ACTIVE) == Region.CUTOFF || v.margin() == 0 && !v.fullyOn()) {
            return mos ? "off" : "cut off";
        }
        String margin = "×" + String.format(Locale.ROOT, "%.2g", v.margin()) + " margin";
        if (v.fullyOn()) {
            return (mos ? "fully on, " : "saturated, ") + margin;
        }
        if (mos) {
            return "not fully on: " + margin;
        }
        boolean darlington = kind == PartKind.DARLINGTON;
        double ic = r.quantity(Readings.IC);
        double drive = r.quantity(darlington ? Readings.IIN : Readings.IB);
        double lacking = ic / part.value(ParamKeys.HFE_MIN) - drive;
        return "not saturated: needs " + Notation.format(lacking, "A") + " more " + (darlington ? "input" : "base")
                + " current";
    }

    // ------------------------------------------------------------------ internals

    private static void current(List<Annotations.BranchCurrent> out, String ref, String pin, PartResult r) {
        Double a = r.pinCurrents().get(pin);
        if (a != null && Math.abs(a) >= SMALLEST_SHOWN_AMPS) {
            out.add(new Annotations.BranchCurrent(new PinRef(ref, pin), a));
        }
    }

    private static Annotations.PartBadge transistorBadge(Part p, PartResult r, Optional<SwitchVerdict> verdict,
                                                         boolean pinHigh) {
        Optional<Region> region = r.region();
        boolean conducting = region.map(Region::conducts).orElse(true);
        if (verdict.isPresent() && verdict.get().ref().equals(p.ref())) {
            SwitchVerdict v = verdict.get();
            String words = verdictWords(v, p, r);
            Annotations.State state;
            if (pinHigh) {
                state = !v.fullyOn() ? Annotations.State.FAIL
                        : v.margin() >= COMFORTABLE_MARGIN ? Annotations.State.OK : Annotations.State.WARN;
            } else {
                state = conducting ? Annotations.State.FAIL : Annotations.State.OK;
            }
            if (!pinHigh && conducting) {
                words = "conducts with the pin low (" + region.map(Region::key).orElse("") + ")";
            }
            return new Annotations.PartBadge(p.ref(), words, state);
        }
        return new Annotations.PartBadge(p.ref(), region.map(Region::words).orElse(""), Annotations.State.OK);
    }

    private static Optional<Annotations.PartBadge> pinBadge(Part p, PartResult r) {
        double limit = p.value(ParamKeys.PIN_CURRENT_LIMIT_AMPS);
        Double out = r.quantities().get(Readings.CURRENT);
        if (out == null || !(limit > 0)) {
            return Optional.empty();
        }
        double a = Math.abs(out);
        Annotations.State state = a > limit ? Annotations.State.FAIL
                : a > PIN_WARN_FRACTION * limit ? Annotations.State.WARN : Annotations.State.OK;
        String text = Notation.format(a, "A") + " of " + Notation.format(limit, "A") + " limit";
        return Optional.of(new Annotations.PartBadge(p.ref(), text, state));
    }

    private static Optional<Annotations.RelayGauge> gauge(Part p, PartResult r, OperatingPoint op) {
        Double coil = r.quantities().get(Readings.COIL_CURRENT);
        Double pick = r.quantities().get(Readings.PICK_UP_CURRENT);
        Double drop = r.quantities().get(Readings.DROP_OUT_CURRENT);
        if (coil == null || pick == null || drop == null || !(drop >= 0 && pick > drop)) {
            return Optional.empty();
        }
        boolean operated = op.relayOperated().getOrDefault(p.ref(), false);
        return Optional.of(new Annotations.RelayGauge(p.ref(), Math.abs(coil), drop, pick, operated));
    }

    private static String shortWords(Finding f) {
        String key = f.key();
        int dot = key.lastIndexOf('.');
        return (dot >= 0 ? key.substring(dot + 1) : key).replace('-', ' ');
    }
}
