package org.faultbench.digitize.importer;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Reads one exchange format (extension point {@value ImporterContributions#POINT}). Like the built-in readers it
 * returns a complete result or throws: a {@link org.faultbench.digitize.io.FormatException} naming file, line and
 * field for a bad file, an {@link IOException} when the file cannot be read; never a half-read result.
 */
@FunctionalInterface
public interface Importer {

    Imported read(Path file, ImportSettings settings) throws IOException;
}
