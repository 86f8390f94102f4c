package org.faultbench.digitize.ui.map;

import org.eclipse.draw2d.IFigure;
import org.eclipse.draw2d.Locator;
import org.eclipse.draw2d.geometry.PrecisionPoint;
import org.eclipse.draw2d.geometry.Rectangle;
import org.eclipse.gef.DragTracker;
import org.eclipse.gef.handles.SquareHandle;
import org.eclipse.swt.graphics.Color;

/** A small square on one vertex of a selected line; dragging it moves the vertex. */
final class VertexHandle extends SquareHandle {
    private static final int SIZE = 7;
    private final int index;

    VertexHandle(FeatureEditPart owner, int index) {
        super(owner, new VertexLocator(owner, index));
        this.index = index;
    }

    @Override
    protected DragTracker createDragTracker() {
        return new VertexDragTracker((FeatureEditPart) getOwner(), index);
    }

    @Override
    protected Color getFillColor() {
        return MapColours.LABEL_HALO;
    }

    @Override
    protected Color getBorderColor() {
        return MapColours.SELECTED;
    }

    /** Places the handle on its vertex, in the (unscaled) handle layer. */
    private record VertexLocator(FeatureEditPart owner, int index) implements Locator {
        @Override
        public void relocate(IFigure target) {
            FeatureFigure figure = owner.featureFigure();
            if (index >= figure.vertexCount()) {
                return;
            }
            PrecisionPoint p = new PrecisionPoint(figure.vertex(index).x, figure.vertex(index).y);
            figure.translateToAbsolute(p);
            target.translateToRelative(p);
            target.setBounds(new Rectangle(p.x - SIZE / 2, p.y - SIZE / 2, SIZE, SIZE));
        }
    }
}
