package org.armature.analysis;

import org.armature.model.ParamKeys;
import org.armature.model.StageRoles;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.solver.SolverException;
import org.armature.solver.timedomain.ContactBreak;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientFailureException;
import org.armature.solver.timedomain.TransientMetrics;
import org.armature.solver.timedomain.TransientOptions;
import org.armature.units.ESeries;

/**
 * Ranks coil suppressors for a stage by release time and peak switch voltage, and proposes the
 * zener and TVS voltages (check-values.md "beyond the hand calculation" 1; SU-12, SU-15, SU-16).
 *
 * <p>Rules: the clamp may add at most Vc,max = f·Vrating − VS,max across the switch (f the
 * {@link Options#ratingUseFraction()}, default 80 %). The zener is about the supply voltage (SU-15):
 * the E24 value nearest VS, lowered to the largest E24 value with VZ + VF ≤ Vc,max when that is
 * exceeded. A TVS across the coil must never conduct in the on state: the smallest E24 breakdown
 * at or above 1.1·VS,max, and at most Vc,max. A resistor across the coil is taken equal to the coil
 * resistance (peak ≈ 2·VS).
 *
 * <p>Each candidate is the stage's template built with that suppressor, every other part keeping the
 * stage's values, at the largest-current corner (supply max, coil −tol, coldest ambient). With the
 * transient engine the figures are its peak switch voltage and its release time (turn-off edge to
 * the contacts opening); without it, or when a run fails, the closed forms of
 * {@link SuppressorEstimate} (coil-current decay to drop-out through a constant clamp, before the
 * armature moves). Each candidate says which was used.
 *
 * <p>{@link #contactProtection} does the same for the contacts of an inductive load: it proposes
 * an RC across the contacts by the rule of thumb ({@value #RC_OHMS_PER_CONTACT_VOLT} Ω per contact
 * volt, rounded to E12, and {@value #RC_FARADS_PER_CONTACT_AMP} F per contact amp, rounded up to
 * E6; check-values.md CT-7, common practice), a varistor clamping at the E24 value at or above
 * {@value #TVS_HEADROOM} × the rail's crest, and on DC a diode across the load, and checks each by
 * re-running the break ({@link ContactBreak}) at the highest rail.
 */
public final class SuppressorAdvisor {

    /** A TVS's breakdown sits at least this factor above the supply's maximum (common practice). */
    public static final double TVS_HEADROOM = 1.1;

    /** The lowest zener voltage proposed, 2.4 V: the bottom of the usual zener range (common practice). */
    public static final double MIN_ZENER_VOLTS = 2.4;

    /** Longest turn-off window run per candidate, 0.2 s: ten times a small relay's release. */
    public static final double MAX_WINDOW_SECONDS = 0.2;

    /** RC rule of thumb: resistance per contact volt, ohms per volt (CT-7: 0.5–1; common practice). */
    public static final double RC_OHMS_PER_CONTACT_VOLT = 0.5;

    /** RC rule of thumb: capacitance per contact amp, farads per amp (CT-7: 0.5–1 µF; common practice). */
    public static final double RC_FARADS_PER_CONTACT_AMP = 1e-6;

    private SuppressorAdvisor() {
    }

    /**
     * One contact protection, sized and checked by re-running the break.
     *
     * @param protection what it is
     * @param description plain words with its sizing ("RC across the contacts, 12 Ω + 680 nF")
     * @param ohms the RC's resistance, ohms (NaN otherwise)
     * @param farads the RC's capacitance, farads (NaN otherwise)
     * @param clampVolts the varistor's clamping voltage, volts (NaN otherwise)
     * @param peakContactVolts peak voltage across the opening contacts with it, volts (NaN when not
     *     re-run: on AC the arc clears at a current zero)
     * @param withinWithstand the peak is at or below the open-contact withstand
     * @param rule the sizing rule and its source
     */
    public record ContactCandidate(ContactBreak.Protection protection, String description, double ohms, double farads,
                                   double clampVolts, double peakContactVolts, boolean withinWithstand, String rule) {
    }

