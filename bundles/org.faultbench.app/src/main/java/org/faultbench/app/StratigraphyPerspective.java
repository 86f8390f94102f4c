package org.faultbench.app;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * Stratigraphy: the unit table and column on top (the plug-in inputs in a tab beside them), the Allan diagram below so the juxtaposition windows that a change
 * of thickness opens or closes are seen at once.
 */
public class StratigraphyPerspective implements IPerspectiveFactory {
    public static final String ID = "org.faultbench.app.perspective.stratigraphy";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editorArea = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        IFolderLayout inputs = layout.createFolder("org.faultbench.app.folder.inputs", IPageLayout.TOP, 0.55f,
                editorArea);
        inputs.addView(ViewIds.STRATIGRAPHY);
        inputs.addView(ViewIds.SAMPLED_INPUTS);
        layout.addView(ViewIds.ALLAN, IPageLayout.BOTTOM, 0.45f, "org.faultbench.app.folder.inputs");
        layout.addView(ViewIds.RESULTS, IPageLayout.RIGHT, 0.6f, ViewIds.ALLAN);
        Perspectives.addShortcuts(layout);
    }
}
