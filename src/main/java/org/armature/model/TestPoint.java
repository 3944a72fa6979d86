package org.armature.model;

/**
 * A named test point: gives the net at a part's pin its name ({@code pin}, {@code control},
 * {@code switch}, {@code supply}). Anchored to a pin so that it follows the part when moved.
 *
 * @param net net name, a short identifier
 * @param ref designator of the part
 * @param pin pin name on that part
 */
public record TestPoint(String net, String ref, String pin) {

    public TestPoint {
        if (net == null || !net.matches("[A-Za-z][A-Za-z0-9_\\-]*")) {
            throw new IllegalArgumentException("net name must start with a letter and use letters, digits, _ or -: " + net);
        }
        if (ref == null || pin == null) {
            throw new IllegalArgumentException("test point " + net + " needs a part and a pin");
        }
    }
}
