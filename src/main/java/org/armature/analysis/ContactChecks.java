package org.armature.analysis;

import org.armature.model.StageRoles;
import static org.armature.analysis.Quantities.amps;
import static org.armature.analysis.Quantities.celsius;
import static org.armature.analysis.Quantities.ohms;
import static org.armature.analysis.Quantities.volts;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.devices.ContactLoad;
import org.armature.devices.LoadKind;
import org.armature.model.Connectivity;
import org.armature.model.Finding;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinRef;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.solver.SolverException;
import org.armature.solver.timedomain.ContactBreak;
import org.armature.solver.timedomain.TransientFailureException;
import org.armature.units.EngineeringNotation;
import org.armature.units.PhysicalConstants;
import org.armature.units.Unit;

/**
 * The checks of the relay's contact side: the load's steady current and the contact-side voltage
 * against the contact rating that applies (AC or DC, from the contact-side rail's waveform), the
 * inrush at closing against the make rating, and for an inductive load the break, run by the
 * transient engine ({@link ContactBreak}). All are judged at the worst corner of the contact-side
 * supply tolerance (its highest voltage) and, for a lamp, the coldest ambient (coldest filament).
 *
 * <table>
 * <caption>contact check ids</caption>
 * <tr><th>id</th><th>judged</th><th>limit</th></tr>
 * <tr><td>{@code contact.current}</td><td>steady load current at the highest rail</td><td>the AC or DC
 *     contact current rating, derated like every rating (80 %)</td></tr>
 * <tr><td>{@code contact.voltage}</td><td>highest rail voltage (RMS on AC)</td><td>the AC or DC contact
 *     voltage rating, not derated (it is the switching rating itself)</td></tr>
 * <tr><td>{@code contact.inrush}</td><td>peak current at closing, by load kind ({@link ContactLoad})</td><td>the
 *     make rating, not derated</td></tr>
 * <tr><td>{@code contact.break}</td><td>inductive loads only: peak voltage across the opening contacts
 *     with the contact protection drawn (RC across the contacts, a TVS or varistor across them, a
 *     diode across a DC load); on AC the arc clears at a current zero and the gap recovers against
 *     the rail's crest</td><td>the open-contact withstand voltage</td></tr>
 * </table>
 *
 * <p>Finding {@code contact.load-power-mismatch} (warning): the load's rated power and the power
 * its resistance draws from the rail differ by more than {@value #POWER_MISMATCH_FRACTION} × (a
 * 12 W lamp label on a 230 V rail with a 48 Ω resistance).
 */
final class ContactChecks {

    /** Rated and drawn power may differ by this fraction before the finding (plausibility, common practice). */
    static final double POWER_MISMATCH_FRACTION = 0.25;

    private ContactChecks() {
    }

    /** The contact side as drawn: rail, load, contacts and any contact protection. */
    record Side(Part relay, Part supply, Part load, boolean ac, ContactLoad physics, ContactBreak.Protection protection,
                double snubberOhms, double snubberFarads, double clampVolts, List<String> protectionRefs) {

        double railMaxVolts() {
            return Math.abs(supply.value("volts")) * (1 + supply.value("tolerancePercent") / 100);
        }

        double ratedAmps() {
            return relay.value(ac ? "contactRatedAmps" : "contactRatedDcAmps");
        }

        double ratedVolts() {
            return relay.value(ac ? "contactRatedVolts" : "contactRatedDcVolts");
        }

        String acdc() {
            return ac ? "AC" : "DC";
        }

        String loadWords() {
            String cat = physics.kind().category(ac);
            return load.ref() + " (" + physics.kind().id() + (cat.isEmpty() ? "" : ", duty " + cat) + ")";
        }
    }

    /** The load's physics from its part. */
    static ContactLoad physics(Part load) {
        LoadKind kind;
        try {
            kind = LoadKind.of(load.option("loadKind"));
        } catch (IllegalArgumentException e) {
            kind = LoadKind.RESISTIVE; // the validator reports option.not-allowed; judge it as resistive
        }
        return new ContactLoad(kind, load.value("resistanceOhms"), load.value("inrushMultiple"),
                load.value("inrushSeconds"), load.value("powerFactor"), load.value("inductanceHenries"),
                load.value("filamentKelvin"), load.value("capacitanceFarads"), load.value("loopResistanceOhms"),
                load.value("forwardVolts"), load.value("ratedWatts"));
    }

