package org.faultbench.digitize.ui.map;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.ui.IStartup;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;

/**
 * Opens a map in the map editor when the workbench starts with {@code -Dfaultbench.openMap=<scan or map sheet>}
 * (demonstrations and scripted screenshots); does nothing otherwise.
 */
public final class MapOnStartup implements IStartup {

    @Override
    public void earlyStartup() {
        String map = System.getProperty("faultbench.openMap");
        if (map == null || !Files.isRegularFile(Path.of(map))) {
            return;
        }
        PlatformUI.getWorkbench().getDisplay().asyncExec(() -> {
            IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
            if (window == null) {
                return;
            }
            new MapOpenJob(Path.of(map), window).schedule();
        });
    }
}
