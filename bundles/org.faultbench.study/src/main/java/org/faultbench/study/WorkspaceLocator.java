package org.faultbench.study;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.faultbench.study.store.ProjectStore;

/** Finds the workspace a file belongs to: the nearest folder above it holding a project file (or its v1 form). */
public final class WorkspaceLocator {

    private WorkspaceLocator() {
    }

    public static Optional<Path> workspaceOf(Path file) {
        for (Path folder = file.toAbsolutePath().getParent(); folder != null; folder = folder.getParent()) {
            if (Files.isRegularFile(ProjectStore.projectFile(folder))
                    || Files.isRegularFile(folder.resolve("workspace.properties"))) {
                return Optional.of(folder);
            }
        }
        return Optional.empty();
    }
}