    /** The contact side of a recognised stage, if it has a rail and a load. */
    static Optional<Side> side(Stage stage, StageRoles roles) {
        if (roles.contactSupplyRefs().isEmpty() || roles.loadRefs().isEmpty()) {
            return Optional.empty();
        }
        Part relay = stage.require(roles.relayRef());
        Part supply = stage.require(roles.contactSupplyRefs().get(0));
        Part load = stage.require(roles.loadRefs().get(0));
        boolean ac = supply.option("waveform").equals("ac-rms");
        Connectivity c = Connectivity.of(stage);
        String com = c.net(relay.ref(), "com");
        String no = c.net(relay.ref(), "no");
        String nc = c.net(relay.ref(), "nc");
        String other = c.pinsOn(no).size() > 1 ? no : nc;
        ContactBreak.Protection protection = ContactBreak.Protection.NONE;
        double rs = 0;
        double cs = 0;
        double vc = 0;
        List<String> refs = new ArrayList<>();
        for (Part p : stage.parts()) {
            if (p.kind().pins().size() != 2 || p.ref().equals(load.ref())) {
                continue;
            }
            String a = c.net(p.ref(), p.kind().pins().get(0).name());
            String b = c.net(p.ref(), p.kind().pins().get(1).name());
            boolean acrossContacts = (a.equals(com) && b.equals(other)) || (a.equals(other) && b.equals(com));
            if (acrossContacts && p.kind() == PartKind.TVS) {
                protection = ContactBreak.Protection.VARISTOR;
                vc = p.value("breakdownVolts");
                refs = List.of(p.ref());
            }
            if (p.kind() == PartKind.RESISTOR && (a.equals(com) || b.equals(com) || a.equals(other) || b.equals(other))) {
                String mid = a.equals(com) || a.equals(other) ? b : a;
                String end = a.equals(com) || b.equals(com) ? other : com;
                for (PinRef pr : c.pinsOn(mid)) {
                    Part q = stage.require(pr.ref());
                    if (q.kind() == PartKind.CAPACITOR && c.pinsOn(mid).size() == 2) {
                        String qa = c.net(q.ref(), "a");
                        String qb = c.net(q.ref(), "b");
                        if ((qa.equals(mid) && qb.equals(end)) || (qb.equals(mid) && qa.equals(end))) {
                            protection = ContactBreak.Protection.RC;
                            rs = p.value("resistanceOhms");
                            cs = q.value("capacitanceFarads");
                            refs = List.of(p.ref(), q.ref());
                        }
                    }
                }
            }
            if (p.kind() == PartKind.DIODE && !ac) {
                String la = c.net(load.ref(), "a");
                String lb = c.net(load.ref(), "b");
                String an = c.net(p.ref(), "a");
                String k = c.net(p.ref(), "k");
                // the load's end on the contact side is the one away from ground; the diode's cathode sits there
                String high = lb.equals(Connectivity.GROUND) ? la : lb;
                String low = high.equals(la) ? lb : la;
                if (k.equals(high) && an.equals(low)) {
                    protection = ContactBreak.Protection.DIODE;
                    refs = List.of(p.ref());
                }
            }
        }
        return Optional.of(new Side(relay, supply, load, ac, physics(load), protection, rs, cs, vc, refs));
    }

