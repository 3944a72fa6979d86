package org.armature.model;

/**
 * The temperatures over which the device laws (package {@code devices}) hold, and the one place callers
 * (document validation, the part sheet, the command line, the DC engine) take them from.
 *
 * <ul>
 *   <li>Copper: R(T) = R0·(234.5 + T)/(234.5 + T0) (IEC 60028, CHECKS.md PC-7) reaches zero at
 *       −234.5 °C and is a handbook fit only well above it; relay datasheets state their coil
 *       figures from −40 °C or −55 °C.</li>
 *   <li>Junctions: the Shockley and Gummel–Poon temperature scaling (saturation current through the
 *       band gap, gain through XTB) is fitted over the datasheet range of silicon parts, −55 °C to
 *       150–200 °C (common practice: the storage and junction ratings of small-signal parts).</li>
 * </ul>
 * Hence ambient and reference temperatures from {@value #AMBIENT_MIN_CELSIUS} °C to
 * {@value #AMBIENT_MAX_CELSIUS} °C: the lower bound covers the −55 °C of military ranges, the upper
 * one the hottest junction rating of silicon small-signal parts (common practice).
 *
 * <p>A coil winding hotter than the hottest insulation class of IEC 60085 (class R, 220 °C,
 * CHECKS.md CT-1) has no insulation left: a self-heating solve that settles only above
 * {@value #COIL_INSULATION_LIMIT_CELSIUS} °C, or not at all, is a finding, not an operating point.
 */
public final class ModelRange {

    /** Coldest ambient or reference temperature the device laws are used at, °C. */
    public static final double AMBIENT_MIN_CELSIUS = -60.0;
    /** Hottest ambient or reference temperature the device laws are used at, °C. */
    public static final double AMBIENT_MAX_CELSIUS = 200.0;
    /** Hottest coil winding any insulation class of IEC 60085 allows (class R), °C. */
    public static final double COIL_INSULATION_LIMIT_CELSIUS = 220.0;

    private ModelRange() {
    }

    /**
     * @param celsius an ambient or reference temperature, °C
     * @return true if finite and within [{@link #AMBIENT_MIN_CELSIUS}, {@link #AMBIENT_MAX_CELSIUS}]
     */
    public static boolean ambientInRange(double celsius) {
        return Double.isFinite(celsius) && celsius >= AMBIENT_MIN_CELSIUS && celsius <= AMBIENT_MAX_CELSIUS;
    }

    /** @return the valid range in words, for messages: "from −60 °C to 200 °C" */
    public static String ambientRangeText() {
        return "from " + format(AMBIENT_MIN_CELSIUS) + " °C to " + format(AMBIENT_MAX_CELSIUS) + " °C";
    }

    private static String format(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
