package org.faultbench.app;

import org.eclipse.equinox.app.IApplication;
import org.eclipse.equinox.app.IApplicationContext;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.PlatformUI;

/** Starts the Faultbench workbench (the GUI entry point of the product). */
public class FaultbenchApplication implements IApplication {

    @Override
    public Object start(IApplicationContext context) throws Exception {
        Display display = PlatformUI.createDisplay();
        try {
            int rc = PlatformUI.createAndRunWorkbench(display, new FaultbenchWorkbenchAdvisor());
            return rc == PlatformUI.RETURN_RESTART ? IApplication.EXIT_RESTART : IApplication.EXIT_OK;
        } finally {
            display.dispose();
        }
    }

    @Override
    public void stop() {
        if (!PlatformUI.isWorkbenchRunning()) {
            return;
        }
        Display display = PlatformUI.getWorkbench().getDisplay();
        display.syncExec(() -> {
            if (!display.isDisposed()) {
                PlatformUI.getWorkbench().close();
            }
        });
    }
}
