package org.faultbench.digitize.ui.map;

import org.eclipse.draw2d.FigureCanvas;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.swt.events.MouseEvent;
import org.eclipse.swt.events.MouseListener;
import org.eclipse.swt.events.MouseMoveListener;

/** Pans the map while the middle mouse button is held, whatever tool is active (the scroll bars pan too). */
final class MiddleDragPanner implements MouseListener, MouseMoveListener {
    private static final int MIDDLE = 2;
    private final FigureCanvas canvas;
    private Point start;
    private Point startView;

    private MiddleDragPanner(FigureCanvas canvas) {
        this.canvas = canvas;
    }

    static void install(FigureCanvas canvas) {
        MiddleDragPanner panner = new MiddleDragPanner(canvas);
        canvas.addMouseListener(panner);
        canvas.addMouseMoveListener(panner);
    }

    @Override
    public void mouseDown(MouseEvent e) {
        if (e.button == MIDDLE) {
            start = new Point(e.x, e.y);
            startView = canvas.getViewport().getViewLocation().getCopy();
        }
    }

    @Override
    public void mouseMove(MouseEvent e) {
        if (start != null) {
            canvas.scrollTo(startView.x - (e.x - start.x), startView.y - (e.y - start.y));
        }
    }

    @Override
    public void mouseUp(MouseEvent e) {
        if (e.button == MIDDLE) {
            start = null;
        }
    }

    @Override
    public void mouseDoubleClick(MouseEvent e) {
        // nothing
    }
}
