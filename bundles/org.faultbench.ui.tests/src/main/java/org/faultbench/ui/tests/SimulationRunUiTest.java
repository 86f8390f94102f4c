package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.faultbench.juxtaposition.ui.AllanDiagramView;
import org.faultbench.sim.ui.ResultsView;
import org.faultbench.sim.ui.SimulationJob;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.junit.jupiter.api.Test;

/** Opens the demo study, runs a short simulation from the results view and looks at the results and the diagram. */
class SimulationRunUiTest {

    private static void waitFor(Job job) {
        long end = System.currentTimeMillis() + 120_000;
        while (job.getState() != Job.NONE && System.currentTimeMillis() < end) {
            WorkbenchSmokeTest.spin(50);
        }
        WorkbenchSmokeTest.spin(300);
    }

    @Test
    void shortRunOfTheDemoFillsTheResultsAndTheAllanDiagram() throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        ActiveStudy.get().open(new AnalysisFileReader().read(demo.resolve("studies/demo-study.json")));
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        ResultsView results = (ResultsView) page.showView(ResultsView.ID);
        WorkbenchSmokeTest.spin(200);
        assertTrue(results.summaryText().contains("press Run"), results.summaryText());

        SimulationJob job = results.runSimulation(60);
        assertNotNull(job);
        waitFor(job);
        assertTrue(job.getResult().isOK(), String.valueOf(job.getResult()));
        assertTrue(results.summaryText().contains("60 realisations"), results.summaryText());
        assertFalse(results.rows().isEmpty(), "the results table has rows");
        assertTrue(results.rows().stream().anyMatch(r -> r.quantity().startsWith("attic column")),
                "attic columns are reported");

        AllanDiagramView allan = (AllanDiagramView) page.showView(AllanDiagramView.ID);
        WorkbenchSmokeTest.spin(500);
        Image image = allan.snapshot();
        try {
            ImageData data = image.getImageData();
            boolean reservoirSeal = false;
            boolean windowOrLeak = false;
            for (int x = 0; x < data.width; x += 2) {
                for (int y = 0; y < data.height; y += 2) {
                    RGB rgb = data.palette.getRGB(data.getPixel(x, y));
                    reservoirSeal |= rgb.red == 240 && rgb.green == 225 && rgb.blue == 175;
                    windowOrLeak |= rgb.red > 100 && rgb.green < 100;
                }
            }
            assertTrue(reservoirSeal, "reservoir/seal cells are painted");
            assertTrue(windowOrLeak, "reservoir windows or leak cells are painted");
        } finally {
            image.dispose();
        }

        // every seal attribute can be painted, whatever the study's own criterion
        assertTrue(allan.colourChoices().containsAll(java.util.List.of("SGR", "SSF", "CSP", "threshold pressure")),
                allan.colourChoices().toString());
        for (String painter : new String[] { "sgr", "ssf", "csp", "threshold-pressure" }) {
            assertTrue(allan.colourBy(painter), painter);
            WorkbenchSmokeTest.spin(200);
            Image painted = allan.snapshot();
            try {
                ImageData data = painted.getImageData();
                boolean ramp = false;
                for (int x = 0; x < data.width && !ramp; x += 2) {
                    for (int y = 0; y < data.height && !ramp; y += 2) {
                        RGB rgb = data.palette.getRGB(data.getPixel(x, y));
                        // the ramp's dark end is slate: blue above red
                        ramp = rgb.blue > rgb.red + 15 && rgb.red < 200;
                    }
                }
                assertTrue(ramp, painter + " paints a ramp colour");
            } finally {
                painted.dispose();
            }
        }
        allan.colourBy("juxtaposition");
    }
}
