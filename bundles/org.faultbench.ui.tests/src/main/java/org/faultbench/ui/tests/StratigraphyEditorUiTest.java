package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.strat.ui.StratigraphyEditorView;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFileReader;
import org.junit.jupiter.api.Test;

/** Types into the stratigraphy table as a user would, sees validation, and undoes the edit from the workbench. */
class StratigraphyEditorUiTest {

    private static UncertainValue sandAThickness() {
        var strat = ActiveStudy.get().analysis().orElseThrow().study().stratigraphy();
        return strat.units().get(strat.indexOf("Sand A")).thickness();
    }

    /** Opens the cell editor of row {@code row}, column {@code column} and types {@code text} into it. */
    private static Text type(StratigraphyEditorView view, int row, int column, String text) {
        view.tableViewer().editElement(view.tableViewer().getElementAt(row), column);
        WorkbenchSmokeTest.spin(50);
        Text field = null;
        for (Control child : view.tableViewer().getTable().getChildren()) {
            if (child instanceof Text t && t.isVisible()) {
                field = t;
            }
        }
        if (field == null) {
            throw new AssertionError("no text cell editor opened on row " + row + ", column " + column);
        }
        field.setText(text);
        WorkbenchSmokeTest.spin(50);
        return field;
    }

    @Test
    void anEditIsValidatedAppliedAndUndone() throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        ActiveStudy.get().open(new AnalysisFileReader().read(demo.resolve("studies/demo-study.json")));
        IWorkbenchPage page = PerspectivesTest.open("org.faultbench.app.perspective.stratigraphy");
        StratigraphyEditorView view = (StratigraphyEditorView) page.showView(StratigraphyEditorView.ID);
        WorkbenchSmokeTest.spin(300);
        assertTrue(view.unitNames().contains("Sand A"), view.unitNames().toString());
        int row = view.unitNames().indexOf("Sand A");
        UncertainValue before = sandAThickness();

        Text field = type(view, row, 2, "normal(14, ");
        assertFalse(view.problemText().isEmpty(), "an unfinished distribution is reported while typing");
        field.setText("triangular(10, 12, 16)");
        WorkbenchSmokeTest.spin(50);
        assertEquals("", view.problemText(), "a valid entry clears the message");
        field.notifyListeners(SWT.DefaultSelection, new Event());
        WorkbenchSmokeTest.spin(200);

        assertEquals(UncertainValue.triangular(10, 12, 16), sandAThickness());
        assertTrue(ActiveStudy.get().isDirty(), "the study has unsaved changes");

        page.activate(view);
        PlatformUI.getWorkbench().getService(IHandlerService.class).executeCommand("org.eclipse.ui.edit.undo", null);
        WorkbenchSmokeTest.spin(200);
        assertEquals(before, sandAThickness(), "undo restores the thickness");

        PlatformUI.getWorkbench().getService(IHandlerService.class).executeCommand("org.eclipse.ui.edit.redo", null);
        WorkbenchSmokeTest.spin(200);
        assertEquals(UncertainValue.triangular(10, 12, 16), sandAThickness(), "redo applies it again");
    }

    @Test
    void aNegativeThicknessIsRefusedWhileTyping() throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        ActiveStudy.get().open(new AnalysisFileReader().read(demo.resolve("studies/demo-study.json")));
        IWorkbenchPage page = PerspectivesTest.open("org.faultbench.app.perspective.stratigraphy");
        StratigraphyEditorView view = (StratigraphyEditorView) page.showView(StratigraphyEditorView.ID);
        WorkbenchSmokeTest.spin(300);
        UncertainValue before = sandAThickness();
        Text field = type(view, view.unitNames().indexOf("Sand A"), 2, "-4");
        assertTrue(view.problemText().contains("Thickness"), view.problemText());
        field.notifyListeners(SWT.DefaultSelection, new Event());
        WorkbenchSmokeTest.spin(100);
        assertEquals(before, sandAThickness(), "an invalid entry is never applied");
    }
}
