package org.armature.io;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Locale;

/**
 * Strict UTF-8 decoding of a stage file, naming the encoding a file is in when it is not UTF-8 and
 * the place (line, column, byte offset) of the first byte that is not UTF-8.
 */
final class Utf8Text {

    private static final int BOM_LENGTH = 3;

    private Utf8Text() {
    }

    /**
     * The text of UTF-8 bytes, without a leading byte-order mark.
     *
     * @throws StageFileException {@code json.malformed} naming UTF-16/UTF-32 or the first bad byte
     */
    static String decode(byte[] bytes) {
        int start = 0;
        if (bytes.length >= BOM_LENGTH && (bytes[0] & 0xFF) == 0xEF && (bytes[1] & 0xFF) == 0xBB
                && (bytes[2] & 0xFF) == 0xBF) {
            start = BOM_LENGTH;
        }
        if (bytes.length > start) {
            int first = bytes[start] & 0xFF;
            if (first == 0xFE || first == 0xFF) {
                throw notUtf8("starts with the byte 0x" + hex(first)
                        + ", a byte-order mark of UTF-16 or UTF-32 text");
            }
            if (first == 0x00 || (bytes.length > start + 1 && bytes[start + 1] == 0)) {
                throw notUtf8("has zero bytes among its first characters, as UTF-16 or UTF-32 text has");
            }
        }
        CharsetDecoder d = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, start, bytes.length - start);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult r = d.decode(in, out, true);
        if (r.isError()) {
            int at = in.position();
            throw notUtf8("has the byte 0x" + hex(bytes[at] & 0xFF) + ", which is not UTF-8, at "
                    + place(bytes, start, at));
        }
        try {
            r = d.flush(out);
            if (r.isError()) {
                r.throwException();
            }
        } catch (CharacterCodingException e) {
            throw notUtf8("ends in the middle of a UTF-8 character");
        }
        out.flip();
        return out.toString();
    }

    private static String place(byte[] bytes, int start, int at) {
        int line = 1;
        int lineStart = start;
        for (int i = start; i < at; i++) {
            if (bytes[i] == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        // columns count characters: continuation bytes of earlier characters do not count
        int column = 1;
        for (int i = lineStart; i < at; i++) {
            if ((bytes[i] & 0xC0) != 0x80) {
                column++;
            }
        }
        return "line " + line + ", column " + column + " (byte " + at + ")";
    }

    private static String hex(int b) {
        return String.format(Locale.ROOT, "%02X", b);
    }

    private static StageFileException notUtf8(String what) {
        return new StageFileException(StageFileException.MALFORMED_JSON,
                "The file is not UTF-8 text: it " + what + "; save it as UTF-8.");
    }
}
