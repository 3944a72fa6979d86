package org.armature.model;

import java.util.ArrayList;
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
                        "Designator " + part.ref() + " is used by more than one part; give each part its own."));
            }
            for (Map.Entry<String, Double> e : part.values().entrySet()) {
                var spec = part.kind().param(e.getKey());
                if (spec.isEmpty()) {
                    out.add(new Finding(Severity.WARNING, "param.unknown", part.ref(), e.getKey(),
                            part.ref() + " (" + part.kind().title() + ") has no parameter " + e.getKey()
                                    + "; it is ignored."));
                } else if (!spec.get().accepts(e.getValue())) {
                    ParamSpec s = spec.get();
                    out.add(new Finding(Severity.ERROR, "param.out-of-range", part.ref(), e.getKey(),
                            part.ref() + " " + s.label() + " is " + e.getValue() + " " + s.unitSymbol()
                                    + "; expected a value from " + s.min() + " to " + s.max() + " " + s.unitSymbol() + "."));
                }
            }
            for (Map.Entry<String, String> e : part.options().entrySet()) {
                var spec = part.kind().option(e.getKey());
                if (spec.isEmpty()) {
                    out.add(new Finding(Severity.WARNING, "option.unknown", part.ref(), e.getKey(),
                            part.ref() + " has no setting " + e.getKey() + "; it is ignored."));
                } else if (!spec.get().allowed().contains(e.getValue())) {
                    out.add(new Finding(Severity.ERROR, "option.not-allowed", part.ref(), e.getKey(),
                            part.ref() + " " + spec.get().label() + " is \"" + e.getValue() + "\"; expected one of "
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
                    "Test point \"" + tp.net() + "\" at " + tp.ref() + "." + tp.pin()
                            + " cannot name its net: the part or pin is missing or the net already has a name."));
        }
        for (Part part : stage.parts()) {
            for (PinSpec pin : part.kind().pins()) {
                String net = c.net(part.ref(), pin.name());
                if (c.pinsOn(net).size() < 2 && !net.equals(Connectivity.GROUND) && !optionalPin(part.kind(), pin.name())) {
                    out.add(new Finding(Severity.WARNING, "pin.unconnected", part.ref(), pin.name(),
                            part.ref() + " " + pin.description() + " is not connected to anything."));
                }
            }
        }
        return List.copyOf(out);
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
        double operate = k.value("mustOperateVolts");
        double release = k.value("mustReleaseVolts");
        double rated = k.value("ratedVolts");
        if (release >= operate) {
            out.add(new Finding(Severity.ERROR, "relay.release-above-operate", k.ref(), "mustReleaseVolts",
                    k.ref() + " must-release voltage (" + release + " V) must be below its must-operate voltage ("
                            + operate + " V)."));
        }
        if (operate > rated) {
            out.add(new Finding(Severity.WARNING, "relay.operate-above-rated", k.ref(), "mustOperateVolts",
                    k.ref() + " must-operate voltage (" + operate + " V) is above the rated coil voltage (" + rated
                            + " V); check the datasheet figures."));
        }
        double lAtt = k.value("inductanceAttractedHenries");
        if (lAtt > 0 && lAtt < k.value("inductanceReleasedHenries")) {
            out.add(new Finding(Severity.WARNING, "relay.inductance-falls", k.ref(), "inductanceAttractedHenries",
                    k.ref() + " attracted inductance is below the released one; closing the gap normally raises it 2–3×."));
        }
    }
}
