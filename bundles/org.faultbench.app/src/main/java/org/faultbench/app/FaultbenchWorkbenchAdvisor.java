package org.faultbench.app;

import org.eclipse.ui.application.IWorkbenchConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;

/** Opens the trap-study perspective first and remembers the user's layout between sessions. */
class FaultbenchWorkbenchAdvisor extends WorkbenchAdvisor {

    @Override
    public void initialize(IWorkbenchConfigurer configurer) {
        configurer.setSaveAndRestore(true);
    }

    /** Opens the workspace's first study (e.g. the demo) so the views have something to show. */
    @Override
    public void postStartup() {
        StudyLoadJob.firstWorkspaceStudy().ifPresent(file -> new StudyLoadJob(file).schedule());
    }

    /** The trap-study perspective, or the one named by -Dfaultbench.perspective (scripted screenshots). */
    @Override
    public String getInitialWindowPerspectiveId() {
        return System.getProperty("faultbench.perspective", TrapStudyPerspective.ID);
    }

    @Override
    public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        return new FaultbenchWindowAdvisor(configurer);
    }
}
