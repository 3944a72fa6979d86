package org.armature.analysis;

import org.armature.model.ParamKeys;
import org.armature.netlist.Readings;
import org.armature.model.DriverTopology;
import org.armature.model.StageRoles;
import static org.armature.analysis.Quantities.volts;
import static org.armature.analysis.Quantities.amps;
import static org.armature.analysis.Quantities.celsius;
import static org.armature.analysis.Quantities.ratio;
import static org.armature.analysis.Quantities.pct;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.Supplier;
import org.armature.model.Finding;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SolveOptions;
import org.armature.solver.SolverException;
import org.armature.solver.SwitchVerdict;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientFailureException;
import org.armature.solver.timedomain.TransientMetrics;
import org.armature.solver.timedomain.TransientOptions;
import org.armature.solver.timedomain.TransientResult;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * The checks of a stage: every corner of its toleranced parameters ({@link Corners}) is solved
 * with the pin high and with the pin low by the DC engine, each check is judged at its worst
 * variant, and an optional seeded Monte Carlo run estimates the yield.
 *
 * <p>Every verdict has one limit, and a value beyond it fails. A rating's limit is the rating
 * derated by {@link CheckOptions#ratingUseFraction()} and says so ("the 60.0 V VCEO, 80.0 %
 * derating → 48.0 V limit"); a functional check's limit is the physical boundary (must-operate,
 * must-release, ×1 overdrive) and it warns inside the limit when the wanted margin is missing.
 *
 * <table>
 * <caption>check ids</caption>
 * <tr><th>id</th><th>judged</th><th>limit; pass / warn</th></tr>
 * <tr><td>{@code relay.operates}</td><td>coil voltage, pin high, vs must-operate moved to the
 *     solved coil temperature, V_mo·R(T)/R(Tref) (RC-7, RC-9); worst over the corners (minimum
 *     supply, hottest coil with self-heating, coil +tol, minimum gain frozen at the coldest ambient,
 *     lowest pin level)</td><td>must-operate at T (fail below); pass ≥ 110 % of it (RC-18), warn between</td></tr>
 * <tr><td>{@code relay.releases}</td><td>coil voltage, pin low (leakage at the hottest corner), vs
 *     must-release at the coil temperature</td><td>must-release at T (fail above); pass ≤ 90 % (RC-18)</td></tr>
 * <tr><td>{@code switch.saturated}</td><td>bipolar: βF(corner)·IB/IC, the gain of the corner
 *     (hFE(min) at the coldest ambient at the low-gain corners); MOSFET and Darlington: the DC
 *     engine's switch verdict margin (MO-6)</td><td>×1 (fail below); pass ≥ ×2</td></tr>
 * <tr><td>{@code rating.switch-current}</td><td>largest IC or ID vs IC max / ID max</td><td>80 % of the rating</td></tr>
 * <tr><td>{@code rating.pin-current}</td><td>largest pin current vs the per-pin limit (GP-1)</td><td>same</td></tr>
 * <tr><td>{@code rating.package-current}</td><td>channels × largest pin current vs the package limit
 *     (GP-x)</td><td>same</td></tr>
 * <tr><td>{@code rating.switch-voltage}</td><td>peak switch voltage at turn-off vs VCEO / VDSS: from
 *     the transient engine at the largest-current corner (supply max, coil −tol, coldest ambient),
 *     avalanche = fail; without it the static estimate VS,max + Vc + I0·Rs
 *     ({@link SuppressorEstimate})</td><td>same; no suppressor: fail (SU-0, SU-1)</td></tr>
 * <tr><td>{@code rating.suppressor-current}</td><td>peak suppressor current (the coil current at
 *     turn-off) vs the diode's or zener's peak rating</td><td>same</td></tr>
 * <tr><td>{@code thermal.switch-junction}</td><td>Tj = Ta + P·RθJA at the hottest variant (TH-1,
 *     TH-5); a Darlington channel's package with its channels on: Ta + n·P·RθJA</td><td>Tj(max) − 20 K</td></tr>
 * <tr><td>{@code relay.release-time}</td><td>only with a requirement: turn-off edge to the contacts
 *     opening (transient engine); without it the coil-current decay to drop-out through the
 *     suppressor, closed form (check-values.md, suppression), before the armature moves</td><td>the requirement</td></tr>
 * <tr><td>{@code coil.voltage}, {@code coil.temperature}, {@code contact.*}</td><td>the relay's
 *     other half, see {@link ContactChecks}</td><td></td></tr>
 * </table>
 *
 * <p>Other findings: {@code check.not-recognised}, {@code check.not-solved} (a variant the engine
 * could not solve, named), {@code check.transient-failed} (INFO: the turn-off fell back to the
 * closed forms), and the safety cautions {@code caution.above-selv},
 * {@code caution.creepage-clearance}, {@code caution.fusing}, {@code caution.enclosure},
 * {@code caution.qualified-installation} when a contact-side supply is above safety extra-low
 * voltage (more than 50 V AC rms or 120 V ripple-free DC; IEC 61140 band, common practice). The
 * checks never call a design safe: they report what ran.
 */
public final class StageChecks {

    /** The ids, in report order. */
    public static final List<String> IDS = List.of("relay.operates", "relay.releases", "switch.saturated",
            "rating.switch-current", "rating.pin-current", "rating.package-current", "rating.switch-voltage",
            "rating.suppressor-current", "thermal.switch-junction", "relay.release-time", "coil.voltage",
            "coil.temperature", "contact.current", "contact.voltage", "contact.inrush", "contact.break");

