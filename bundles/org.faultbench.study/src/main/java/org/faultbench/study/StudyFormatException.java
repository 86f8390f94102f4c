package org.faultbench.study;

/**
 * A study or analysis file that cannot be used, with the file and the field (a JSON path such as
 * {@code stratigraphy.units[2].thickness}) named so the user can find and fix it.
 */
public final class StudyFormatException extends Exception {
    private static final long serialVersionUID = 1L;
    private final String file;
    private final String field;

    public StudyFormatException(String file, String field, String problem, Throwable cause) {
        super(file + (field.isEmpty() ? "" : ": " + field) + ": " + problem, cause);
        this.file = file;
        this.field = field;
    }

    public StudyFormatException(String file, String field, String problem) {
        this(file, field, problem, null);
    }

    public String file() {
        return file;
    }

    /** JSON path of the offending field; empty when the whole file is at fault. */
    public String field() {
        return field;
    }
}
