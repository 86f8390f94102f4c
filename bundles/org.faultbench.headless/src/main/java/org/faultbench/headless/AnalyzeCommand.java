package org.faultbench.headless;

import java.nio.file.Path;
import java.util.List;

/** {@code analyze <analysis file> [--realisations N] [--seed S] [--threads T] [--out DIR]}. */
record AnalyzeCommand(Path analysisFile, int realisations, long seed, int threads, Path outDir) implements BatchCommand {

    static final int DEFAULT_REALISATIONS = 1000;
    static final long DEFAULT_SEED = 1L;
    static final Path DEFAULT_OUT = Path.of("faultbench-results");

    static BatchCommand parse(List<String> args) {
        if (args.isEmpty() || args.get(0).startsWith("--")) {
            return new UsageError("analyze needs an analysis file");
        }
        Path file = Path.of(args.get(0));
        int realisations = DEFAULT_REALISATIONS;
        long seed = DEFAULT_SEED;
        int threads = Runtime.getRuntime().availableProcessors();
        Path out = DEFAULT_OUT;
        for (int i = 1; i < args.size(); i += 2) {
            String option = args.get(i);
            if (i + 1 >= args.size()) {
                return new UsageError("option " + option + " needs a value");
            }
            String value = args.get(i + 1);
            try {
                switch (option) {
                case "--realisations":
                    realisations = positiveInt(option, value);
                    break;
                case "--seed":
                    seed = Long.parseLong(value);
                    break;
                case "--threads":
                    threads = positiveInt(option, value);
                    break;
                case "--out":
                    out = Path.of(value);
                    break;
                default:
                    return new UsageError("unknown option " + option + " for analyze");
                }
            } catch (NumberFormatException e) {
                return new UsageError("option " + option + " expects a whole number, got '" + value + "'");
            }
        }
        return new AnalyzeCommand(file, realisations, seed, threads, out);
    }

    private static int positiveInt(String option, String value) {
        int n = Integer.parseInt(value);
        if (n <= 0) {
            throw new NumberFormatException(option + " must be positive");
        }
        return n;
    }

    @Override
    public int execute(BatchContext context) {
        context.err().println("faultbench: analyze is not available in this build yet (" + analysisFile + ")");
        return ExitCode.FAILED;
    }
}
