package org.armature.io;

import com.fasterxml.jackson.core.io.JsonStringEncoder;
import java.util.Iterator;
import java.util.Map;
import java.util.Optional;
import org.armature.model.FaultHunt;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.SharedPart;
import org.armature.model.Conditions;
import org.armature.model.StageSettings;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.TestPoint;
import org.armature.model.Wire;

/**
 * Lays out the text of a stage file by hand: one line per part header, per value, per wire and per
 * test point, so that files read well and diff by line.
 *
 * <p>Numbers are written so that reading them back gives the same {@code double}: whole numbers below
 * {@value #LARGEST_PLAIN_WHOLE} without a fraction ({@code 12}), others in Java's shortest
 * round-tripping form with a lower-case exponent ({@code 0.0025}, {@code 1e-14}). Non-finite values,
 * which JSON numbers cannot hold, become the texts {@code "NaN"}, {@code "Infinity"},
 * {@code "-Infinity"}, so that a document always saves and nothing typed is lost.
 */
final class StageWriter {

    /** Text standing for a value that is not a number. */
    static final String NOT_A_NUMBER = "NaN";
    /** Text standing for positive infinity. */
    static final String POSITIVE_INFINITY = "Infinity";
    /** Text standing for negative infinity. */
    static final String NEGATIVE_INFINITY = "-Infinity";

    /**
     * Whole numbers below this magnitude are written without fraction or exponent; doubles hold every
     * integer exactly up to 2^53 ≈ 9.007e15, so this keeps the plain form exact.
     */
    static final double LARGEST_PLAIN_WHOLE = 1e15;

    private static final String INDENT = "  ";

    private StageWriter() {
    }

    static String write(StageDocument doc) {
        StringBuilder b = new StringBuilder();
        b.append("{\n");
        b.append(INDENT).append("\"format\": ").append(quote(StageJson.FORMAT)).append(",\n");
        boolean settings = doc.stages().stream().anyMatch(st -> !st.settings().isDefault());
        int version = doc.faultHunt().isPresent() ? StageJson.VERSION
                : doc.lineUp().isPresent() ? StageJson.VERSION_WITH_LINE_UP
                : settings ? StageJson.VERSION_WITH_SETTINGS : StageJson.VERSION_WITHOUT_SETTINGS;
        b.append(INDENT).append("\"version\": ").append(version).append(",\n");
        b.append(INDENT).append("\"title\": ").append(quote(doc.title())).append(",\n");
        b.append(INDENT).append("\"stages\": [\n");
        for (int i = 0; i < doc.stages().size(); i++) {
            stage(b, doc.stages().get(i), INDENT.repeat(2));
            b.append(i + 1 < doc.stages().size() ? ",\n" : "\n");
        }
        b.append(INDENT).append(doc.lineUp().isPresent() || doc.faultHunt().isPresent() ? "],\n" : "]\n");
        doc.lineUp().ifPresent(l -> lineUp(b, l, INDENT, doc.faultHunt().isPresent()));
        doc.faultHunt().ifPresent(h -> faultHunt(b, h, INDENT));
        b.append("}\n");
        return b.toString();
    }

    /** The line-up (format version 3): stage indices, then the shared roles one per line group. */
    private static void lineUp(StringBuilder b, LineUp l, String in, boolean more) {
        String in1 = in + INDENT;
        String in2 = in1 + INDENT;
        b.append(in).append("\"lineUp\": {\n");
        b.append(in1).append("\"stages\": [");
        for (int i = 0; i < l.stageIndices().size(); i++) {
            b.append(i == 0 ? "" : ", ").append(l.stageIndices().get(i));
        }
        b.append("],\n");
        LineUpContext c = l.context();
        b.append(in1).append("\"context\": {\n");
        b.append(in2).append("\"ambient\": {\"ambientCelsius\": ").append(number(c.ambientCelsius()))
                .append(", \"ambientMinCelsius\": ").append(number(c.ambientMinCelsius()))
                .append(", \"ambientMaxCelsius\": ").append(number(c.ambientMaxCelsius())).append('}');
        shared(b, "relay", c.relay(), in2);
        shared(b, "coilSupply", c.coilSupply(), in2);
        shared(b, "drivePin", c.drivePin(), in2);
        shared(b, "contactSupply", c.contactSupply(), in2);
        shared(b, "load", c.load(), in2);
        b.append('\n').append(in1).append("}\n");
        b.append(in).append(more ? "},\n" : "}\n");
    }

