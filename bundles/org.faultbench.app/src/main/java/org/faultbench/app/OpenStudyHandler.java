package org.faultbench.app;

import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.handlers.HandlerUtil;

/** File > Open Study...: picks an analysis file and loads it in the background. */
public class OpenStudyHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) {
        FileDialog dialog = new FileDialog(HandlerUtil.getActiveShell(event), SWT.OPEN);
        dialog.setText("Open study");
        dialog.setFilterExtensions(new String[] { "*.json", "*.*" });
        dialog.setFilterNames(new String[] { "Faultbench analysis files (*.json)", "All files" });
        String chosen = dialog.open();
        if (chosen != null) {
            new StudyLoadJob(Path.of(chosen)).schedule();
        }
        return null;
    }
}
