package org.faultbench.digitize.ui.editing;

/**
 * Snapping distance as the user feels it, in screen pixels, turned into map metres for the model
 * {@link org.faultbench.digitize.sketch.Snapper}: at zoom z one drawing unit (one scan pixel) covers z screen
 * pixels, so p screen pixels are p / z drawing units, times the metres per drawing unit of the georeference.
 */
public final class SnapTolerance {
    /** Default snapping distance in screen pixels (common practice for pointer picking: a few pixels). */
    public static final double DEFAULT_SCREEN_PIXELS = 8;

    private SnapTolerance() {
    }

    /**
     * @param screenPixels tolerance on screen, &ge; 0
     * @param zoom the viewer's zoom, &gt; 0 (1 = one scan pixel per screen pixel)
     * @param projection the current georeference
     * @param u drawing position where the user clicked
     * @param v drawing position where the user clicked
     * @return the tolerance in map metres
     */
    public static double metres(double screenPixels, double zoom, ScanProjection projection, double u, double v) {
        if (!(screenPixels >= 0) || Double.isInfinite(screenPixels)) {
            throw new IllegalArgumentException("snapping tolerance must be a finite number >= 0 screen pixels, was "
                    + screenPixels);
        }
        if (!(zoom > 0) || Double.isInfinite(zoom)) {
            throw new IllegalArgumentException("zoom must be a finite number > 0, was " + zoom);
        }
        return screenPixels / zoom * projection.metresPerUnit(u, v);
    }
}