    private static final String TRANSIENT = "transient engine: turn-off at the largest-current corner";

    /** Longest turn-off window the checks run, 0.2 s: ten times a small relay's release. */
    private static final double TRANSIENT_MAX_WINDOW_SECONDS = 0.2;

    private static final String STATIC = "static estimate (closed form of check-values.md, suppression); the transient engine"
            + " is not used yet";

    private StageChecks() {
    }

    /** The checks with the default options and a default DC engine. */
    public static CheckReport run(Stage stage) {
        return run(stage, CheckOptions.DEFAULT, new DcAnalysis());
    }

    /**
     * Runs every check.
     *
     * @param stage the nominal stage; not modified
     * @param options limits, margins, Monte Carlo size
     * @param dc the DC engine to solve with
     * @return the verdicts and findings; never throws for a stage the editor can hold (an engine
     *     failure becomes a {@code check.not-solved} finding)
     */
    public static CheckReport run(Stage stage, CheckOptions options, DcAnalysis dc) {
        return new Run(stage, options, dc).run();
    }

    /**
     * A variant with its two operating points (empty when the engine failed) and the parts the
     * measures read, looked up once (relay, switch, and the drive pin or null).
     */
    record Solved(Variant variant, Optional<Readout> on, Optional<Readout> off, Part relay,
                  Part switchPart, Part pin) {
    }

    /**
     * What the measures read of one operating point, taken right after its solve, so that the run
     * keeps a few numbers per variant instead of the operating point and its netlist. Quantities a
     * switch kind does not have are NaN; the verdict is kept for the switches judged by it (MOSFET,
     * Darlington channel).
     */
    record Readout(double coilVoltage, double coilTemperature, double coilCurrent, double ic, double ib,
                   double id, double switchPowerWatts, double pinCurrent, Optional<SwitchVerdict> verdict) {

        /** The readout of a pin-high point: relay, switch and drive pin. */
        static Readout on(OperatingPoint op, StageRoles roles, PartKind switchKind) {
            String k = roles.relayRef();
            String q = roles.switchRef();
            boolean bipolar = switchKind == PartKind.NPN || switchKind == PartKind.PNP;
            boolean mos = switchKind == PartKind.NMOS;
            return new Readout(op.quantity(k, Readings.COIL_VOLTAGE), op.quantity(k, Readings.COIL_TEMPERATURE),
                    op.quantity(k, Readings.COIL_CURRENT), mos ? Double.NaN : op.quantity(q, Readings.IC),
                    bipolar ? op.quantity(q, Readings.IB) : Double.NaN, mos ? op.quantity(q, Readings.ID) : Double.NaN,
                    op.powerWatts(q), roles.drivePinRef().map(pin -> op.quantity(pin, Readings.CURRENT)).orElse(Double.NaN),
                    bipolar ? Optional.empty() : op.switchVerdict());
        }

        /** The readout of a pin-low point: the relay only. */
        static Readout off(OperatingPoint op, StageRoles roles) {
            String k = roles.relayRef();
            return new Readout(op.quantity(k, Readings.COIL_VOLTAGE), op.quantity(k, Readings.COIL_TEMPERATURE),
                    op.quantity(k, Readings.COIL_CURRENT), Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Optional.empty());
        }
    }

    /** The turn-off run and the corner it ran at. */
    record TurnOff(TransientMetrics metrics, Stage stage, Map<String, Double> corner, String cornerText) {
    }

    /** One check measured on one variant. */
    /**
     * @param margin how far inside the absolute limit, in the check's own terms (a ratio minus one, or
     *     kelvin for the junction): only compared between variants of the same check, to find the worst
     */
    record Measure(double value, double limit, CheckStatus status, double margin, Supplier<String> why) {
        /** @return the explanation, formatted only when asked for (most variants are never reported) */
        String explanation() {
            return why.get();
        }
    }

    /** One check run. */
    private static final class Run {
        private final Stage stage;
        private final CheckOptions o;
        private final DcAnalysis dc;
        private final List<Finding> findings = new ArrayList<>();
        private StageRoles roles;
        private List<Factor> factors;
        private Optional<OperatingPoint> nominalOn = Optional.empty();
        private Optional<OperatingPoint> nominalOff = Optional.empty();

        Run(Stage stage, CheckOptions options, DcAnalysis dc) {
            this.stage = stage;
            this.o = options;
            this.dc = dc;
        }

