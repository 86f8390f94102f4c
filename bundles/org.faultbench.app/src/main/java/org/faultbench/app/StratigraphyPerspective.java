package org.faultbench.app;

import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * Stratigraphy: the unit table and column on top, the Allan diagram below so the juxtaposition windows that a change
 * of thickness opens or closes are seen at once.
 */
public class StratigraphyPerspective implements IPerspectiveFactory {
    public static final String ID = "org.faultbench.app.perspective.stratigraphy";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editorArea = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        layout.addView(ViewIds.STRATIGRAPHY, IPageLayout.TOP, 0.55f, editorArea);
        layout.addView(ViewIds.ALLAN, IPageLayout.BOTTOM, 0.45f, ViewIds.STRATIGRAPHY);
        layout.addView(ViewIds.RESULTS, IPageLayout.RIGHT, 0.6f, ViewIds.ALLAN);
        Perspectives.addShortcuts(layout);
    }
}
