package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.faultbench.digitize.ui.map.MapOpenJob;
import org.faultbench.digitize.ui.map.MapSheetEditor;
import org.junit.jupiter.api.Test;

/** Opening a map builds its image pyramid in a background job, then the editor opens on the demo scan. */
class MapOpenJobUiTest {

    @Test
    void theScanOpensThroughABackgroundJob() {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
        IWorkbenchPage page = window.getActivePage();
        page.closeAllEditors(false);
        Job job = new MapOpenJob(demo.resolve("maps/depth-structure-scan.png"), window);
        job.schedule();
        long end = System.currentTimeMillis() + 60_000;
        while (job.getState() != Job.NONE && System.currentTimeMillis() < end) {
            WorkbenchSmokeTest.spin(20); // the UI thread keeps dispatching while the pyramid is built
        }
        WorkbenchSmokeTest.spin(500);
        assertTrue(job.getResult() != null && job.getResult().isOK(), String.valueOf(job.getResult()));
        IEditorPart editor = page.getActiveEditor();
        assertNotNull(editor, "an editor opened");
        assertTrue(editor instanceof MapSheetEditor, editor.getClass().getName());
        page.closeAllEditors(false);
    }
}
