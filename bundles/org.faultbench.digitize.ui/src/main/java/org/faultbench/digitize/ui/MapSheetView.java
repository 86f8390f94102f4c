package org.faultbench.digitize.ui;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;

/** Map Sheet view: Georeferenced depth-structure maps, digitized contours, fault traces and cut-off lines. */
public class MapSheetView extends ViewPart {
    public static final String ID = "org.faultbench.digitize.ui.mapSheet";

    private Label summary;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        summary = new Label(parent, SWT.WRAP);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        summary.setText(PURPOSE);
    }

    /** What the view is for and where digitizing happens (the map editor), shown until a study is loaded. */
    static final String PURPOSE = "Georeferenced depth-structure maps, digitized contours, fault traces and cut-off lines."
            + " Open a scanned map or a map sheet with File > Open Map... to digitize it in the map editor.";

    /** The text the view currently shows. */
    public String summaryText() {
        return summary.getText();
    }

    @Override
    public void setFocus() {
        summary.setFocus();
    }
}
