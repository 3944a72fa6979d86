package org.armature.analysis.faults;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.PartKind;

/**
 * The default prior weights of the fault hunt (check-values FH-5), one per part class and fault
 * kind, in FIT (failures per 10⁹ part-hours) or, for faults that are not a part wearing out, in a
 * FIT-equivalent of our own. Each weight is the part class's failure rate times the share of its
 * failures that take that mode:
 * <ul>
 *   <li>part-class rates: the base failure rates λb of <em>MIL-HDBK-217F, Notice 2</em> (Military
 *   Handbook, Reliability Prediction of Electronic Equipment, 28 February 1995), parts-stress
 *   method, with every π factor (quality, environment, temperature, stress) left at 1: the same
 *   conditions for every part, so only the ratios between classes count. <strong>As recalled from
 *   memory</strong>, not read from the handbook here; each is rounded and may be off by a factor of
 *   two or three;</li>
 *   <li>mode shares: <em>FMD-97, Failure Mode/Mechanism Distributions</em> (Reliability Analysis
 *   Center, 1997), as its tables are reproduced in reliability texts. <strong>As recalled from
 *   memory</strong>;</li>
 *   <li>where a handbook mode covers two of our kinds (a bipolar "short": C–E or B–E), the split is
 *   ours; kinds the handbooks do not list (gain low, shorted turns) have shares of our own;</li>
 *   <li>assembly errors (a diode fitted reversed) are a defect rate per placed part, turned into a
 *   FIT-equivalent over {@value #REFERENCE_HOURS} h of service; non-part faults (a broken track or
 *   ground connection, a drive pin, a supply) have weights of our own, said so beside each.</li>
 * </ul>
 * The healthy stage weighs {@value #NONE_WEIGHT} (ours). Every weight is user-adjustable per fault
 * kind ({@link Priors#with}, {@code diagnose --prior KIND=WEIGHT}). The table is printed in
 * {@code docs/fault-priors.md}.
 */
public final class PriorTable {

    /** The service time over which an assembly defect rate is spread into a FIT-equivalent, hours (ours). */
    public static final double REFERENCE_HOURS = 10_000;
    /** The healthy stage's weight (ours; see {@link Priors}). */
    public static final double NONE_WEIGHT = 10;
    /** Where the part-class failure rates come from. */
    public static final String RATE_SOURCE = "MIL-HDBK-217F Notice 2 (1995) base failure rates";
    /** Where the failure-mode shares come from. */
    public static final String MODE_SOURCE = "FMD-97 (Reliability Analysis Center, 1997) failure-mode shares";
    /** One line naming the default priors' basis, for output. */
    public static final String SOURCE = RATE_SOURCE + " × " + MODE_SOURCE
            + ", both as recalled from memory; assembly and non-part faults our own (docs/fault-priors.md)";

    /**
     * A part class's failure rate.
     *
     * @param part the part class
     * @param fit failure rate, FIT (failures per 10⁹ h)
     * @param basis what the figure is and how sure we are of it
     */
    public record ClassRate(PartKind part, double fit, String basis) {
    }

    /**
     * One default weight.
     *
     * @param part the part class, empty for a fault addressed by nets or pins rather than a part
     *     ({@code track-open})
     * @param kind the fault kind
     * @param share the share of the class's failures in this mode (dimensionless), or NaN where the
     *     weight is set directly
     * @param weight the weight, FIT or FIT-equivalent
     * @param basis the source of the share (or the weight) and its label
     */
    public record Row(Optional<PartKind> part, FaultKind kind, double share, double weight, String basis) {
    }

    private static final String FROM_MEMORY = ", as recalled from memory";
    private static final Map<PartKind, ClassRate> RATES = new EnumMap<>(PartKind.class);
    private static final List<Row> ROWS = new ArrayList<>();
    private static final Map<PartKind, Map<FaultKind, Double>> WEIGHTS = new EnumMap<>(PartKind.class);
    private static final double TRACK_WEIGHT = 0.5;

