package org.armature.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import org.armature.model.StageDocument;

/**
 * Converts stage documents to and from the text of a stage file ({@code *.stage.json}); the schema is
 * written down in {@code docs/stage-format.md}.
 *
 * <p>Reading parses the text into a Jackson tree and maps it field by field ({@link StageReader});
 * writing lays the text out by hand ({@link StageWriter}) so that files stay readable and
 * diff-friendly. No type information is ever taken from the file: part kinds come from a closed list.
 * Writing then reading gives a document equal to the original ({@code equals} of the records).
 *
 * <p>Parsing is strict about structure and lenient about values: duplicate keys, trailing content,
 * unknown fields and wrong types are errors ({@link StageFileException}); out-of-range numbers and
 * parameter keys a part kind does not know are kept for {@link org.armature.model.Validator}.
 */
public final class StageJson {

    /** The value of the top-level {@code format} field. */
    public static final String FORMAT = "armature-stage";

    /**
     * The newest format version this program reads and writes. Version 2 added a stage's
     * {@code settings}, version 3 the document's {@code lineUp}, version 4 the document's
     * {@code faultHunt}; a document is written with the lowest version that holds it
     * ({@link #VERSION_WITH_LINE_UP} with a line-up but no fault hunt, {@link #VERSION_WITH_SETTINGS}
     * with settings but neither, {@link #VERSION_WITHOUT_SETTINGS} with none of them), so that older
     * programs open it.
     */
    public static final int VERSION = 4;

    /** The version written when the document has a line-up but no fault hunt. */
    public static final int VERSION_WITH_LINE_UP = 3;

    /** The version written when a stage has settings but the document has no line-up or fault hunt. */
    public static final int VERSION_WITH_SETTINGS = 2;

    /** The version written when no stage has settings of its own (the first format version). */
    public static final int VERSION_WITHOUT_SETTINGS = 1;

    /**
     * Deepest nesting of lists and objects read. A stage file nests 5 levels (document, stages, stage,
     * parts, part values); the limit leaves room and stops a hostile file long before the stack does.
     */
    public static final int MAX_NESTING = 32;
    /** Longest number read, in characters (a double needs at most 25). */
    public static final int MAX_NUMBER_CHARS = 100;

    /** Longest piece of the file's own text quoted in a message. */
    static final int EXCERPT_CHARS = 80;

    private static final ObjectMapper MAPPER = JsonMapper.builder(JsonFactory.builder()
                    .streamReadConstraints(StreamReadConstraints.builder()
                            .maxNestingDepth(MAX_NESTING)
                            .maxNumberLength(MAX_NUMBER_CHARS)
                            .build())
                    .build())
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .build();

    private StageJson() {
    }

    /**
     * Reads a stage document from JSON text.
     *
     * @throws StageFileException with one sentence naming the line and column of malformed JSON or the
     *     JSON path of a structural problem
     */
    public static StageDocument parse(String text) {
        return parseText(text.startsWith("\uFEFF") ? text.substring(1) : text);
    }

    /**
     * Reads a stage document from the bytes of a file, which must be UTF-8 (a byte-order mark is
     * allowed): UTF-16, UTF-32 and other encodings are refused and named as such, with the place of
     * the first byte that is not UTF-8.
     *
     * @throws StageFileException as {@link #parse(String)}
     */
    public static StageDocument parse(byte[] content) {
        return parseText(Utf8Text.decode(content));
    }

    private static StageDocument parseText(String text) {
        if (text.isBlank()) {
            throw new StageFileException(StageFileException.MALFORMED_JSON,
                    "The file is empty; a stage file holds one JSON object.");
        }
        JsonNode root;
        try (JsonParser parser = MAPPER.createParser(text)) {
            try {
                root = MAPPER.readTree(parser);
                if (root != null && parser.nextToken() != null) {
                    throw new StageFileException(StageFileException.MALFORMED_JSON, "The file is not valid JSON"
                            + where(parser.currentLocation()) + ": there is more after the top-level object.");
                }
            } catch (StreamConstraintsException e) {
                throw overLimit(e, parser.currentLocation());
            }
        } catch (JsonProcessingException e) {
            throw malformed(e);
        } catch (IOException e) {
            throw new IllegalStateException("reading from a string in memory does not fail with I/O", e);
        }
        if (root == null || root.isMissingNode()) {
            throw new StageFileException(StageFileException.MALFORMED_JSON,
                    "The file is empty; a stage file holds one JSON object.");
        }
        return StageReader.read(root);
    }

    /** The text of a stage file for a document: UTF-8 JSON, two-space indent, ending in a newline. */
    public static String write(StageDocument document) {
        return StageWriter.write(document);
    }

