package org.armature.render.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.armature.analysis.faults.Diagnosis;
import org.armature.analysis.faults.Fault;
import org.armature.analysis.faults.FaultKind;
import org.armature.analysis.faults.PriorTable;
import org.armature.analysis.faults.Priors;
import org.armature.analysis.faults.Probe;
import org.armature.analysis.faults.SavedHunt;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageRecognition;
import org.armature.render.Colour;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * The fault hunt section of a stage's design report: what the technician entered (symptom, meter,
 * readings, changed priors) and what the engine makes of it now, ranked by
 * {@link SavedHunt#rank} when the report is made. Nothing of the ranking comes from the file.
 *
 * @param hunt the hunt as the document holds it
 * @param stage the stage hunted on (the reported stage)
 * @param ranked the ranking and next measurement, empty when the hunt cannot be ranked
 * @param failure one sentence saying why the hunt cannot be ranked; empty when ranked
 */
public record FaultHuntSection(FaultHunt hunt, Stage stage, Optional<SavedHunt.Ranked> ranked, String failure) {

    /** How many candidates the report lists. */
    public static final int LISTED_CANDIDATES = 10;
    /** How many of the top candidates get their readings, expected against measured. */
    public static final int EXPLAINED_CANDIDATES = 3;
    /** Significant digits of a volts figure: a 4,000-count meter shows at most four. */
    static final int VOLTS_DIGITS = 4;

    private static final Colour FAIL = Colour.hex("#b3261e");
    /** Room kept below a sub-heading so that it stays with the first rows of what it heads, points. */
    private static final double KEEP_WITH_NEXT = 90;

    public FaultHuntSection {
        if (hunt == null || stage == null || ranked == null || failure == null) {
            throw new IllegalArgumentException("a fault hunt section needs its hunt, stage, ranking and failure text");
        }
        if (ranked.isEmpty() == failure.isEmpty()) {
            throw new IllegalArgumentException("a fault hunt section is either ranked or says why it is not");
        }
    }

    /**
     * The section of a stage's report: present when the document holds a fault hunt on this very
     * stage (the same stage object as {@code doc.stages().get(hunt.stageIndex())}, so that an equal
     * copy elsewhere in the document gets none). Ranks the hunt now; a hunt that cannot be ranked (a
     * net the stage no longer has, a word the engine does not know, a stage with no ground) gives a
     * section that says why instead of throwing.
     */
    public static Optional<FaultHuntSection> of(StageDocument doc, Stage stage) {
        if (doc.faultHunt().isEmpty()) {
            return Optional.empty();
        }
        FaultHunt hunt = doc.faultHunt().get();
        if (hunt.stageIndex() >= doc.stages().size() || doc.stages().get(hunt.stageIndex()) != stage) {
            return Optional.empty();
        }
        return Optional.of(rank(hunt, stage));
    }

    /** The section of a hunt on a stage, ranked now. */
    public static FaultHuntSection rank(FaultHunt hunt, Stage stage) {
        try {
            return new FaultHuntSection(hunt, stage, Optional.of(SavedHunt.rank(stage, hunt)), "");
        } catch (IllegalArgumentException e) {
            return new FaultHuntSection(hunt, stage, Optional.empty(), "The fault hunt cannot be ranked: "
                    + lowerFirst(sentence(e.getMessage())));
        }
    }

    /** Lays the section out. */
    void draw(PdfFlow f) {
        f.heading("Fault hunt", 13);
        f.paragraph("What was entered while hunting a fault on this stage, ranked now by the fault dictionary "
                + "of the stage as drawn (every single fault, both pin states, each reading with the meter's "
                + "loading); the file holds the entries only, never a ranking.", PdfFlow.BODY, false, PdfFlow.MUTED);
        f.paragraph("Symptom: " + hunt.symptom().map(FaultHuntSection::symptomWords).orElse("none entered") + ".",
                PdfFlow.BODY, false, PdfFlow.INK);
        FaultHunt.MeterSetting m = hunt.meter();
        f.paragraph("Meter: input resistance " + EngineeringNotation.format(m.inputOhms(), Unit.OHM) + ", "
                + m.counts() + " counts, accuracy ±(" + plain(m.percentOfReading()) + " % of the reading + "
                + plain(m.digits()) + " digits).", PdfFlow.BODY, false, PdfFlow.INK);
        if (ranked.isEmpty()) {
            f.paragraph(failure, PdfFlow.BODY, true, FAIL);
        }
        readings(f);
        ranked.ifPresent(r -> {
            candidates(f, r);
            explanations(f, r);
            next(f, r);
        });
        priors(f);
    }

    private void readings(PdfFlow f) {
        subheading(f, "Readings");
        if (hunt.readings().isEmpty()) {
            f.paragraph("No readings were entered.", PdfFlow.BODY, false, PdfFlow.MUTED);
            return;
        }
        f.paragraph("A net is measured against ground; coil is the voltage across the relay coil.", PdfFlow.BODY, false,
                PdfFlow.MUTED);
        List<PdfFlow.Row> rows = new ArrayList<>();
        for (FaultHunt.HuntReading r : hunt.readings()) {
            rows.add(new PdfFlow.Row(List.of(probeName(r.net()), pinState(r.pinHigh()), volts(r.volts()))));
        }
        f.table(new double[] {0.6, 0.16, 0.24}, List.of("Probe point", "Pin state", "Measured"), rows);
    }

    private void candidates(PdfFlow f, SavedHunt.Ranked r) {
        List<Diagnosis.Candidate> all = r.result().candidates();
        subheading(f, "Candidates");
        f.paragraph("Posterior probability of each single fault (and of none) given the symptom and the readings, "
                + "the first " + Math.min(LISTED_CANDIDATES, all.size()) + " of " + all.size() + "; faults that no "
                + "probe point tells apart form an ambiguity group, named beside each member. Symptom: whether the "
                + "candidate shows the symptom entered.", PdfFlow.BODY, false,
                PdfFlow.MUTED);
        Map<String, List<String>> groupOf = new HashMap<>();
        for (List<String> g : r.dictionary().ambiguityGroups(r.spread())) {
            for (String name : g) {
                groupOf.put(name, g);
            }
        }
        List<PdfFlow.Row> rows = new ArrayList<>();
        for (int i = 0; i < Math.min(LISTED_CANDIDATES, all.size()); i++) {
            Diagnosis.Candidate c = all.get(i);
            List<String> others = new ArrayList<>(groupOf.getOrDefault(c.name(), List.of()));
            others.remove(c.name());
            rows.add(new PdfFlow.Row(List.of(Integer.toString(i + 1), candidateName(c.name()), percent(c.probability()),
                    hunt.symptom().isEmpty() ? "–" : c.symptomExplained() ? "yes" : "no",
                    others.isEmpty() ? "–" : String.join(", ", others))));
        }
        f.table(new double[] {0.05, 0.28, 0.13, 0.11, 0.43}, List.of("#", "Candidate", "Probability",
                "Symptom", "Same readings as"), rows);
        if (!r.result().unsolved().isEmpty()) {
            f.paragraph(r.result().unsolved().size() + " faulted stages have no operating point and are left out: "
                    + String.join(", ", r.result().unsolved()) + ".", PdfFlow.SMALL, false, PdfFlow.MUTED);
        }
    }

    private void explanations(PdfFlow f, SavedHunt.Ranked r) {
        if (hunt.readings().isEmpty()) {
            return;
        }
        List<Diagnosis.Candidate> all = r.result().candidates();
        for (int i = 0; i < Math.min(EXPLAINED_CANDIDATES, all.size()); i++) {
            Diagnosis.Candidate c = all.get(i);
            f.need(KEEP_WITH_NEXT);
            f.paragraph("Why " + candidateName(c.name()) + " (" + percent(c.probability()) + "): reading by reading",
                    PdfFlow.BODY, true, PdfFlow.INK);
            List<PdfFlow.Row> rows = new ArrayList<>();
            for (Diagnosis.Explanation e : c.explains()) {
                rows.add(new PdfFlow.Row(List.of(e.probe(), pinState(e.pinHigh()), volts(e.expectedVolts()),
                        volts(e.measuredVolts()), spreads(e.zScore()))));
            }
            f.table(new double[] {0.3, 0.14, 0.18, 0.18, 0.2}, List.of("Probe point", "Pin state", "Expected",
                    "Measured", "Off by (spreads)"), rows);
        }
    }

    private void next(PdfFlow f, SavedHunt.Ranked r) {
        subheading(f, "Next measurement");
        Optional<Diagnosis.Next> next = r.result().next();
        if (next.isEmpty()) {
            f.paragraph("None left: every probe point has been measured in both pin states.", PdfFlow.BODY, false,
                    PdfFlow.INK);
        } else if (!(next.get().gainBits() > 0)) {
            f.paragraph("None left: no unmeasured probe point tells the remaining candidates apart (0 bits to gain).",
                    PdfFlow.BODY, false, PdfFlow.INK);
        } else {
            Diagnosis.Next n = next.get();
            f.paragraph("Measure " + n.probe() + " with the pin " + pinState(n.pinHigh()) + ", expected information gain "
                    + bits(n.gainBits()) + " (the largest of the unmeasured probe points and pin states).",
                    PdfFlow.BODY, true, PdfFlow.INK);
            f.paragraph(probeName(n.probe()) + (n.probe().equals(Probe.COIL) ? "." : ", against ground."),
                    PdfFlow.BODY, false, PdfFlow.MUTED);
        }
    }

    private void priors(PdfFlow f) {
        subheading(f, "Priors");
        if (hunt.priorWeights().isEmpty()) {
            f.paragraph("The default prior weights were used (none changed): per part class and fault kind from "
                    + PriorTable.SOURCE + ".", PdfFlow.BODY, false, PdfFlow.MUTED);
            return;
        }
        f.paragraph("Prior weights changed from their defaults (relative, dimensionless); the other kinds keep theirs.",
                PdfFlow.BODY, false, PdfFlow.MUTED);
        List<PdfFlow.Row> rows = new ArrayList<>();
        for (Map.Entry<String, Double> e : hunt.priorWeights().entrySet()) {
            String def = e.getKey().equals(FaultHunt.NONE) ? plain(Priors.DEFAULT_NONE_WEIGHT)
                    : FaultKind.byId(e.getKey()).map(k -> "per part class (table)").orElse("not a fault kind");
            rows.add(new PdfFlow.Row(List.of(e.getKey().equals(FaultHunt.NONE) ? "none (healthy stage)" : e.getKey(),
                    plain(e.getValue()), def)));
        }
        f.table(new double[] {0.5, 0.25, 0.25}, List.of("Fault kind", "Weight", "Default"), rows);
    }

    private static void subheading(PdfFlow f, String text) {
        f.need(KEEP_WITH_NEXT);
        f.paragraph(text, 10.5, true, PdfFlow.INK);
    }

    /** A deviation in spreads, signed, one decimal; no "-0.0". */
    static String spreads(double z) {
        return Math.abs(z) < 0.05 ? "0.0" : String.format(Locale.ROOT, "%+.1f", z);
    }

    /** A probe point in words: its name, then what it is on the stage. */
    String probeName(String net) {
        if (net.equals(Probe.COIL)) {
            Optional<Probe> p = ranked.flatMap(r -> r.dictionary().probes().stream()
                    .filter(x -> x.name().equals(Probe.COIL)).findFirst());
            return p.map(x -> "coil: across the relay coil, " + x.plus().ref() + "." + x.plus().pin() + " to "
                    + x.minus().ref() + "." + x.minus().pin()).orElse("coil: across the relay coil");
        }
        String words = StageRecognition.of(stage).describe(net);
        return words.equals(net) ? net : net + ": " + words;
    }

    /** A candidate's name as printed: {@code PART:KIND}, or none as the healthy stage. */
    static String candidateName(String name) {
        return name.equals(Fault.NONE) ? "none (healthy stage)" : name;
    }

    /** A probability in percent as the report prints it. */
    public static String percent(double p) {
        double pc = 100 * p;
        if (pc < 0.01) {
            // an exact 0 is an underflow of a tiny posterior: a listed candidate's prior is positive
            return "< 0.01 %";
        }
        return String.format(Locale.ROOT, pc >= 10 ? "%.1f %%" : "%.2f %%", pc);
    }

    /** An information gain as the report prints it: three significant digits. */
    public static String bits(double b) {
        return String.format(Locale.ROOT, "%.3g bits", b);
    }

    /**
     * A voltage as the report prints a reading: up to four significant digits, as a meter shows,
     * with an engineering prefix (V, mV, µV, nV).
     */
    public static String volts(double v) {
        if (v == 0) {
            return "0 V";
        }
        double rounded = new BigDecimal(v).round(new MathContext(VOLTS_DIGITS)).doubleValue();
        double a = Math.abs(rounded);
        String[] prefixes = {"", "m", "µ", "n"};
        int k = 0;
        while (k < prefixes.length - 1 && a < 1) {
            a *= 1000;
            k++;
        }
        double scaled = rounded * Math.pow(1000, k);
        return plain(new BigDecimal(scaled).round(new MathContext(VOLTS_DIGITS)).doubleValue()) + " " + prefixes[k] + "V";
    }

    /** A pin state's word. */
    static String pinState(boolean high) {
        return high ? "high" : "low";
    }

    /** A number without exponent or trailing zeros (15 significant digits at most). */
    static String plain(double v) {
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(new MathContext(15)).stripTrailingZeros().toPlainString();
    }

    private static String symptomWords(String word) {
        return switch (word) {
            case "no-operate" -> "no-operate (the relay does not operate with the pin high)";
            case "no-release" -> "no-release (the relay does not release with the pin low)";
            case "chatter" -> "chatter (the relay picks up and drops out by itself)";
            default -> word;
        };
    }

    private static String sentence(String text) {
        String t = text == null ? "" : text.strip();
        return t.isEmpty() || t.endsWith(".") ? t : t + ".";
    }

    private static String lowerFirst(String s) {
        return s.isEmpty() ? s : Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }
}