    /**
     * The fault hunt (format version 4): the stage, the symptom if entered, the meter on one line,
     * one line per reading and per changed prior weight.
     */
    private static void faultHunt(StringBuilder b, FaultHunt h, String in) {
        String in1 = in + INDENT;
        String in2 = in1 + INDENT;
        b.append(in).append("\"faultHunt\": {\n");
        b.append(in1).append("\"stage\": ").append(h.stageIndex()).append(",\n");
        h.symptom().ifPresent(s -> b.append(in1).append("\"symptom\": ").append(quote(s)).append(",\n"));
        FaultHunt.MeterSetting m = h.meter();
        b.append(in1).append("\"meter\": {\"inputOhms\": ").append(number(m.inputOhms()))
                .append(", \"counts\": ").append(m.counts())
                .append(", \"percentOfReading\": ").append(number(m.percentOfReading()))
                .append(", \"digits\": ").append(number(m.digits())).append("},\n");
        b.append(in1).append("\"readings\": [");
        b.append(h.readings().isEmpty() ? "" : "\n");
        for (int i = 0; i < h.readings().size(); i++) {
            FaultHunt.HuntReading r = h.readings().get(i);
            b.append(in2).append("{\"net\": ").append(quote(r.net()))
                    .append(", \"pinState\": ").append(quote(r.pinHigh() ? "high" : "low"))
                    .append(", \"volts\": ").append(number(r.volts())).append('}');
            b.append(i + 1 < h.readings().size() ? ",\n" : "\n" + in1);
        }
        b.append("],\n");
        b.append(in1).append("\"priorWeights\": {");
        appendMap(b, h.priorWeights(), in1, true);
        b.append("}\n");
        b.append(in).append("}\n");
    }

    private static void shared(StringBuilder b, String role, Optional<SharedPart> part, String in) {
        if (part.isEmpty()) {
            return;
        }
        SharedPart p = part.get();
        String in1 = in + INDENT;
        b.append(",\n").append(in).append(quote(role)).append(": {\"kind\": ").append(quote(PartKindIds.id(p.kind())));
        b.append(",\n").append(in1).append("\"values\": {");
        appendMap(b, p.values(), in1, true);
        b.append('}');
        if (!p.options().isEmpty()) {
            b.append(",\n").append(in1).append("\"options\": {");
            appendMap(b, p.options(), in1, false);
            b.append('}');
        }
        b.append('\n').append(in).append('}');
    }

    private static void stage(StringBuilder b, Stage s, String in) {
        String in1 = in + INDENT;
        String in2 = in1 + INDENT;
        b.append(in).append("{\n");
        b.append(in1).append("\"name\": ").append(quote(s.name())).append(",\n");
        b.append(in1).append("\"description\": ").append(quote(s.description())).append(",\n");
        Conditions c = s.conditions();
        b.append(in1).append("\"conditions\": {\"pinState\": ").append(quote(c.pinHigh() ? "high" : "low"))
                .append(", \"ambientCelsius\": ").append(number(c.ambientCelsius()))
                .append(", \"ambientMinCelsius\": ").append(number(c.ambientMinCelsius()))
                .append(", \"ambientMaxCelsius\": ").append(number(c.ambientMaxCelsius())).append("},\n");
        StageSettings st = s.settings();
        if (!st.isDefault()) {
            b.append(in1).append("\"settings\": {");
            if (st.releaseTimeRequirementSeconds().isPresent()) {
                b.append("\"releaseTimeSeconds\": ").append(number(st.releaseTimeRequirementSeconds().getAsDouble()))
                        .append(", ");
            }
            b.append("\"monteCarloSamples\": ").append(st.monteCarloSamples())
                    .append(", \"monteCarloSeed\": ").append(st.monteCarloSeed()).append("},\n");
        }
        b.append(in1).append("\"parts\": [");
        b.append(s.parts().isEmpty() ? "" : "\n");
        for (int i = 0; i < s.parts().size(); i++) {
            part(b, s.parts().get(i), in2);
            b.append(i + 1 < s.parts().size() ? ",\n" : "\n" + in1);
        }
        b.append("],\n");
        b.append(in1).append("\"wires\": [");
        b.append(s.wires().isEmpty() ? "" : "\n");
        for (int i = 0; i < s.wires().size(); i++) {
            Wire w = s.wires().get(i);
            b.append(in2).append('[').append(w.from().gridX()).append(", ").append(w.from().gridY()).append(", ")
                    .append(w.to().gridX()).append(", ").append(w.to().gridY()).append(']');
            b.append(i + 1 < s.wires().size() ? ",\n" : "\n" + in1);
        }
        b.append("],\n");
        b.append(in1).append("\"testPoints\": [");
        b.append(s.testPoints().isEmpty() ? "" : "\n");
        for (int i = 0; i < s.testPoints().size(); i++) {
            TestPoint t = s.testPoints().get(i);
            b.append(in2).append("{\"net\": ").append(quote(t.net())).append(", \"ref\": ").append(quote(t.ref()))
                    .append(", \"pin\": ").append(quote(t.pin())).append('}');
            b.append(i + 1 < s.testPoints().size() ? ",\n" : "\n" + in1);
        }
        b.append("]\n");
        b.append(in).append('}');
    }

