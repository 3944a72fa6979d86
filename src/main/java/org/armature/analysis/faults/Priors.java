package org.armature.analysis.faults;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;

/**
 * Prior weights of the candidates before any reading. By default each fault weighs what
 * {@link PriorTable} gives its part class and kind (published failure rates and failure-mode
 * shares, as recalled from memory; see there); the healthy stage weighs
 * {@value PriorTable#NONE_WEIGHT}, large because most boards brought in work in the stage hunted,
 * and it gives way as soon as a reading or the symptom disagrees with it.
 *
 * <p>A user's weight for a kind replaces the table's for every part of that kind; only ratios
 * between weights count (doubling one kind's weight doubles its prior odds against every other).
 *
 * @param kindWeights the weights the user set, per fault kind (kinds absent keep the table's),
 *     dimensionless, not negative
 * @param noneWeight weight of the healthy stage, not negative
 */
public record Priors(Map<FaultKind, Double> kindWeights, double noneWeight) {

    /** The default weight of the healthy stage. */
    public static final double DEFAULT_NONE_WEIGHT = PriorTable.NONE_WEIGHT;

    /** The table's weights and {@value #DEFAULT_NONE_WEIGHT} for the healthy stage. */
    public static final Priors DEFAULT = new Priors(Map.of(), DEFAULT_NONE_WEIGHT);

    /** The word that names the healthy stage's weight ({@link #parse}, {@code --prior none=W}). */
    public static final String NONE = Fault.NONE;

    public Priors {
        kindWeights = Map.copyOf(kindWeights);
        if (!(noneWeight >= 0) || Double.isInfinite(noneWeight)) {
            throw new IllegalArgumentException("noneWeight must be a finite number not below 0, was " + noneWeight);
        }
        for (Map.Entry<FaultKind, Double> e : kindWeights.entrySet()) {
            if (!(e.getValue() >= 0) || Double.isInfinite(e.getValue())) {
                throw new IllegalArgumentException("weight of " + e.getKey().id() + " must be a finite number not below 0");
            }
        }
    }

    /** The same priors with one kind's weight set for every part of that kind. */
    public Priors with(FaultKind kind, double weight) {
        Map<FaultKind, Double> m = new EnumMap<>(FaultKind.class);
        m.putAll(kindWeights);
        m.put(kind, weight);
        return new Priors(m, noneWeight);
    }

    /** The same priors with another weight for the healthy stage. */
    public Priors withNone(double weight) {
        return new Priors(kindWeights, weight);
    }

    /** True when nothing was changed from {@link #DEFAULT}. */
    public boolean isDefault() {
        return kindWeights.isEmpty() && noneWeight == DEFAULT_NONE_WEIGHT;
    }

    /**
     * The weight of a candidate.
     *
     * @param stage the healthy stage (it gives the faulted part's class)
     * @param fault the fault, empty for the healthy stage
     * @return the weight: the user's for the kind if set, else the table's for the part's class
     */
    public double weight(Stage stage, Optional<Fault> fault) {
        if (fault.isEmpty()) {
            return noneWeight;
        }
        Fault f = fault.get();
        Double set = kindWeights.get(f.kind());
        if (set != null) {
            return set;
        }
        Optional<PartKind> part = f.kind() == FaultKind.TRACK_OPEN ? Optional.empty()
                : stage.part(f.ref()).map(Part::kind);
        return PriorTable.weight(part, f.kind());
    }

    /**
     * The user's weights as written ({@code none=5, open=2}), healthy first, then in the order of
     * {@link FaultKind}; empty when nothing was changed.
     */
    public String describeChanges() {
        StringBuilder b = new StringBuilder();
        if (noneWeight != DEFAULT_NONE_WEIGHT) {
            b.append(NONE).append('=').append(number(noneWeight));
        }
        for (FaultKind k : FaultKind.values()) {
            if (kindWeights.containsKey(k)) {
                b.append(b.length() > 0 ? ", " : "").append(k.id()).append('=').append(number(kindWeights.get(k)));
            }
        }
        return b.toString();
    }

    private static String number(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.format(Locale.ROOT, "%s", v);
    }

    /** The words a weight may be given for: {@code none} and every fault kind. */
    public static String validKinds() {
        return NONE + ", " + Arrays.stream(FaultKind.values()).map(FaultKind::id).collect(Collectors.joining(", "));
    }

    /**
     * These priors with one weight written {@code KIND=WEIGHT} put in ({@code ce-short=2},
     * {@code none=5}).
     *
     * @param text the weight as written
     * @return the changed priors
     * @throws IllegalArgumentException with one sentence listing the valid kinds
     */
    public Priors parse(String text) {
        Map.Entry<String, Double> w = parseWeight(text);
        return set(w.getKey(), w.getValue());
    }

    /**
     * Reads one weight written {@code KIND=WEIGHT} into the word and the number, both checked; the
     * form {@link SavedHunt#priors} and {@code model.FaultHunt} keep weights in.
     *
     * @param text the weight as written
     * @return the kind's word ({@code none} for the healthy stage) and the weight
     * @throws IllegalArgumentException with one sentence listing the valid kinds
     */
    public static Map.Entry<String, Double> parseWeight(String text) {
        String t = text.strip();
        int eq = t.indexOf('=');
        if (eq <= 0) {
            throw new IllegalArgumentException("A prior is written KIND=WEIGHT (for example ce-short=2), not '" + t
                    + "'; kinds: " + validKinds() + ".");
        }
        String kind = t.substring(0, eq).strip();
        String value = t.substring(eq + 1).strip();
        double w;
        try {
            w = Double.parseDouble(value);
        } catch (NumberFormatException e) {
            w = Double.NaN;
        }
        if (!(w >= 0) || Double.isInfinite(w)) {
            throw new IllegalArgumentException("A prior weight is a number not below 0 (for example " + kind
                    + "=2), not '" + value + "'; kinds: " + validKinds() + ".");
        }
        DEFAULT.set(kind, w);
        return Map.entry(kind, w);
    }

    /**
     * These priors with the weight of a kind named by its word ({@code none} for the healthy stage).
     *
     * @param kind the fault kind's word or {@code none}
     * @param weight the weight, not negative
     * @return the changed priors
     * @throws IllegalArgumentException with one sentence listing the valid kinds
     */
    public Priors set(String kind, double weight) {
        if (kind.equals(NONE)) {
            return withNone(weight);
        }
        Optional<FaultKind> k = FaultKind.byId(kind);
        if (k.isEmpty()) {
            throw new IllegalArgumentException("No fault kind '" + kind + "' to weigh; valid: " + validKinds() + ".");
        }
        return with(k.get(), weight);
    }
}
