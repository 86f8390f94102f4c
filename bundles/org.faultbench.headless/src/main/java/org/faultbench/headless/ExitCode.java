package org.faultbench.headless;

/** Process exit codes of the headless application, documented in DEVELOPERS.md. */
final class ExitCode {
    static final int OK = 0;
    /** Bad command line: unknown command or option, missing or malformed value. */
    static final int USAGE = 2;
    /** The input files could not be read or are invalid. */
    static final int BAD_INPUT = 3;
    /** The analysis failed while running. */
    static final int FAILED = 4;

    private ExitCode() {
    }
}
