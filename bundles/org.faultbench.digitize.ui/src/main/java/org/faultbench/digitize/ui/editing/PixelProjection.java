package org.faultbench.digitize.ui.editing;

/**
 * The stand-in projection of a scan that has no usable fit yet: map x is the pixel column and map y the negated
 * pixel row (so north stays up). Features digitized this way are in pixel units and must be redrawn once the scan
 * is georeferenced, which the editor says in its status.
 */
public record PixelProjection() implements ScanProjection {

    @Override
    public double[] toDrawing(double x, double y) {
        return new double[] { x + FittedProjection.PIXEL_CENTRE, -y + FittedProjection.PIXEL_CENTRE };
    }

    @Override
    public double[] toMap(double u, double v) {
        return new double[] { u - FittedProjection.PIXEL_CENTRE, -(v - FittedProjection.PIXEL_CENTRE) };
    }

    @Override
    public boolean georeferenced() {
        return false;
    }
}
