package org.faultbench.app;

import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * Map and digitizing: the map sheet editor fills the centre, control points and their residuals below it, the
 * properties of the selected feature and the topology problems on the right.
 */
public class MapSheetPerspective implements IPerspectiveFactory {
    public static final String ID = "org.faultbench.app.perspective.mapSheet";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editorArea = layout.getEditorArea();
        layout.setEditorAreaVisible(true);
        layout.addView(ViewIds.CONTROL_POINTS, IPageLayout.BOTTOM, 0.70f, editorArea);
        IFolderLayout right = layout.createFolder("org.faultbench.app.folder.mapRight", IPageLayout.RIGHT, 0.74f,
                editorArea);
        right.addView(ViewIds.PROPERTIES);
        right.addView(ViewIds.PROBLEMS);
        right.addPlaceholder(ViewIds.MAP_SHEET);
        Perspectives.addShortcuts(layout);
    }
}
