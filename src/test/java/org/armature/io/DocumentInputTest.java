package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reproductions of the document findings of issue 15; each failed before the fix. */
class DocumentInputTest {

    @TempDir
    Path dir;

    private static final String VALID = StageJson.write(StageDocument.of(Templates.defaultStage()));

    private static StageFileException refused(String text) {
        return assertThrows(StageFileException.class, () -> StageJson.parse(text.getBytes(StandardCharsets.UTF_8)));
    }

    private static StageFileException refused(byte[] bytes) {
        return assertThrows(StageFileException.class, () -> StageJson.parse(bytes));
    }

    @Test
    @DisplayName("reproduction: an unknown kind of 5 million characters gives a short message, not a 5-million-character one")
    void hugeKindQuotedShortly() {
        String kind = "x".repeat(5_000_000);
        StageFileException e = refused(VALID.replaceFirst("\"kind\": \"[a-z-]+\"", "\"kind\": \"" + kind + "\""));
        assertEquals(StageFileException.UNKNOWN_KIND, e.key());
        assertTrue(e.getMessage().length() < 600, "message of " + e.getMessage().length() + " characters");
        assertTrue(e.getMessage().contains("x".repeat(80) + "…"), e.getMessage());
    }

    @Test
    @DisplayName("reproduction: a title holding a lone UTF-16 surrogate round-trips exactly instead of saving as ?")
    void loneSurrogateRoundTrips() {
        String text = VALID.replaceFirst("\"title\": \"[^\"]*\"", "\"title\": \"valves \\\\ud800 and \\\\udc00x\"");
        StageDocument doc = StageJson.parse(text);
        assertEquals("valves \ud800 and \udc00x", doc.title());
        String written = StageJson.write(doc);
        assertTrue(written.contains("\"title\": \"valves \\ud800 and \\udc00x\""), written.substring(0, 120));
        assertEquals(doc, StageJson.parse(written.getBytes(StandardCharsets.UTF_8)));
        assertEquals(written, StageJson.write(StageJson.parse(written)));
        StageDocument paired = StageJson.parse(VALID.replaceFirst("\"title\": \"[^\"]*\"", "\"title\": \"\\\\ud83d\\\\ude00\""));
        assertTrue(StageJson.write(paired).contains("\"title\": \"\ud83d\ude00\""), "a proper pair is written as itself");
    }

    @Test
    @DisplayName("reproduction: nesting beyond the limit is said in our words with a position, no library internals")
    void deepNesting() {
        String deep = "{\"format\": \"armature-stage\", \"version\": 1, \"title\": " + "[".repeat(5000) + "]".repeat(5000) + "}";
        StageFileException e = refused(deep);
        assertEquals(StageFileException.MALFORMED_JSON, e.key());
        assertTrue(e.getMessage().contains("line 1, column"), e.getMessage());
        assertTrue(e.getMessage().contains("deeper than 32 levels"), e.getMessage());
        assertFalse(e.getMessage().contains("StreamReadConstraints"), e.getMessage());
        assertFalse(e.getMessage().contains("`"), e.getMessage());
    }

    @Test
    @DisplayName("a number of 500 digits is refused in our words with its position")
    void longNumber() {
        StageFileException e = refused(VALID.replaceFirst("\"version\": 1", "\"version\": 1" + "0".repeat(500)));
        assertTrue(e.getMessage().contains("longer than 100 characters"), e.getMessage());
        assertTrue(e.getMessage().contains("line 3"), e.getMessage());
    }

    @Test
    @DisplayName("reproduction: a file starting with an FE or 00 byte is named as not UTF-8 (was read as UTF-16)")
    void utf16Named() {
        byte[] le = VALID.getBytes(StandardCharsets.UTF_16LE);
        StageFileException z = refused(le);
        assertTrue(z.getMessage().contains("not UTF-8"), z.getMessage());
        byte[] bom = VALID.getBytes(StandardCharsets.UTF_16); // big-endian with FE FF
        StageFileException f = refused(bom);
        assertTrue(f.getMessage().contains("0xFE"), f.getMessage());
        byte[] zero = new byte[] {0, '{', '}'};
        assertTrue(refused(zero).getMessage().contains("not UTF-8"));
    }

