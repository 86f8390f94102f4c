package org.faultbench.app;

import org.eclipse.jface.action.IMenuManager;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.ui.IWorkbenchActionConstants;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.actions.ActionFactory.IWorkbenchAction;
import org.eclipse.ui.actions.ContributionItemFactory;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;

/** Main menu: File (save), Edit (undo, redo), Window (perspectives, views, preferences) and Help (About). */
class FaultbenchActionBarAdvisor extends ActionBarAdvisor {
    private IWorkbenchAction quit;
    private IWorkbenchAction save;
    private IWorkbenchAction undo;
    private IWorkbenchAction redo;
    private IWorkbenchAction preferences;
    private IWorkbenchAction resetPerspective;
    private IWorkbenchAction savePerspective;
    private IWorkbenchWindow window;

    FaultbenchActionBarAdvisor(IActionBarConfigurer configurer) {
        super(configurer);
    }

    @Override
    protected void makeActions(IWorkbenchWindow window) {
        this.window = window;
        quit = register(ActionFactory.QUIT.create(window));
        save = register(ActionFactory.SAVE.create(window));
        undo = register(ActionFactory.UNDO.create(window));
        redo = register(ActionFactory.REDO.create(window));
        preferences = register(ActionFactory.PREFERENCES.create(window));
        resetPerspective = register(ActionFactory.RESET_PERSPECTIVE.create(window));
        savePerspective = register(ActionFactory.SAVE_PERSPECTIVE.create(window));
    }

    private IWorkbenchAction register(IWorkbenchAction action) {
        super.register(action);
        return action;
    }

    @Override
    protected void fillMenuBar(IMenuManager menuBar) {
        MenuManager file = new MenuManager("&File", IWorkbenchActionConstants.M_FILE);
        file.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));
        file.add(save);
        file.add(new Separator());
        file.add(quit);

        MenuManager edit = new MenuManager("&Edit", IWorkbenchActionConstants.M_EDIT);
        edit.add(undo);
        edit.add(redo);
        edit.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));

        MenuManager openPerspective = new MenuManager("Open &Perspective");
        openPerspective.add(ContributionItemFactory.PERSPECTIVES_SHORTLIST.create(window));
        MenuManager showView = new MenuManager("Show &View");
        showView.add(ContributionItemFactory.VIEWS_SHORTLIST.create(window));

        MenuManager windowMenu = new MenuManager("&Window", IWorkbenchActionConstants.M_WINDOW);
        windowMenu.add(openPerspective);
        windowMenu.add(showView);
        windowMenu.add(new Separator());
        windowMenu.add(savePerspective);
        windowMenu.add(resetPerspective);
        windowMenu.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));
        windowMenu.add(preferences);

        MenuManager help = new MenuManager("&Help", IWorkbenchActionConstants.M_HELP);
        help.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));

        menuBar.add(file);
        menuBar.add(edit);
        menuBar.add(windowMenu);
        menuBar.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));
        menuBar.add(help);
    }
}
