package org.armature.model;

import java.util.ArrayList;
import java.util.List;

/**
 * Builds the four ready stages and their variants, laid out on the grid as clean schematics.
 *
 * <p>Values are typical figures for generic part classes (see {@link PartKind}); the relay is a
 * generic 12 V, 400 Ω PCB relay. Every template names the nets {@code pin}, {@code control},
 * {@code switch}, {@code supply} and {@code gnd} with test points.
 */
public final class Templates {

    private Templates() {
    }

    /** The stage the application opens with: low-side NPN with a freewheeling diode. */
    public static Stage defaultStage() {
        return build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
    }

    /** A template with its usual suppressor (a diode; the clamp diode for the Darlington channel). */
    public static Stage build(StageTemplate template) {
        return build(template, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
    }

    /**
     * Builds a template variant.
     *
     * @param template which stage
     * @param suppressor what goes across the coil (for the Darlington channel, {@code DIODE} uses the
     *     channel's own clamp diode through its common pin and {@code DIODE_ZENER} puts a zener in the
     *     common line)
     * @param drive high-side drive variant; ignored by the other templates
     */
    public static Stage build(StageTemplate template, Suppressor suppressor, HighSideDrive drive) {
        Builder b = new Builder();
        switch (template) {
            case LOW_SIDE_NPN -> lowSide(b, PartKind.NPN, suppressor);
            case LOW_SIDE_NMOS -> lowSide(b, PartKind.NMOS, suppressor);
            case DARLINGTON_CHANNEL -> darlington(b, suppressor);
            case HIGH_SIDE_PNP -> highSide(b, suppressor, drive);
            default -> throw new IllegalStateException("unknown template " + template);
        }
        String name = template.title() + ", " + suppressor.id().replace('-', ' ')
                + (template == StageTemplate.HIGH_SIDE_PNP && drive == HighSideDrive.DIRECT ? ", direct drive" : "");
        return new Stage(name, describe(template, drive), b.parts, b.wires, b.tps, Conditions.DEFAULT);
    }

    private static String describe(StageTemplate t, HighSideDrive drive) {
        return switch (t) {
            case LOW_SIDE_NPN -> "3.3 V logic pin switching a 12 V relay through a low-side NPN.";
            case LOW_SIDE_NMOS -> "3.3 V logic pin switching a 12 V relay through a logic-level N-MOSFET.";
            case DARLINGTON_CHANNEL -> "5 V logic pin switching a 12 V relay through one Darlington-array channel.";
            case HIGH_SIDE_PNP -> drive == HighSideDrive.DIRECT
                    ? "3.3 V pin driving a high-side PNP directly: it cannot turn off with a 12 V coil supply."
                    : "3.3 V logic pin switching a 12 V relay through a high-side PNP and an NPN level shift.";
        };
    }

    private static void lowSide(Builder b, PartKind switchKind, Suppressor s) {
        boolean mos = switchKind == PartKind.NMOS;
        b.part("V1", PartKind.SUPPLY, Placement.at(20, 0)).set(ParamKeys.VOLTS, 12).set(ParamKeys.TOLERANCE_PERCENT, 5);
        relay(b, 20, 6);
        b.wire(20, 0, 20, 4);
        suppressorAcrossCoil(b, s, 20, 4, 8);
        b.part("Q1", switchKind, Placement.at(19, 12));
        b.wire(20, 8, 20, 10);
        b.part("GND1", PartKind.GROUND, Placement.at(20, 16));
        b.wire(20, 14, 20, 16);
        b.part("R1", PartKind.RESISTOR, Placement.at(12, 12).rotated(90)).set(ParamKeys.RESISTANCE_OHMS, mos ? 100 : 1000);
        b.wire(14, 12, 17, 12);
        pin33(b, 6, 12);
        b.wire(8, 12, 10, 12);
        b.part("R2", PartKind.RESISTOR, Placement.at(15, 16)).set(ParamKeys.RESISTANCE_OHMS, mos ? 100_000 : 10_000);
        b.wire(15, 12, 15, 14);
        b.part("GND2", PartKind.GROUND, Placement.at(15, 18));
        contactSide(b, 20, 6);
        b.tp("pin", "U1", "out").tp("control", "Q1", mos ? "g" : "b").tp("switch", "Q1", mos ? "d" : "c")
                .tp("supply", "V1", "p");
    }

    private static void darlington(Builder b, Suppressor s) {
        b.part("V1", PartKind.SUPPLY, Placement.at(20, 0)).set(ParamKeys.VOLTS, 12).set(ParamKeys.TOLERANCE_PERCENT, 5);
        relay(b, 20, 6);
        b.wire(20, 0, 20, 4);
        b.part("U2", PartKind.DARLINGTON, Placement.at(19, 13));
        b.wire(20, 8, 20, 10);
        b.part("GND1", PartKind.GROUND, Placement.at(20, 18));
        b.wire(20, 16, 20, 18);
        if (s == Suppressor.DIODE) {
            b.wire(22, 10, 22, 2);
            b.wire(22, 2, 20, 2);
        } else if (s == Suppressor.DIODE_ZENER) {
            // zener in the common line: COM -> zener cathode ... anode -> supply
            b.part("D2", PartKind.ZENER, Placement.at(22, 5)).set(ParamKeys.BREAKDOWN_VOLTS, 12);
            b.wire(22, 10, 22, 7);
            b.wire(22, 3, 22, 2);
            b.wire(22, 2, 20, 2);
        } else {
            suppressorAcrossCoil(b, s, 20, 4, 8);
        }
        b.part("R1", PartKind.RESISTOR, Placement.at(12, 13).rotated(90)).set(ParamKeys.RESISTANCE_OHMS, 100);
        b.wire(14, 13, 16, 13);
        b.part("U1", PartKind.DRIVE_PIN, Placement.at(6, 13)).set(ParamKeys.HIGH_VOLTS, 5.05).set(ParamKeys.OUTPUT_RESISTANCE_OHMS, 50)
                .set(ParamKeys.PIN_CURRENT_LIMIT_AMPS, 0.020).set(ParamKeys.PACKAGE_CURRENT_LIMIT_AMPS, 0.2);
        b.wire(8, 13, 10, 13);
        contactSide(b, 20, 6);
        b.tp("pin", "U1", "out").tp("control", "U2", "in").tp("switch", "U2", "out").tp("supply", "V1", "p");
    }

    private static void highSide(Builder b, Suppressor s, HighSideDrive drive) {
        b.part("V1", PartKind.SUPPLY, Placement.at(20, 0)).set(ParamKeys.VOLTS, 12).set(ParamKeys.TOLERANCE_PERCENT, 5);
        b.part("Q1", PartKind.PNP, Placement.at(19, 4));
        b.wire(20, 0, 20, 2);
        relay(b, 20, 10);
        b.wire(20, 6, 20, 8);
        b.part("GND1", PartKind.GROUND, Placement.at(20, 14));
        b.wire(20, 12, 20, 14);
        suppressorAcrossCoil(b, s, 20, 8, 12);
        if (drive == HighSideDrive.DIRECT) {
            b.part("R2", PartKind.RESISTOR, Placement.at(15, 2)).set(ParamKeys.RESISTANCE_OHMS, 10_000);
            b.wire(15, 0, 20, 0);
            b.part("R1", PartKind.RESISTOR, Placement.at(11, 4).rotated(90)).set(ParamKeys.RESISTANCE_OHMS, 2200);
            b.wire(13, 4, 17, 4);
            pin33(b, 5, 4);
            b.wire(7, 4, 9, 4);
        } else {
            b.part("R3", PartKind.RESISTOR, Placement.at(15, 2)).set(ParamKeys.RESISTANCE_OHMS, 10_000);
            b.wire(15, 0, 20, 0);
            b.part("R4", PartKind.RESISTOR, Placement.at(12, 4).rotated(90)).set(ParamKeys.RESISTANCE_OHMS, 2200);
            b.wire(14, 4, 17, 4);
            b.part("Q2", PartKind.NPN, Placement.at(9, 8));
            b.wire(10, 4, 10, 6);
            b.part("GND2", PartKind.GROUND, Placement.at(10, 12));
            b.wire(10, 10, 10, 12);
            b.part("R1", PartKind.RESISTOR, Placement.at(3, 8).rotated(90)).set(ParamKeys.RESISTANCE_OHMS, 4700);
            b.wire(5, 8, 7, 8);
            pin33(b, -3, 8);
            b.wire(-1, 8, 1, 8);
            b.part("R2", PartKind.RESISTOR, Placement.at(6, 12)).set(ParamKeys.RESISTANCE_OHMS, 47_000);
            b.wire(6, 8, 6, 10);
            b.part("GND3", PartKind.GROUND, Placement.at(6, 14));
        }
        contactSide(b, 20, 10);
        b.tp("pin", "U1", "out").tp("control", "Q1", "b").tp("switch", "Q1", "c").tp("supply", "V1", "p");
    }

    private static void pin33(Builder b, int x, int y) {
        b.part("U1", PartKind.DRIVE_PIN, Placement.at(x, y)).set(ParamKeys.HIGH_VOLTS, 3.5).set(ParamKeys.OUTPUT_RESISTANCE_OHMS, 75);
    }

    /**
     * The demo relay: a small 12 V PCB relay, typical figures. The core-loss resistance, 100 kΩ
     * (typical, demo value), stands for the eddy-current losses that damp the winding's
     * self-resonance with its 100 pF: Q = R·√(C/L) ≈ 0.9 released, 0.65 attracted (derived), so the
     * coil does not ring on after the freewheeling diode stops conducting, as it would with the
     * winding resistance alone (Q ≈ 250).
     */
    private static void relay(Builder b, int x, int y) {
        b.part("K1", PartKind.RELAY, Placement.at(x, y))
                .set(ParamKeys.RATED_VOLTS, 12).set(ParamKeys.COIL_RESISTANCE_OHMS, 400)
                .set(ParamKeys.MUST_OPERATE_VOLTS, 9.0).set(ParamKeys.MUST_RELEASE_VOLTS, 1.2)
                .set(ParamKeys.INDUCTANCE_RELEASED_HENRIES, 1.2).set(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES, 2.4).set(ParamKeys.CORE_LOSS_OHMS, 100e3);
    }

    /** Contact side: a 24 V rail through the normally-open contact to a lamp. */
    private static void contactSide(Builder b, int coilX, int coilY) {
        int comX = coilX + 5;
        int noX = coilX + 6;
        b.part("V2", PartKind.SUPPLY, Placement.at(comX, coilY - 5)).set(ParamKeys.VOLTS, 24).set(ParamKeys.TOLERANCE_PERCENT, 10);
        b.wire(comX, coilY - 5, comX, coilY - 2);
        b.part("E1", PartKind.LOAD, Placement.at(noX, coilY + 6)).set(ParamKeys.RESISTANCE_OHMS, 48).set(ParamKeys.RATED_WATTS, 12)
                .option(ParamKeys.LOAD_KIND, "lamp");
        b.wire(noX, coilY + 2, noX, coilY + 4);
        b.part(b.nextRef("GND"), PartKind.GROUND, Placement.at(noX, coilY + 10));
        b.wire(noX, coilY + 8, noX, coilY + 10);
    }

    /**
     * Places the chosen suppressor across a vertical coil at {@code x} from {@code top} (the end at
     * the higher potential when on) to {@code bottom}.
     */
    private static void suppressorAcrossCoil(Builder b, Suppressor s, int x, int top, int bottom) {
        int mid = (top + bottom) / 2;
        switch (s) {
            case NONE -> { }
            case DIODE -> {
                b.part("D1", PartKind.DIODE, Placement.at(x - 4, mid).rotated(180));
                b.wire(x - 4, top, x, top);
                b.wire(x - 4, bottom, x, bottom);
            }
            case TVS -> {
                b.part("D1", PartKind.TVS, Placement.at(x - 4, mid)).set(ParamKeys.BREAKDOWN_VOLTS, 24);
                b.wire(x - 4, top, x, top);
                b.wire(x - 4, bottom, x, bottom);
            }
            case RESISTOR -> {
                b.part(b.nextRef("R"), PartKind.RESISTOR, Placement.at(x - 4, mid)).set(ParamKeys.RESISTANCE_OHMS, 1200)
                        .set(ParamKeys.POWER_RATING_WATTS, 0.5);
                b.wire(x - 4, top, x, top);
                b.wire(x - 4, bottom, x, bottom);
            }
            case DIODE_ZENER, RC -> {
                // series pair: lower part vertical at x-6, upper part horizontal one row above the coil top
                if (s == Suppressor.DIODE_ZENER) {
                    b.part("D1", PartKind.DIODE, Placement.at(x - 6, mid).rotated(180));
                    // zener: cathode (left) meets the diode's cathode, anode (right) to the supply end
                    b.part("D2", PartKind.ZENER, Placement.at(x - 3, top - 2).rotated(90)).set(ParamKeys.BREAKDOWN_VOLTS, 12);
                } else {
                    b.part("C1", PartKind.CAPACITOR, Placement.at(x - 6, mid)).set(ParamKeys.CAPACITANCE_FARADS, 100e-9);
                    b.part(b.nextRef("R"), PartKind.RESISTOR, Placement.at(x - 3, top - 2).rotated(90))
                            .set(ParamKeys.RESISTANCE_OHMS, 470).set(ParamKeys.POWER_RATING_WATTS, 0.5);
                }
                b.wire(x - 6, bottom, x, bottom);
                b.wire(x - 6, top, x - 6, top - 2);
                b.wire(x - 6, top - 2, x - 5, top - 2);
                b.wire(x - 1, top - 2, x, top - 2);
            }
            default -> throw new IllegalStateException("unknown suppressor " + s);
        }
    }

    /**
     * Adds contact protection to a template's contact side: an RC or a varistor across the contacts
     * (between the contact rail and the load's terminal on the contacts), or a diode across the load.
     * Parts go to the right of the contacts and the load, wired to their pins.
     *
     * @param stage a stage laid out like the templates (rail straight above the contact common, load
     *     below the contact it is switched by)
     * @param protection what to add; {@code NONE} returns the stage as it is
     * @param ohms the RC's resistance, ohms (RC only)
     * @param farads the RC's capacitance, farads (RC only)
     * @param volts the varistor's clamping voltage, volts (varistor only)
     * @throws IllegalArgumentException with one sentence when the stage's contact side is not laid out
     *     like a template's
     */
    public static Stage withContactProtection(Stage stage, ContactProtection protection, double ohms, double farads,
                                              double volts) {
        if (protection == ContactProtection.NONE) {
            return stage;
        }
        Part k = stage.parts().stream().filter(p -> p.kind() == PartKind.RELAY).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("contact protection needs a relay in the stage"));
        Part e = stage.parts().stream().filter(p -> p.kind() == PartKind.LOAD).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("contact protection needs a contact-side load in the stage"));
        GridPoint com = k.pinPoint("com");
        GridPoint top = e.pinPoint("a");
        GridPoint bottom = e.pinPoint("b");
        if (top.gridY() > bottom.gridY()) {
            GridPoint t = top;
            top = bottom;
            bottom = t;
        }
        if (top.gridX() != bottom.gridX() || top.gridY() <= com.gridY()) {
            throw new IllegalArgumentException("contact protection can be added only to a contact side laid out like the"
                    + " templates' (a vertical load below the contacts)");
        }
        int x = Math.max(com.gridX(), top.gridX()) + 3;
        int joinY = top.gridY() - 1; // on the wire from the contact down to the load
        if (joinY < com.gridY() + 4) {
            throw new IllegalArgumentException("contact protection needs at least five grid rows between the contact"
                    + " common and the load");
        }
        Stage s = stage.withWire(Wire.of(com.gridX(), com.gridY(), x, com.gridY()));
        switch (protection) {
            case RC, VARISTOR -> {
                int end;
                if (protection == ContactProtection.RC) {
                    // R down from the contact common's row, C across to the right one row below it
                    s = s.withPart(Part.of(nextRef(s, "R", 5), PartKind.RESISTOR, Placement.at(x, com.gridY() + 2))
                            .with("resistanceOhms", ohms).with("powerRatingWatts", 0.5));
                    s = s.withPart(Part.of(nextRef(s, "C", 2), PartKind.CAPACITOR,
                            Placement.at(x + 2, com.gridY() + 4).rotated(90))
                            .with("capacitanceFarads", farads).with("ratedVolts", 400));
                    end = x + 4;
                    s = s.withWire(Wire.of(end, com.gridY() + 4, end, joinY));
                } else {
                    s = s.withPart(Part.of(nextRef(s, "D", 3), PartKind.TVS, Placement.at(x, com.gridY() + 2))
                            .with("breakdownVolts", volts));
                    end = x;
                    s = s.withWire(Wire.of(x, com.gridY() + 4, x, joinY));
                }
                s = s.withWire(Wire.of(top.gridX(), joinY, end, joinY));
            }
            case DIODE -> {
                s = stage;
                int dx = top.gridX() + 3;
                s = s.withPart(Part.of(nextRef(s, "D", 3), PartKind.DIODE, Placement.at(dx, top.gridY() + 2).rotated(180)));
                s = s.withWire(Wire.of(top.gridX(), top.gridY(), dx, top.gridY()));
                s = s.withWire(Wire.of(bottom.gridX(), bottom.gridY(), dx, bottom.gridY()));
            }
            default -> throw new IllegalStateException("unknown protection " + protection);
        }
        return s;
    }

    private static String nextRef(Stage s, String prefix, int from) {
        for (int i = from; ; i++) {
            String c = prefix + i;
            if (s.part(c).isEmpty()) {
                return c;
            }
        }
    }

    /** Collects parts, wires and test points while a template is laid out. */
    private static final class Builder {
        final List<Part> parts = new ArrayList<>();
        final List<Wire> wires = new ArrayList<>();
        final List<TestPoint> tps = new ArrayList<>();

        PartBuilder part(String ref, PartKind kind, Placement placement) {
            return new PartBuilder(this, parts.size(), Part.of(ref, kind, placement));
        }

        void wire(int x1, int y1, int x2, int y2) {
            wires.add(Wire.of(x1, y1, x2, y2));
        }

        Builder tp(String net, String ref, String pin) {
            tps.add(new TestPoint(net, ref, pin));
            return this;
        }

        String nextRef(String prefix) {
            for (int i = 1; ; i++) {
                String c = prefix + i;
                if (parts.stream().noneMatch(p -> p.ref().equals(c)) && !reserved(c)) {
                    return c;
                }
            }
        }

        private static boolean reserved(String ref) {
            // R1..R4 are the drive network's in the templates that use them
            return ref.equals("R1") || ref.equals("R2") || ref.equals("R3") || ref.equals("R4");
        }
    }

    /** Sets values on the part just placed. */
    private static final class PartBuilder {
        private final Builder owner;
        private final int index;

        PartBuilder(Builder owner, int index, Part part) {
            this.owner = owner;
            this.index = index;
            owner.parts.add(part);
        }

        PartBuilder set(String key, double value) {
            owner.parts.set(index, owner.parts.get(index).with(key, value));
            return this;
        }

        PartBuilder option(String key, String value) {
            owner.parts.set(index, owner.parts.get(index).withOption(key, value));
            return this;
        }
    }
}
