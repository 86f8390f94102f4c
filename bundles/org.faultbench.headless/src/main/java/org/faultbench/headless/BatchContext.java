package org.faultbench.headless;

import java.io.PrintStream;
import java.util.List;
import java.util.function.Supplier;

import org.faultbench.sim.ResultOutput;
import org.faultbench.sim.ResultOutputContributions;

/**
 * Where a batch command writes, which program version it reports, and the contributed result outputs it runs after
 * the built-in files (read from the platform only when a run needs them; tests pass their own).
 */
record BatchContext(PrintStream out, PrintStream err, String programVersion,
        Supplier<List<ResultOutput>> resultOutputs) {

    BatchContext(PrintStream out, PrintStream err, String programVersion) {
        this(out, err, programVersion, ResultOutputContributions::platformOutputs);
    }
}
