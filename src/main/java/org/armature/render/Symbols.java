package org.armature.render;

import org.armature.model.ParamKeys;
import org.armature.model.Part;

/**
 * IEC 60617-style symbols of the allowed part kinds, drawn in local symbol units (see
 * {@link PartGeometry}) with the pin offsets of {@link org.armature.model.PartKind}.
 *
 * <p>Proportions follow the usual drawing practice for a 2.5 mm grid (IEC 60617 / IEC 61082-1, from
 * memory): a resistor body 1 × 2 grid units long is drawn here as 0.8 × 2.1, diode triangles about
 * one unit, transistor envelopes about 2.4 units across.
 */
final class Symbols {

    /** Line width of symbol outlines, grid units. */
    static final double LINE = 0.08;
    /** Arrowhead length, grid units. */
    static final double ARROW = 0.32;

    private Symbols() {
    }

    /** Draws one part; the pen's transform must already map local units (see {@link PartGeometry#frame}). */
    static void draw(Pen pen, Part part, Colour ink, Colour paper, boolean pinHigh) {
        draw(pen, part, ink, paper, pinHigh, false);
    }

    /**
     * Draws a part's symbol in its own frame; a relay with {@code relayOperated} has its blade on
     * the normally-open contact, otherwise on the normally-closed one.
     */
    static void draw(Pen pen, Part part, Colour ink, Colour paper, boolean pinHigh, boolean relayOperated) {
        Stroke s = Stroke.solid(LINE);
        switch (part.kind()) {
            case RESISTOR -> resistor(pen, ink, s);
            case DIODE -> diode(pen, ink, s, Bar.PLAIN);
            case ZENER -> diode(pen, ink, s, Bar.ZENER);
            case TVS -> tvs(pen, ink, s);
            case CAPACITOR -> capacitor(pen, ink, s);
            case LED -> {
                diode(pen, ink, s, Bar.PLAIN);
                ledArrows(pen, ink, s);
            }
            case NPN -> bjt(pen, ink, s, true);
            case PNP -> bjt(pen, ink, s, false);
            case NMOS -> nmos(pen, ink, s);
            case DARLINGTON -> darlington(pen, ink, s);
            case RELAY -> relay(pen, ink, s, relayOperated);
            case LOAD -> {
                switch (part.option(ParamKeys.LOAD_KIND)) {
                    case "lamp" -> lamp(pen, ink, s);
                    case "motor" -> motor(pen, ink, s);
                    case "solenoid" -> inductor(pen, ink, s);
                    case "capacitive" -> capacitor(pen, ink, s);
                    case "led" -> {
                        diode(pen, ink, s, Bar.PLAIN);
                        ledArrows(pen, ink, s);
                    }
                    default -> resistor(pen, ink, s);
                }
            }
            case SUPPLY -> supply(pen, ink);
            case GROUND -> ground(pen, ink, s);
            case DRIVE_PIN -> drivePin(pen, ink, paper, s, pinHigh);
            default -> throw new IllegalStateException("no symbol for " + part.kind());
        }
    }

    private enum Bar { PLAIN, ZENER }

    private static void resistor(Pen pen, Colour ink, Stroke s) {
        pen.line(0, -2, 0, -1, ink, s);
        pen.line(0, 1, 0, 2, ink, s);
        pen.strokeRect(new Box(-0.35, -1, 0.35, 1), ink, s);
    }

    /** Anode at the top (0, −2), cathode at the bottom (0, 2): forward current flows downwards. */
    private static void diode(Pen pen, Colour ink, Stroke s, Bar bar) {
        pen.line(0, -2, 0, -0.5, ink, s);
        pen.line(0, 0.5, 0, 2, ink, s);
        pen.fillPolygon(new double[] {-0.5, 0.5, 0}, new double[] {-0.5, -0.5, 0.5}, ink);
        if (bar == Bar.ZENER) {
            pen.polyline(new double[] {-0.72, -0.52, 0.52, 0.72}, new double[] {0.3, 0.5, 0.5, 0.7}, ink, s);
        } else {
            pen.line(-0.52, 0.5, 0.52, 0.5, ink, s);
        }
    }

