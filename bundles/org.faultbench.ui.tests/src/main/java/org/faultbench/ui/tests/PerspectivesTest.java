package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.eclipse.ui.IPerspectiveDescriptor;
import org.eclipse.ui.IViewReference;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;

/** Every stage perspective opens with its views, and a rearranged perspective can be reset. */
class PerspectivesTest {
    private static final Map<String, List<String>> VIEWS = Map.of(
            "org.faultbench.app.perspective.mapSheet",
            List.of("org.eclipse.ui.views.PropertySheet", "org.eclipse.ui.views.ProblemView"),
            "org.faultbench.app.perspective.faultReview",
            List.of("org.faultbench.faults.ui.throwProfiles", "org.faultbench.faults.ui.displacementLength",
                    "org.eclipse.ui.views.ProblemView"),
            "org.faultbench.app.perspective.stratigraphy",
            List.of("org.faultbench.strat.ui.stratigraphyEditor", "org.faultbench.strat.ui.sampledInputs",
                    "org.faultbench.juxtaposition.ui.allanDiagram", "org.faultbench.sim.ui.results"),
            "org.faultbench.app.perspective.trapStudy",
            List.of("org.faultbench.juxtaposition.ui.allanDiagram", "org.faultbench.sim.ui.results",
                    "org.faultbench.strat.ui.sampledInputs"));

    static IWorkbenchPage open(String perspectiveId) {
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        IPerspectiveDescriptor descriptor = PlatformUI.getWorkbench().getPerspectiveRegistry()
                .findPerspectiveWithId(perspectiveId);
        assertNotNull(descriptor, perspectiveId + " is registered");
        page.setPerspective(descriptor);
        page.resetPerspective();
        WorkbenchSmokeTest.spin(300);
        return page;
    }

    @Test
    void eachStagePerspectiveShowsItsViews() {
        for (var entry : VIEWS.entrySet()) {
            IWorkbenchPage page = open(entry.getKey());
            assertEquals(entry.getKey(), page.getPerspective().getId());
            List<String> open = Arrays.stream(page.getViewReferences()).map(IViewReference::getId).toList();
            for (String view : entry.getValue()) {
                assertTrue(open.contains(view), entry.getKey() + ": " + view + " missing from " + open);
            }
        }
    }

    @Test
    void aClosedViewComesBackOnReset() {
        IWorkbenchPage page = open("org.faultbench.app.perspective.faultReview");
        page.hideView(page.findViewReference("org.faultbench.faults.ui.displacementLength"));
        WorkbenchSmokeTest.spin(100);
        assertEquals(null, page.findViewReference("org.faultbench.faults.ui.displacementLength"));
        page.resetPerspective();
        WorkbenchSmokeTest.spin(200);
        assertNotNull(page.findViewReference("org.faultbench.faults.ui.displacementLength"));
    }
}
