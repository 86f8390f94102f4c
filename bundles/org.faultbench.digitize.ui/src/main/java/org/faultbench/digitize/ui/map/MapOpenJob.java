package org.faultbench.digitize.ui.map;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.CancellationException;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;
import org.faultbench.digitize.raster.BuildProgress;
import org.faultbench.digitize.ui.store.MapDocuments;
import org.faultbench.digitize.ui.store.VersionedMapSheetStore;

/**
 * Opens a scan or map sheet in the map editor without blocking the workbench: the image pyramid of the scan (seconds
 * for a large scan) is built here with progress and cancel, then the editor opens on the UI thread and picks it up.
 */
public final class MapOpenJob extends Job {
    private final Path file;
    private final IWorkbenchWindow window;

    public MapOpenJob(Path file, IWorkbenchWindow window) {
        super("Opening map " + file.getFileName());
        this.file = file;
        this.window = window;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor progress = SubMonitor.convert(monitor, "Building the image pyramid of " + file.getFileName(), 1000);
        try {
            var scan = MapDocuments.open(file, new VersionedMapSheetStore()).document().scan();
            if (scan.isPresent()) {
                ScanPyramids.build(scan.get(), new BuildProgress() {
                    private int reported;

                    @Override
                    public void tilesDone(int done, int total) {
                        int target = (int) (1000L * done / Math.max(1, total));
                        progress.worked(target - reported);
                        reported = target;
                    }

                    @Override
                    public boolean isCancelled() {
                        return progress.isCanceled();
                    }
                });
            }
        } catch (CancellationException cancelled) {
            return Status.CANCEL_STATUS;
        } catch (IOException | RuntimeException unreadable) {
            return Status.error("Cannot open " + file + ": " + unreadable.getMessage(), unreadable);
        }
        PlatformUI.getWorkbench().getDisplay().asyncExec(this::openEditor);
        return Status.OK_STATUS;
    }

    private void openEditor() {
        if (window.getShell() == null || window.getShell().isDisposed()) {
            return;
        }
        try {
            window.getActivePage().openEditor(new MapSheetEditorInput(file), MapSheetEditor.ID);
        } catch (PartInitException e) {
            org.eclipse.core.runtime.ILog.of(MapOpenJob.class).error(e.getMessage(), e);
        }
    }
}