    private static void part(StringBuilder b, Part p, String in) {
        String in1 = in + INDENT;
        b.append(in).append("{\"ref\": ").append(quote(p.ref()))
                .append(", \"kind\": ").append(quote(PartKindIds.id(p.kind())))
                .append(", \"at\": [").append(p.placement().origin().gridX()).append(", ")
                .append(p.placement().origin().gridY()).append(']')
                .append(", \"rotation\": ").append(p.placement().rotationDegrees())
                .append(", \"mirrored\": ").append(p.placement().mirrored());
        if (p.values().isEmpty() && p.options().isEmpty()) {
            b.append(", \"values\": {}}");
            return;
        }
        b.append(",\n").append(in1).append("\"values\": {");
        appendMap(b, p.values(), in1, true);
        b.append('}');
        if (!p.options().isEmpty()) {
            b.append(",\n").append(in1).append("\"options\": {");
            appendMap(b, p.options(), in1, false);
            b.append('}');
        }
        b.append('\n').append(in).append('}');
    }

    private static void appendMap(StringBuilder b, Map<String, ?> map, String in, boolean numbers) {
        if (map.isEmpty()) {
            return;
        }
        b.append('\n');
        for (Iterator<? extends Map.Entry<String, ?>> it = map.entrySet().iterator(); it.hasNext(); ) {
            Map.Entry<String, ?> e = it.next();
            b.append(in).append(INDENT).append(quote(e.getKey())).append(": ");
            b.append(numbers ? number((Double) e.getValue()) : quote((String) e.getValue()));
            b.append(it.hasNext() ? ",\n" : "\n" + in);
        }
    }

    /** A JSON string literal. */
    static String quote(String s) {
        return '"' + escapeLoneSurrogates(new String(JsonStringEncoder.getInstance().quoteAsString(s))) + '"';
    }

    /**
     * Writes a UTF-16 surrogate that is not half of a pair as a JSON backslash-u escape: as a raw
     * character it has no UTF-8 form (it would be saved as {@code ?}), escaped it reads back as the
     * same character, so the text round-trips exactly.
     */
    static String escapeLoneSurrogates(String s) {
        StringBuilder b = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean paired = Character.isHighSurrogate(c) && i + 1 < s.length()
                    && Character.isLowSurrogate(s.charAt(i + 1));
            if (paired) {
                if (b != null) {
                    b.append(c).append(s.charAt(i + 1));
                }
                i++;
            } else if (Character.isSurrogate(c)) {
                if (b == null) {
                    b = new StringBuilder(s.length() + 8).append(s, 0, i);
                }
                b.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
            } else if (b != null) {
                b.append(c);
            }
        }
        return b == null ? s : b.toString();
    }

    /** A JSON number (or stand-in text for a non-finite value) that reads back as exactly {@code v}. */
    static String number(double v) {
        if (Double.isNaN(v)) {
            return quote(NOT_A_NUMBER);
        }
        if (Double.isInfinite(v)) {
            return quote(v > 0 ? POSITIVE_INFINITY : NEGATIVE_INFINITY);
        }
        boolean negativeZero = v == 0 && Double.doubleToRawLongBits(v) != 0;
        if (v == Math.rint(v) && Math.abs(v) < LARGEST_PLAIN_WHOLE && !negativeZero) {
            return Long.toString((long) v);
        }
        String s = Double.toString(v);
        int e = s.indexOf('E');
        if (e < 0) {
            return s;
        }
        String mantissa = s.substring(0, e);
        if (mantissa.endsWith(".0")) {
            mantissa = mantissa.substring(0, mantissa.length() - 2);
        }
        return mantissa + "e" + s.substring(e + 1);
    }
}
