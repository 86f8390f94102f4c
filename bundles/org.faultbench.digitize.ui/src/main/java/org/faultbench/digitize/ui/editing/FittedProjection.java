package org.faultbench.digitize.ui.editing;

import java.util.Objects;

import org.faultbench.digitize.georef.GeoTransform;

/** The projection of a scan georeferenced by a control-point fit. */
public record FittedProjection(GeoTransform transform) implements ScanProjection {
    static final double PIXEL_CENTRE = 0.5;

    public FittedProjection {
        Objects.requireNonNull(transform, "transform");
    }

    @Override
    public double[] toDrawing(double x, double y) {
        double[] pixel = transform.toPixel(x, y);
        return new double[] { pixel[0] + PIXEL_CENTRE, pixel[1] + PIXEL_CENTRE };
    }

    @Override
    public double[] toMap(double u, double v) {
        return transform.toMap(u - PIXEL_CENTRE, v - PIXEL_CENTRE);
    }

    @Override
    public boolean georeferenced() {
        return true;
    }
}
