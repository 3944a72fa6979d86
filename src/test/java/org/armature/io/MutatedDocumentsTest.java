package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.Validator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * 10,000 seeded mutations of valid stage files (issue 15): truncation, byte flips, wrong types,
 * huge and non-finite numbers, deep nesting, duplicate keys, unknown kinds, dangling wires,
 * duplicate designators, non-UTF-8 bytes and lone surrogates. The seeds are the templates, the
 * examples (one of them holds a fault hunt) and a document with a fault hunt on its second stage.
 *
 * <p>Guarantees, for every mutated file: reading it either gives a document or a
 * {@link StageFileException} with a documented key and a one-line message of bounded length that
 * gives a position (line and column, or a JSON path) where the file has one; no other exception
 * escapes the reader or the validator; every accepted document writes, reads back equal, and writes
 * again byte-identically.
 */
class MutatedDocumentsTest {

    private static final int CASES = 10_000;
    private static final long SEED = 20261205L;

    /** The documented keys (docs/stage-format.md, Strictness). */
    private static final Set<String> KEYS = Set.of(StageFileException.MALFORMED_JSON, StageFileException.UNKNOWN_FORMAT,
            StageFileException.UNKNOWN_VERSION, StageFileException.NEWER_VERSION, StageFileException.MISSING_FIELD,
            StageFileException.WRONG_TYPE, StageFileException.UNKNOWN_FIELD, StageFileException.INVALID_VALUE,
            StageFileException.UNKNOWN_KIND);

    private static final Pattern NUMBER = Pattern.compile("(?<=[\\[ :])-?\\d+(\\.\\d+)?(e-?\\d+)?(?=[,\\]}\\n])");
    private static final Pattern TEXT = Pattern.compile("\"([^\"\\\\]*)\"");
    private static final Pattern KIND = Pattern.compile("\"kind\": \"[a-z-]+\"");
    private static final Pattern REF = Pattern.compile("\"ref\": \"([A-Z]+\\d+)\"");
    private static final Pattern WIRES = Pattern.compile("\"wires\": \\[");

