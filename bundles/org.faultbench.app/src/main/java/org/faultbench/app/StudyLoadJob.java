package org.faultbench.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.stream.Stream;

import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Platform;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.faultbench.study.StudyFormatException;
import org.faultbench.study.store.OpenedProject;
import org.faultbench.study.store.ProjectStore;
import org.faultbench.ui.preferences.FaultbenchPreferences;

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
            // a seal section without a criterion takes the user's preferred one
            ActiveStudy.get().open(new AnalysisFileReader(FaultbenchPreferences.defaultSealCriterion()).read(file));
            return Status.OK_STATUS;
        } catch (StudyFormatException e) {
            return Status.error(e.getMessage(), e);
        }
    }

    /**
     * The study to open at start-up: the active study of the workspace's project file (a project file damaged by a
     * crash is restored from its backup, and the repair is logged), else the first analysis file (by name) in its
     * {@code studies} folder.
     */
    static Optional<Path> firstWorkspaceStudy() {
        if (Platform.getInstanceLocation() == null || Platform.getInstanceLocation().getURL() == null) {
            return Optional.empty();
        }
        Path workspace = Path.of(Platform.getInstanceLocation().getURL().getPath());
        Optional<Path> named = activeStudy(workspace);
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

    private static Optional<Path> activeStudy(Path workspace) {
        if (!Files.exists(ProjectStore.projectFile(workspace)) && !Files.exists(workspace.resolve("workspace.properties"))) {
            return Optional.empty();
        }
        try {
            OpenedProject opened = new ProjectStore().open(workspace);
            if (opened.report().recovered()) {
                ILog.of(StudyLoadJob.class).warn(opened.report().summary());
            }
            return opened.project().activeStudy().map(workspace::resolve);
        } catch (StudyFormatException e) {
            ILog.of(StudyLoadJob.class).error(e.getMessage(), e);
            return Optional.empty();
        }
    }
}
