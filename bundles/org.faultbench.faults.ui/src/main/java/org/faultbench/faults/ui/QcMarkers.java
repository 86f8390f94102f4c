package org.faultbench.faults.ui;

import java.util.List;
import java.util.Locale;

import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspaceRoot;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.Severity;

/**
 * Publishes fault QC findings as problem markers, so they are listed, sorted and filtered in the Problems view.
 * The markers sit on the workspace root (the faults are not workspace files) and carry the fault id, horizon and
 * along-strike position; the throw-profile view follows the Problems view's selection to the place.
 */
final class QcMarkers {
    static final String TYPE = "org.faultbench.faults.ui.qcFinding";
    static final String FAULT = "faultId";
    static final String POSITION = "alongStrike";
    static final String HORIZON = "horizon";

    private QcMarkers() {
    }

    static void publish(List<QcFinding> findings) throws CoreException {
        IWorkspaceRoot root = ResourcesPlugin.getWorkspace().getRoot();
        ResourcesPlugin.getWorkspace().run(monitor -> {
            root.deleteMarkers(TYPE, true, IResource.DEPTH_ZERO);
            for (QcFinding f : findings) {
                IMarker marker = root.createMarker(TYPE);
                marker.setAttribute(IMarker.MESSAGE, f.message() + (f.suggestion().isEmpty() ? "" : " " + f.suggestion()));
                marker.setAttribute(IMarker.SEVERITY, severity(f.severity()));
                marker.setAttribute(IMarker.LOCATION, location(f));
                marker.setAttribute(FAULT, f.faultId());
                marker.setAttribute(POSITION, Double.isNaN(f.u()) ? "" : Double.toString(f.u()));
                marker.setAttribute(HORIZON, f.horizon() == null ? "" : f.horizon());
            }
        }, root, 0, null);
    }

    static String location(QcFinding f) {
        String where = "fault " + f.faultId();
        if (!Double.isNaN(f.u())) {
            where += String.format(Locale.ROOT, ", u = %.0f m", f.u());
        }
        return f.horizon() == null ? where : where + ", " + f.horizon();
    }

    private static int severity(Severity severity) {
        return severity == Severity.ERROR ? IMarker.SEVERITY_ERROR : IMarker.SEVERITY_WARNING;
    }
}
