package org.armature.render;

/**
 * A colour in sRGB with opacity, independent of any toolkit.
 *
 * @param red red channel, 0 to 255
 * @param green green channel, 0 to 255
 * @param blue blue channel, 0 to 255
 * @param alpha opacity, 0 (transparent) to 1 (opaque)
 */
public record Colour(int red, int green, int blue, double alpha) {

    public Colour {
        check("red", red);
        check("green", green);
        check("blue", blue);
        if (!(alpha >= 0 && alpha <= 1)) {
            throw new IllegalArgumentException("alpha must be within [0, 1], was " + alpha);
        }
    }

    /** An opaque colour from a hex code such as {@code "#1f2a44"} or {@code "1f2a44"}. */
    public static Colour hex(String code) {
        String s = code.startsWith("#") ? code.substring(1) : code;
        if (s.length() != 6) {
            throw new IllegalArgumentException("hex colour must have six digits: " + code);
        }
        int v = Integer.parseInt(s, 16);
        return new Colour((v >> 16) & 0xff, (v >> 8) & 0xff, v & 0xff, 1.0);
    }

    /** The same colour with another opacity. */
    public Colour withAlpha(double a) {
        return new Colour(red, green, blue, a);
    }

    /**
     * The opaque colour a fraction {@code t} of the way from this colour to {@code other} (0 gives
     * this, 1 gives other); exports use it for tints instead of transparency, which not every SVG
     * reader honours.
     */
    public Colour mix(Colour other, double t) {
        double u = Math.max(0, Math.min(1, t));
        return new Colour((int) Math.round(red + (other.red - red) * u), (int) Math.round(green + (other.green - green) * u),
                (int) Math.round(blue + (other.blue - blue) * u), 1.0);
    }

    /** Six-digit lower-case hex code with a leading {@code #}, opacity left out. */
    public String toHex() {
        return String.format("#%02x%02x%02x", red, green, blue);
    }

    /** Relative luminance per ITU-R BT.709 weights on the gamma-encoded channels (0 dark to 1 light). */
    public double luma() {
        return (0.2126 * red + 0.7152 * green + 0.0722 * blue) / 255.0;
    }

    private static void check(String name, int v) {
        if (v < 0 || v > 255) {
            throw new IllegalArgumentException(name + " must be within [0, 255], was " + v);
        }
    }
}
