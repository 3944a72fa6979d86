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
        return of(original, seed, dx, dy, keepTestPoints, 0, false);
    }

    /**
     * As {@link #of(Stage, long, int, int, boolean)}, with the whole drawing first mirrored
     * left-right (if asked) and turned clockwise by quarter turns.
     *
     * @param quarterTurns clockwise quarter turns of the whole drawing, 0 to 3
     * @param mirror true to mirror the whole drawing left-right first
     */
    public static StageDisguise of(Stage original, long seed, int dx, int dy, boolean keepTestPoints,
                                   int quarterTurns, boolean mirror) {
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
            Placement was = p.placement();
            // mirror: (x, y) -> (-x, y), so M·R(r)·M(m) = R(-r)·M(!m); a quarter turn: R(90)·R(r) = R(r + 90)
            int rotation = mirror ? (360 - was.rotationDegrees()) % 360 : was.rotationDegrees();
            boolean mirrored = mirror != was.mirrored();
            rotation = (rotation + 90 * quarterTurns) % 360;
            Placement at = new Placement(move(was.origin(), dx, dy, quarterTurns, mirror), rotation, mirrored);
            parts.add(p.withRef(refs.get(p.ref())).withPlacement(at));
        }
        Collections.shuffle(parts, random);
        List<Wire> wires = new ArrayList<>();
        for (Wire w : original.wires()) {
            wires.add(new Wire(move(w.from(), dx, dy, quarterTurns, mirror), move(w.to(), dx, dy, quarterTurns, mirror)));
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

    /** A grid point mirrored, turned clockwise on screen ((x, y) -> (-y, x) per quarter turn), then moved. */
    private static GridPoint move(GridPoint p, int dx, int dy, int quarterTurns, boolean mirror) {
        int x = mirror ? -p.gridX() : p.gridX();
        int y = p.gridY();
        for (int i = 0; i < quarterTurns; i++) {
            int t = x;
            x = -y;
            y = t;
        }
        return new GridPoint(x + dx, y + dy);
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