    /**
     * Contact protection for the inductive load of a stage's contact side, best first (within the
     * withstand before beyond it, then by peak contact voltage).
     *
     * @param stage the stage; not modified
     * @return the candidates; empty when the stage has no inductive load on its contacts
     */
    public static List<ContactCandidate> contactProtection(Stage stage) {
        Optional<StageRoles> roles = TopologyCheck.recognise(stage);
        if (roles.isEmpty()) {
            return List.of();
        }
        Optional<ContactChecks.Side> found = ContactChecks.side(stage, roles.get());
        if (found.isEmpty() || !found.get().physics().kind().inductive()) {
            return List.of();
        }
        return contactProtection(found.get());
    }

    /**
     * The sizes the rules give for a contact side: the RC by the rule of thumb and the varistor's
     * clamping voltage (see the class comment).
     *
     * @param rcOhms the RC's resistance, ohms (E12)
     * @param rcFarads the RC's capacitance, farads (E6)
     * @param varistorVolts the varistor's clamping voltage, volts (E24)
     */
    public record ContactSizing(double rcOhms, double rcFarads, double varistorVolts) {
    }

    /**
     * The contact protection sizes for a stage's contact side, whatever its load kind.
     *
     * @return the sizes; empty when the stage has no recognised contact rail and load
     */
    public static Optional<ContactSizing> contactSizing(Stage stage) {
        return TopologyCheck.recognise(stage).flatMap(r -> ContactChecks.side(stage, r)).map(SuppressorAdvisor::sizing);
    }

    private static ContactSizing sizing(ContactChecks.Side side) {
        double v = side.railMaxVolts();
        double i = side.physics().steadyAmps(v);
        double crest = v * (side.ac() ? Math.sqrt(2) : 1);
        return new ContactSizing(ESeries.E12.nearest(Math.max(1, RC_OHMS_PER_CONTACT_VOLT * v)),
                ESeries.E6.roundUp(Math.max(1e-9, RC_FARADS_PER_CONTACT_AMP * i)),
                ESeries.E24.roundUp(TVS_HEADROOM * crest));
    }

    static List<ContactCandidate> contactProtection(ContactChecks.Side side) {
        double v = side.railMaxVolts();
        double withstand = side.relay().value("contactWithstandVolts");
        ContactSizing size = sizing(side);
        double rs = size.rcOhms();
        double c = size.rcFarads();
        double vc = size.varistorVolts();
        List<ContactCandidate> out = new ArrayList<>();
        String rcRule = "rule of thumb: " + RC_OHMS_PER_CONTACT_VOLT + " Ω per contact volt, 1 µF per contact amp"
                + " (CT-7, common practice); capacitor rated for the rail's crest";
        String vRule = "the E24 value at or above " + TVS_HEADROOM + " × the rail's crest (stays off when the contacts"
                + " are open; common practice)";
        out.add(candidate(side, v, withstand, ContactBreak.Protection.RC, "RC across the contacts, "
                + Quantities.ohms(rs) + " + " + org.armature.units.EngineeringNotation.format(c,
                org.armature.units.Unit.FARAD), rs, c, Double.NaN, rcRule));
        out.add(candidate(side, v, withstand, ContactBreak.Protection.VARISTOR, "varistor across the contacts, "
                + Quantities.volts(vc) + " clamping", Double.NaN, Double.NaN, vc, vRule));
        if (!side.ac()) {
            out.add(candidate(side, v, withstand, ContactBreak.Protection.DIODE, "diode across the load (slows the"
                    + " load's own release, like a coil's freewheeling diode, SU-12)", Double.NaN, Double.NaN, Double.NaN,
                    "a rectifier rated for the rail and the load current (common practice)"));
        }
        out.sort(Comparator.comparing((ContactCandidate k) -> !k.withinWithstand())
                .thenComparingDouble(k -> Double.isNaN(k.peakContactVolts()) ? 0 : k.peakContactVolts()));
        return out;
    }

