package org.armature.analysis.faults;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.armature.model.PartKind;

/**
 * The kinds of single fault, each written after the part's designator as {@code PART:KIND}
 * ({@code D1:short}, {@code Q1:ce-short}). Which kinds a part can have follows from its
 * {@link PartKind}; {@link FaultInjector} says how each one changes the stage.
 *
 * <p>The prior weight of each kind, per part class, is in {@link PriorTable} (published failure
 * rates and failure-mode shares, as recalled from memory); users may set their own ({@link Priors}).
 */
public enum FaultKind {
    /**
     * Open: a resistor or load 1 TΩ in place of its value; a diode a 1 TΩ resistor; a MOSFET channel
     * or Darlington output that carries no current; a ground symbol whose connection has opened.
     */
    OPEN("open"),
    /** Resistor, load, diode or capacitor shorted: 0.1 Ω. */
    SHORT("short"),
    /** Resistor drifted high, ×10. */
    DRIFT_UP("drift-x10"),
    /** Resistor drifted low, ×0.1. */
    DRIFT_DOWN("drift-x0.1"),
    /** Diode fitted the wrong way round (an assembly error). */
    REVERSED("reversed"),
    /** Bipolar collector–emitter short (0.1 Ω). */
    CE_SHORT("ce-short"),
    /** Bipolar base lead or base–emitter junction open. */
    BE_OPEN("be-open"),
    /** Bipolar base–collector junction open: the collector carries no current. */
    BC_OPEN("bc-open"),
    /** Bipolar base–emitter short (0.1 Ω). */
    BE_SHORT("be-short"),
    /** Bipolar gain fallen to a tenth of its model βF (degraded junction). */
    GAIN_LOW("gain-low"),
    /** MOSFET drain–source short (0.1 Ω). */
    DS_SHORT("ds-short"),
    /** MOSFET gate–source short (0.1 Ω, a punctured gate oxide). */
    GS_SHORT("gs-short"),
    /**
     * Darlington channel's clamp diode open (its common pin's bond or the diode itself): the
     * channel's {@code com} pin is cut from its net and joined back through 1 TΩ. At DC the clamp
     * never conducts (the output stays at or below the coil supply), so the readings equal the
     * healthy stage's and the dictionary puts it in the healthy stage's ambiguity group; at
     * turn-off the coil's flyback is then unclamped ({@code simulate --fault}).
     */
    CLAMP_OPEN("clamp-open"),
    /**
     * A track open between two named nets, written {@code NET~TOWARD:track-open}: on net NET, the
     * track to the parts that lead to net TOWARD is broken ({@link FaultInjector#cutNet}); these are
     * in every stage's single-fault set ({@link FaultCatalog#trackOpens}). The older spelling
     * {@code PART.PIN:track-open} (the track joining that one pin to the rest of its net is broken,
     * {@link FaultInjector#cutPin}) is still accepted wherever a fault is written. Not in any part's
     * list ({@link #of}).
     */
    TRACK_OPEN("track-open"),
    /** Relay coil open (1 TΩ). */
    COIL_OPEN("coil-open"),
    /** Relay coil with half its turns shorted: half the resistance at the same must-operate voltage. */
    SHORTED_TURNS("shorted-turns"),
    /** Relay contacts welded: they stay closed at any coil current. */
    WELDED("welded"),
    /** Relay contacts stuck open: they never close. */
    STUCK_OPEN("stuck-open"),
    /** Drive pin stuck at its low level. */
    STUCK_LOW("stuck-low"),
    /** Drive pin stuck at its high level. */
    STUCK_HIGH("stuck-high"),
    /** Drive pin weak: output resistance ×100 (a damaged output stage). */
    WEAK("weak"),
    /** Supply rail missing (0 V). */
    MISSING("missing"),
    /** Supply rail sagging to 75 % of nominal. */
    SAG("sag");

    private final String id;

    FaultKind(String id) {
        this.id = id;
    }

    /** The word written after {@code PART:}. */
    public String id() {
        return id;
    }

    /** The kind with this word, if any. */
    public static Optional<FaultKind> byId(String id) {
        return Arrays.stream(values()).filter(k -> k.id.equals(id)).findFirst();
    }

    /**
     * The fault kinds a part of this kind can have, in a fixed order. A capacitor's open is invisible
     * at DC and is not listed; a bidirectional TVS reversed is the same part, not listed either.
     */
    public static List<FaultKind> of(PartKind kind) {
        return switch (kind) {
            case RESISTOR -> List.of(OPEN, SHORT, DRIFT_UP, DRIFT_DOWN);
            case LOAD -> List.of(OPEN, SHORT);
            case DIODE, ZENER, LED -> List.of(OPEN, SHORT, REVERSED);
            case TVS -> List.of(OPEN, SHORT);
            case CAPACITOR -> List.of(SHORT);
            case NPN, PNP -> List.of(CE_SHORT, BE_OPEN, BC_OPEN, BE_SHORT, GAIN_LOW);
            case NMOS -> List.of(DS_SHORT, GS_SHORT, OPEN);
            case DARLINGTON -> List.of(CE_SHORT, OPEN, CLAMP_OPEN);
            case RELAY -> List.of(COIL_OPEN, SHORTED_TURNS, WELDED, STUCK_OPEN);
            case DRIVE_PIN -> List.of(STUCK_LOW, STUCK_HIGH, WEAK);
            case SUPPLY -> List.of(MISSING, SAG);
            case GROUND -> List.of(OPEN);
        };
    }
}
