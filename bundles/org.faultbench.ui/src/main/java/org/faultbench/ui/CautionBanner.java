package org.faultbench.ui;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

/**
 * The strip of cautions shown above every view whose numbers can drive a well or storage decision.
 */
public final class CautionBanner {
    /** Short form for views; the full list is in reports and the About dialog. */
    public static final String TEXT = "Decision support only \u2014 results carry the uncertainty of every input; "
            + "calibrate against field data; clay-based rules do not apply to carbonates; "
            + "defer to licensed professionals and local regulations.";

    /** Pale amber: reads as "take note" without alarming, and prints well in grey. */
    private static final int[] BACKGROUND = { 255, 243, 205 };

    private CautionBanner() {
    }

    /** Adds the banner as a full-width row of a GridLayout parent and returns its label. */
    public static Label create(Composite parent) {
        Composite strip = new Composite(parent, SWT.NONE);
        GridLayout layout = new GridLayout(1, false);
        layout.marginHeight = 3;
        strip.setLayout(layout);
        strip.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, ((GridLayout) parent.getLayout()).numColumns, 1));
        Color background = new Color(BACKGROUND[0], BACKGROUND[1], BACKGROUND[2]);
        strip.setBackground(background);
        Label label = new Label(strip, SWT.WRAP);
        label.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        label.setBackground(background);
        label.setText(TEXT);
        return label;
    }
}
