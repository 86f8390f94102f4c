package org.faultbench.study;

import java.io.IOException;

import org.faultbench.study.store.AtomicFileStore;

/**
 * Writes an edited study back to its analysis file through the {@link AtomicFileStore}: a crash leaves either the old
 * or the new file, never half of one, and the previous version is kept as {@code <name>.bak}.
 */
public final class AnalysisFileSaver {
    private final AtomicFileStore store = new AtomicFileStore();

    /** Saves {@code analysis} and returns it as read back from the saved file (same content, same hash). */
    public AnalysisFile save(AnalysisFile analysis) throws IOException, StudyFormatException {
        store.save(analysis.file().toAbsolutePath(), StudyEdits.content(analysis));
        return new AnalysisFileReader().read(analysis.file());
    }
}