    private static ContactCandidate candidate(ContactChecks.Side side, double v, double withstand,
                                              ContactBreak.Protection p, String words, double ohms, double farads,
                                              double clamp, String rule) {
        if (side.ac()) {
            return new ContactCandidate(p, words, ohms, farads, clamp, Double.NaN, true,
                    rule + "; on AC the arc clears at a current zero, so the break is not re-run");
        }
        ContactBreak.Setup base = ContactChecks.setup(side, v);
        ContactBreak.Setup setup = base.with(p, Double.isNaN(ohms) ? 0 : ohms, Double.isNaN(farads) ? 0 : farads,
                Double.isNaN(clamp) ? 0 : clamp);
        try {
            double peak = ContactBreak.run(setup).peakContactVolts();
            return new ContactCandidate(p, words, ohms, farads, clamp, peak, peak <= withstand, rule);
        } catch (TransientFailureException | SolverException e) {
            return new ContactCandidate(p, words, ohms, farads, clamp, Double.NaN, false,
                    rule + "; the re-run failed: " + e.getMessage());
        }
    }

    /**
     * What to rank and how.
     *
     * @param releaseRequirementSeconds the user's release-time requirement, if any
     * @param useTransient use the transient engine (default true)
     * @param ratingUseFraction share of the switch's voltage rating the peak may reach (default 0.8)
     * @param forwardDropVolts diode drop in the closed forms (default 0.7 V)
     * @param candidates the suppressors to compare (default diode, diode + zener, TVS, resistor)
     */
    public record Options(OptionalDouble releaseRequirementSeconds, boolean useTransient, double ratingUseFraction,
                          double forwardDropVolts, List<Suppressor> candidates) {

        /** The defaults named above. */
        public static final Options DEFAULT = new Options(OptionalDouble.empty(), true, 0.8, 0.7,
                List.of(Suppressor.DIODE, Suppressor.DIODE_ZENER, Suppressor.TVS, Suppressor.RESISTOR));

        public Options {
            if (releaseRequirementSeconds == null || candidates == null) {
                throw new IllegalArgumentException("releaseRequirementSeconds and candidates must not be null");
            }
            if (!(ratingUseFraction > 0 && ratingUseFraction <= 1) || !(forwardDropVolts > 0)) {
                throw new IllegalArgumentException("ratingUseFraction must be in (0, 1] and forwardDropVolts positive");
            }
            candidates = List.copyOf(candidates);
        }

        /** The same options with or without the transient engine. */
        public Options withTransient(boolean on) {
            return new Options(releaseRequirementSeconds, on, ratingUseFraction, forwardDropVolts, candidates);
        }

        /** The same options with a release-time requirement, seconds. */
        public Options withReleaseRequirement(double seconds) {
            return new Options(OptionalDouble.of(seconds), useTransient, ratingUseFraction, forwardDropVolts, candidates);
        }

        /** The same options comparing other candidates. */
        public Options withCandidates(List<Suppressor> list) {
            return new Options(releaseRequirementSeconds, useTransient, ratingUseFraction, forwardDropVolts, list);
        }
    }

    /**
     * One suppressor option with its figures.
     *
     * @param suppressor the kind
     * @param description plain words ("diode + 12.0 V zener")
     * @param peakSwitchVolts peak switch voltage at turn-off, V
     * @param releaseSeconds release figure: the transient engine's release time, or the closed-form
     *     decay to drop-out (see {@code method}), s
     * @param withinRating peak at or below the rating times the use fraction, and no avalanche
     * @param meetsRequirement against the release requirement, when one was given
     * @param method "transient engine" or "closed form (decay to drop-out before the armature moves)"
     */
    public record Candidate(Suppressor suppressor, String description, double peakSwitchVolts, double releaseSeconds,
                            boolean withinRating, Optional<Boolean> meetsRequirement, String method) {
    }

