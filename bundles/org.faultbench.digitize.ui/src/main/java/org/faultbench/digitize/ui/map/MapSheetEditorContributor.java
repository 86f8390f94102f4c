package org.faultbench.digitize.ui.map;

import org.eclipse.gef.ui.actions.ActionBarContributor;
import org.eclipse.gef.ui.actions.DeleteRetargetAction;
import org.eclipse.gef.ui.actions.GEFActionConstants;
import org.eclipse.gef.ui.actions.RedoRetargetAction;
import org.eclipse.gef.ui.actions.UndoRetargetAction;
import org.eclipse.gef.ui.actions.ZoomComboContributionItem;
import org.eclipse.gef.ui.actions.ZoomInRetargetAction;
import org.eclipse.gef.ui.actions.ZoomOutRetargetAction;
import org.eclipse.jface.action.IToolBarManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.actions.RetargetAction;

/**
 * Ties the map editor's actions to the workbench: Undo, Redo, Delete and Select All become the global handlers (so
 * Edit menu and Ctrl+Z act on the map), and the tool bar gets Undo, Redo, zoom in/out/fit and the zoom box.
 */
public final class MapSheetEditorContributor extends ActionBarContributor {

    @Override
    protected void buildActions() {
        addRetargetAction(new UndoRetargetAction());
        addRetargetAction(new RedoRetargetAction());
        addRetargetAction(new DeleteRetargetAction());
        addRetargetAction(new ZoomInRetargetAction());
        addRetargetAction(new ZoomOutRetargetAction());
        RetargetAction fit = new RetargetAction(ZoomToFitAction.ID, "Zoom to Fit");
        fit.setToolTipText("Zoom to fit the whole map");
        addRetargetAction(fit);
    }

    @Override
    protected void declareGlobalActionKeys() {
        addGlobalActionKey(ActionFactory.SELECT_ALL.getId());
        addGlobalActionKey(ActionFactory.SAVE.getId());
    }

    @Override
    public void contributeToToolBar(IToolBarManager toolBar) {
        toolBar.add(getAction(ActionFactory.UNDO.getId()));
        toolBar.add(getAction(ActionFactory.REDO.getId()));
        toolBar.add(new Separator());
        toolBar.add(getAction(GEFActionConstants.ZOOM_IN));
        toolBar.add(getAction(GEFActionConstants.ZOOM_OUT));
        toolBar.add(getAction(ZoomToFitAction.ID));
        toolBar.add(new ZoomComboContributionItem(getPage()));
    }
}