    /** A limit of the reader was passed: said in our words, with the place. */
    private static StageFileException overLimit(StreamConstraintsException e, JsonLocation at) {
        String m = e.getOriginalMessage() == null ? "" : e.getOriginalMessage().toLowerCase(java.util.Locale.ROOT);
        String what;
        if (m.contains("nesting")) {
            what = "lists and objects nest deeper than " + MAX_NESTING + " levels; a stage file nests 5";
        } else if (m.contains("number")) {
            what = "a number is longer than " + MAX_NUMBER_CHARS + " characters";
        } else if (m.contains("string") || m.contains("name")) {
            what = "a text or field name is longer than the reader allows";
        } else {
            what = "the file exceeds a size limit of the reader";
        }
        return new StageFileException(StageFileException.MALFORMED_JSON,
                "The file cannot be read" + where(at) + ": " + what + ".", e);
    }

    private static String where(JsonLocation at) {
        return at == null || at.getLineNr() < 1 ? "" : " at line " + at.getLineNr() + ", column " + at.getColumnNr();
    }

    /** At most {@value #EXCERPT_CHARS} characters of a text, with an ellipsis where cut. */
    static String excerpt(String text) {
        if (text.length() <= EXCERPT_CHARS) {
            return text;
        }
        int end = EXCERPT_CHARS;
        if (Character.isHighSurrogate(text.charAt(end - 1))) {
            end--;
        }
        return text.substring(0, end) + "…";
    }

    private static StageFileException malformed(JsonProcessingException e) {
        String what = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
        return new StageFileException(StageFileException.MALFORMED_JSON,
                "The file is not valid JSON" + where(e.getLocation()) + ": " + plainWords(what) + ".", e);
    }

    private static final java.util.regex.Pattern UNEXPECTED_CHAR =
            java.util.regex.Pattern.compile("Unexpected character \\('(.*?)' \\(code \\d+[^)]*\\)\\)(?::\\s*(.*))?",
                    java.util.regex.Pattern.DOTALL);
    private static final java.util.regex.Pattern QUOTED = java.util.regex.Pattern.compile("'(.*?)'");

    /**
     * The JSON reader's complaint in our own words: what was found and what was expected, with no
     * names of the library's classes or settings.
     */
    static String plainWords(String message) {
        String m = message.strip();
        if (m.startsWith("Unexpected end-of-input")) {
            return m.contains("closing quote") ? "the file ends inside a text (a closing \" is missing)"
                    : "the file ends too early (a bracket, brace or quote is not closed)";
        }
        java.util.regex.Matcher c = UNEXPECTED_CHAR.matcher(m);
        if (c.lookingAt()) {
            String found = c.group(1);
            String expecting = c.group(2) == null ? "" : c.group(2);
            String expected;
            if (expecting.contains("colon")) {
                expected = "a colon after the field name";
            } else if (expecting.contains("Object entries")) {
                expected = "a comma or a closing }";
            } else if (expecting.contains("Array entries")) {
                expected = "a comma or a closing ]";
            } else if (expecting.contains("double-quote to start field name")) {
                expected = "a field name in double quotes";
            } else {
                expected = "a value: a number, text in double quotes, true, false, null, a list or an object";
            }
            return "found " + printable(found) + " where " + expected + " belongs";
        }
        if (m.startsWith("Unrecognized token") || m.startsWith("Non-standard token")) {
            java.util.regex.Matcher q = QUOTED.matcher(m);
            String word = q.find() ? q.group(1) : "";
            String hint = word.matches("[+-]?(NaN|Infinity|INF)") ? " (write it as the text \"" + word.replace("+", "")
                    + "\")" : "";
            return "found the word \"" + excerpt(word) + "\" where a number, text in double quotes, true, false, null, a list "
                    + "or an object belongs" + hint;
        }
        if (m.startsWith("Duplicate field")) {
            java.util.regex.Matcher q = QUOTED.matcher(m);
            return "the field \"" + (q.find() ? excerpt(q.group(1)) : "") + "\" appears twice in one object";
        }
        if (m.startsWith("Trailing token")) {
            return "there is more after the top-level object";
        }
        if (m.contains("Leading zeroes")) {
            return "a number starts with a zero (write 1, not 01)";
        }
        if (m.startsWith("Invalid numeric value") || m.startsWith("Unexpected character ('.'")) {
            return "a number is not written as JSON writes numbers (digits, a point, an exponent)";
        }
        if (m.startsWith("Illegal unquoted character") || m.contains("CTRL-CHAR")) {
            return "a control character (a tab or line break) stands inside a text; write it as an escape such as \\n";
        }
        if (m.startsWith("Unrecognized character escape") || m.contains("escape")) {
            return "a backslash in a text starts no JSON escape (use \\\\ for a backslash)";
        }
        if (m.startsWith("Unexpected close marker")) {
            return "a closing bracket or brace does not match the one opened";
        }
        return "the text is not well-formed JSON here";
    }

    private static String printable(String c) {
        if (c.length() == 1 && Character.isISOControl(c.charAt(0))) {
            return String.format(java.util.Locale.ROOT, "the control character U+%04X", (int) c.charAt(0));
        }
        return "'" + excerpt(c) + "'";
    }
}
