package org.faultbench.digitize.ui.map;

import java.util.List;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MapSheetListener;
import org.faultbench.digitize.sketch.TopologyChecker;
import org.faultbench.digitize.sketch.TopologyProblem;

/**
 * Keeps the Problems view in step with a sheet's topology: after each edit (and once on opening) the sheet is
 * checked again in a background job, so a large sheet never stalls drawing, and the problems replace the sheet's
 * markers. The job checks a snapshot taken on the editing thread (features are immutable, so that is a copy of
 * references). Edits in quick succession (a vertex drag) are checked once, after the last.
 */
final class TopologyWatch {
    /** Wait after an edit before checking, ms: long enough to merge the steps of one gesture. */
    static final long SETTLE_MS = 300;
    /**
     * Largest gap, map metres, still taken as a closed fault polygon: the polygon tool closes polygons exactly, and
     * a metre is below what a depth map at any working scale shows (common practice).
     */
    static final double CLOSURE_TOLERANCE_M = 1.0;

    private final MapSheet sheet;
    private final String sheetName;
    private final Job job;
    private final MapSheetListener onEdit = (changed, edit) -> schedule(SETTLE_MS);
    private volatile MapSheet latest;
    private volatile boolean watching;

    TopologyWatch(MapSheet sheet, String sheetName) {
        this.sheet = sheet;
        this.sheetName = sheetName;
        this.job = Job.create("Checking map topology of " + sheetName, this::check);
        job.setSystem(true);
    }

    /** Starts watching and checks the sheet as it is now; call on the thread that edits the sheet. */
    void start() {
        watching = true;
        sheet.addListener(onEdit);
        schedule(0);
    }

    /**
     * Stops watching and removes the sheet's markers, without waiting for a check under way (the editor closes at
     * once): such a check finds the watch stopped when it writes, and writes nothing.
     */
    void stop() {
        watching = false;
        sheet.removeListener(onEdit);
        job.cancel();
        try {
            TopologyMarkers.clear(sheetName);
        } catch (CoreException e) {
            ILog.of(TopologyWatch.class).log(Status.warning("Could not remove topology markers of " + sheetName, e));
        }
    }

    String sheetName() {
        return sheetName;
    }

    /** The job, so that tests can wait for a check to finish. */
    Job job() {
        return job;
    }

    private void schedule(long delay) {
        latest = sheet.snapshot();
        job.cancel();
        job.schedule(delay);
    }

    private IStatus check(IProgressMonitor monitor) {
        MapSheet snapshot = latest;
        List<TopologyProblem> problems = new TopologyChecker(CLOSURE_TOLERANCE_M).check(snapshot);
        if (monitor.isCanceled()) {
            return Status.CANCEL_STATUS;
        }
        try {
            TopologyMarkers.publish(sheetName, problems, () -> watching);
            return Status.OK_STATUS;
        } catch (CoreException e) {
            return Status.warning("Could not list the topology problems of " + sheetName, e);
        }
    }
}