        CheckReport run() {
            TopologyReport topo = TopologyCheck.analyse(stage);
            topo.findings().stream().filter(f -> f.severity() != Severity.INFO).forEach(findings::add);
            cautions(topo);
            if (topo.roles().isEmpty() || topo.roles().get().coilSupplyRef().isEmpty()) {
                findings.add(new Finding(Severity.WARNING, "check.not-recognised", "", "",
                        "The checks need one of the four driver stages with a coil supply; none ran."));
                return new CheckReport(List.of(), Optional.empty(), findings, 0);
            }
            roles = topo.roles().get();
            CornerPlan plan = Corners.enumerate(stage, o.corners());
            factors = plan.factors();
            nominalOn = solve(stage, true, Optional.empty(), "the nominal stage");
            nominalOff = solve(stage, false, Optional.empty(), "the nominal stage");
            List<Solved> corners = new ArrayList<>(plan.corners().size());
            for (Variant v : plan.corners()) {
                corners.add(solveVariant(v, "corner " + v.index()));
            }
            List<CheckResult> checks = new ArrayList<>();
            checks.add(worst("relay.operates", corners, this::operates, Unit.VOLT,
                    "coil voltage (pin high) vs must-operate at the coil temperature, V_mo·R(T)/R(Tref) (RC-7, RC-9): fails"
                            + " below it, warns below " + Quantities.pct1(1 + o.operateMarginFraction()) + " of it (RC-18);"
                            + " DC engine over every corner",
                    List.of(roles.relayRef())));
            checks.add(worst("relay.releases", corners, this::releases, Unit.VOLT,
                    "coil voltage (pin low) vs must-release at the coil temperature: fails above it, warns above "
                            + Quantities.pct1(1 - o.releaseMarginFraction()) + " of it (RC-18); DC engine over every corner",
                    List.of(roles.relayRef())));
            checks.add(worst("switch.saturated", corners, this::saturated, Unit.RATIO,
                    "bipolar βF·IB/IC with the corner's gain; MOSFET and Darlington: the DC engine's switch verdict"
                            + " margin: fails below ×1, warns below ×" + ratio(o.saturationPassMargin()),
                    List.of(roles.switchRef())));
            checks.add(worst("rating.switch-current", corners, this::switchCurrent, Unit.AMPERE,
                    "largest switch current vs its rating, " + Quantities.pct1(o.ratingUseFraction()) + " derating",
                    List.of(roles.switchRef())));
            roles.drivePinRef().ifPresent(pin -> {
                checks.add(worst("rating.pin-current", corners, this::pinCurrent, Unit.AMPERE,
                        "largest pin current vs the per-pin limit (GP-1), " + Quantities.pct1(o.ratingUseFraction())
                                + " derating",
                        List.of(pin)));
                checks.add(worst("rating.package-current", corners, this::packageCurrent, Unit.AMPERE,
                        "channels × largest pin current vs the package limit (GP-x), "
                                + Quantities.pct1(o.ratingUseFraction()) + " derating", List.of(pin)));
            });
            double i0 = corners.stream().flatMap(s -> s.on().stream())
                    .mapToDouble(r -> Math.abs(r.coilCurrent())).max().orElse(Double.NaN);
            SuppressorEstimate sup = SuppressorEstimate.of(stage, roles, o.forwardDropVolts());
            Optional<TurnOff> edge = o.useTransient() ? turnOff(sup, i0) : Optional.empty();
            if (edge.isPresent()) {
                checks.add(transientSwitchVoltage(edge.get(), sup));
                transientSuppressorCurrent(edge.get(), sup).ifPresent(checks::add);
            } else {
                checks.add(switchVoltage(sup, i0));
                suppressorCurrent(sup, i0).ifPresent(checks::add);
            }
            checks.add(worst("thermal.switch-junction", corners, this::junction, Unit.CELSIUS,
                    "Tj = Ta + P·RθJA (TH-1, TH-5)" + (isDarlington() ? ", package total with the channels on" : "")
                            + "; limit Tj(max) − " + EngineeringNotation.format(o.thermalMarginKelvin(), Unit.KELVIN),
                    List.of(roles.switchRef())));
            o.releaseTimeRequirementSeconds().ifPresent(req -> checks.add(edge.isPresent()
                    ? transientReleaseTime(edge.get(), req) : releaseTime(sup, i0, req)));
            checks.add(worst("coil.voltage", corners, this::coilVoltage, Unit.VOLT,
                    "coil voltage (pin high) at every corner vs the relay's maximum allowable coil voltage, a percentage"
                            + " of rated (CT-3); DC engine", List.of(roles.relayRef())));
            checks.add(worst("coil.temperature", corners, this::coilTemperature, Unit.CELSIUS,
                    "coil temperature with self-heating, Ta + Rth·V·I solved with the copper law (CT-2), vs the"
                            + " insulation's thermal class (IEC 60085, CT-1); DC engine over every corner",
                    List.of(roles.relayRef())));
            checks.addAll(ContactChecks.run(stage, roles, o, findings));
            Optional<YieldResult> yield = Optional.empty();
            if (o.monteCarloSamples() > 0) {
                yield = Optional.of(monteCarlo(corners));
            }
            return new CheckReport(checks, yield, findings, corners.size());
        }

        // ------------------------------------------------------------------ solving

        /**
         * Solves a variant with the pin high and low, each started from the nominal operating point
         * of that pin state (so every variant's answer is independent of the order they are solved in).
         */
        private Solved solveVariant(Variant v, String what) {
            Optional<OperatingPoint> on = solve(v.stage(), true, nominalOn, what);
            Optional<OperatingPoint> off = solve(v.stage(), false, nominalOff, what);
            Part relay = null;
            Part sw = null;
            Part pin = null;
            String pinRef = roles.drivePinRef().orElse(null);
            for (Part p : v.stage().parts()) {
                if (p.ref().equals(roles.relayRef())) {
                    relay = p;
                }
                if (p.ref().equals(roles.switchRef())) {
                    sw = p;
                }
                if (p.ref().equals(pinRef)) {
                    pin = p;
                }
            }
            if (relay == null || sw == null || (pinRef != null && pin == null)) {
                throw new IllegalStateException("a variant lost a part of the stage's roles");
            }
            PartKind kind = sw.kind();
            return new Solved(v, on.map(op -> Readout.on(op, roles, kind)), off.map(op -> Readout.off(op, roles)),
                    relay, sw, pin);
        }

