package org.faultbench.headless;

/** The --help text. */
final class Usage {
    static final String TEXT = String.join(System.lineSeparator(),
            "Faultbench headless analysis",
            "",
            "Usage:",
            "  faultbench.sh -application org.faultbench.headless.batch <command> [options]",
            "",
            "Commands:",
            "  analyze <analysis file>   run the trap analysis with Monte Carlo uncertainty",
            "      --realisations N      number of realisations (default: the analysis file's, else 1000)",
            "      --seed S              random seed (default: the file's, else 1); same seed, same results",
            "      --threads T           worker threads (default: all cores); results do not depend on T",
            "      --out DIR             output folder (default: ./faultbench-results): results.json, summary.csv,",
            "                            leak-probability-<fault>.csv, report.html and report.pdf",
            "      --no-report           write the result files only, without report.html and report.pdf",
            "  --version                 print the program version",
            "  --help                    print this text",
            "",
            "Exit codes: 0 ok, 2 bad command line, 3 bad input, 4 analysis failed.",
            "",
            "Results are decision support only: calibrate against field data and defer to licensed",
            "professionals and local regulations.",
            "");

    private Usage() {
    }
}
