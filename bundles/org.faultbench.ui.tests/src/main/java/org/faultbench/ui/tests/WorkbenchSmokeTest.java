package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IViewReference;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.faultbench.app.ProductInfo;
import org.faultbench.app.TrapStudyPerspective;
import org.junit.jupiter.api.Test;
import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;

/** Runs inside the real Faultbench workbench (UI harness, UI thread) under Xvfb. */
class WorkbenchSmokeTest {

    static void spin(long millis) {
        Display display = Display.getCurrent();
        long end = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < end) {
            while (display.readAndDispatch()) {
                // drain pending events
            }
            Thread.onSpinWait();
        }
    }

    private static IWorkbenchWindow window() {
        return PlatformUI.getWorkbench().getActiveWorkbenchWindow();
    }

    @Test
    void windowTitleNamesTheProductAndVersion() {
        String title = window().getShell().getText();
        assertTrue(title.startsWith("Faultbench 0."), title);
    }

    @Test
    void trapStudyPerspectiveOpensItsViews() throws Exception {
        IWorkbenchPage page = window().getActivePage();
        page.setPerspective(PlatformUI.getWorkbench().getPerspectiveRegistry()
                .findPerspectiveWithId(TrapStudyPerspective.ID));
        page.resetPerspective();
        spin(300);
        assertEquals(TrapStudyPerspective.ID, page.getPerspective().getId());
        String[] open = Arrays.stream(page.getViewReferences()).map(IViewReference::getId).toArray(String[]::new);
        for (String id : new String[] { "org.faultbench.faults.ui.throwProfiles",
                "org.faultbench.strat.ui.stratigraphyEditor", "org.faultbench.juxtaposition.ui.allanDiagram",
                "org.faultbench.sim.ui.results" }) {
            assertTrue(Arrays.asList(open).contains(id), id + " missing from " + Arrays.toString(open));
        }
    }

    @Test
    void aboutTextCarriesVersionAndCautions() {
        String text = ProductInfo.aboutText();
        Bundle app = FrameworkUtil.getBundle(ProductInfo.class);
        assertNotNull(app);
        assertTrue(text.contains(app.getVersion().toString()), text);
        assertTrue(text.contains("Decision support only"), text);
        assertTrue(text.contains("licensed professionals"), text);
        assertTrue(text.contains("Clay-based seal rules do not apply to carbonates"), text);
    }

    @Test
    void aboutCommandIsInTheHelpMenu() throws Exception {
        org.eclipse.ui.commands.ICommandService commands = PlatformUI.getWorkbench()
                .getService(org.eclipse.ui.commands.ICommandService.class);
        assertTrue(commands.getCommand("org.faultbench.app.about").isDefined());
        assertTrue(commands.getCommand("org.faultbench.app.about").isHandled(), "About has a handler");
    }

    @Test
    void gefCompatibilityFragmentRestoresJFaceAssert() throws Exception {
        Bundle gef = org.eclipse.core.runtime.Platform.getBundle("org.eclipse.gef");
        assertNotNull(gef, "GEF 3.2 is part of the product");
        Class<?> assertClass = gef.loadClass("org.eclipse.jface.util.Assert");
        assertFalse(assertClass.getName().isEmpty());
        // a GEF palette entry constructor calls Assert.isTrue: it must not fail with NoClassDefFoundError
        assertNotNull(new org.eclipse.gef.palette.SelectionToolEntry());
    }
}