    static {
        rate(PartKind.RESISTOR, 3.7, "MIL-HDBK-217F N2 §9.1, fixed film resistor, λb 0.0037 /10⁶ h" + FROM_MEMORY);
        rate(PartKind.LOAD, 3.7, "ours: taken as a fixed resistor (the contact-side load is not a board part)");
        rate(PartKind.DIODE, 3.8, "MIL-HDBK-217F N2 §6.1, general-purpose analog diode, λb 0.0038 /10⁶ h" + FROM_MEMORY);
        rate(PartKind.ZENER, 2.0, "MIL-HDBK-217F N2 §6.1, voltage regulator/reference diode, λb 0.0020 /10⁶ h"
                + FROM_MEMORY);
        rate(PartKind.TVS, 1.3, "MIL-HDBK-217F N2 §6.1, transient suppressor, λb 0.0013 /10⁶ h" + FROM_MEMORY);
        rate(PartKind.LED, 3.8, "ours: taken as a general-purpose diode (§6.1)");
        rate(PartKind.CAPACITOR, 0.5, "MIL-HDBK-217F N2 §10, plastic film capacitor, λb about 0.0005 /10⁶ h"
                + FROM_MEMORY + " (uncertain)");
        rate(PartKind.NPN, 0.74, "MIL-HDBK-217F N2 §6.3, low-frequency bipolar transistor, λb 0.00074 /10⁶ h"
                + FROM_MEMORY);
        rate(PartKind.PNP, 0.74, "as NPN (§6.3)" + FROM_MEMORY);
        rate(PartKind.NMOS, 12, "MIL-HDBK-217F N2 §6.4, low-frequency MOSFET, λb 0.012 /10⁶ h" + FROM_MEMORY);
        rate(PartKind.DARLINGTON, 2 * 0.74 + 1.0, "derived: two bipolar transistors (§6.3, 0.74 FIT each) and one "
                + "switching diode (§6.1, λb 0.0010 /10⁶ h" + FROM_MEMORY + ")");
        rate(PartKind.RELAY, 5.9, "MIL-HDBK-217F N2 §13.1, mechanical relay, λb about 0.0059 /10⁶ h at 25 °C"
                + FROM_MEMORY + "; the handbook's contact-form, cycling and construction factors, which raise it "
                + "several times, are left at 1");

        String film = "FMD-97, resistor, fixed film: open 59 %, parameter change 36 %, short 5 %" + FROM_MEMORY;
        mode(PartKind.RESISTOR, FaultKind.OPEN, 0.59, film);
        mode(PartKind.RESISTOR, FaultKind.SHORT, 0.05, film);
        mode(PartKind.RESISTOR, FaultKind.DRIFT_UP, 0.36 * 0.75, film + "; ours: three quarters of the changes upwards");
        mode(PartKind.RESISTOR, FaultKind.DRIFT_DOWN, 0.36 * 0.25, film + "; ours: a quarter downwards");
        mode(PartKind.LOAD, FaultKind.OPEN, 0.59, "ours: as a fixed film resistor (" + film + ")");
        mode(PartKind.LOAD, FaultKind.SHORT, 0.05, "ours: as a fixed film resistor");
        String diode = "FMD-97, diode, general: short 49 %, open 36 %, parameter change 15 %" + FROM_MEMORY;
        for (PartKind d : List.of(PartKind.DIODE, PartKind.LED, PartKind.TVS)) {
            String by = d == PartKind.DIODE ? diode : "ours: as a general diode (" + diode + ")";
            mode(d, FaultKind.SHORT, 0.49, by);
            mode(d, FaultKind.OPEN, 0.36, by);
        }
        String zener = "FMD-97, diode, zener: parameter change 69 %, open 18 %, short 13 %" + FROM_MEMORY;
        mode(PartKind.ZENER, FaultKind.OPEN, 0.18, zener);
        mode(PartKind.ZENER, FaultKind.SHORT, 0.13, zener);
        mode(PartKind.CAPACITOR, FaultKind.SHORT, 0.4, "FMD-97, capacitor, plastic film: short about 40 %"
                + FROM_MEMORY + " (uncertain)");
        String bjt = "FMD-97, transistor, bipolar: short 73 %, open 27 %" + FROM_MEMORY;
        for (PartKind q : List.of(PartKind.NPN, PartKind.PNP)) {
            mode(q, FaultKind.CE_SHORT, 0.73 / 2, bjt + "; ours: half the shorts C–E");
            mode(q, FaultKind.BE_SHORT, 0.73 / 2, bjt + "; ours: half the shorts B–E");
            mode(q, FaultKind.BE_OPEN, 0.27 / 2, bjt + "; ours: half the opens at the base");
            mode(q, FaultKind.BC_OPEN, 0.27 / 2, bjt + "; ours: half the opens at the collector");
            mode(q, FaultKind.GAIN_LOW, 0.10, "ours: 10 % (FMD-97 lists no gain loss for bipolar transistors, as recalled)");
        }
        String fet = "FMD-97, transistor, FET: short 51 %, output low 22 %, parameter change 17 %, open 5 %, "
                + "output high 5 %" + FROM_MEMORY;
        mode(PartKind.NMOS, FaultKind.DS_SHORT, 0.51, fet + "; the short taken as D–S");
        mode(PartKind.NMOS, FaultKind.GS_SHORT, 0.22, fet + "; ours: output low taken as a punctured gate (G–S)");
        mode(PartKind.NMOS, FaultKind.OPEN, 0.05, fet);
        double transistors = 2 * 0.74;
        double clamp = 1.0;
        double channel = transistors + clamp;
        mode(PartKind.DARLINGTON, FaultKind.CE_SHORT, 0.73 * transistors / channel,
                "derived: the bipolar short share (FMD-97, 73 %" + FROM_MEMORY + ") of the transistors' part of the rate");
        mode(PartKind.DARLINGTON, FaultKind.OPEN, 0.27 * transistors / channel,
                "derived: the bipolar open share (FMD-97, 27 %" + FROM_MEMORY + ") of the transistors' part");
        mode(PartKind.DARLINGTON, FaultKind.CLAMP_OPEN, 0.36 * clamp / channel,
                "derived: the diode open share (FMD-97, 36 %" + FROM_MEMORY + ") of the clamp diode's part");
        String relay = "FMD-97, relay, general: fails to trip 55 %, spurious trip 26 %, short 19 %" + FROM_MEMORY;
        mode(PartKind.RELAY, FaultKind.COIL_OPEN, 0.55 / 2, relay + "; ours: half of fails-to-trip an open coil");
        mode(PartKind.RELAY, FaultKind.STUCK_OPEN, 0.55 / 2, relay + "; ours: half contacts that never close");
        mode(PartKind.RELAY, FaultKind.WELDED, 0.19, relay + "; the short taken as welded contacts");
        mode(PartKind.RELAY, FaultKind.SHORTED_TURNS, 0.05, "ours: 5 % (not a mode FMD-97 lists, as recalled)");

        // faults that are not a part wearing out: weights set directly, in FIT-equivalents
        direct(PartKind.DIODE, FaultKind.REVERSED, 1.0, "ours: assembly error, about 10 defects per million placed "
                + "polar parts (common practice order) over " + (int) REFERENCE_HOURS + " h = 1 FIT-equivalent");
        direct(PartKind.ZENER, FaultKind.REVERSED, 1.0, "ours: assembly error, as the diode");
        direct(PartKind.LED, FaultKind.REVERSED, 1.0, "ours: assembly error, as the diode");
        direct(PartKind.GROUND, FaultKind.OPEN, 0.5, "ours: a broken ground connection, as a track open");
        direct(PartKind.DRIVE_PIN, FaultKind.STUCK_LOW, 1.0, "ours: one output of a microcontroller, about 1 FIT per pin");
        direct(PartKind.DRIVE_PIN, FaultKind.STUCK_HIGH, 1.0, "ours: as stuck-low");
        direct(PartKind.DRIVE_PIN, FaultKind.WEAK, 0.5, "ours: half of stuck-low");
        direct(PartKind.SUPPLY, FaultKind.MISSING, 5.0, "ours: an off-board supply, its fuse and connector");
        direct(PartKind.SUPPLY, FaultKind.SAG, 5.0, "ours: a failing regulator or an overloaded adapter");
        ROWS.add(new Row(Optional.empty(), FaultKind.TRACK_OPEN, Double.NaN, TRACK_WEIGHT,
                "ours: above two wave-soldered joints (MIL-HDBK-217F N2 §17.1, about 0.000069 /10⁶ h each"
                        + FROM_MEMORY + ", 0.14 FIT) because cracked tracks and joints near a heavy relay are common "
                        + "field failures (common practice)"));
        checkComplete();
    }

