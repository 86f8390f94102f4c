package org.faultbench.sim;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point and runs the outputs after a simulation. The call site (headless
 * {@code analyze} after results.json is written, and the workbench after a run) calls {@link #writeAll}; an output
 * that fails is reported and the others still run.
 */
public final class ResultOutputContributions {

    public static final String POINT = "org.faultbench.sim.resultOutputs";
    private static final ContributionReader READER = new ContributionReader("result output", "output");
    private static List<ResultOutput> platformOutputs;

    private ResultOutputContributions() {
    }

    /** The valid contributions of the running platform (none outside OSGi). */
    public static synchronized List<ResultOutput> platformOutputs() {
        if (platformOutputs == null) {
            Map<String, ResultOutput> outputs = new LinkedHashMap<>();
            ContributionReader.log(ResultOutputContributions.class,
                    readInto(outputs, ContributionReader.platformElements(POINT)));
            platformOutputs = List.copyOf(outputs.values());
        }
        return platformOutputs;
    }

    /** Adds every valid contribution by id; returns one message per skipped contribution. */
    public static List<String> readInto(Map<String, ResultOutput> outputs, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            ResultOutput output = c.createWithId(ResultOutput.class, ResultOutput::id);
            if (outputs.containsKey(c.id())) {
                throw new IllegalArgumentException("id '" + c.id() + "' is already registered");
            }
            outputs.put(c.id(), output);
        });
    }

    /** Runs every output; returns one message per output that failed (for the run's warnings). */
    public static List<String> writeAll(List<ResultOutput> outputs, SimulationResult result, Path outputDirectory) {
        List<String> failures = new ArrayList<>();
        for (ResultOutput output : outputs) {
            try {
                output.write(result, outputDirectory);
            } catch (Exception | LinkageError e) {
                failures.add("result output '" + output.name() + "' (" + output.id() + ") failed: " + e);
            }
        }
        return failures;
    }
}
