package org.armature.model;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The parameter values and options a line-up shares for one role (the relay, the coil supply, the
 * drive pin, the contact supply, the load): a part's settings without its designator or place.
 *
 * @param kind the part kind these settings belong to
 * @param values parameter values by key, SI units as the key says (keys left out take the kind's
 *     typical default)
 * @param options choice settings by key
 */
public record SharedPart(PartKind kind, Map<String, Double> values, Map<String, String> options) {

    public SharedPart {
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null");
        }
        values = Collections.unmodifiableMap(new TreeMap<>(values == null ? Map.of() : values));
        options = Collections.unmodifiableMap(new TreeMap<>(options == null ? Map.of() : options));
    }

    /** The settings of a part, without its designator and placement. */
    public static SharedPart of(Part part) {
        return new SharedPart(part.kind(), part.values(), part.options());
    }

    /** A copy with one parameter set. */
    public SharedPart with(String key, double value) {
        Map<String, Double> m = new TreeMap<>(values);
        m.put(key, value);
        return new SharedPart(kind, m, options);
    }

    /** The part with these settings in place of its own, keeping its designator and placement. */
    public Part applyTo(Part part) {
        return new Part(part.ref(), part.kind(), values, options, part.placement());
    }

    /**
     * What differs between a part's own settings and these, in words ("coilResistanceOhms 400 here,
     * 720 shared"); empty when they agree. Keys left out count as the kind's default on both sides,
     * so a file listing a default explicitly does not differ from one leaving it out.
     */
    public List<String> differences(Part part) {
        if (part.kind() != kind) {
            return List.of("a " + part.kind().title().toLowerCase(java.util.Locale.ROOT) + " here, a "
                    + kind.title().toLowerCase(java.util.Locale.ROOT) + " shared");
        }
        Map<String, String> out = new LinkedHashMap<>();
        for (String key : union(part.values().keySet(), values.keySet())) {
            double mine = effective(part.values(), key);
            double shared = effective(values, key);
            if (Double.compare(mine, shared) != 0) {
                out.put(key, key + " " + plain(mine) + " here, " + plain(shared) + " shared");
            }
        }
        for (String key : union(part.options().keySet(), options.keySet())) {
            String mine = effectiveOption(part.options(), key);
            String shared = effectiveOption(options, key);
            if (!mine.equals(shared)) {
                out.put("option " + key, key + " " + mine + " here, " + shared + " shared");
            }
        }
        return List.copyOf(out.values());
    }

    private static java.util.SortedSet<String> union(java.util.Set<String> a, java.util.Set<String> b) {
        java.util.SortedSet<String> s = new java.util.TreeSet<>(a);
        s.addAll(b);
        return s;
    }

    private double effective(Map<String, Double> map, String key) {
        Double v = map.get(key);
        if (v != null) {
            return v;
        }
        return kind.param(key).map(ParamSpec::defaultValue).orElse(Double.NaN);
    }

    private String effectiveOption(Map<String, String> map, String key) {
        String v = map.get(key);
        if (v != null) {
            return v;
        }
        return kind.option(key).map(OptionSpec::defaultValue).orElse("");
    }

    private static String plain(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
