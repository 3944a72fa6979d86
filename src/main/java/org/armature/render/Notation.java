package org.armature.render;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;
import java.util.Optional;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * Engineering notation for drawing labels: the units package's
 * {@link EngineeringNotation#format(double, Unit, int)} with at most three significant figures and
 * no trailing zeros ({@code 1 kΩ}, {@code 12 V}, {@code 29.6 mA}), since a label states a value
 * rather than its precision. Symbols of a known {@link Unit} follow that unit's prefix rule (percent
 * and degrees Celsius take none); other symbols take SI prefixes.
 */
public final class Notation {

    /** Largest number of significant figures on a label. */
    public static final int LABEL_DIGITS = 3;

    private Notation() {
    }

    /** The value with an SI prefix where the unit takes one, e.g. {@code format(4700, Unit.OHM)} is {@code 4.7 kΩ}. */
    public static String format(double value, Unit unit) {
        int digits = Double.isFinite(value) && value != 0 ? digitsNeeded(value) : LABEL_DIGITS;
        return EngineeringNotation.format(value, unit, digits);
    }

    /** The value with an SI prefix and the unit symbol, e.g. {@code format(4700, "Ω")} is {@code 4.7 kΩ}. */
    public static String format(double value, String unitSymbol) {
        int digits = Double.isFinite(value) && value != 0 ? digitsNeeded(value) : LABEL_DIGITS;
        Optional<Unit> unit = Arrays.stream(Unit.values()).filter(u -> u.symbol().equals(unitSymbol)).findFirst();
        return unit.map(u -> EngineeringNotation.format(value, u, digits))
                .orElseGet(() -> EngineeringNotation.format(value, unitSymbol, digits));
    }

    /** The fewest significant figures (1 to 3) that show the value as its 3-figure rounding does. */
    private static int digitsNeeded(double value) {
        BigDecimal full = new BigDecimal(value).round(new MathContext(LABEL_DIGITS));
        for (int d = 1; d < LABEL_DIGITS; d++) {
            if (new BigDecimal(value).round(new MathContext(d)).compareTo(full) == 0) {
                return d;
            }
        }
        return LABEL_DIGITS;
    }
}
