package org.armature.cli;

import org.armature.units.EngineeringNotation;
import org.armature.units.ParseResult;
import org.armature.units.Unit;
import picocli.CommandLine;

/**
 * Reads an option value in engineering notation ({@code 4k7}, {@code 22k}, {@code 3.3 V},
 * {@code 100n}, {@code 1.5e-3}) as a value of one unit, in SI. A value that cannot be read fails
 * with the parser's sentence, which picocli reports as a usage error.
 */
class QuantityConverter implements CommandLine.ITypeConverter<Double> {

    private final Unit unit;

    /** @param unit the unit the option expects; its spelling may follow the number */
    QuantityConverter(Unit unit) {
        this.unit = unit;
    }

    @Override
    public Double convert(String text) {
        ParseResult r = EngineeringNotation.tryParse(text, unit);
        if (r instanceof ParseResult.Value v) {
            return v.value();
        }
        throw new CommandLine.TypeConversionException(((ParseResult.Failure) r).error().message());
    }

    /** Degrees Celsius, for annotated options. */
    static final class Celsius extends QuantityConverter {
        Celsius() {
            super(Unit.CELSIUS);
        }
    }

    /** Ohms, for annotated options. */
    static final class Ohms extends QuantityConverter {
        Ohms() {
            super(Unit.OHM);
        }
    }

    /** Farads, for annotated options. */
    static final class Farads extends QuantityConverter {
        Farads() {
            super(Unit.FARAD);
        }
    }

    /** Volts, for annotated options. */
    static final class Volts extends QuantityConverter {
        Volts() {
            super(Unit.VOLT);
        }
    }
}