        private Optional<OperatingPoint> solve(Stage s, boolean pinHigh, Optional<OperatingPoint> start, String what) {
            SolveOptions so = SolveOptions.DEFAULT.withPinHigh(pinHigh);
            if (start.isPresent()) {
                so = so.withStart(start.get());
            }
            try {
                return Optional.of(dc.solve(s, so));
            } catch (SolverException e) {
                if (findings.stream().noneMatch(f -> f.key().equals("check.not-solved"))) {
                    findings.add(new Finding(Severity.WARNING, "check.not-solved", roles == null ? "" : roles.switchRef(), "",
                            "The DC engine could not solve " + what + " with the pin " + (pinHigh ? "high" : "low") + ": "
                                    + e.getMessage() + " Checks that need it are judged on the variants that solved."));
                }
                return Optional.empty();
            }
        }

        // ------------------------------------------------------------------ per-variant measures

        private Optional<Measure> operates(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            Part k = s.relay();
            Readout op = s.on().get();
            double v = Math.abs(op.coilVoltage());
            double t = op.coilTemperature();
            double mo = PartPhysics.coilVoltsAt(k, k.value(ParamKeys.MUST_OPERATE_VOLTS), t);
            double wanted = 1 + o.operateMarginFraction();
            CheckStatus st = v >= mo * wanted ? CheckStatus.PASS : v >= mo ? CheckStatus.WARN : CheckStatus.FAIL;
            return Optional.of(new Measure(v, mo, st, v / mo - 1,
                    () -> "Coil voltage " + volts(v) + " at a coil temperature of " + celsius(t) + " against must-operate "
                            + volts(mo) + " at that temperature (" + volts(k.value(ParamKeys.MUST_OPERATE_VOLTS)) + " at "
                            + celsius(k.value(ParamKeys.REFERENCE_TEMPERATURE_CELSIUS)) + ", copper law): " + Quantities.pct1(v / mo)
                            + " of it" + (st == CheckStatus.FAIL ? ", so the relay may not operate."
                            : st == CheckStatus.WARN ? ", short of the " + Quantities.pct1(wanted) + " margin RC-18 wants."
                            : "; RC-18 wants at least " + Quantities.pct1(wanted) + ".")));
        }

        private Optional<Measure> releases(Solved s) {
            if (s.off().isEmpty()) {
                return Optional.empty();
            }
            Part k = s.relay();
            Readout op = s.off().get();
            double v = Math.abs(op.coilVoltage());
            double t = op.coilTemperature();
            double mr = PartPhysics.coilVoltsAt(k, k.value(ParamKeys.MUST_RELEASE_VOLTS), t);
            double wanted = 1 - o.releaseMarginFraction();
            CheckStatus st = v <= mr * wanted ? CheckStatus.PASS : v <= mr ? CheckStatus.WARN : CheckStatus.FAIL;
            return Optional.of(new Measure(v, mr, st, 1 - v / mr,
                    () -> "With the pin low the coil sees " + volts(v) + " against must-release " + volts(mr) + " at a coil"
                            + " temperature of " + celsius(t) + ": " + Quantities.pct1(v / mr) + " of it"
                            + (st == CheckStatus.FAIL ? ", so the relay may not release."
                            : st == CheckStatus.WARN ? ", above the " + Quantities.pct1(wanted) + " RC-18 allows."
                            : "; RC-18 allows up to " + Quantities.pct1(wanted) + ".")));
        }

        private Optional<Measure> coilVoltage(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            Part k = s.relay();
            double v = Math.abs(s.on().get().coilVoltage());
            double pctMax = k.value(ParamKeys.MAX_COIL_VOLTAGE_PERCENT);
            double limit = k.value(ParamKeys.RATED_VOLTS) * pctMax / 100;
            CheckStatus st = v <= limit ? CheckStatus.PASS : CheckStatus.FAIL;
            return Optional.of(new Measure(v, limit, st, 1 - v / limit,
                    () -> "Coil voltage " + volts(v) + " against the maximum allowable " + volts(limit) + " ("
                            + Quantities.pct1(pctMax / 100) + " of the " + volts(k.value(ParamKeys.RATED_VOLTS)) + " rated voltage, at "
                            + celsius(k.value(ParamKeys.REFERENCE_TEMPERATURE_CELSIUS)) + "; the datasheet's maximum falls with"
                            + " ambient)."));
        }

        private Optional<Measure> coilTemperature(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            Part k = s.relay();
            Readout op = s.on().get();
            double t = op.coilTemperature();
            double ta = s.variant().stage().conditions().ambientCelsius();
            double p = Math.abs(op.coilVoltage() * op.coilCurrent());
            double limit = k.value(ParamKeys.INSULATION_CLASS_CELSIUS);
            CheckStatus st = t <= limit ? CheckStatus.PASS : CheckStatus.FAIL;
            return Optional.of(new Measure(t, limit, st, limit - t,
                    () -> "Coil at " + celsius(t) + " (ambient " + celsius(ta) + " + "
                            + EngineeringNotation.format(p, Unit.WATT) + " × "
                            + EngineeringNotation.format(k.value(ParamKeys.COIL_THERMAL_RESISTANCE_KELVIN_PER_WATT), Unit.KELVIN_PER_WATT)
                            + ", mean winding temperature) against the " + celsius(limit) + " limit of its insulation"
                            + InsulationClass.words(limit) + "."));
        }

