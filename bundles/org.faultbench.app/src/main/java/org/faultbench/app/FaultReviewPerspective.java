package org.faultbench.app;

import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * Fault model QC: throw profiles along strike with their fitted models in the centre, the displacement-length plot
 * beside them and the QC findings in the Problems view below (double-click jumps to the fault and position).
 */
public class FaultReviewPerspective implements IPerspectiveFactory {
    public static final String ID = "org.faultbench.app.perspective.faultReview";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editorArea = layout.getEditorArea();
        layout.setEditorAreaVisible(false);
        layout.addView(ViewIds.THROW_PROFILES, IPageLayout.TOP, 0.65f, editorArea);
        layout.addView(ViewIds.DISPLACEMENT_LENGTH, IPageLayout.RIGHT, 0.62f, ViewIds.THROW_PROFILES);
        layout.addView(ViewIds.PROBLEMS, IPageLayout.BOTTOM, 0.65f, ViewIds.THROW_PROFILES);
        layout.addPlaceholder(ViewIds.MAP_SHEET, IPageLayout.LEFT, 0.2f, ViewIds.THROW_PROFILES);
        Perspectives.addShortcuts(layout);
    }
}