    /**
     * Runs the contact checks.
     *
     * @param findings receives {@code contact.load-power-mismatch} and {@code check.transient-failed}
     * @return the verdicts, empty when the stage has no contact rail or no load
     */
    static List<CheckResult> run(Stage stage, StageRoles roles, CheckOptions o, List<Finding> findings) {
        Optional<Side> found = side(stage, roles);
        if (found.isEmpty()) {
            return List.of();
        }
        Side s = found.get();
        List<CheckResult> out = new ArrayList<>();
        double vNom = Math.abs(s.supply().value("volts"));
        double vMax = s.railMaxVolts();
        double tolPct = s.supply().value("tolerancePercent");
        String railWords = volts(vMax) + " " + s.acdc() + " (" + volts(vNom) + " + "
                + EngineeringNotation.format(tolPct, Unit.PERCENT) + ")";
        Map<String, Double> corner = new LinkedHashMap<>();
        corner.put("contact-supply", vMax);
        String cornerText = "contact supply " + volts(vMax) + " (" + s.supply().ref() + " at its maximum)";
        List<String> refs = List.of(s.relay().ref(), s.load().ref());
        ContactLoad load = s.physics();

        double watts = s.load().value("ratedWatts");
        double drawn = load.powerWatts(vNom, s.ac());
        if (watts > 0 && Math.abs(drawn / watts - 1) > POWER_MISMATCH_FRACTION) {
            findings.add(new Finding(Severity.WARNING, "contact.load-power-mismatch", s.load().ref(), "",
                    s.load().ref() + " is labelled " + EngineeringNotation.format(watts, Unit.WATT) + " but its "
                            + ohms(s.load().value("resistanceOhms")) + " draws " + EngineeringNotation.format(drawn, Unit.WATT)
                            + " from the " + volts(vNom) + " " + s.acdc() + " rail; give the load's resistance for this rail"
                            + " (the contact checks use the resistance)."));
        }

        double i = load.steadyAmps(vMax);
        double rating = s.ratedAmps();
        double limit = rating * o.ratingUseFraction();
        out.add(new CheckResult("contact.current", i <= limit ? CheckStatus.PASS : CheckStatus.FAIL, i, limit, Unit.AMPERE,
                corner, cornerText, "steady load current at the highest contact-side rail vs the " + s.acdc()
                + " contact rating, " + Quantities.pct1(o.ratingUseFraction()) + " derating",
                s.loadWords() + " draws " + amps(i) + " at " + railWords + " against the " + amps(rating) + " " + s.acdc()
                        + " contact rating, " + Quantities.pct1(o.ratingUseFraction()) + " derating → " + amps(limit)
                        + " limit.", refs));

        double vRated = s.ratedVolts();
        out.add(new CheckResult("contact.voltage", vMax <= vRated ? CheckStatus.PASS : CheckStatus.FAIL, vMax, vRated,
                Unit.VOLT, corner, cornerText, "highest contact-side rail vs the " + s.acdc() + " contact voltage rating"
                + " (a switching rating; not derated)",
                "The contacts switch " + railWords + " against the " + volts(vRated) + " " + s.acdc() + " contact rating"
                        + (s.ac() ? "." : "; a DC rating is far below the AC one at the same current (CT-4)."), refs));

        double coldC = stage.conditions().ambientMinCelsius();
        double coldK = PhysicalConstants.celsiusToKelvin(coldC);
        double peak = load.inrushPeakAmps(vMax, s.ac(), coldK);
        double make = s.relay().value("contactMakeAmps");
        Map<String, Double> inrushCorner = new LinkedHashMap<>(corner);
        inrushCorner.put("ambient", coldC);
        out.add(new CheckResult("contact.inrush", peak <= make ? CheckStatus.PASS : CheckStatus.FAIL, peak, make,
                Unit.AMPERE, inrushCorner, cornerText + ", ambient " + celsius(coldC),
                "peak current at closing by load kind (CT-5, CT-6) vs the make rating (not derated)",
                s.load().ref() + " makes " + amps(peak) + " peak (" + inrushWords(s, vMax, coldK) + decayWords(s, vMax)
                        + ") against the " + amps(make) + " make rating.", refs));

        if (load.kind().inductive()) {
            breakCheck(s, vMax, i, corner, cornerText, findings).ifPresent(out::add);
        }
        return out;
    }

    private static String decayWords(Side s, double vMax) {
        double tau = s.physics().inrushSeconds(s.ac(), vMax);
        return tau > 0 ? ", decaying with τ = " + EngineeringNotation.format(tau, Unit.SECOND)
                + (s.physics().inrushSeconds() > 0 ? "" : " (typical)") : "";
    }

    private static String inrushWords(Side s, double vMax, double coldK) {
        ContactLoad load = s.physics();
        double m = load.inrushMultiple(s.ac(), coldK, vMax);
        String crest = s.ac() ? "√2 × " : "";
        String steady = amps(load.steadyAmps(vMax));
        if (load.inrushMultiple() > 0) {
            return crest + "×" + Quantities.ratio(m) + " (the load's own figure) × " + steady;
        }
        return switch (load.kind()) {
            case RESISTIVE, LED -> "no inrush: " + crest + steady;
            case LAMP -> crest + "cold filament at " + celsius(PhysicalConstants.kelvinToCelsius(coldK)) + ": R_hot/R_cold = ("
                    + String.format(java.util.Locale.ROOT, "%.0f K / %.0f K", load.filamentKelvin(), coldK)
                    + ")^1.2 = " + Quantities.ratio(m)
                    + " (tungsten law, CT-6) × " + steady;
            case MOTOR -> crest + "locked rotor ×" + Quantities.ratio(m) + " (typical, common practice, CT-5) × " + steady;
            case SOLENOID -> s.ac() ? crest + "open gap ×" + Quantities.ratio(m) + " (typical, common practice, CT-5) × "
                    + steady : "a DC solenoid's current rises with L/R: " + steady;
            case CAPACITIVE -> "the rail's crest " + volts(vMax * (s.ac() ? Math.sqrt(2) : 1)) + " over the "
                    + ohms(load.loopResistanceOhms()) + " loop resistance";
        };
    }

