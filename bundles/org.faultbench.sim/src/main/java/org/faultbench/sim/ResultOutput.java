package org.faultbench.sim;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A writer called after a run (extension point {@value ResultOutputContributions#POINT}): e.g. an export to an
 * in-house database or an extra table. Must not change the result; files go into the given folder.
 */
public interface ResultOutput {

    String id();

    String name();

    void write(SimulationResult result, Path outputDirectory) throws IOException;
}
