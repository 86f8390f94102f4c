package org.faultbench.digitize.io;

/**
 * Walks the blank-separated values of a grid file's data part one by one, across line breaks, remembering the line
 * and field of each value for error messages.
 */
final class DataTokens {
    private static final String[] NO_FIELDS = {};

    private final TextFile file;
    private int line;
    private String[] fields = NO_FIELDS;
    private int index = -1;

    /** Tokens from line {@code firstLine} (1-based) to the end of the file. */
    DataTokens(TextFile file, int firstLine) {
        this.file = file;
        this.line = firstLine - 1;
    }

    /** Moves to the next value; false when the file has no more. */
    boolean advance() {
        index++;
        while (index >= fields.length) {
            if (line >= file.lineCount()) {
                return false;
            }
            line++;
            String text = file.line(line).trim();
            fields = text.isEmpty() ? NO_FIELDS : text.split("\\s+");
            index = 0;
        }
        return true;
    }

    String text() {
        return fields[index];
    }

    /** Line of the current value, 1-based. */
    int line() {
        return line;
    }

    /** Field of the current value within its line, 1-based. */
    int field() {
        return index + 1;
    }

    /** Number of values on the current line. */
    int fieldsOnLine() {
        return fields.length;
    }

    /** The current value as a number, or an error at its line and field. */
    double number() throws FormatException {
        return file.number(text(), line, field(), "the grid value");
    }
}
