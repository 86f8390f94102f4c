package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.sim.ContributedInput;
import org.faultbench.strat.ui.SampledInputsView;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.junit.jupiter.api.Test;

/** Ticks a plug-in input into the demo study, types its distribution as a user would, and undoes both. */
class SampledInputsUiTest {
    private static final String SSF = "ssf-maximum-sealing";

    private static List<ContributedInput> drawn() {
        return ActiveStudy.get().analysis().orElseThrow().study().contributedInputs();
    }

    private static Text typeDistribution(SampledInputsView view, Table table, int row, String text) {
        view.editCell(row, false);
        WorkbenchSmokeTest.spin(50);
        for (Control child : table.getChildren()) {
            if (child instanceof Text t && t.isVisible()) {
                t.setText(text);
                WorkbenchSmokeTest.spin(50);
                return t;
            }
        }
        throw new AssertionError("no text cell editor opened on row " + row);
    }

    @Test
    void anInputIsTickedGivenADistributionAndUndone() throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        ActiveStudy.get().open(new AnalysisFileReader().read(demo.resolve("studies/demo-study.json")));
        IWorkbenchPage page = PerspectivesTest.open("org.faultbench.app.perspective.stratigraphy");
        SampledInputsView view = (SampledInputsView) page.showView(SampledInputsView.ID);
        WorkbenchSmokeTest.spin(300);
        Table table = view.tableViewer().getTable();
        int row = view.inputIds().indexOf(SSF);
        assertTrue(row >= 0, "the simulator's own input is offered: " + view.inputIds());
        assertTrue(drawn().isEmpty());
        assertEquals("\u2610", view.cellText(row, true));

        view.editCell(row, true);
        WorkbenchSmokeTest.spin(200);
        assertEquals(List.of(SSF), drawn().stream().map(ContributedInput::id).toList(), "ticking draws it");
        assertTrue(ActiveStudy.get().isDirty());
        int drawnRow = view.inputIds().indexOf(SSF);
        assertEquals(0, drawnRow, "drawn inputs come first");
        assertEquals("\u2611", view.cellText(drawnRow, true));

        Text field = typeDistribution(view, table, drawnRow, "uniform(0.5, 3)");
        assertFalse(view.problemText().isEmpty(), "below the input's bound of 1, refused while typing");
        field.setText("uniform(5, 6)");
        WorkbenchSmokeTest.spin(50);
        assertEquals("", view.problemText());
        field.notifyListeners(SWT.DefaultSelection, new Event());
        WorkbenchSmokeTest.spin(200);
        assertEquals(UncertainValue.uniform(5, 6), drawn().get(0).distribution());
        assertEquals("uniform(5, 6)", view.cellText(0, false));

        page.activate(view);
        IHandlerService handlers = PlatformUI.getWorkbench().getService(IHandlerService.class);
        handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        WorkbenchSmokeTest.spin(200);
        assertEquals(UncertainValue.uniform(4, 7), drawn().get(0).distribution(), "undo: the plug-in's own again");
        handlers.executeCommand("org.eclipse.ui.edit.undo", null);
        WorkbenchSmokeTest.spin(200);
        assertTrue(drawn().isEmpty(), "undo: not drawn");
    }
}
