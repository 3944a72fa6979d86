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
 * <p>Each kind carries a prior weight: a relative likelihood of that failure before any reading,
 * used by {@link Diagnosis}. The weights are our own rough figures, from memory, after the shape of
 * published part failure-rate and failure-mode data (base rates per part class in MIL-HDBK-217F,
 * open/short shares per class in the failure-mode distribution handbook FMD-97): transistors and
 * relays fail more often than film resistors, semiconductors fail short more often than open. They
 * are not taken from those tables, and users may set their own ({@link Priors}).
 */
public enum FaultKind {
    /**
     * Open: a resistor or load 1 TΩ in place of its value; a diode a 1 TΩ resistor; a MOSFET channel
     * or Darlington output that carries no current; a ground symbol whose connection has opened.
     */
    OPEN("open", 1.0),
    /** Resistor, load, diode or capacitor shorted: 0.1 Ω. */
    SHORT("short", 1.0),
    /** Resistor drifted high, ×10. */
    DRIFT_UP("drift-x10", 0.3),
    /** Resistor drifted low, ×0.1. */
    DRIFT_DOWN("drift-x0.1", 0.1),
    /** Diode fitted the wrong way round (an assembly error). */
    REVERSED("reversed", 0.3),
    /** Bipolar collector–emitter short (0.1 Ω). */
    CE_SHORT("ce-short", 2.0),
    /** Bipolar base lead or base–emitter junction open. */
    BE_OPEN("be-open", 1.5),
    /** Bipolar base–collector junction open: the collector carries no current. */
    BC_OPEN("bc-open", 1.0),
    /** Bipolar base–emitter short (0.1 Ω). */
    BE_SHORT("be-short", 1.0),
    /** Bipolar gain fallen to a tenth of its model βF (degraded junction). */
    GAIN_LOW("gain-low", 0.5),
    /** MOSFET drain–source short (0.1 Ω). */
    DS_SHORT("ds-short", 2.0),
    /** MOSFET gate–source short (0.1 Ω, a punctured gate oxide). */
    GS_SHORT("gs-short", 1.5),
    /**
     * Darlington channel's clamp diode open (its common pin's bond or the diode itself): the
     * channel's {@code com} pin is cut from its net and joined back through 1 TΩ. At DC the clamp
     * never conducts (the output stays at or below the coil supply), so the readings equal the
     * healthy stage's and the dictionary puts it in the healthy stage's ambiguity group; at
     * turn-off the coil's flyback is then unclamped ({@code simulate --fault}).
     */
    CLAMP_OPEN("clamp-open", 0.5),
    /**
     * A track open, written {@code PART.PIN:track-open}: the track that joins that pin to the rest
     * of its net is broken, so the net splits in two, the pin's side and the rest, joined through
     * 1 TΩ. Addressed by a pin rather than a part, it is not in any part's list ({@link #of}) and
     * not in the single-fault set; it is accepted wherever a fault is written.
     */
    TRACK_OPEN("track-open", 0.5),
    /** Relay coil open (1 TΩ). */
    COIL_OPEN("coil-open", 2.0),
    /** Relay coil with half its turns shorted: half the resistance at the same must-operate voltage. */
    SHORTED_TURNS("shorted-turns", 0.5),
    /** Relay contacts welded: they stay closed at any coil current. */
    WELDED("welded", 1.5),
    /** Relay contacts stuck open: they never close. */
    STUCK_OPEN("stuck-open", 1.0),
    /** Drive pin stuck at its low level. */
    STUCK_LOW("stuck-low", 1.0),
    /** Drive pin stuck at its high level. */
    STUCK_HIGH("stuck-high", 1.0),
    /** Drive pin weak: output resistance ×100 (a damaged output stage). */
    WEAK("weak", 0.5),
    /** Supply rail missing (0 V). */
    MISSING("missing", 1.0),
    /** Supply rail sagging to 75 % of nominal. */
    SAG("sag", 1.0);

    private final String id;
    private final double priorWeight;

    FaultKind(String id, double priorWeight) {
        this.id = id;
        this.priorWeight = priorWeight;
    }

    /** The word written after {@code PART:}. */
    public String id() {
        return id;
    }

    /** Relative prior weight (dimensionless; see the class comment for its source). */
    public double priorWeight() {
        return priorWeight;
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
