package org.faultbench.digitize.ui.map;

import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;
import java.util.stream.Collectors;

import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspaceRoot;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.sketch.Severity;
import org.faultbench.digitize.sketch.TopologyProblem;

/**
 * Publishes a map sheet's topology problems as problem markers, so the Problems view lists, sorts and filters them
 * beside the fault QC findings. The markers sit on the workspace root (map sheets need not be workspace files) and
 * carry the sheet, the map position and the feature ids, which the map editor follows to select the features.
 */
final class TopologyMarkers {
    static final String TYPE = "org.faultbench.digitize.ui.topologyProblem";
    static final String SHEET = "mapSheet";
    static final String X = "mapX";
    static final String Y = "mapY";
    static final String FEATURES = "featureIds";

    private TopologyMarkers() {
    }

    /**
     * Replaces the markers of {@code sheet} (a name the user recognises, e.g. the file name) by {@code problems}, or
     * only removes them when {@code wanted} says no at the moment of writing: marker changes run one at a time, so a
     * check that finishes after its editor closed cannot leave markers behind.
     */
    static void publish(String sheet, List<TopologyProblem> problems, BooleanSupplier wanted) throws CoreException {
        IWorkspaceRoot root = ResourcesPlugin.getWorkspace().getRoot();
        ResourcesPlugin.getWorkspace().run(monitor -> {
            remove(root, sheet);
            if (!wanted.getAsBoolean()) {
                return;
            }
            for (TopologyProblem p : problems) {
                IMarker marker = root.createMarker(TYPE);
                marker.setAttribute(IMarker.MESSAGE, p.message());
                marker.setAttribute(IMarker.SEVERITY, p.severity() == Severity.ERROR ? IMarker.SEVERITY_ERROR
                        : IMarker.SEVERITY_WARNING);
                marker.setAttribute(IMarker.LOCATION, location(sheet, p));
                marker.setAttribute(SHEET, sheet);
                marker.setAttribute(X, Double.toString(p.x()));
                marker.setAttribute(Y, Double.toString(p.y()));
                marker.setAttribute(FEATURES, p.featureIds().stream().map(id -> Long.toString(id.value()))
                        .collect(Collectors.joining(",")));
            }
        }, root, 0, null);
    }

    /** Removes the markers of {@code sheet}, e.g. when its editor closes. */
    static void clear(String sheet) throws CoreException {
        IWorkspaceRoot root = ResourcesPlugin.getWorkspace().getRoot();
        ResourcesPlugin.getWorkspace().run(monitor -> remove(root, sheet), root, 0, null);
    }

    private static void remove(IWorkspaceRoot root, String sheet) throws CoreException {
        for (IMarker marker : root.findMarkers(TYPE, false, IResource.DEPTH_ZERO)) {
            if (sheet.equals(marker.getAttribute(SHEET, null))) {
                marker.delete();
            }
        }
    }

    static String location(String sheet, TopologyProblem p) {
        return String.format(Locale.ROOT, "%s, x %.0f, y %.0f", sheet, p.x(), p.y());
    }

    /** The feature ids a marker of this type names; empty for other markers or a malformed attribute. */
    static List<FeatureId> features(IMarker marker) {
        String ids = marker.getAttribute(FEATURES, "");
        try {
            return ids.isBlank() ? List.of()
                    : java.util.Arrays.stream(ids.split(",")).map(s -> new FeatureId(Long.parseLong(s))).toList();
        } catch (IllegalArgumentException malformed) {
            return List.of();
        }
    }
}
