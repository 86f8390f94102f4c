package org.faultbench.app;

import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;

/** Window size, title and chrome of a Faultbench workbench window. */
class FaultbenchWindowAdvisor extends WorkbenchWindowAdvisor {

    FaultbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        super(configurer);
    }

    @Override
    public ActionBarAdvisor createActionBarAdvisor(IActionBarConfigurer configurer) {
        return new FaultbenchActionBarAdvisor(configurer);
    }

    @Override
    public void preWindowOpen() {
        IWorkbenchWindowConfigurer configurer = getWindowConfigurer();
        // fill most of the primary monitor: diagrams and tables need the room
        Rectangle screen = Display.getCurrent().getPrimaryMonitor().getClientArea();
        configurer.setInitialSize(new Point(Math.min(1800, screen.width), Math.min(1100, screen.height)));
        configurer.setShowCoolBar(true);
        configurer.setShowStatusLine(true);
        configurer.setShowPerspectiveBar(true);
        configurer.setTitle(ProductInfo.windowTitle());
    }
}
