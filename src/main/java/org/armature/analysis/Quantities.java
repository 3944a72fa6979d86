package org.armature.analysis;

import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/** The figures in check explanations and sizing steps, printed the way the rest of the tool prints them. */
final class Quantities {

    private Quantities() {
    }

    static String volts(double v) {
        return EngineeringNotation.format(v, Unit.VOLT);
    }

    static String amps(double v) {
        return EngineeringNotation.format(v, Unit.AMPERE);
    }

    static String ohms(double v) {
        return EngineeringNotation.format(v, Unit.OHM);
    }

    static String ratio(double v) {
        return EngineeringNotation.format(v, Unit.RATIO);
    }

    static String celsius(double v) {
        return EngineeringNotation.format(v, Unit.CELSIUS);
    }

    /**
     * A fraction printed as a percentage with one decimal (1.097 → "109.7 %"), so that a value
     * just short of a wanted percentage never prints as that percentage.
     */
    static String pct1(double fraction) {
        return String.format(java.util.Locale.ROOT, "%.1f %%", fraction * 100);
    }

    /** A fraction (0.95) printed as a percentage (95.0 %). */
    static String pct(double fraction) {
        return EngineeringNotation.format(fraction * 100, Unit.PERCENT);
    }
}
