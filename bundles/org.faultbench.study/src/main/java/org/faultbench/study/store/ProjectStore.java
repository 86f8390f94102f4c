package org.faultbench.study.store;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;

import org.faultbench.study.ProjectFile;
import org.faultbench.study.ProjectFileFormat;
import org.faultbench.study.StudyFormatException;

/**
 * Opens and saves the project of a workspace folder through the {@link AtomicFileStore}: {@value
 * ProjectFileFormat#FILE_NAME}, or, in a workspace of the first releases, {@code workspace.properties} migrated to
 * the current version.
 */
public final class ProjectStore {
    static final String PROPERTIES_FILE = "workspace.properties";
    private final AtomicFileStore store = new AtomicFileStore();
    private final ProjectFileFormat format = new ProjectFileFormat();

    public static Path projectFile(Path workspace) {
        return workspace.resolve(ProjectFileFormat.FILE_NAME);
    }

    public OpenedProject open(Path workspace) throws StudyFormatException {
        Path file = projectFile(workspace);
        if (Files.exists(file) || Files.exists(AtomicFileStore.sibling(file, AtomicFileStore.TEMPORARY))
                || Files.exists(AtomicFileStore.sibling(file, AtomicFileStore.BACKUP))) {
            StoredContent stored;
            try {
                stored = store.open(file, content -> format.read(content, file.toString()));
            } catch (IOException e) {
                throw new StudyFormatException(file.toString(), "", e.getMessage(), e);
            }
            return new OpenedProject(format.read(stored.content(), file.toString()), stored.report(), false);
        }
        Path properties = workspace.resolve(PROPERTIES_FILE);
        if (Files.exists(properties)) {
            return new OpenedProject(readProperties(properties, workspace), RecoveryReport.clean(file), true);
        }
        throw new StudyFormatException(file.toString(), "", "not found, and there is no " + PROPERTIES_FILE
                + " either: this folder is not a Faultbench workspace");
    }

    public void save(Path workspace, ProjectFile project) throws IOException {
        store.save(projectFile(workspace), format.write(project));
    }

    private ProjectFile readProperties(Path properties, Path workspace) throws StudyFormatException {
        Properties values = new Properties();
        try (Reader in = Files.newBufferedReader(properties, StandardCharsets.ISO_8859_1)) {
            values.load(in);
        } catch (IOException | IllegalArgumentException e) {
            throw new StudyFormatException(properties.toString(), "", "cannot be read: " + e.getMessage(), e);
        }
        Path folderName = workspace.toAbsolutePath().normalize().getFileName();
        return format.readWorkspaceProperties(values, properties.toString(),
                folderName == null ? "Workspace" : folderName.toString());
    }
}
