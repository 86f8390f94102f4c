package org.faultbench.digitize.ui.map;

import java.nio.file.Path;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.handlers.HandlerUtil;

/** File &gt; Open Map...: a scanned map image or a map-sheet file, in the map editor. */
public final class OpenMapHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        FileDialog dialog = new FileDialog(window.getShell(), SWT.OPEN);
        dialog.setText("Open a scanned map or a map sheet");
        dialog.setFilterExtensions(new String[] { "*.png;*.jpg;*.jpeg;*.tif;*.tiff;*.bmp;*.mapsheet.json", "*" });
        dialog.setFilterNames(new String[] { "Scanned maps and map sheets", "All files" });
        String chosen = dialog.open();
        if (chosen != null) {
            new MapOpenJob(Path.of(chosen), window).schedule();
        }
        return null;
    }
}
