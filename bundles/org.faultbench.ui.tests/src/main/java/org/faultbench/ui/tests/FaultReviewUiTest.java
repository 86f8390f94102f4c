package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;

import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.ui.IWorkbenchPage;
import org.faultbench.faults.ui.DisplacementLengthView;
import org.faultbench.faults.ui.ThrowProfileView;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.faultbench.ui.plot.PlotSeries;
import org.junit.jupiter.api.Test;

/** The fault review of the demo finds the over-correlated fault and lists it in the Problems view. */
class FaultReviewUiTest {

    @Test
    void theOverCorrelatedDemoFaultIsFlaggedOnItsProfileAndInProblems() throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        IWorkbenchPage page = PerspectivesTest.open("org.faultbench.app.perspective.faultReview");
        ActiveStudy.get().open(new AnalysisFileReader().read(demo.resolve("studies/demo-study.json")));
        ThrowProfileView profiles = (ThrowProfileView) page.showView(ThrowProfileView.ID);
        IMarker[] markers = new IMarker[0];
        long end = System.currentTimeMillis() + 60_000;
        while (markers.length == 0 && System.currentTimeMillis() < end) {
            WorkbenchSmokeTest.spin(100);
            markers = ResourcesPlugin.getWorkspace().getRoot().findMarkers("org.faultbench.faults.ui.qcFinding",
                    false, IResource.DEPTH_ZERO);
        }
        assertTrue(Arrays.stream(markers).anyMatch(m -> "F-North".equals(m.getAttribute("faultId", ""))),
                "a Problems entry for F-North");

        profiles.goTo("F-North", 1000);
        WorkbenchSmokeTest.spin(200);
        assertTrue(profiles.plottedSeries().stream().anyMatch(s -> s.name().equals("QC finding")),
                "the finding is marked on the profile");
        assertTrue(profiles.plottedSeries().stream().anyMatch(s -> s.name().startsWith("fit: ")),
                "a fitted model is drawn");
        assertTrue(profiles.readoutText().startsWith("F-North"), profiles.readoutText());

        DisplacementLengthView dl = (DisplacementLengthView) page.showView(DisplacementLengthView.ID);
        WorkbenchSmokeTest.spin(300);
        long points = dl.plottedSeries().stream().filter(s -> s.style() == PlotSeries.Style.POINTS)
                .mapToInt(s -> s.x().length).sum();
        assertTrue(points >= 2, "one point per fittable fault, was " + points);
    }
}
