package org.armature.analysis.faults;

import java.util.EnumMap;
import java.util.Map;

/**
 * Prior weights of the candidates before any reading: one per fault kind (default
 * {@link FaultKind#priorWeight()}, our own figures from memory, see there) and one for the healthy
 * stage. The healthy weight is large (default {@value #DEFAULT_NONE_WEIGHT}) because most boards
 * brought in work, and it gives way as soon as a reading or the symptom disagrees with it.
 *
 * @param kindWeights weight per fault kind, dimensionless, not negative
 * @param noneWeight weight of the healthy stage
 */
public record Priors(Map<FaultKind, Double> kindWeights, double noneWeight) {

    /** The default weight of the healthy stage. */
    public static final double DEFAULT_NONE_WEIGHT = 10;

    /** The kinds' own weights and {@value #DEFAULT_NONE_WEIGHT} for the healthy stage. */
    public static final Priors DEFAULT = defaults();

    public Priors {
        kindWeights = Map.copyOf(kindWeights);
        if (!(noneWeight >= 0)) {
            throw new IllegalArgumentException("noneWeight must not be negative, was " + noneWeight);
        }
        for (Map.Entry<FaultKind, Double> e : kindWeights.entrySet()) {
            if (!(e.getValue() >= 0)) {
                throw new IllegalArgumentException("weight of " + e.getKey().id() + " must not be negative");
            }
        }
    }

    private static Priors defaults() {
        Map<FaultKind, Double> m = new EnumMap<>(FaultKind.class);
        for (FaultKind k : FaultKind.values()) {
            m.put(k, k.priorWeight());
        }
        return new Priors(m, DEFAULT_NONE_WEIGHT);
    }

    /** The same priors with one kind's weight changed. */
    public Priors with(FaultKind kind, double weight) {
        Map<FaultKind, Double> m = new EnumMap<>(FaultKind.class);
        m.putAll(kindWeights);
        m.put(kind, weight);
        return new Priors(m, noneWeight);
    }

    /** The weight of a candidate (empty: healthy). */
    public double weight(java.util.Optional<Fault> fault) {
        return fault.map(f -> kindWeights.getOrDefault(f.kind(), f.kind().priorWeight())).orElse(noneWeight);
    }
}
