package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.faultbench.core.io.SafeXml;
import org.faultbench.core.units.LengthUnit;
import org.faultbench.juxtaposition.ui.AllanDiagramView;
import org.faultbench.sim.AdaptiveHistogram;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.ui.ResultRow;
import org.faultbench.sim.ui.ResultsView;
import org.faultbench.sim.ui.SimulationJob;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.faultbench.ui.plot.PlotSeries;
import org.faultbench.ui.preferences.FaultbenchPreferences;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/** After a short run: the histogram tab, the length-unit preference in the table, and SVG export of the Allan diagram. */
class DistributionsAndUnitsUiTest {
    private static final int REALISATIONS = 40;

    @AfterEach
    void backToMetres() {
        FaultbenchPreferences.setLengthUnit(LengthUnit.METRE);
        WorkbenchSmokeTest.spin(200);
    }

    private static ResultsView runDemo(IWorkbenchPage page) throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        ActiveStudy.get().open(new AnalysisFileReader().read(demo.resolve("studies/demo-study.json")));
        ResultsView results = (ResultsView) page.showView(ResultsView.ID);
        SimulationJob job = results.runSimulation(REALISATIONS);
        assertNotNull(job);
        long end = System.currentTimeMillis() + 120_000;
        while (job.getState() != Job.NONE && System.currentTimeMillis() < end) {
            WorkbenchSmokeTest.spin(50);
        }
        WorkbenchSmokeTest.spin(300);
        assertTrue(job.getResult() != null && job.getResult().isOK(), String.valueOf(job.getResult()));
        return results;
    }

    private static IWorkbenchPage page() {
        return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
    }

    @Test
    void histogramBarsSumToTheRealisations() throws Exception {
        ResultsView results = runDemo(page());
        SimulationResult result = ActiveStudy.get().result().orElseThrow();
        String unit = result.units().get(0).unitName();
        results.showDistribution(unit, UnitQuantity.CONTACT);
        WorkbenchSmokeTest.spin(200);
        PlotSeries bars = results.histogramFigure().series().stream()
                .filter(s -> s.style() == PlotSeries.Style.BARS).findFirst().orElseThrow();
        double sum = 0;
        for (double count : bars.y()) {
            sum += count;
        }
        AdaptiveHistogram h = result.units().get(0).histogram(UnitQuantity.CONTACT);
        assertEquals(REALISATIONS, h.finiteCount() + h.nonFiniteCount());
        assertEquals(h.finiteCount(), sum, 0, "the bars hold every realisation with a finite contact");
        assertEquals(REALISATIONS, sum, 0, "every realisation of the demo has a contact");
        List<String> markers = results.histogramFigure().series().stream()
                .filter(s -> s.style() == PlotSeries.Style.VERTICAL_MARKERS).map(PlotSeries::name).toList();
        assertEquals(3, markers.size());
        assertTrue(markers.get(0).startsWith("P90 (low case"), markers.get(0));
        PlotSeries curve = results.exceedanceFigure().series().stream()
                .filter(s -> s.style() == PlotSeries.Style.LINE).findFirst().orElseThrow();
        assertEquals(1, curve.y()[0], 0, "every value exceeds the lowest edge");
        assertEquals(0, curve.y()[curve.y().length - 1], 0, "none exceeds the highest");
    }

    @Test
    void feetChangeTheHeaderAndTheValues() throws Exception {
        ResultsView results = runDemo(page());
        assertTrue(results.quantityHeader().contains("lengths in m,"), results.quantityHeader());
        ResultRow contactInMetres = contactRow(results);

        FaultbenchPreferences.setLengthUnit(LengthUnit.FOOT);
        WorkbenchSmokeTest.spin(500);
        assertTrue(results.quantityHeader().contains("lengths in ft"), results.quantityHeader());
        ResultRow contactInFeet = contactRow(results);
        assertTrue(contactInFeet.quantity().endsWith("[ft]"), contactInFeet.quantity());
        // 1 m = 1 / 0.3048 ft = 3.28084 ft (international foot, NIST SP 811 (2008), Appendix B.8)
        assertEquals(contactInMetres.p50() * 3.28084, contactInFeet.p50(), 1e-6 * contactInFeet.p50());
        assertEquals(contactInMetres.p90() / 0.3048, contactInFeet.p90(), 1e-9 * Math.abs(contactInFeet.p90()));
    }

    private static ResultRow contactRow(ResultsView results) {
        return results.rows().stream().filter(r -> r.quantity().startsWith(UnitQuantity.CONTACT.label())).findFirst()
                .orElseThrow();
    }

    @Test
    void svgExportWritesAWellFormedFile() throws Exception {
        runDemo(page());
        AllanDiagramView allan = (AllanDiagramView) page().showView(AllanDiagramView.ID);
        WorkbenchSmokeTest.spin(500);
        Path file = Files.createTempDirectory("faultbench-svg").resolve("allan.svg");
        assertTrue(allan.exportSvg(file), "a diagram is on show");
        assertTrue(Files.size(file) > 1000, "the SVG has content");
        var svg = SafeXml.parse(file);
        assertEquals("svg", svg.getDocumentElement().getTagName());
        assertTrue(svg.getElementsByTagName("polygon").getLength() > 0, "unit polygons are written");
        assertTrue(Files.readString(file).contains("P50"), "the P50 contact line is drawn after a run");
    }
}
