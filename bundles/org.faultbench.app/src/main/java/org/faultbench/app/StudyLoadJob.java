package org.faultbench.app;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.Properties;
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

    /**
     * The study to open at start-up: the one named by {@code study=} in the workspace's {@code workspace.properties},
     * else the first analysis file (by name) in its {@code studies} folder.
     */
    static Optional<Path> firstWorkspaceStudy() {
        if (Platform.getInstanceLocation() == null || Platform.getInstanceLocation().getURL() == null) {
            return Optional.empty();
        }
        Path workspace = Path.of(Platform.getInstanceLocation().getURL().getPath());
        Optional<Path> named = namedStudy(workspace);
        if (named.isPresent()) {
            return named;
        }
        Path studies = workspace.resolve("studies");
        if (!Files.isDirectory(studies)) {
            return Optional.empty();
        }
        try (Stream<Path> files = Files.list(studies)) {
            return files.filter(f -> f.toString().endsWith(".json")).sorted().findFirst();
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    private static Optional<Path> namedStudy(Path workspace) {
        Path settings = workspace.resolve("workspace.properties");
        if (!Files.isRegularFile(settings)) {
            return Optional.empty();
        }
        Properties properties = new Properties();
        try (Reader in = Files.newBufferedReader(settings)) {
            properties.load(in);
        } catch (IOException e) {
            return Optional.empty();
        }
        String study = properties.getProperty("study");
        return study == null ? Optional.empty() : Optional.of(workspace.resolve(study.trim()));
    }
}
