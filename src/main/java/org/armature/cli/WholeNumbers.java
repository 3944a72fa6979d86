package org.armature.cli;

import java.math.BigInteger;
import picocli.CommandLine;

/**
 * Converters for the plain numeric options ({@code --seed}, {@code --monte-carlo},
 * {@code --forced-beta}), registered on every command, so a bad value gets a sentence saying what was
 * expected instead of picocli's "'abc' is not a long".
 */
final class WholeNumbers {

    private WholeNumbers() {
    }

    /** Registers the converters on a command line and all its subcommands (call after adding them). */
    static void register(CommandLine cl) {
        CommandLine.ITypeConverter<Long> longs = text -> parseWhole(text, Long.MIN_VALUE, Long.MAX_VALUE).longValue();
        CommandLine.ITypeConverter<Integer> ints = text ->
                parseWhole(text, Integer.MIN_VALUE, Integer.MAX_VALUE).intValue();
        CommandLine.ITypeConverter<Double> doubles = WholeNumbers::parseNumber;
        cl.registerConverter(Long.class, longs);
        cl.registerConverter(Long.TYPE, longs);
        cl.registerConverter(Integer.class, ints);
        cl.registerConverter(Integer.TYPE, ints);
        cl.registerConverter(Double.class, doubles);
        cl.registerConverter(Double.TYPE, doubles);
    }

    static BigInteger parseWhole(String text, long min, long max) {
        String t = text.strip().replace("_", "").replace(",", "");
        if (!t.matches("[+-]?\\d{1,400}")) {
            throw new CommandLine.TypeConversionException("expected a whole number such as 7, not '"
                    + shortened(text) + "'");
        }
        BigInteger v = new BigInteger(t);
        if (v.compareTo(BigInteger.valueOf(min)) < 0 || v.compareTo(BigInteger.valueOf(max)) > 0) {
            throw new CommandLine.TypeConversionException("expected a whole number from " + min + " to " + max
                    + ", not " + shortened(text));
        }
        return v;
    }

    private static double parseNumber(String text) {
        try {
            double v = Double.parseDouble(text.strip());
            if (Double.isFinite(v) && text.strip().matches("[+-]?[0-9.]+([eE][+-]?\\d+)?")) {
                return v;
            }
        } catch (NumberFormatException e) {
            // said below
        }
        throw new CommandLine.TypeConversionException("expected a finite number such as 10 or 12.5, not '"
                + shortened(text) + "'");
    }

    static String shortened(String text) {
        return text.length() <= 40 ? text : text.substring(0, 40) + "…";
    }
}
