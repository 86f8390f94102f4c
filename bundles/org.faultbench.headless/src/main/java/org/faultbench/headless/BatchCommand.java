package org.faultbench.headless;

import java.util.List;

/** One parsed invocation of the headless application. */
interface BatchCommand {

    int execute(BatchContext context);

    /**
     * Parses the application arguments. Never throws: a bad command line becomes a command that prints the problem
     * and the usage and returns {@link ExitCode#USAGE}.
     */
    static BatchCommand parse(String[] args) {
        List<String> words = List.of(args);
        if (words.isEmpty()) {
            return new UsageError("no command given");
        }
        String command = words.get(0);
        List<String> rest = words.subList(1, words.size());
        switch (command) {
        case "--help":
        case "-h":
        case "help":
            return context -> {
                context.out().print(Usage.TEXT);
                return ExitCode.OK;
            };
        case "--version":
        case "version":
            return context -> {
                context.out().println("Faultbench " + context.programVersion());
                return ExitCode.OK;
            };
        case "analyze":
            return AnalyzeCommand.parse(rest);
        default:
            return new UsageError("unknown command '" + command + "'");
        }
    }

    /** A command line that could not be understood. */
    record UsageError(String problem) implements BatchCommand {
        @Override
        public int execute(BatchContext context) {
            context.err().println("faultbench: " + problem);
            context.err().println("Run with --help for usage.");
            return ExitCode.USAGE;
        }
    }
}
