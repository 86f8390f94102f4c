package org.faultbench.app;

import java.util.List;

import org.eclipse.ui.IPageLayout;

/** The stage perspectives in workflow order, and the shortcuts every one of them offers. */
final class Perspectives {
    static final List<String> IN_WORKFLOW_ORDER = List.of(MapSheetPerspective.ID, FaultReviewPerspective.ID,
            StratigraphyPerspective.ID, TrapStudyPerspective.ID);
    private static final List<String> VIEWS = List.of(ViewIds.MAP_SHEET, ViewIds.CONTROL_POINTS,
            ViewIds.THROW_PROFILES, ViewIds.DISPLACEMENT_LENGTH, ViewIds.STRATIGRAPHY, ViewIds.ALLAN, ViewIds.RESULTS,
            ViewIds.PROBLEMS, ViewIds.PROPERTIES);

    private Perspectives() {
    }

    static void addShortcuts(IPageLayout layout) {
        VIEWS.forEach(layout::addShowViewShortcut);
        IN_WORKFLOW_ORDER.forEach(layout::addPerspectiveShortcut);
    }
}
