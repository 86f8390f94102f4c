package org.faultbench.headless;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.OptionalInt;
import java.util.OptionalLong;

import org.faultbench.report.ReportFiles;
import org.faultbench.report.ReportInput;
import org.faultbench.sim.MonteCarloSimulator;
import org.faultbench.sim.ResultOutputContributions;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.AnalysisFileReader;
import org.faultbench.study.ResultsWriter;
import org.faultbench.study.StudyFormatException;

/**
 * {@code analyze <analysis file> [--realisations N] [--seed S] [--threads T] [--out DIR] [--no-report]}: reads the
 * analysis file, runs the Monte Carlo trap analysis and writes results.json, summary.csv and the leak-probability
 * tables to DIR, then report.html and report.pdf unless --no-report. Options left out take the analysis file's own
 * values. The report is rendered before anything is written, so a report that cannot be made leaves DIR untouched.
 * Then the contributed result outputs (extension point {@value ResultOutputContributions#POINT}) run; one that fails
 * is a warning on the console, never a failed run (results.json is already written).
 */
record AnalyzeCommand(Path analysisFile, OptionalInt realisations, OptionalLong seed, int threads, Path outDir,
        boolean report) implements BatchCommand {

    static final Path DEFAULT_OUT = Path.of("faultbench-results");

    static BatchCommand parse(List<String> args) {
        if (args.isEmpty() || args.get(0).startsWith("--")) {
            return new UsageError("analyze needs an analysis file");
        }
        Path file = Path.of(args.get(0));
        OptionalInt realisations = OptionalInt.empty();
        OptionalLong seed = OptionalLong.empty();
        int threads = Runtime.getRuntime().availableProcessors();
        Path out = DEFAULT_OUT;
        boolean report = true;
        for (int i = 1; i < args.size(); i += 2) {
            String option = args.get(i);
            if (option.equals("--no-report")) {
                report = false;
                i--;
                continue;
            }
            if (i + 1 >= args.size()) {
                return new UsageError("option " + option + " needs a value");
            }
            String value = args.get(i + 1);
            try {
                switch (option) {
                case "--realisations":
                    realisations = OptionalInt.of(positiveInt(option, value));
                    break;
                case "--seed":
                    seed = OptionalLong.of(Long.parseLong(value));
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
        return new AnalyzeCommand(file, realisations, seed, threads, out, report);
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
        AnalysisFile analysis;
        try {
            analysis = new AnalysisFileReader().read(analysisFile);
        } catch (StudyFormatException e) {
            context.err().println("faultbench: " + e.getMessage());
            return ExitCode.BAD_INPUT;
        }
        SimulationSettings settings = new SimulationSettings(realisations.orElse(analysis.realisations()),
                seed.orElse(analysis.seed()), threads, analysis.cellHeight());
        SimulationResult result;
        try {
            result = new MonteCarloSimulator().run(analysis.study(), settings, new ConsoleProgressMonitor(context.err()));
        } catch (IllegalArgumentException e) {
            context.err().println("faultbench: " + analysisFile + ": " + e.getMessage());
            return ExitCode.BAD_INPUT;
        } catch (RuntimeException e) {
            context.err().println("faultbench: the analysis failed: " + e);
            return ExitCode.FAILED;
        }
        ReportFiles reportFiles = null;
        if (report) {
            context.err().println("Rendering report (HTML and PDF)");
            try {
                reportFiles = ReportFiles.render(new ReportInput(analysis, result, context.programVersion(),
                        LocalDate.now()));
            } catch (IOException | RuntimeException e) {
                context.err().println("faultbench: cannot make the report (nothing written; --no-report skips it): "
                        + e);
                return ExitCode.FAILED;
            }
        }
        try {
            new ResultsWriter(context.programVersion()).write(analysis, result, outDir);
            if (reportFiles != null) {
                context.err().println("Writing report.html and report.pdf");
                reportFiles.writeTo(outDir);
            }
        } catch (IOException e) {
            context.err().println("faultbench: cannot write results to " + outDir + ": " + e.getMessage());
            return ExitCode.FAILED;
        }
        for (String failure : ResultOutputContributions.writeAll(context.resultOutputs().get(), result, outDir)) {
            context.err().println("faultbench: warning: " + failure);
        }
        new ResultTable(context.out()).print(result);
        context.out().println("Results written to " + outDir.toAbsolutePath());
        return ExitCode.OK;
    }
}
