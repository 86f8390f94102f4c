package org.faultbench.digitize.io;

import java.io.IOException;

/**
 * A text file that does not follow its exchange format, reported with the place to fix it so that a geologist can
 * correct the file in an editor, for example {@code sample.asc, line 7, field 3: expected a number for the grid value,
 * found 'abc'}.
 */
public final class FormatException extends IOException {
    private static final long serialVersionUID = 1L;

    private final String fileName;
    private final int line;
    private final int field;
    private final String problem;

    /**
     * @param fileName name of the file or other source read
     * @param line 1-based line number; 0 when the problem concerns the file as a whole
     * @param field 1-based field (column) number within the line; 0 when the problem concerns the whole line
     * @param problem what is wrong and, where possible, what was expected
     */
    public FormatException(String fileName, int line, int field, String problem) {
        super(describe(fileName, line, field, problem));
        this.fileName = fileName;
        this.line = line;
        this.field = field;
        this.problem = problem;
    }

    private static String describe(String fileName, int line, int field, String problem) {
        StringBuilder text = new StringBuilder(fileName);
        if (line > 0) {
            text.append(", line ").append(line);
        }
        if (line > 0 && field > 0) {
            text.append(", field ").append(field);
        }
        return text.append(": ").append(problem).toString();
    }

    public String fileName() {
        return fileName;
    }

    /** 1-based line number, 0 for the file as a whole. */
    public int line() {
        return line;
    }

    /** 1-based field number within the line, 0 for the whole line. */
    public int field() {
        return field;
    }

    /** The problem without its position. */
    public String problem() {
        return problem;
    }
}
