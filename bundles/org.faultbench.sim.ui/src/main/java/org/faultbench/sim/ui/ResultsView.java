package org.faultbench.sim.ui;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;

/** Realisation Results view: Per-unit spill, leak, contact and column as P90/P50/P10 (exceedance convention) after a Monte Carlo run. */
public class ResultsView extends ViewPart {
    public static final String ID = "org.faultbench.sim.ui.results";

    private Label summary;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        summary = new Label(parent, SWT.WRAP);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        summary.setText(PURPOSE);
    }

    /** What the view is for, shown until a study is loaded. */
    static final String PURPOSE = "Per-unit spill, leak, contact and column as P90/P50/P10 (exceedance convention) after a Monte Carlo run.";

    /** The text the view currently shows. */
    public String summaryText() {
        return summary.getText();
    }

    @Override
    public void setFocus() {
        summary.setFocus();
    }
}
