package org.faultbench.ui.plot;

import org.eclipse.draw2d.LightweightSystem;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;

/** An SWT canvas showing one plot figure that always fills it, so the plot follows the size of its view. */
public final class PlotCanvas {

    private PlotCanvas() {
    }

    public static Canvas create(Composite parent, XYPlotFigure figure) {
        Canvas canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED | SWT.NO_BACKGROUND);
        // the lightweight system's root lays its contents out to the canvas's whole client area
        new LightweightSystem(canvas).setContents(figure);
        return canvas;
    }
}