    private static Optional<CheckResult> breakCheck(Side s, double vMax, double i0, Map<String, Double> corner,
                                                    String cornerText, List<Finding> findings) {
        ContactLoad load = s.physics();
        double withstand = s.relay().value("contactWithstandVolts");
        List<String> refs = new ArrayList<>(List.of(s.relay().ref(), s.load().ref()));
        refs.addAll(s.protectionRefs());
        double minArcV = s.relay().value("minArcVolts");
        double minArcA = s.relay().value("minArcAmps");
        if (s.ac()) {
            double crest = vMax * Math.sqrt(2);
            return Optional.of(new CheckResult("contact.break", crest <= withstand ? CheckStatus.PASS : CheckStatus.FAIL,
                    crest, withstand, Unit.VOLT, corner, cornerText, "AC break: the arc clears at a current zero; the gap"
                    + " recovers against the rail's crest (closed form)",
                    "On AC the arc of " + s.loadWords() + " clears at the next current zero, within a half-cycle; the"
                            + " opened gap then holds the rail's crest " + volts(crest) + " against its " + volts(withstand)
                            + " withstand. The contact's AC-15 rating, where the datasheet gives one, covers this duty.",
                    refs));
        }
        ContactBreak.Setup setup = setup(s, vMax);
        try {
            ContactBreak.Result r = ContactBreak.run(setup);
            boolean arc = r.initialAmps() >= minArcA && r.peakContactVolts() >= minArcV;
            String why0 = "When the contacts part on " + s.loadWords() + " (" + ohms(setup.loadOhms()) + ", "
                    + EngineeringNotation.format(setup.loadHenries(), Unit.HENRY) + ", " + amps(r.initialAmps())
                    + ", stored ½·L·I² = " + EngineeringNotation.format(r.storedJoules(), Unit.JOULE) + ") with "
                    + s.protection().words() + (s.protectionRefs().isEmpty() ? "" : " (" + String.join(", ", s.protectionRefs()) + ")")
                    + ", the voltage across them peaks at " + volts(r.peakContactVolts()) + " against the "
                    + volts(withstand) + " open-contact withstand. "
                    + (arc ? "The arc conditions are met (≥ " + volts(minArcV) + " and ≥ " + amps(minArcA)
                            + ", contact material's minimum): an arc forms as they part"
                            + (s.protection() == ContactBreak.Protection.NONE
                            ? " and the stored energy goes into it." : "; the protection takes "
                            + EngineeringNotation.format(r.protectionJoules(), Unit.JOULE) + ".")
                    : "The arc conditions (" + volts(minArcV) + ", " + amps(minArcA) + ") are not met: no arc forms.");
            String why = why0;
            if (s.protection() != ContactBreak.Protection.NONE) {
                double bare = ContactBreak.run(setup.with(ContactBreak.Protection.NONE, 0, 0, 0)).peakContactVolts();
                why += " Without it they would see " + volts(bare) + ".";
            }
            boolean pass = r.peakContactVolts() <= withstand;
            if (!pass) {
                List<SuppressorAdvisor.ContactCandidate> advice = SuppressorAdvisor.contactProtection(s);
                if (!advice.isEmpty() && advice.get(0).withinWithstand()) {
                    SuppressorAdvisor.ContactCandidate best = advice.get(0);
                    why += " Proposed: " + best.description() + " (" + best.rule() + "); re-run, the contacts then peak at "
                            + volts(best.peakContactVolts()) + ".";
                    for (SuppressorAdvisor.ContactCandidate other : advice.subList(1, advice.size())) {
                        why += " " + capital(other.description()) + ": " + volts(other.peakContactVolts()) + ".";
                    }
                }
            }
            return Optional.of(new CheckResult("contact.break", pass ? CheckStatus.PASS
                    : CheckStatus.FAIL, r.peakContactVolts(), withstand, Unit.VOLT, corner, cornerText,
                    "transient engine: the contacts part on the inductive load at the highest rail", why, refs));
        } catch (TransientFailureException | SolverException e) {
            findings.add(new Finding(Severity.INFO, "check.transient-failed", s.load().ref(), "",
                    "The transient engine could not run the contact break (" + e.getMessage() + "); contact.break was not judged."));
            return Optional.empty();
        }
    }

    private static String capital(String words) {
        return words.isEmpty() ? words : Character.toUpperCase(words.charAt(0)) + words.substring(1);
    }

    /** The break of this side's load at a rail of {@code volts}, with the protection drawn. */
    static ContactBreak.Setup setup(Side s, double volts) {
        ContactLoad load = s.physics();
        double l = load.breakInductanceHenries(volts, false);
        return new ContactBreak.Setup(volts, load.breakResistanceOhms(false), l, ContactBreak.STRAY_FARADS,
                s.protection(), s.snubberOhms(), s.snubberFarads(),
                s.protection() == ContactBreak.Protection.VARISTOR ? Math.max(s.clampVolts(), volts * 1.01) : 0);
    }
}