    @Test
    @DisplayName("a byte that is not UTF-8 in the middle is named with its line and column")
    void badByteLocated() {
        byte[] bytes = VALID.replaceFirst("\"title\": \"", "\"title\": \"\u00e9X").getBytes(StandardCharsets.UTF_8);
        int at = VALID.indexOf("\"title\": \"") + "\"title\": \"".length();
        bytes[at + 1] = 'Z'; // the second byte of é is gone: C3 5A is not UTF-8
        StageFileException e = refused(bytes);
        assertTrue(e.getMessage().contains("not UTF-8"), e.getMessage());
        assertTrue(e.getMessage().contains("line 4, column 13"), e.getMessage());
    }

    @Test
    @DisplayName("a UTF-8 byte-order mark is allowed")
    void utf8Bom() {
        byte[] body = VALID.getBytes(StandardCharsets.UTF_8);
        byte[] withBom = new byte[body.length + 3];
        withBom[0] = (byte) 0xEF;
        withBom[1] = (byte) 0xBB;
        withBom[2] = (byte) 0xBF;
        System.arraycopy(body, 0, withBom, 3, body.length);
        assertEquals(StageJson.parse(VALID), StageJson.parse(withBom));
    }

    @Test
    @DisplayName("reproduction: a 3 GB sparse file is refused by its size before reading (was OutOfMemoryError)")
    void hugeSparseFile() throws IOException {
        Path big = dir.resolve("big.stage.json");
        try (RandomAccessFile f = new RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(3L << 30);
        }
        StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.open(big));
        assertEquals(StageFileException.UNREADABLE, e.key());
        assertTrue(e.getMessage().contains("at most 8,388,608 bytes"), e.getMessage());
    }

    @Test
    @DisplayName("reproduction: /dev/zero and a FIFO are refused without reading (were OutOfMemoryError and a hang)")
    void specialFiles() throws Exception {
        if (Files.exists(Path.of("/dev/zero"))) {
            StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.open(Path.of("/dev/zero")));
            assertTrue(e.getMessage().contains("special file"), e.getMessage());
        }
        Path fifo = dir.resolve("pipe.stage.json");
        Process p = new ProcessBuilder("mkfifo", fifo.toString()).start();
        if (p.waitFor() == 0) {
            StageFileException e = assertThrows(StageFileException.class, () -> StageFiles.open(fifo));
            assertTrue(e.getMessage().contains("special file"), e.getMessage());
        }
    }

    @Test
    @DisplayName("every quoted piece of a user's text in a parse message is at most about 80 characters")
    void longTextsQuotedShortly() {
        String longName = "n".repeat(10_000);
        for (String text : List.of(
                VALID.replaceFirst("\"format\": \"armature-stage\",", "\"format\": \"armature-stage\", \"" + longName + "\": 1,"),
                VALID.replaceFirst("\"ref\": \"[^\"]+\"", "\"ref\": \"" + longName + "\", \"bogus\": 1"),
                VALID.replaceFirst("\"pinState\": \"high\"", "\"pinState\": \"" + longName + "\""),
                VALID.replaceFirst("\"format\"", longName))) {
            StageFileException e = refused(text);
            assertTrue(e.getMessage().length() < 700, e.key() + ": " + e.getMessage().length() + " characters");
        }
    }

    @org.junit.jupiter.params.ParameterizedTest(name = "{0}")
    @org.junit.jupiter.params.provider.CsvSource(delimiter = '|', textBlock = """
            {"a": 1,             | line 1, column 9: the file ends too early
            {"a" 1}              | found '1' where a colon after the field name belongs
            {"a": tru}           | found the word "tru"
            {"a": 1}{            | there is more after the top-level object
            {"a": 1, "a": 2}     | the field "a" appears twice in one object
            {"a": 01}            | a number starts with a zero
            {"a": NaN}           | write it as the text "NaN"
            {'a': 1}             | a field name in double quotes
            {"a": [1}            | does not match the one opened
            """)
    @DisplayName("reproduction: malformed JSON is described in our words with its place, no library names or settings")
    void malformedInOurWords(String text, String expected) {
        StageFileException e = refused(text);
        assertTrue(e.getMessage().contains(expected), e.getMessage());
        assertFalse(e.getMessage().contains("`") || e.getMessage().contains("(code ") || e.getMessage().contains("Feature")
                || e.getMessage().contains("com.fasterxml"), e.getMessage());
    }
}