    private static List<String> seeds() {
        List<String> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            out.add(StageJson.write(StageDocument.of(Templates.build(t, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT))));
        }
        for (StageDocument d : ExampleDocuments.all().values()) {
            out.add(StageJson.write(d));
        }
        // fault hunts (format version 4): symptom, meter, readings in both pin states, changed priors
        out.add(StageJson.write(FaultHuntJsonTest.huntDocument()));
        return out;
    }

    @Test
    @DisplayName("10,000 mutated documents: only documented refusals with a place, accepted ones round-trip byte-identically")
    void mutatedDocuments() {
        List<String> seeds = seeds();
        Random r = new Random(SEED);
        Map<String, Integer> outcomes = new TreeMap<>();
        int huntRefusals = 0;
        int huntsAccepted = 0;
        for (int i = 0; i < CASES; i++) {
            String base = seeds.get(r.nextInt(seeds.size()));
            int kind = r.nextInt(13);
            byte[] bytes = mutate(base, kind, r);
            String label = "case " + i + " (mutation " + kind + ")";
            StageDocument doc;
            try {
                doc = StageJson.parse(bytes);
            } catch (StageFileException e) {
                checkRefusal(e, label);
                outcomes.merge(e.key(), 1, Integer::sum);
                huntRefusals += e.getMessage().startsWith("faultHunt") ? 1 : 0;
                continue;
            } catch (RuntimeException | StackOverflowError e) {
                fail(label + ": " + e + " escaped the reader");
                return;
            }
            outcomes.merge("accepted", 1, Integer::sum);
            huntsAccepted += doc.faultHunt().isPresent() ? 1 : 0;
            for (Stage s : doc.stages()) {
                Validator.validate(s);
            }
            String written = StageJson.write(doc);
            StageDocument again = StageJson.parse(written.getBytes(StandardCharsets.UTF_8));
            assertEquals(doc, again, label + ": reads back equal");
            assertEquals(written, StageJson.write(again), label + ": writes byte-identically");
        }
        int total = outcomes.values().stream().mapToInt(Integer::intValue).sum();
        assertEquals(CASES, total);
        assertTrue(outcomes.getOrDefault("accepted", 0) > 500, "enough mutations are accepted: " + outcomes);
        assertTrue(outcomes.size() >= 7, "most refusal keys are reached: " + outcomes);
        assertTrue(huntRefusals > 0 && huntsAccepted > 0, "the fault hunt block is reached: " + huntRefusals
                + " refusals in it, " + huntsAccepted + " accepted documents with a hunt");
    }

    private static void checkRefusal(StageFileException e, String label) {
        String m = e.getMessage();
        assertTrue(KEYS.contains(e.key()), label + ": undocumented key " + e.key());
        assertFalse(m == null || m.isBlank(), label + ": empty message");
        assertFalse(m.contains("\n"), label + ": one line: " + m);
        assertTrue(m.length() <= 700, label + ": message of " + m.length() + " characters");
        assertFalse(m.contains("com.fasterxml") || m.contains("StreamReadConstraints") || m.contains("Exception")
                || m.matches("(?s).*`[A-Za-z]+\\.[A-Za-z].*") || m.contains("(code ") || m.contains("Feature")
                || m.contains("START_"),
                label + ": library internals in " + m);
        boolean placed = m.contains("line ") || m.contains("stages") || m.startsWith("faultHunt") || m.startsWith("lineUp") || m.startsWith("The file")
                || m.startsWith("This is not") || m.startsWith("A stage file");
        assertTrue(placed, label + ": no place in " + m);
    }

    private static byte[] mutate(String text, int kind, Random r) {
        byte[] b = text.getBytes(StandardCharsets.UTF_8);
        switch (kind) {
            case 0: { // truncation
                int n = r.nextInt(b.length);
                byte[] t = new byte[n];
                System.arraycopy(b, 0, t, 0, n);
                return t;
            }
            case 1: { // byte flips
                int flips = 1 + r.nextInt(3);
                for (int k = 0; k < flips; k++) {
                    int at = r.nextInt(b.length);
                    b[at] = (byte) (b[at] ^ (1 << r.nextInt(8)));
                }
                return b;
            }
            case 2: // wrong types: a number becomes text, a list, an object, true or null
                return replaceOne(text, NUMBER, r, new String[] {"\"12\"", "[1]", "{}", "true", "null", "\"4k7\""});
            case 3: // huge and non-finite numbers
                return replaceOne(text, NUMBER, r, new String[] {"1e999", "-1e999", "\"NaN\"", "\"Infinity\"",
                        "\"-Infinity\"", "1.7976931348623157e308", "4.9e-324", "99999999999999999999", "-0.0",
                        "2147483648", "1e-400"});
            case 4: { // deep nesting in place of a value
                int depth = 1 + r.nextInt(r.nextBoolean() ? 40 : 3000);
                return replaceOne(text, NUMBER, r, new String[] {"[".repeat(depth) + "]".repeat(depth)});
            }
            case 5: { // duplicate keys: a line of a part's values repeated
                String[] lines = text.split("\n", -1);
                int at = 1 + r.nextInt(lines.length - 2);
                List<String> out = new ArrayList<>(List.of(lines));
                out.add(at, lines[at]);
                return String.join("\n", out).getBytes(StandardCharsets.UTF_8);
            }
            case 6: // unknown kinds, including long and upper-case ones
                return replaceOne(text, KIND, r, new String[] {"\"kind\": \"relais\"", "\"kind\": \"NPN\"",
                        "\"kind\": \"" + "q".repeat(10_000) + "\"", "\"kind\": \"\"", "\"kind\": 7"});
            case 7: { // dangling wires far from everything
                Matcher m = WIRES.matcher(text);
                if (!m.find()) {
                    return b;
                }
                int x = r.nextInt(2000) - 1000;
                String wire = "[" + x + ", 5, " + (x + r.nextInt(9)) + ", 5]" + (text.startsWith("]", m.end()) ? "" : ", ");
                return (text.substring(0, m.end()) + wire + text.substring(m.end())).getBytes(StandardCharsets.UTF_8);
            }
            case 8: { // duplicate designators
                Matcher m = REF.matcher(text);
                List<String> refs = new ArrayList<>();
                while (m.find()) {
                    refs.add(m.group(1));
                }
                if (refs.size() < 2) {
                    return b;
                }
                String from = refs.get(r.nextInt(refs.size()));
                String to = refs.get(r.nextInt(refs.size()));
                return text.replaceFirst("\"ref\": \"" + from + "\"", "\"ref\": \"" + to + "\"")
                        .getBytes(StandardCharsets.UTF_8);
            }
            case 9: { // bytes that are not UTF-8
                int at = r.nextInt(b.length);
                byte[] bad = {(byte) 0xC3, (byte) 0xFF, (byte) 0x80, (byte) 0xED, (byte) 0xFE, 0};
                b[at] = bad[r.nextInt(bad.length)];
                return b;
            }
            case 10: // lone surrogates (and proper pairs) inside texts
                return replaceOne(text, TEXT, r, new String[] {"\"a\\ud800\"", "\"\\udfff b\"", "\"\\ud83d\\ude00\"",
                        "\"\\ud800\\ud800\"", "\"\\u0000\""});
            case 11: { // a random slice removed
                int from = r.nextInt(b.length);
                int to = Math.min(b.length, from + 1 + r.nextInt(40));
                byte[] t = new byte[b.length - (to - from)];
                System.arraycopy(b, 0, t, 0, from);
                System.arraycopy(b, to, t, from, b.length - to);
                return t;
            }
            default: { // a value of a part moved out of its range or renamed
                return replaceOne(text, TEXT, r, new String[] {"\"coilResistanceOhm\"", "\"\"", "\"-\"", "\"low\"",
                        "\"x y\"", "\"" + "é".repeat(200) + "\""});
            }
        }
    }

    private static byte[] replaceOne(String text, Pattern p, Random r, String[] choices) {
        Matcher m = p.matcher(text);
        List<int[]> spans = new ArrayList<>();
        while (m.find()) {
            spans.add(new int[] {m.start(), m.end()});
        }
        if (spans.isEmpty()) {
            return text.getBytes(StandardCharsets.UTF_8);
        }
        int[] s = spans.get(r.nextInt(spans.size()));
        String with = choices[r.nextInt(choices.length)];
        return (text.substring(0, s[0]) + with + text.substring(s[1])).getBytes(StandardCharsets.UTF_8);
    }
}