        private Optional<Measure> saturated(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            Part q = s.switchPart();
            Readout op = s.on().get();
            double margin;
            Supplier<String> why;
            if (q.kind() == PartKind.NPN || q.kind() == PartKind.PNP) {
                double ic = op.ic();
                double ib = op.ib();
                double beta = q.value(ParamKeys.BETA_FORWARD);
                double m = ic > 0 && ib > 0 ? beta * ib / ic : 0;
                margin = m;
                why = () -> "Gain " + ratio(beta) + " × IB " + amps(ib) + " ÷ IC " + amps(ic) + " = ×" + ratio(m)
                        + " overdrive; below ×1 the switch leaves saturation, and ×" + ratio(o.saturationPassMargin())
                        + " is wanted (common practice).";
            } else {
                Optional<SwitchVerdict> v = op.verdict();
                margin = v.map(SwitchVerdict::margin).orElse(0.0);
                why = () -> capital(v.map(SwitchVerdict::reason).orElse("no switch verdict."))
                        + " Below ×1 the switch is not on; ×" + ratio(o.saturationPassMargin())
                        + " is wanted (common practice).";
            }
            CheckStatus st = margin >= o.saturationPassMargin() ? CheckStatus.PASS : margin >= 1 ? CheckStatus.WARN
                    : CheckStatus.FAIL;
            return Optional.of(new Measure(margin, 1, st, margin - 1, why));
        }

        private Optional<Measure> switchCurrent(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            Part q = s.switchPart();
            double i = Math.abs(q.kind() == PartKind.NMOS ? s.on().get().id() : s.on().get().ic());
            double rating = q.value(q.kind() == PartKind.NMOS ? ParamKeys.ID_MAX_AMPS : ParamKeys.IC_MAX_AMPS);
            String name = q.kind() == PartKind.NMOS ? "ID max" : q.kind() == PartKind.DARLINGTON ? "output current max"
                    : "IC max";
            return Optional.of(rated(i, rating, Unit.AMPERE, name, q.ref() + " carries"));
        }

        private Optional<Measure> pinCurrent(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            double i = Math.abs(s.on().get().pinCurrent());
            double limit = s.pin().value(ParamKeys.PIN_CURRENT_LIMIT_AMPS);
            return Optional.of(rated(i, limit, Unit.AMPERE, "per-pin limit", "The pin sources"));
        }

        private Optional<Measure> packageCurrent(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            Part u = s.pin();
            double n = u.value(ParamKeys.CHANNEL_COUNT);
            double i = n * Math.abs(s.on().get().pinCurrent());
            double limit = u.value(ParamKeys.PACKAGE_CURRENT_LIMIT_AMPS);
            return Optional.of(rated(i, limit, Unit.AMPERE, "package limit",
                    n == 1 ? "One channel draws" : String.format(java.util.Locale.ROOT, "%.0f", n) + " channels draw"));
        }

        /**
         * A value against a derated rating: the limit is rating × the derating fraction, and a value
         * beyond it fails. The explanation names what is derated and by how much.
         */
        private Measure rated(double value, double rating, Unit unit, String ratingName, String what) {
            double limit = rating * o.ratingUseFraction();
            CheckStatus st = value <= limit ? CheckStatus.PASS : CheckStatus.FAIL;
            return new Measure(value, limit, st, 1 - value / rating,
                    () -> what + " " + EngineeringNotation.format(value, unit) + " against " + derated(rating, unit, ratingName)
                            + ".");
        }

        /** "the 60.0 V VCEO, 80 % derating → 48.0 V limit". */
        private String derated(double rating, Unit unit, String ratingName) {
            return "the " + EngineeringNotation.format(rating, unit) + " " + ratingName + ", "
                    + Quantities.pct1(o.ratingUseFraction()) + " derating → "
                    + EngineeringNotation.format(rating * o.ratingUseFraction(), unit) + " limit";
        }

        private Optional<Measure> junction(Solved s) {
            if (s.on().isEmpty()) {
                return Optional.empty();
            }
            Part q = s.switchPart();
            double ta = s.variant().stage().conditions().ambientCelsius();
            double n = q.kind() == PartKind.DARLINGTON ? q.value(ParamKeys.CHANNEL_COUNT) : 1;
            double p = Math.max(0, s.on().get().switchPowerWatts()) * n;
            double rth = q.value(ParamKeys.THERMAL_RESISTANCE_KELVIN_PER_WATT);
            double tj = ThermalBudget.junctionCelsius(ta, p, rth);
            double max = q.value(ParamKeys.TJ_MAX_CELSIUS);
            double pass = max - o.thermalMarginKelvin();
            CheckStatus st = tj <= pass ? CheckStatus.PASS : CheckStatus.FAIL;
            return Optional.of(new Measure(tj, pass, st, max - tj,
                    () -> "Tj = " + celsius(ta) + " + " + EngineeringNotation.format(p, Unit.WATT) + " × "
                            + EngineeringNotation.format(rth, Unit.KELVIN_PER_WATT) + " = " + celsius(tj) + " against Tj(max) "
                            + celsius(max) + " less a " + EngineeringNotation.format(o.thermalMarginKelvin(), Unit.KELVIN)
                            + " margin → " + celsius(pass) + " limit."));
        }

        // ------------------------------------------------------------------ static estimates

