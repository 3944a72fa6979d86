package org.armature.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

/**
 * The same circuit drawn differently: every designator replaced by another of the same prefix, the
 * whole drawing moved, the parts listed in another order, and the test points dropped (or kept,
 * following their parts). Its connectivity is the original's; only names and placement change.
 *
 * @param stage the disguised stage
 * @param refs original designator to new designator
 */
public record StageDisguise(Stage stage, Map<String, String> refs) {

    /**
     * @param original the stage to disguise
     * @param seed seeds the new designators and the part order
     * @param dx grid columns to move everything by
     * @param dy grid rows to move everything by
     * @param keepTestPoints true to keep the test points (on the renamed parts), false to drop them
     */
    public static StageDisguise of(Stage original, long seed, int dx, int dy, boolean keepTestPoints) {
        Random random = new Random(seed);
        Map<String, String> refs = new HashMap<>();
        Set<String> used = new HashSet<>();
        for (Part p : original.parts()) {
            String prefix = p.ref().replaceAll("[0-9]+$", "");
            String fresh;
            do {
                fresh = prefix + (3 + random.nextInt(97));
            } while (!used.add(fresh));
            refs.put(p.ref(), fresh);
        }
        List<Part> parts = new ArrayList<>();
        for (Part p : original.parts()) {
            Placement at = p.placement().movedTo(p.placement().origin().plus(dx, dy));
            parts.add(p.withRef(refs.get(p.ref())).withPlacement(at));
        }
        Collections.shuffle(parts, random);
        List<Wire> wires = new ArrayList<>();
        for (Wire w : original.wires()) {
            wires.add(new Wire(w.from().plus(dx, dy), w.to().plus(dx, dy)));
        }
        Collections.shuffle(wires, random);
        List<TestPoint> tps = new ArrayList<>();
        if (keepTestPoints) {
            for (TestPoint t : original.testPoints()) {
                tps.add(new TestPoint(t.net(), refs.get(t.ref()), t.pin()));
            }
        }
        return new StageDisguise(new Stage(original.name(), original.description(), parts, wires, tps,
                original.conditions()), Map.copyOf(refs));
    }

    /** The new designator of an original one. */
    public String ref(String original) {
        String r = refs.get(original);
        if (r == null) {
            throw new IllegalArgumentException("no part " + original);
        }
        return r;
    }
}
