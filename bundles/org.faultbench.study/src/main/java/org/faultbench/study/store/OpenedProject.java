package org.faultbench.study.store;

import org.faultbench.study.ProjectFile;

/**
 * A workspace's project as opened.
 *
 * @param project the project at the current schema version
 * @param report what recovery was needed, if any
 * @param migratedFromProperties true when the workspace only had a version 1 {@code workspace.properties}; the
 *        project file is written at the next {@link ProjectStore#save}
 */
public record OpenedProject(ProjectFile project, RecoveryReport report, boolean migratedFromProperties) {
}