        private CheckResult switchVoltage(SuppressorEstimate sup, double i0) {
            Part q = stage.require(roles.switchRef());
            Part v = stage.require(roles.coilSupplyRef().orElseThrow());
            double vs = PartPhysics.supplyMax(v);
            double rating = q.value(q.kind() == PartKind.NMOS ? ParamKeys.VDSS_VOLTS : ParamKeys.VCEO_VOLTS);
            List<String> refs = new ArrayList<>(List.of(q.ref()));
            refs.addAll(sup.refs());
            if (!sup.clamps()) {
                return new CheckResult("rating.switch-voltage", CheckStatus.FAIL, Double.POSITIVE_INFINITY,
                        rating * o.ratingUseFraction(), Unit.VOLT, Map.of(), "", STATIC,
                        "Nothing clamps the coil: at turn-off the switch sees several hundred volts (SU-0; 1000–1500 V"
                                + " for an unsuppressed 12 V relay, SU-1), far beyond " + derated(rating, Unit.VOLT,
                                switchVoltageName(q)) + ".",
                        refs);
            }
            double peak = sup.peakSwitchVolts(vs, Double.isNaN(i0) ? 0 : i0);
            Measure m = rated(peak, rating, Unit.VOLT, switchVoltageName(q), "Peak switch voltage VS,max + Vc + I0·Rs = "
                    + volts(vs) + " + " + volts(sup.clampVolts())
                    + (sup.seriesOhms() > 0 ? " + " + amps(i0) + " × " + Quantities.ohms(sup.seriesOhms()) : "")
                    + " (" + sup.description() + ") =");
            return new CheckResult("rating.switch-voltage", m.status(), m.value(), m.limit(), Unit.VOLT, Map.of(),
                    "supply at its maximum, largest coil current", STATIC, m.explanation(), refs);
        }

        private Optional<CheckResult> suppressorCurrent(SuppressorEstimate sup, double i0) {
            // a channel's own clamp diode is rated like its output (from memory); else the diode or zener's peak rating
            Optional<Part> diode = sup.refs().stream().map(stage::require)
                    .filter(p -> p.kind() == PartKind.DIODE || p.kind() == PartKind.ZENER || p.kind() == PartKind.DARLINGTON)
                    .findFirst();
            if (diode.isEmpty() || Double.isNaN(i0)) {
                return Optional.empty();
            }
            boolean channel = diode.get().kind() == PartKind.DARLINGTON;
            double rating = diode.get().value(channel ? ParamKeys.IC_MAX_AMPS : ParamKeys.MAX_CURRENT_AMPS);
            Measure m = rated(i0, rating, Unit.AMPERE, channel ? "output rating (taken for the clamp diode)" : "peak rating",
                    (channel ? diode.get().ref() + "'s clamp diode" : diode.get().ref()) + " carries the coil current at"
                            + " turn-off,");
            return Optional.of(new CheckResult("rating.suppressor-current", m.status(), m.value(), m.limit(), Unit.AMPERE,
                    Map.of(), "largest coil current", "peak suppressor current = coil current at turn-off", m.explanation(),
                    List.of(diode.get().ref())));
        }

