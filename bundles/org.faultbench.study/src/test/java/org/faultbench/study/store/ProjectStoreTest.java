package org.faultbench.study.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

import org.faultbench.core.units.LengthUnit;
import org.faultbench.study.MapSheetFile;
import org.faultbench.study.ProjectFile;
import org.faultbench.study.ProjectFileFormat;
import org.faultbench.study.StudyFormatException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ProjectStoreTest {
    @TempDir
    Path workspace;

    private final ProjectStore store = new ProjectStore();

    private static ProjectFile project(String name) {
        return new ProjectFile(name, LengthUnit.METRE, OptionalInt.empty(), "", Optional.of("s.json"),
                List.of("s.json"), List.of(), List.of(), List.of(), List.of());
    }

    @Test
    void workspaceWithOnlyPropertiesOpensMigrated() throws Exception {
        Files.writeString(workspace.resolve("workspace.properties"), "# comment\nstudy=studies/demo-study.json\n");
        OpenedProject opened = store.open(workspace);
        assertTrue(opened.migratedFromProperties());
        assertEquals(Optional.of("studies/demo-study.json"), opened.project().activeStudy());
        store.save(workspace, opened.project());
        OpenedProject reopened = store.open(workspace);
        assertFalse(reopened.migratedFromProperties());
        assertEquals(opened.project(), reopened.project());
    }

    @Test
    void truncatedProjectFileIsRestoredFromBackupWithAReport() throws Exception {
        store.save(workspace, project("first"));
        store.save(workspace, project("second"));
        Path file = ProjectStore.projectFile(workspace);
        byte[] content = Files.readAllBytes(file);
        Files.write(file, java.util.Arrays.copyOf(content, content.length / 2));
        OpenedProject opened = store.open(workspace);
        assertEquals("first", opened.project().name());
        assertEquals(RecoveryAction.RESTORED_FROM_BACKUP, opened.report().action());
    }

    @Test
    void folderWithoutProjectIsAClearError() {
        StudyFormatException e = assertThrows(StudyFormatException.class, () -> store.open(workspace));
        assertTrue(e.getMessage().contains(ProjectFileFormat.FILE_NAME), e.getMessage());
    }

    @Test
    void demoWorkspaceProjectFileMatchesItsProperties() throws Exception {
        Path demo = demoWorkspace();
        ProjectFile project = store.open(demo).project();
        Path copy = workspace.resolve("old");
        Files.createDirectories(copy);
        Files.copy(demo.resolve("workspace.properties"), copy.resolve("workspace.properties"));
        ProjectFile migrated = store.open(copy).project();
        assertEquals(migrated.activeStudy(), project.activeStudy());
        for (String path : project.studies()) {
            assertTrue(Files.isRegularFile(demo.resolve(path)), path);
        }
        for (List<String> paths : List.of(project.grids(), project.wells(), project.faults())) {
            for (String path : paths) {
                assertTrue(Files.isRegularFile(demo.resolve(path)), path);
            }
        }
    }

    @Test
    void mapSheetSavedThroughTheStoreReopens() throws IOException, StudyFormatException {
        MapSheetStore sheets = new MapSheetStore();
        Path file = workspace.resolve("sheet.mapsheet.json");
        MapSheetFile sample = org.faultbench.study.SampleMapSheets.sample();
        sheets.save(file, sample);
        sheets.save(file, sample);
        OpenedMapSheet opened = sheets.open(file);
        assertEquals(sample.sheet().features().size(), opened.mapSheet().sheet().features().size());
        assertFalse(opened.report().recovered());
    }

    /** The demo workspace, found from the bundle folder (Maven) or the repository root. */
    static Path demoWorkspace() {
        for (Path p : List.of(Path.of("../../demo-workspace"), Path.of("demo-workspace"))) {
            if (Files.isDirectory(p)) {
                return p;
            }
        }
        throw new IllegalStateException("demo-workspace not found from " + Path.of("").toAbsolutePath());
    }
}
