package org.faultbench.digitize.io;

import java.io.IOException;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The lines of a text file read completely before parsing, so that readers never hand back a partial result, plus
 * the positioned errors that point a geologist at the line and field to fix.
 * <p>
 * Bytes are decoded as UTF-8, falling back to ISO-8859-1 when they are not valid UTF-8 (well names exported by
 * older spreadsheets); a leading byte-order mark, which spreadsheets put before the first CSV header, is dropped.
 */
final class TextFile {
    private static final char BYTE_ORDER_MARK = '\uFEFF';

    private final String name;
    private final List<String> lines;

    private TextFile(String name, String text) {
        this.name = name;
        String withoutMark = !text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK ? text.substring(1) : text;
        this.lines = withoutMark.lines().toList();
    }

    static TextFile read(Path file) throws IOException {
        Path fileName = file.getFileName();
        return new TextFile(fileName == null ? file.toString() : fileName.toString(), decode(Files.readAllBytes(file)));
    }

    static TextFile read(Reader in, String sourceName) throws IOException {
        StringWriter text = new StringWriter();
        in.transferTo(text);
        return new TextFile(sourceName, text.toString());
    }

    private static String decode(byte[] bytes) {
        try {
            return StandardCharsets.UTF_8.newDecoder().decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException notUtf8) {
            return new String(bytes, StandardCharsets.ISO_8859_1);
        }
    }

    String name() {
        return name;
    }

    int lineCount() {
        return lines.size();
    }

    /** Text of line {@code number}, 1-based. */
    String line(int number) {
        return lines.get(number - 1);
    }

    /**
     * Refuses a header that declares more values than the lines from {@code fromLine} on can hold (every value
     * takes at least one character and one separator), before an array of that size is allocated: a damaged
     * count must give a clear error, not exhaust the memory.
     */
    void requireRoomFor(long declared, int fromLine, int line, int field, String what) throws FormatException {
        long room = 0;
        for (int n = Math.max(1, fromLine); n <= lines.size(); n++) {
            room += (lines.get(n - 1).length() + 1) / 2;
        }
        if (declared > room) {
            throw error(line, field, what + " declares " + declared + " values, but the rest of the file can hold at"
                    + " most " + room + "; the header does not match the data");
        }
    }

    FormatException error(int line, int field, String problem) {
        return new FormatException(name, line, field, problem);
    }

    /** The finite decimal number in {@code token}, or an error naming {@code what} was expected there. */
    double number(String token, int line, int field, String what) throws FormatException {
        OptionalDouble value = NumberText.parse(token);
        if (value.isEmpty()) {
            String found = token.isBlank() ? "an empty field" : "'" + token + "'";
            throw error(line, field, "expected a number for " + what + ", found " + found);
        }
        return value.getAsDouble();
    }

    /** The whole number of at least {@code minimum} in {@code token}, or an error naming {@code what}. */
    int count(String token, int line, int field, String what, int minimum) throws FormatException {
        int value;
        try {
            value = Integer.parseInt(token.trim());
        } catch (NumberFormatException notWhole) {
            throw error(line, field, "expected a whole number for " + what + ", found '" + token.trim() + "'");
        }
        if (value < minimum) {
            throw error(line, field, what + " must be at least " + minimum + ", found " + value);
        }
        return value;
    }
}
