package org.armature.model;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Checks a stage's data: unique designators, known parameters within range, known option values,
 * test points on existing pins, pins left unconnected, and relay datasheet figures that contradict
 * each other. Never throws for bad user data; returns findings.
 */
public final class Validator {

    private Validator() {
    }

    /** All findings for a stage, in a stable order. */
    public static List<Finding> validate(Stage stage) {
        List<Finding> out = new ArrayList<>();
        Set<String> refs = new HashSet<>();
        for (Part part : stage.parts()) {
            if (!refs.add(part.ref())) {
                out.add(new Finding(Severity.ERROR, "part.duplicate-ref", part.ref(), "",
                        "Designator " + shorten(part.ref()) + " is used by more than one part; give each part its own."));
            }
            for (Map.Entry<String, Double> e : part.values().entrySet()) {
                var spec = part.kind().param(e.getKey());
                if (spec.isEmpty()) {
                    out.add(new Finding(Severity.WARNING, "param.unknown", part.ref(), e.getKey(),
                            shorten(part.ref()) + " (" + part.kind().title() + ") has no parameter " + shorten(e.getKey())
                                    + "; it is ignored."));
                } else if (!spec.get().accepts(e.getValue())) {
                    ParamSpec s = spec.get();
                    out.add(new Finding(Severity.ERROR, "param.out-of-range", part.ref(), e.getKey(),
                            shorten(part.ref()) + " " + s.label() + " is " + e.getValue() + " " + s.unitSymbol()
                                    + "; expected a value from " + s.min() + " to " + s.max() + " " + s.unitSymbol() + "."));
                }
            }
            for (Map.Entry<String, String> e : part.options().entrySet()) {
                var spec = part.kind().option(e.getKey());
                if (spec.isEmpty()) {
                    out.add(new Finding(Severity.WARNING, "option.unknown", part.ref(), e.getKey(),
                            shorten(part.ref()) + " has no setting " + shorten(e.getKey()) + "; it is ignored."));
                } else if (!spec.get().allowed().contains(e.getValue())) {
                    out.add(new Finding(Severity.ERROR, "option.not-allowed", part.ref(), e.getKey(),
                            shorten(part.ref()) + " " + spec.get().label() + " is \"" + shorten(e.getValue()) + "\"; expected one of "
                                    + String.join(", ", spec.get().allowed()) + "."));
                }
            }
            if (part.kind() == PartKind.RELAY) {
                relayFigures(part, out);
            }
        }
        Conditions cond = stage.conditions();
        double[] temps = {cond.ambientCelsius(), cond.ambientMinCelsius(), cond.ambientMaxCelsius()};
        String[] labels = {"nominal ambient", "coldest ambient", "hottest ambient"};
        for (int i = 0; i < temps.length; i++) {
            if (!ModelRange.ambientInRange(temps[i])) {
                out.add(new Finding(Severity.ERROR, "conditions.ambient-out-of-range", "", labels[i],
                        "The " + labels[i] + " is " + temps[i] + " °C; expected a value " + ModelRange.ambientRangeText()
                                + ", the range the copper and junction models hold over."));
            }
        }
        Connectivity c = Connectivity.of(stage);
        for (TestPoint tp : c.nameConflicts()) {
            out.add(new Finding(Severity.WARNING, "testpoint.conflict", tp.ref(), tp.pin(),
                    "Test point \"" + shorten(tp.net()) + "\" at " + shorten(tp.ref()) + "." + shorten(tp.pin())
                            + " cannot name its net: the part or pin is missing or the net already has a name."));
        }
        Map<String, Integer> pinsPerNet = new HashMap<>();
        for (String net : c.netOfPin().values()) {
            pinsPerNet.merge(net, 1, Integer::sum);
        }
        Set<String> seen = new HashSet<>();
        for (Part part : stage.parts()) {
            if (!seen.add(part.ref())) {
                continue; // a duplicate designator: its pins share the first part's names, reported above
            }
            for (PinSpec pin : part.kind().pins()) {
                String net = c.net(part.ref(), pin.name());
                if (pinsPerNet.getOrDefault(net, 0) < 2 && !net.equals(Connectivity.GROUND) && !optionalPin(part.kind(), pin.name())) {
                    out.add(new Finding(Severity.WARNING, "pin.unconnected", part.ref(), pin.name(),
                            shorten(part.ref()) + " " + pin.description() + " is not connected to anything."));
                }
            }
        }
        return List.copyOf(out);
    }

    /** Longest piece of a user's own text quoted in a message. */
    public static final int QUOTED_CHARS = 80;

    /** At most {@value #QUOTED_CHARS} characters of a text, with an ellipsis where cut. */
    public static String shorten(String text) {
        if (text.length() <= QUOTED_CHARS) {
            return text;
        }
        int end = Character.isHighSurrogate(text.charAt(QUOTED_CHARS - 1)) ? QUOTED_CHARS - 1 : QUOTED_CHARS;
        return text.substring(0, end) + "\u2026";
    }

    /** True when no finding is an error. */
    public static boolean isSolvable(List<Finding> findings) {
        return findings.stream().noneMatch(f -> f.severity() == Severity.ERROR);
    }

    private static boolean optionalPin(PartKind kind, String pin) {
        return (kind == PartKind.RELAY && (pin.equals("nc") || pin.equals("no") || pin.equals("com")))
                || (kind == PartKind.DARLINGTON && pin.equals("com"))
                || kind == PartKind.SUPPLY || kind == PartKind.GROUND;
    }

    private static void relayFigures(Part k, List<Finding> out) {
        double operate = k.value(ParamKeys.MUST_OPERATE_VOLTS);
        double release = k.value(ParamKeys.MUST_RELEASE_VOLTS);
        double rated = k.value(ParamKeys.RATED_VOLTS);
        if (release >= operate) {
            out.add(new Finding(Severity.ERROR, "relay.release-above-operate", k.ref(), ParamKeys.MUST_RELEASE_VOLTS,
                    shorten(k.ref()) + " must-release voltage (" + release + " V) must be below its must-operate voltage ("
                            + operate + " V)."));
        }
        if (operate > rated) {
            out.add(new Finding(Severity.WARNING, "relay.operate-above-rated", k.ref(), ParamKeys.MUST_OPERATE_VOLTS,
                    shorten(k.ref()) + " must-operate voltage (" + operate + " V) is above the rated coil voltage (" + rated
                            + " V); check the datasheet figures."));
        }
        double lAtt = k.value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES);
        if (lAtt > 0 && lAtt < k.value(ParamKeys.INDUCTANCE_RELEASED_HENRIES)) {
            out.add(new Finding(Severity.WARNING, "relay.inductance-falls", k.ref(), ParamKeys.INDUCTANCE_ATTRACTED_HENRIES,
                    shorten(k.ref()) + " attracted inductance is below the released one; closing the gap normally raises it 2–3×."));
        }
    }
}
