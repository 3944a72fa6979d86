package org.armature.io;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
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
     * {@code settings}; a document whose stages all keep the default settings is still written as
     * {@link #VERSION_WITHOUT_SETTINGS}, so that older programs open it.
     */
    public static final int VERSION = 2;

    /** The version written when no stage has settings of its own (the first format version). */
    public static final int VERSION_WITHOUT_SETTINGS = 1;

    private static final ObjectMapper MAPPER = JsonMapper.builder()
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
        return parse(text.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Reads a stage document from the bytes of a file (UTF-8; Jackson also detects UTF-16 and UTF-32).
     *
     * @throws StageFileException as {@link #parse(String)}
     */
    public static StageDocument parse(byte[] content) {
        JsonNode root;
        try {
            root = MAPPER.readTree(content);
        } catch (JsonProcessingException e) {
            throw malformed(e);
        } catch (IOException e) {
            throw new StageFileException(StageFileException.UNREADABLE,
                    "The stage file could not be read: " + e.getMessage() + ".", e);
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

    private static StageFileException malformed(JsonProcessingException e) {
        JsonLocation at = e.getLocation();
        String what = e.getOriginalMessage();
        int newline = what.indexOf('\n');
        if (newline >= 0) {
            what = what.substring(0, newline);
        }
        what = what.strip();
        if (what.endsWith(".")) {
            what = what.substring(0, what.length() - 1);
        }
        String where = at == null || at.getLineNr() < 1
                ? ""
                : " at line " + at.getLineNr() + ", column " + at.getColumnNr();
        return new StageFileException(StageFileException.MALFORMED_JSON,
                "The file is not valid JSON" + where + ": " + what + ".", e);
    }
}
