package org.faultbench.study;

import java.io.IOException;

import org.faultbench.study.store.AtomicFileStore;

/**
 * Writes an edited study back to its analysis file through the {@link AtomicFileStore}: a crash leaves either the old
 * or the new file, never half of one, and the previous version is kept as {@code <name>.bak}.
 */
public final class AnalysisFileSaver {
    private final AtomicFileStore store = new AtomicFileStore();

    /**
     * Saves {@code analysis}. The file then holds exactly the content {@code analysis} was read from (its hash is
     * that content's), so the caller keeps using {@code analysis} as the saved study.
     */
    public void save(AnalysisFile analysis) throws IOException {
        store.save(analysis.file().toAbsolutePath(), StudyEdits.content(analysis));
    }
}