        private CheckResult releaseTime(SuppressorEstimate sup, double i0, double requirement) {
            Part k = stage.require(roles.relayRef());
            double l = k.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES) > 0 ? k.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES)
                    : k.value(ParamKeys.INDUCTANCE_RELEASED_HENRIES);
            double r = k.value(ParamKeys.COIL_RESISTANCE_OHMS);
            double drop = k.value(ParamKeys.MUST_RELEASE_VOLTS) / r;
            double t = Double.isNaN(i0) ? Double.NaN : sup.decaySeconds(r, l, i0, drop);
            CheckStatus st = t <= requirement ? CheckStatus.PASS : CheckStatus.FAIL;
            return new CheckResult("relay.release-time", st, t, requirement, Unit.SECOND, Map.of(),
                    "largest coil current, nominal coil", STATIC + "; the armature's own release time comes on top",
                    "Through " + sup.description() + " the coil current falls from " + amps(i0) + " to drop-out ("
                            + amps(drop) + ") in " + EngineeringNotation.format(t, Unit.SECOND) + "; required "
                            + EngineeringNotation.format(requirement, Unit.SECOND) + ".",
                    List.of(k.ref()));
        }

        // ------------------------------------------------------------------ transient turn-off

        /** The turn-off run at the largest-current corner, if the transient engine manages it. */
        private Optional<TurnOff> turnOff(SuppressorEstimate sup, double i0) {
            Map<String, Double> levels = new LinkedHashMap<>();
            levels.put("supply", 1.0);
            levels.put("coil-resistance", -1.0);
            levels.put("ambient", -1.0);
            Map<String, Double> present = new LinkedHashMap<>();
            for (Factor f : factors) {
                if (levels.containsKey(f.id())) {
                    present.put(f.id(), levels.get(f.id()));
                }
            }
            Stage s = Corners.at(stage, factors, present);
            Part k = s.require(roles.relayRef());
            double l = Math.max(k.value(ParamKeys.INDUCTANCE_RELEASED_HENRIES), k.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES));
            double guess = sup.decaySeconds(k.value(ParamKeys.COIL_RESISTANCE_OHMS), l, Double.isNaN(i0) ? 0.03 : i0,
                    k.value(ParamKeys.MUST_RELEASE_VOLTS) / k.value(ParamKeys.COIL_RESISTANCE_OHMS));
            double window = Math.min(TRANSIENT_MAX_WINDOW_SECONDS, Math.max(TransientOptions.DEFAULT_DURATION_SECONDS,
                    TransientOptions.DEFAULT_EDGE_SECONDS + 3 * (Double.isFinite(guess) ? guess : 0)
                            + k.value(ParamKeys.RELEASE_TIME_SECONDS) * 2));
            try {
                TransientResult r = TransientAnalysis.run(s, TransientOptions.turnOff().withDuration(window));
                Map<String, Double> corner = new LinkedHashMap<>();
                List<String> words = new ArrayList<>();
                for (Factor f : factors) {
                    if (present.containsKey(f.id())) {
                        corner.put(f.id(), f.valueAt(present.get(f.id())));
                        words.add(f.word() + " " + f.describe(present.get(f.id())));
                    }
                }
                return Optional.of(new TurnOff(r.metrics(), s, corner, String.join(", ", words)));
            } catch (TransientFailureException | SolverException e) {
                findings.add(new Finding(Severity.INFO, "check.transient-failed", roles.switchRef(), "",
                        "The transient engine could not run the turn-off (" + e.getMessage()
                                + "); the turn-off checks use the closed-form estimates."));
                return Optional.empty();
            }
        }

        private CheckResult transientSwitchVoltage(TurnOff t, SuppressorEstimate sup) {
            Part q = t.stage().require(roles.switchRef());
            double rating = q.value(q.kind() == PartKind.NMOS ? ParamKeys.VDSS_VOLTS : ParamKeys.VCEO_VOLTS);
            double peak = t.metrics().peakSwitchVolts();
            Measure m = rated(peak, rating, Unit.VOLT, switchVoltageName(q), "Peak switch voltage at turn-off ("
                    + sup.description() + ")");
            CheckStatus st = t.metrics().switchBreakdown() ? CheckStatus.FAIL : m.status();
            String why = t.metrics().switchBreakdown()
                    ? "At turn-off (suppressor: " + sup.description() + ") the switch goes into avalanche at "
                            + volts(peak) + " and absorbs " + EngineeringNotation.format(t.metrics().switchEnergyJoules(),
                            Unit.JOULE) + ", beyond " + derated(rating, Unit.VOLT, switchVoltageName(q)) + "."
                    : m.explanation();
            List<String> refs = new ArrayList<>(List.of(q.ref()));
            refs.addAll(sup.refs());
            return new CheckResult("rating.switch-voltage", st, peak, m.limit(), Unit.VOLT, t.corner(), t.cornerText(),
                    TRANSIENT, why, refs);
        }

        private Optional<CheckResult> transientSuppressorCurrent(TurnOff t, SuppressorEstimate sup) {
            Optional<Part> diode = sup.refs().stream().map(stage::require)
                    .filter(p -> p.kind() == PartKind.DIODE || p.kind() == PartKind.ZENER || p.kind() == PartKind.DARLINGTON)
                    .findFirst();
            if (diode.isEmpty()) {
                return Optional.empty();
            }
            boolean channel = diode.get().kind() == PartKind.DARLINGTON;
            double rating = diode.get().value(channel ? ParamKeys.IC_MAX_AMPS : ParamKeys.MAX_CURRENT_AMPS);
            double peak = t.metrics().peakSuppressorAmps();
            Measure m = rated(peak, rating, Unit.AMPERE, channel ? "output rating (taken for the clamp diode)"
                    : "peak rating", "Peak suppressor current");
            return Optional.of(new CheckResult("rating.suppressor-current", m.status(), peak, m.limit(), Unit.AMPERE,
                    t.corner(), t.cornerText(), TRANSIENT, m.explanation(), List.of(diode.get().ref())));
        }

        private CheckResult transientReleaseTime(TurnOff t, double requirement) {
            double rt = t.metrics().releaseTimeSeconds();
            CheckStatus st = Double.isNaN(rt) ? CheckStatus.FAIL : rt <= requirement ? CheckStatus.PASS : CheckStatus.FAIL;
            String why = Double.isNaN(rt) ? "The contacts had not opened by the end of the run."
                    : "The contacts open " + EngineeringNotation.format(rt, Unit.SECOND) + " after the turn-off edge (coil"
                            + " current to drop-out in " + EngineeringNotation.format(t.metrics().decayToReleaseCurrentSeconds(),
                            Unit.SECOND) + "); required " + EngineeringNotation.format(requirement, Unit.SECOND) + ".";
            return new CheckResult("relay.release-time", st, rt, requirement, Unit.SECOND, t.corner(), t.cornerText(),
                    TRANSIENT, why, List.of(roles.relayRef()));
        }

        // ------------------------------------------------------------------ worst variant

        private CheckResult worst(String id, List<Solved> variants, Function<Solved, Optional<Measure>> measure,
                                  Unit unit, String method, List<String> refs) {
            Measure worst = null;
            Solved at = null;
            int judged = 0;
            for (Solved s : variants) {
                Optional<Measure> m = measure.apply(s);
                if (m.isEmpty()) {
                    continue;
                }
                judged++;
                if (worst == null || m.get().margin() < worst.margin()) {
                    worst = m.get();
                    at = s;
                }
            }
            if (worst == null) {
                return new CheckResult(id, CheckStatus.WARN, Double.NaN, Double.NaN, unit, Map.of(), "", method,
                        "Not judged: the DC engine solved none of the corners.", refs);
            }
            Map<String, Double> corner = new LinkedHashMap<>();
            List<String> words = new ArrayList<>();
            for (Factor f : factors) {
                double level = at.variant().level(f.id());
                corner.put(f.id(), f.valueAt(level));
                words.add(f.word() + " " + f.describe(level));
            }
            String note = judged < variants.size() ? " (" + judged + " of " + variants.size() + " corners solved)" : "";
            return new CheckResult(id, worst.status(), worst.value(), worst.limit(), unit, corner,
                    String.join(", ", words), method, worst.explanation() + note, refs);
        }

        // ------------------------------------------------------------------ Monte Carlo

        private YieldResult monteCarlo(List<Solved> corners) {
            List<Function<Solved, Optional<Measure>>> functional = List.of(this::operates, this::releases, this::saturated);
            // main effect of each factor on each functional check's margin, from the corners
            double[][] effect = new double[functional.size()][factors.size()];
            for (int c = 0; c < functional.size(); c++) {
                double[] hi = new double[factors.size()];
                double[] lo = new double[factors.size()];
                int[] nHi = new int[factors.size()];
                int[] nLo = new int[factors.size()];
                for (Solved s : corners) {
                    Optional<Measure> m = functional.get(c).apply(s);
                    if (m.isEmpty()) {
                        continue;
                    }
                    for (int j = 0; j < factors.size(); j++) {
                        if (s.variant().level(factors.get(j).id()) > 0) {
                            hi[j] += m.get().margin();
                            nHi[j]++;
                        } else {
                            lo[j] += m.get().margin();
                            nLo[j]++;
                        }
                    }
                }
                for (int j = 0; j < factors.size(); j++) {
                    effect[c][j] = nHi[j] > 0 && nLo[j] > 0 ? hi[j] / nHi[j] - lo[j] / nLo[j] : 0;
                }
            }
            // one sample at a time: a sample is judged and dropped, so the run keeps no stage of it
            Iterator<Variant> samples = Corners.monteCarloSamples(stage, factors, o.monteCarloSamples(), o.seed());
            int passed = 0;
            int unsolved = 0;
            Map<String, Integer> culprits = new LinkedHashMap<>();
            while (samples.hasNext()) {
                Variant v = samples.next();
                Solved s = solveVariant(v, "Monte Carlo sample " + v.index());
                if (s.on().isEmpty() || s.off().isEmpty()) {
                    unsolved++;
                    continue;
                }
                int failing = -1;
                for (int c = 0; c < functional.size() && failing < 0; c++) {
                    Optional<Measure> m = functional.get(c).apply(s);
                    if (m.isPresent() && m.get().status() == CheckStatus.FAIL) {
                        failing = c;
                    }
                }
                if (failing < 0) {
                    passed++;
                    continue;
                }
                int best = -1;
                double most = 0;
                for (int j = 0; j < factors.size(); j++) {
                    double contribution = effect[failing][j] * v.level(factors.get(j).id()) / 2;
                    if (contribution < most) {
                        most = contribution;
                        best = j;
                    }
                }
                if (best >= 0) {
                    culprits.merge(factors.get(best).id(), 1, Integer::sum);
                }
            }
            Optional<String> top = culprits.entrySet().stream().max(Map.Entry.comparingByValue()).map(Map.Entry::getKey);
            return new YieldResult(o.monteCarloSamples(), o.seed(), passed, unsolved, culprits, top);
        }

        // ------------------------------------------------------------------ safety

        private void cautions(TopologyReport topo) {
            List<String> supplies = topo.roles().map(StageRoles::contactSupplyRefs).orElse(List.of());
            for (String ref : supplies) {
                Part v = stage.require(ref);
                boolean ac = v.option(ParamKeys.WAVEFORM).equals("ac-rms");
                double volts = Math.abs(v.value(ParamKeys.VOLTS)) * (1 + v.value(ParamKeys.TOLERANCE_PERCENT) / 100);
                double limit = ac ? o.selvAcRmsVolts() : o.selvDcVolts();
                if (volts <= limit) {
                    continue;
                }
                String what = volts(volts) + (ac ? " AC rms" : " DC");
                caution("caution.above-selv", ref, "The contact side (" + ref + ", up to " + what + ") is above safety"
                        + " extra-low voltage (" + volts(limit) + (ac ? " AC rms" : " ripple-free DC") + "): these checks"
                        + " judge the coil drive and the contacts against their ratings, and say nothing about the safety"
                        + " of the contact circuit.");
                caution("caution.creepage-clearance", ref, "Keep the creepage and clearance distances between the"
                        + " contact circuit and the logic side that the working voltage and pollution degree require.");
                caution("caution.fusing", ref, "Fuse the contact circuit for its load and wiring.");
                caution("caution.enclosure", ref, "Put live contact-side parts in an enclosure that keeps fingers and"
                        + " tools out.");
                caution("caution.qualified-installation", ref, "Have the installation done and checked by a qualified"
                        + " person, following local electrical codes and licensed practice.");
                return;
            }
        }

        private void caution(String key, String ref, String message) {
            findings.add(new Finding(Severity.WARNING, key, ref, "", message));
        }

        private static String capital(String words) {
            String w = words.strip();
            return w.isEmpty() ? w : Character.toUpperCase(w.charAt(0)) + w.substring(1) + (w.endsWith(".") ? "" : ".");
        }

        private static String switchVoltageName(Part q) {
            return q.kind() == PartKind.NMOS ? "VDSS" : q.kind() == PartKind.DARLINGTON ? "VCE max" : "VCEO";
        }

        private boolean isDarlington() {
            return roles.topology() == DriverTopology.DARLINGTON_CHANNEL;
        }
    }






    /** "1 channel", "6 channels"; a fraction (a share of a package) keeps its digits. */
    static String channelWords(double n) {
        if (n == Math.rint(n) && Math.abs(n) < 1e9) {
            return (long) n + (n == 1 ? " channel" : " channels");
        }
        return org.armature.units.EngineeringNotation.format(n, org.armature.units.Unit.RATIO) + " channels";
    }
}
