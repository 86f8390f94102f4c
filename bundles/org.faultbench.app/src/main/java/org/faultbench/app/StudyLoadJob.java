package org.faultbench.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.stream.Stream;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Platform;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.faultbench.study.StudyFormatException;

/** Reads an analysis file in the background and makes it the active study. */
public final class StudyLoadJob extends Job {
    private final Path file;

    public StudyLoadJob(Path file) {
        super("Opening study " + file.getFileName());
        this.file = file;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        try {
            ActiveStudy.get().open(new AnalysisFileReader().read(file));
            return Status.OK_STATUS;
        } catch (StudyFormatException e) {
            return Status.error(e.getMessage(), e);
        }
    }

    /** The first analysis file (by name) in the workspace's {@code studies} folder, if the workspace has one. */
    static Optional<Path> firstWorkspaceStudy() {
        if (Platform.getInstanceLocation() == null || Platform.getInstanceLocation().getURL() == null) {
            return Optional.empty();
        }
        Path studies = Path.of(Platform.getInstanceLocation().getURL().getPath()).resolve("studies");
        if (!Files.isDirectory(studies)) {
            return Optional.empty();
        }
        try (Stream<Path> files = Files.list(studies)) {
            return files.filter(f -> f.toString().endsWith(".json")).sorted().findFirst();
        } catch (IOException e) {
            return Optional.empty();
        }
    }
}