    private static void tvs(Pen pen, Colour ink, Stroke s) {
        pen.line(0, -2, 0, -0.9, ink, s);
        pen.line(0, 0.9, 0, 2, ink, s);
        pen.fillPolygon(new double[] {-0.45, 0.45, 0}, new double[] {-0.9, -0.9, 0}, ink);
        pen.fillPolygon(new double[] {-0.45, 0.45, 0}, new double[] {0.9, 0.9, 0}, ink);
        pen.polyline(new double[] {-0.7, -0.52, 0.52, 0.7}, new double[] {-0.18, 0, 0, 0.18}, ink, s);
    }

    private static void capacitor(Pen pen, Colour ink, Stroke s) {
        pen.line(0, -2, 0, -0.2, ink, s);
        pen.line(0, 0.2, 0, 2, ink, s);
        Stroke plate = Stroke.solid(LINE * 1.5);
        pen.line(-0.65, -0.2, 0.65, -0.2, ink, plate);
        pen.line(-0.65, 0.2, 0.65, 0.2, ink, plate);
    }

    private static void ledArrows(Pen pen, Colour ink, Stroke s) {
        arrowLine(pen, 0.6, -0.25, 1.25, -0.75, ink, s);
        arrowLine(pen, 0.75, 0.1, 1.4, -0.4, ink, s);
    }

    private static void lamp(Pen pen, Colour ink, Stroke s) {
        double r = 0.7;
        pen.line(0, -2, 0, -r, ink, s);
        pen.line(0, r, 0, 2, ink, s);
        pen.circle(0, 0, r, ink, s);
        double d = r * Math.sqrt(0.5);
        pen.line(-d, -d, d, d, ink, s);
        pen.line(-d, d, d, -d, ink, s);
    }

    /** A motor (IEC 60617 style): a circle with the letter M, leads to (0, ∓2). */
    private static void motor(Pen pen, Colour ink, Stroke s) {
        double r = 0.8;
        pen.line(0, -2, 0, -r, ink, s);
        pen.line(0, r, 0, 2, ink, s);
        pen.circle(0, 0, r, ink, s);
        pen.text("M", 0, 0, TextStyle.centred(0.8), ink);
    }

    /** An inductive load (solenoid or contactor coil): four half-turns from (0, −1) to (0, 1). */
    private static void inductor(Pen pen, Colour ink, Stroke s) {
        pen.line(0, -2, 0, -1, ink, s);
        pen.line(0, 1, 0, 2, ink, s);
        for (int k = 0; k < 4; k++) {
            pen.arc(0, -0.75 + 0.5 * k, 0.25, -90, 180, ink, s);
        }
    }

    /** Base at (−2, 0), collector and emitter at (1, ∓2) for NPN, emitter on top for PNP. */
    private static void bjt(Pen pen, Colour ink, Stroke s, boolean npn) {
        pen.circle(0.25, 0, 1.2, ink, s);
        pen.line(-2, 0, -0.35, 0, ink, s);
        pen.line(-0.35, -0.65, -0.35, 0.65, ink, Stroke.solid(LINE * 1.6));
        pen.polyline(new double[] {-0.35, 1, 1}, new double[] {-0.3, -0.95, -2}, ink, s);
        pen.polyline(new double[] {-0.35, 1, 1}, new double[] {0.3, 0.95, 2}, ink, s);
        if (npn) {
            arrowHead(pen, 1, 0.95, -0.35, 0.3, ink);
        } else {
            arrowHead(pen, -0.35, -0.3, 1, -0.95, ink);
        }
    }

