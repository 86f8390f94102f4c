package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eclipse.ui.IViewPart;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.faultbench.digitize.ui.MapSheetView;
import org.faultbench.faults.ui.DisplacementLengthView;
import org.faultbench.faults.ui.ThrowProfileView;
import org.faultbench.juxtaposition.ui.AllanDiagramView;
import org.faultbench.sim.ui.ResultsView;
import org.faultbench.strat.ui.StratigraphyEditorView;
import org.junit.jupiter.api.Test;

/** Each UI bundle's view opens in the workbench and shows its content. */
class ViewsTest {

    private static IViewPart show(String id) throws Exception {
        IWorkbenchPage page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        IViewPart part = page.showView(id);
        WorkbenchSmokeTest.spin(100);
        return part;
    }

    @Test
    void mapSheet() throws Exception {
        MapSheetView view = assertInstanceOf(MapSheetView.class, show(MapSheetView.ID));
        assertTrue(view.summaryText().contains("contours"), view.summaryText());
    }

    @Test
    void faultViews() throws Exception {
        assertInstanceOf(ThrowProfileView.class, show(ThrowProfileView.ID));
        assertInstanceOf(DisplacementLengthView.class, show(DisplacementLengthView.ID));
    }

    @Test
    void stratigraphy() throws Exception {
        assertInstanceOf(StratigraphyEditorView.class, show(StratigraphyEditorView.ID));
    }

    @Test
    void allanDiagram() throws Exception {
        AllanDiagramView view = assertInstanceOf(AllanDiagramView.class, show(AllanDiagramView.ID));
        assertTrue(view.summaryText().contains("Juxtaposition") || view.summaryText().contains("footwall"),
                view.summaryText());
    }

    @Test
    void results() throws Exception {
        ResultsView view = assertInstanceOf(ResultsView.class, show(ResultsView.ID));
        assertTrue(view.summaryText().contains("exceedance"), view.summaryText());
    }
}
