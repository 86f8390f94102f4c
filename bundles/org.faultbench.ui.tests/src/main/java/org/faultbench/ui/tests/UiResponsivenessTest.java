package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.faultbench.juxtaposition.ui.AllanDiagramView;
import org.faultbench.sim.ui.ResultsView;
import org.faultbench.sim.ui.SimulationJob;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.junit.jupiter.api.Test;

/**
 * The UI thread stays free while a simulation runs: a probe posted to the display every 10 ms from another thread
 * measures how long it waits before the UI thread runs it, which is at least as long as any UI-thread task running
 * at the time. The run covers progress updates, the results arriving and the views redrawing.
 */
class UiResponsivenessTest {
    /** The bound for a UI-thread task while a simulation runs. */
    private static final long BOUND_MS = 100;

    @Test
    void noUiThreadTaskBlocksForLongDuringARun() throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        ActiveStudy.get().open(new AnalysisFileReader().read(demo.resolve("studies/demo-study.json")));
        IWorkbenchPage page = PerspectivesTest.open("org.faultbench.app.perspective.trapStudy");
        ResultsView results = (ResultsView) page.showView(ResultsView.ID);
        page.showView(AllanDiagramView.ID);
        WorkbenchSmokeTest.spin(500);

        Display display = Display.getCurrent();
        List<Long> waits = Collections.synchronizedList(new ArrayList<>());
        ScheduledExecutorService prober = Executors.newSingleThreadScheduledExecutor();
        prober.scheduleAtFixedRate(() -> {
            long posted = System.nanoTime();
            display.asyncExec(() -> waits.add((System.nanoTime() - posted) / 1_000_000));
        }, 0, 10, TimeUnit.MILLISECONDS);
        SimulationJob job = results.runSimulation(600);
        long end = System.currentTimeMillis() + 120_000;
        while (job.getState() != Job.NONE && System.currentTimeMillis() < end) {
            WorkbenchSmokeTest.spin(20);
        }
        WorkbenchSmokeTest.spin(1000); // the result reaches the views and they redraw
        prober.shutdownNow();
        WorkbenchSmokeTest.spin(50);

        List<Long> sorted;
        synchronized (waits) {
            sorted = new ArrayList<>(waits);
        }
        Collections.sort(sorted);
        long max = sorted.get(sorted.size() - 1);
        long p99 = sorted.get((int) (sorted.size() * 0.99));
        System.out.println("UI responsiveness during a 600-realisation run: " + sorted.size() + " probes, p99 "
                + p99 + " ms, max " + max + " ms");
        assertTrue(sorted.size() > 50, "probes ran: " + sorted.size());
        assertTrue(max < BOUND_MS, "longest wait of the UI thread " + max + " ms (p99 " + p99 + " ms)");
    }
}
