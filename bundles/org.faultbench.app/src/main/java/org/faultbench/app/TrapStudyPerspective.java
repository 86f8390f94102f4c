package org.faultbench.app;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * Trap analysis and results: the Allan diagram in the centre, the results below it, stratigraphy, throw profiles and
 * plug-in inputs beside, so an edit of the inputs and its effect on the contacts are seen together.
 */
public class TrapStudyPerspective implements IPerspectiveFactory {
    public static final String ID = "org.faultbench.app.perspective.trapStudy";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editorArea = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        IFolderLayout right = layout.createFolder("org.faultbench.app.folder.right", IPageLayout.RIGHT, 0.70f,
                editorArea);
        right.addView(ViewIds.STRATIGRAPHY);
        right.addView(ViewIds.THROW_PROFILES);
        right.addView(ViewIds.SAMPLED_INPUTS);
        layout.addView(ViewIds.RESULTS, IPageLayout.BOTTOM, 0.5f, editorArea);
        layout.addView(ViewIds.ALLAN, IPageLayout.TOP, 0.5f, editorArea);
        layout.addPlaceholder(ViewIds.MAP_SHEET, IPageLayout.LEFT, 0.22f, editorArea);
        Perspectives.addShortcuts(layout);
    }
}
