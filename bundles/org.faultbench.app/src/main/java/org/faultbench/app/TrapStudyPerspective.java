package org.faultbench.app;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * The first perspective: map on the left, Allan diagram in the centre, stratigraphy and fault inspector on the
 * right, results below. Views are referenced by id so the perspective does not depend on the UI bundles.
 */
public class TrapStudyPerspective implements IPerspectiveFactory {
    public static final String ID = "org.faultbench.app.perspective.trapStudy";

    static final String MAP_VIEW = "org.faultbench.digitize.ui.mapSheet";
    static final String FAULT_VIEW = "org.faultbench.faults.ui.faultInspector";
    static final String STRAT_VIEW = "org.faultbench.strat.ui.unitStack";
    static final String ALLAN_VIEW = "org.faultbench.juxtaposition.ui.allanDiagram";
    static final String RESULTS_VIEW = "org.faultbench.sim.ui.results";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editorArea = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        layout.addView(MAP_VIEW, IPageLayout.LEFT, 0.22f, editorArea);
        IFolderLayout right = layout.createFolder("org.faultbench.app.folder.right", IPageLayout.RIGHT, 0.78f, editorArea);
        right.addView(STRAT_VIEW);
        right.addView(FAULT_VIEW);
        layout.addView(RESULTS_VIEW, IPageLayout.BOTTOM, 0.55f, editorArea);
        layout.addView(ALLAN_VIEW, IPageLayout.TOP, 0.5f, editorArea);
        layout.addShowViewShortcut(MAP_VIEW);
        layout.addShowViewShortcut(FAULT_VIEW);
        layout.addShowViewShortcut(STRAT_VIEW);
        layout.addShowViewShortcut(ALLAN_VIEW);
        layout.addShowViewShortcut(RESULTS_VIEW);
    }
}
