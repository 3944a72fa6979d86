package org.armature.model;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;

/**
 * One part on the drawing: its kind, reference designator, parameter values in SI units,
 * choice settings and placement.
 *
 * <p>Parameters missing from {@link #values()} take the kind's default; values outside the kind's
 * range are kept as entered and reported by {@link Validator}, never rejected here, so that nothing a
 * user typed is lost.
 *
 * @param ref reference designator, unique within a stage (K1, Q1, R1)
 * @param kind what the part is
 * @param values parameter values by key (SI units, as the key says)
 * @param options choice settings by key
 * @param placement where it sits on the grid
 */
public record Part(String ref, PartKind kind, Map<String, Double> values, Map<String, String> options,
                   Placement placement) {

    public Part {
        if (ref == null || ref.isBlank()) {
            throw new IllegalArgumentException("ref must not be blank");
        }
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null for " + ref);
        }
        if (placement == null) {
            throw new IllegalArgumentException("placement must not be null for " + ref);
        }
        values = Collections.unmodifiableMap(new TreeMap<>(values == null ? Map.of() : values));
        options = Collections.unmodifiableMap(new TreeMap<>(options == null ? Map.of() : options));
    }

    /** A part with all defaults at a placement. */
    public static Part of(String ref, PartKind kind, Placement placement) {
        return new Part(ref, kind, Map.of(), Map.of(), placement);
    }

    /**
     * The value of a parameter, falling back to the kind's default.
     *
     * @throws IllegalArgumentException if the kind has no such parameter (a programming error)
     */
    public double value(String key) {
        Double v = values.get(key);
        if (v != null) {
            return v;
        }
        return kind.param(key)
                .orElseThrow(() -> new IllegalArgumentException(kind + " has no parameter " + key))
                .defaultValue();
    }

    /** The setting of a choice option, falling back to the kind's default. */
    public String option(String key) {
        String v = options.get(key);
        if (v != null) {
            return v;
        }
        return kind.option(key)
                .orElseThrow(() -> new IllegalArgumentException(kind + " has no option " + key))
                .defaultValue();
    }

    /** A copy with one parameter set. */
    public Part with(String key, double value) {
        Map<String, Double> m = new TreeMap<>(values);
        m.put(key, value);
        return new Part(ref, kind, m, options, placement);
    }

    /** A copy with one option set. */
    public Part withOption(String key, String value) {
        Map<String, String> m = new TreeMap<>(options);
        m.put(key, value);
        return new Part(ref, kind, values, m, placement);
    }

    /** A copy at another placement. */
    public Part withPlacement(Placement p) {
        return new Part(ref, kind, values, options, p);
    }

    /** A copy with another designator. */
    public Part withRef(String newRef) {
        return new Part(newRef, kind, values, options, placement);
    }

    /** Grid position of a pin of this part. */
    public GridPoint pinPoint(String pinName) {
        PinSpec spec = kind.pin(pinName)
                .orElseThrow(() -> new IllegalArgumentException(kind + " has no pin " + pinName));
        return placement.apply(spec.localX(), spec.localY());
    }
}