    private PriorTable() {
    }

    private static void rate(PartKind part, double fit, String basis) {
        RATES.put(part, new ClassRate(part, fit, basis));
    }

    private static void mode(PartKind part, FaultKind kind, double share, String basis) {
        double w = RATES.get(part).fit() * share;
        WEIGHTS.computeIfAbsent(part, p -> new EnumMap<>(FaultKind.class)).put(kind, w);
        ROWS.add(new Row(Optional.of(part), kind, share, w, basis));
    }

    private static void direct(PartKind part, FaultKind kind, double weight, String basis) {
        WEIGHTS.computeIfAbsent(part, p -> new EnumMap<>(FaultKind.class)).put(kind, weight);
        ROWS.add(new Row(Optional.of(part), kind, Double.NaN, weight, basis));
    }

    /** Every kind a part class can have has a weight; checked once, when the class loads. */
    private static void checkComplete() {
        for (PartKind p : PartKind.values()) {
            for (FaultKind k : FaultKind.of(p)) {
                if (!WEIGHTS.getOrDefault(p, Map.of()).containsKey(k)) {
                    throw new IllegalStateException("no prior for " + p + " " + k);
                }
            }
        }
    }

    /**
     * The default weight of a fault.
     *
     * @param part the faulted part's class, empty for a fault addressed by nets or a pin
     *     ({@code track-open})
     * @param kind the fault kind
     * @return the weight, FIT or FIT-equivalent, positive
     * @throws IllegalArgumentException for a kind the class cannot have
     */
    public static double weight(Optional<PartKind> part, FaultKind kind) {
        if (kind == FaultKind.TRACK_OPEN) {
            return TRACK_WEIGHT;
        }
        Double w = part.map(p -> WEIGHTS.getOrDefault(p, Map.of()).get(kind)).orElse(null);
        if (w == null) {
            throw new IllegalArgumentException("no prior for " + kind.id() + " of " + part.map(PartKind::title)
                    .orElse("a part-less fault"));
        }
        return w;
    }

    /** The failure rate of each part class, with its basis. */
    public static List<ClassRate> rates() {
        return List.copyOf(RATES.values());
    }

    /** Every default weight with its basis, in the order of the table. */
    public static List<Row> rows() {
        return Collections.unmodifiableList(ROWS);
    }
}