    /**
     * The ranking.
     *
     * @param ranked best first: within rating before beyond it, then by release figure
     * @param proposedZenerVolts the zener voltage proposed (NaN when no zener fits the rating)
     * @param proposedTvsVolts the TVS breakdown proposed (NaN when none fits)
     * @param switchRatingVolts the switch's VCEO / VDSS, V
     * @param findings problems met ({@code suppressor.*})
     */
    public record Ranking(List<Candidate> ranked, double proposedZenerVolts, double proposedTvsVolts,
                          double switchRatingVolts, List<Finding> findings) {
        public Ranking {
            ranked = List.copyOf(ranked);
            findings = List.copyOf(findings);
        }
    }

    /** Ranks with the default options. */
    public static Ranking rank(Stage stage) {
        return rank(stage, Options.DEFAULT);
    }

    /**
     * Ranks the candidates for a stage.
     *
     * @param stage the stage; not modified
     * @param options what to compare and how
     * @return the ranking; empty with a finding when the stage is not recognised
     */
    public static Ranking rank(Stage stage, Options options) {
        List<Finding> findings = new ArrayList<>();
        Optional<StageRoles> found = TopologyCheck.recognise(stage);
        if (found.isEmpty() || found.get().coilSupplyRef().isEmpty()) {
            findings.add(new Finding(Severity.WARNING, "suppressor.not-recognised", "", "",
                    "Suppressors can be compared only on one of the four driver stages with a coil supply."));
            return new Ranking(List.of(), Double.NaN, Double.NaN, Double.NaN, findings);
        }
        StageRoles roles = found.get();
        Part q = stage.require(roles.switchRef());
        Part v = stage.require(roles.coilSupplyRef().get());
        Part k = stage.require(roles.relayRef());
        double rating = q.value(q.kind() == PartKind.NMOS ? ParamKeys.VDSS_VOLTS : ParamKeys.VCEO_VOLTS);
        double vs = Math.abs(v.value(ParamKeys.VOLTS));
        double vsMax = PartPhysics.supplyMax(v);
        double clampMax = options.ratingUseFraction() * rating - vsMax;
        ESeries e24 = ESeries.E24;
        double vf = options.forwardDropVolts();
        double zener = Double.NaN;
        if (clampMax - vf >= MIN_ZENER_VOLTS) {
            zener = e24.nearest(vs);
            if (zener + vf > clampMax) {
                zener = e24.roundDown(clampMax - vf);
            }
        } else {
            findings.add(new Finding(Severity.WARNING, "suppressor.no-zener-fits", q.ref(), "",
                    "No zener fits: " + Quantities.volts(clampMax) + " of clamp is all the switch's rating leaves"
                            + " above the supply's maximum."));
        }
        double tvs = e24.roundUp(TVS_HEADROOM * vsMax);
        if (tvs > clampMax) {
            findings.add(new Finding(Severity.WARNING, "suppressor.no-tvs-fits", q.ref(), "",
                    "No TVS fits: one that stays off at " + Quantities.volts(vsMax) + " clamps above the "
                            + Quantities.volts(clampMax) + " the switch's rating leaves."));
            tvs = Double.NaN;
        }
        List<Factor> factors = Corners.factors(stage);
        Map<String, Double> levels = new LinkedHashMap<>();
        levels.put("supply", 1.0);
        levels.put("coil-resistance", -1.0);
        levels.put("ambient", -1.0);
        double coilMin = PartPhysics.coilOhms(k, 1 - k.value(ParamKeys.COIL_RESISTANCE_TOLERANCE_PERCENT) / 100,
                stage.conditions().ambientMinCelsius());
        double i0 = vsMax / coilMin;
        double henries = k.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES) > 0 ? k.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES)
                : k.value(ParamKeys.INDUCTANCE_RELEASED_HENRIES);
        double dropOut = k.value(ParamKeys.MUST_RELEASE_VOLTS) / k.value(ParamKeys.COIL_RESISTANCE_OHMS);
        List<Candidate> out = new ArrayList<>();
        for (Suppressor s : options.candidates()) {
            if ((s == Suppressor.DIODE_ZENER && Double.isNaN(zener)) || (s == Suppressor.TVS && Double.isNaN(tvs))
                    || s == Suppressor.NONE) {
                continue;
            }
            Stage candidate = Corners.at(build(stage, roles, s, zener, tvs, k.value(ParamKeys.COIL_RESISTANCE_OHMS)), factors, levels);
            Optional<StageRoles> cr = TopologyCheck.recognise(candidate);
            if (cr.isEmpty()) {
                continue;
            }
            SuppressorEstimate est = SuppressorEstimate.of(candidate, cr.get(), vf);
            double peak = est.peakSwitchVolts(vsMax, i0);
            double release = est.decaySeconds(k.value(ParamKeys.COIL_RESISTANCE_OHMS), henries, i0, dropOut);
            boolean breakdown = false;
            String method = "closed form (decay to drop-out through a constant clamp, before the armature moves)";
            if (options.useTransient()) {
                try {
                    double window = Math.min(MAX_WINDOW_SECONDS, Math.max(TransientOptions.DEFAULT_DURATION_SECONDS,
                            TransientOptions.DEFAULT_EDGE_SECONDS + 3 * release + 2 * k.value(ParamKeys.RELEASE_TIME_SECONDS)));
                    TransientMetrics m = TransientAnalysis.run(candidate, TransientOptions.turnOff().withDuration(window))
                            .metrics();
                    peak = m.peakSwitchVolts();
                    release = m.releaseTimeSeconds();
                    breakdown = m.switchBreakdown();
                    method = "transient engine (turn-off edge to the contacts opening)";
                } catch (TransientFailureException | SolverException ex) {
                    method = method + "; the transient run failed: " + ex.getMessage();
                }
            }
            boolean within = !breakdown && peak <= options.ratingUseFraction() * rating;
            double rel = release;
            Optional<Boolean> meets = options.releaseRequirementSeconds().isPresent()
                    ? Optional.of(rel <= options.releaseRequirementSeconds().getAsDouble()) : Optional.empty();
            out.add(new Candidate(s, est.description(), peak, release, within, meets, method));
        }
        out.sort(Comparator.comparing((Candidate c) -> !c.withinRating())
                .thenComparingDouble(c -> Double.isNaN(c.releaseSeconds()) ? Double.POSITIVE_INFINITY : c.releaseSeconds()));
        return new Ranking(out, zener, tvs, rating, findings);
    }

    /**
     * The stage's template built with another suppressor, every part it shares with the stage (same
     * designator and kind) keeping the stage's values and options.
     */
    static Stage build(Stage stage, StageRoles roles, Suppressor s, double zenerVolts, double tvsVolts, double coilOhms) {
        StageTemplate t = StageTemplate.valueOf(roles.topology().name());
        Stage built = Templates.build(t, s, roles.highSideDrive().orElse(HighSideDrive.LEVEL_SHIFT))
                .withConditions(stage.conditions());
        final Stage template = built;
        List<String> fresh = TopologyCheck.recognise(built).map(StageRoles::suppressorRefs).orElse(List.of()).stream()
                .filter(ref -> template.require(ref).kind().isSuppressorKind()).toList();
        for (Part p : built.parts()) {
            if (fresh.contains(p.ref())) {
                continue;
            }
            Optional<Part> old = stage.part(p.ref()).filter(o -> o.kind() == p.kind());
            if (old.isPresent()) {
                built = built.withPart(new Part(p.ref(), p.kind(), old.get().values(), old.get().options(), p.placement()));
            }
        }
        for (String ref : fresh) {
            Part p = built.require(ref);
            if (p.kind() == PartKind.ZENER && !Double.isNaN(zenerVolts)) {
                built = built.withPart(p.with(ParamKeys.BREAKDOWN_VOLTS, zenerVolts));
            } else if (p.kind() == PartKind.TVS && !Double.isNaN(tvsVolts)) {
                built = built.withPart(p.with(ParamKeys.BREAKDOWN_VOLTS, tvsVolts));
            } else if (p.kind() == PartKind.RESISTOR && s == Suppressor.RESISTOR) {
                built = built.withPart(p.with(ParamKeys.RESISTANCE_OHMS, coilOhms));
            }
        }
        return built;
    }
}