    /** Gate at (−2, 0), drain (1, −2), source (1, 2); enhancement channel in three pieces, body diode. */
    private static void nmos(Pen pen, Colour ink, Stroke s) {
        pen.line(-2, 0, -0.65, 0, ink, s);
        pen.line(-0.65, -0.7, -0.65, 0.7, ink, s);
        Stroke ch = Stroke.solid(LINE * 1.6);
        pen.line(-0.35, -0.85, -0.35, -0.4, ink, ch);
        pen.line(-0.35, -0.22, -0.35, 0.22, ink, ch);
        pen.line(-0.35, 0.4, -0.35, 0.85, ink, ch);
        pen.polyline(new double[] {-0.35, 1, 1}, new double[] {-0.62, -0.62, -2}, ink, s);
        pen.polyline(new double[] {-0.35, 1, 1}, new double[] {0.62, 0.62, 2}, ink, s);
        pen.polyline(new double[] {-0.35, 0.4, 0.4}, new double[] {0, 0, 0.62}, ink, s);
        arrowHead(pen, -0.35, 0, 0.3, 0, ink);
        // body diode: anode on the source, cathode on the drain
        pen.polyline(new double[] {1, 1.7, 1.7}, new double[] {-1.25, -1.25, -0.3}, ink, s);
        pen.polyline(new double[] {1, 1.7, 1.7}, new double[] {1.25, 1.25, 0.3}, ink, s);
        pen.fillPolygon(new double[] {1.4, 2.0, 1.7}, new double[] {0.3, 0.3, -0.3}, ink);
        pen.line(1.4, -0.3, 2.0, -0.3, ink, s);
        pen.fillCircle(1, -1.25, 0.1, ink);
        pen.fillCircle(1, 1.25, 0.1, ink);
    }

    /**
     * Input (−3, 0), output (1, −3), clamp common (3, −3), emitter (1, 3): a box holding the input
     * resistor, the two transistors and the clamp diode.
     */
    private static void darlington(Pen pen, Colour ink, Stroke s) {
        Stroke thin = Stroke.solid(LINE * 0.8);
        pen.strokeRect(new Box(-2, -2, 3.6, 2), ink, s);
        pen.line(-3, 0, -2, 0, ink, s);
        pen.line(1, -3, 1, -2, ink, s);
        pen.line(3, -3, 3, -2, ink, s);
        pen.line(1, 2, 1, 3, ink, s);
        // input resistor
        pen.line(-2, 0, -1.75, 0, ink, thin);
        pen.strokeRect(new Box(-1.75, -0.17, -1.05, 0.17), ink, thin);
        pen.line(-1.05, 0, -0.75, 0, ink, thin);
        // first transistor, base bar at x = -0.75
        pen.line(-0.75, -0.4, -0.75, 0.4, ink, Stroke.solid(LINE * 1.3));
        pen.polyline(new double[] {-0.75, -0.15, -0.15, 1}, new double[] {-0.18, -0.6, -1.1, -1.1}, ink, thin);
        pen.polyline(new double[] {-0.75, -0.15, -0.15, 0.25}, new double[] {0.18, 0.6, 0.9, 0.9}, ink, thin);
        arrowHead(pen, -0.15, 0.6, -0.75, 0.18, ink, 0.22);
        // output transistor, base bar at x = 0.25
        pen.line(0.25, 0.5, 0.25, 1.3, ink, Stroke.solid(LINE * 1.3));
        pen.polyline(new double[] {0.25, 1, 1}, new double[] {0.72, 0.3, -2}, ink, thin);
        pen.polyline(new double[] {0.25, 1, 1}, new double[] {1.08, 1.5, 2}, ink, thin);
        arrowHead(pen, 1, 1.5, 0.25, 1.08, ink, 0.22);
        pen.fillCircle(1, -1.1, 0.08, ink);
        // clamp diode from the output (anode) to the common pin (cathode)
        pen.polyline(new double[] {1, 3, 3}, new double[] {-0.35, -0.35, -0.7}, ink, thin);
        pen.fillPolygon(new double[] {2.7, 3.3, 3}, new double[] {-0.7, -0.7, -1.25}, ink);
        pen.line(2.7, -1.25, 3.3, -1.25, ink, thin);
        pen.line(3, -1.25, 3, -2, ink, thin);
        pen.fillCircle(1, -0.35, 0.08, ink);
    }

    /** Coil between A1 (0, −2) and A2 (0, 2); changeover set: common (5, −2), NC (4, 2), NO (6, 2). */
    private static void relay(Pen pen, Colour ink, Stroke s, boolean operated) {
        pen.line(0, -2, 0, -0.5, ink, s);
        pen.line(0, 0.5, 0, 2, ink, s);
        pen.strokeRect(new Box(-0.75, -0.5, 0.75, 0.5), ink, s);
        // the blade rests on the normally-closed contact unless the readouts say operated
        pen.line(5, -2, 5, -0.55, ink, s);
        pen.polyline(new double[] {4, 4, 4.45}, new double[] {2, 0.7, 0.7}, ink, s);
        pen.polyline(new double[] {6, 6, 5.55}, new double[] {2, 0.7, 0.7}, ink, s);
        pen.line(5, -0.55, operated ? 5.7 : 4.3, 0.72, ink, s);
        pen.fillCircle(5, -0.55, 0.09, ink);
        // mechanical link from the coil to the blade
        pen.line(0.75, 0, 4.62, 0, ink, new Stroke(LINE * 0.75, java.util.List.of(0.22, 0.16)));
    }

    private static void supply(Pen pen, Colour ink) {
        pen.line(-0.75, 0, 0.75, 0, ink, Stroke.solid(LINE * 1.8));
    }

    private static void ground(Pen pen, Colour ink, Stroke s) {
        pen.line(0, 0, 0, 0.4, ink, s);
        Stroke bar = Stroke.solid(LINE * 1.3);
        pen.line(-0.65, 0.4, 0.65, 0.4, ink, bar);
        pen.line(-0.42, 0.62, 0.42, 0.62, ink, bar);
        pen.line(-0.2, 0.84, 0.2, 0.84, ink, bar);
    }

    /** A flag pointing at its output (2, 0), with the level written inside. */
    private static void drivePin(Pen pen, Colour ink, Colour paper, Stroke s, boolean high) {
        double[] xs = {-1.3, 0.7, 1.25, 0.7, -1.3};
        double[] ys = {-0.5, -0.5, 0, 0.5, 0.5};
        pen.fillPolygon(xs, ys, paper);
        pen.strokePolygon(xs, ys, ink, s);
        pen.line(1.25, 0, 2, 0, ink, s);
        pen.text(high ? "HIGH" : "LOW", -0.25, 0, TextStyle.centred(0.5).weight(true), ink);
    }

    /** A line from (x1, y1) ending in an arrowhead at (x2, y2). */
    static void arrowLine(Pen pen, double x1, double y1, double x2, double y2, Colour ink, Stroke s) {
        double len = Math.hypot(x2 - x1, y2 - y1);
        double k = Math.max(0, (len - ARROW * 0.8) / len);
        pen.line(x1, y1, x1 + (x2 - x1) * k, y1 + (y2 - y1) * k, ink, s);
        arrowHead(pen, x2, y2, x1, y1, ink, ARROW * 0.8);
    }

    /** A filled arrowhead with its tip at (tipX, tipY), pointing away from (fromX, fromY). */
    static void arrowHead(Pen pen, double tipX, double tipY, double fromX, double fromY, Colour ink) {
        arrowHead(pen, tipX, tipY, fromX, fromY, ink, ARROW);
    }

    static void arrowHead(Pen pen, double tipX, double tipY, double fromX, double fromY, Colour ink, double size) {
        double dx = tipX - fromX;
        double dy = tipY - fromY;
        double len = Math.hypot(dx, dy);
        if (len == 0) {
            return;
        }
        double ux = dx / len;
        double uy = dy / len;
        double bx = tipX - ux * size;
        double by = tipY - uy * size;
        double w = size * 0.42;
        pen.fillPolygon(new double[] {tipX, bx - uy * w, bx + uy * w}, new double[] {tipY, by + ux * w, by - ux * w}, ink);
    }
}
