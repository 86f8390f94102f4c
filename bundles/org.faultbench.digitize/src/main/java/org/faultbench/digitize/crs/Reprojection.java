package org.faultbench.digitize.crs;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.CoordinateTransform;
import org.locationtech.proj4j.CoordinateTransformFactory;
import org.locationtech.proj4j.Proj4jException;
import org.locationtech.proj4j.ProjCoordinate;

/**
 * Moves map coordinates from one coordinate reference system to another (projection, and datum shift where the
 * EPSG definitions give one), so digitized traces, contours and polygons can be brought into the study's system.
 * x, y follow {@link CoordinateSystem}'s axis order; z (depth) is kept as it is.
 * <p>
 * Safe for use from several threads: proj4j's transform keeps scratch state, so calls are serialized on it.
 */
public final class Reprojection {
    private static final CoordinateTransformFactory TRANSFORMS = new CoordinateTransformFactory();
    private static final double MAX_LATITUDE = 90;

    private final CoordinateSystem from;
    private final CoordinateSystem to;
    private final CoordinateTransform transform;
    private final boolean fromGeographic;

    public Reprojection(CoordinateSystem from, CoordinateSystem to) {
        if (from == null || to == null) {
            throw new IllegalArgumentException("coordinate system missing: from " + from + ", to " + to);
        }
        this.from = from;
        this.to = to;
        CoordinateReferenceSystem source = EpsgDataset.crs(from.epsgCode());
        this.transform = TRANSFORMS.createTransform(source, EpsgDataset.crs(to.epsgCode()));
        this.fromGeographic = source.isGeographic();
    }

    public CoordinateSystem from() {
        return from;
    }

    public CoordinateSystem to() {
        return to;
    }

    /** The reprojection back from {@link #to()} to {@link #from()}. */
    public Reprojection inverse() {
        return new Reprojection(to, from);
    }

    /**
     * {x, y} in {@link #to()} of the point (x, y) in {@link #from()}.
     *
     * @throws IllegalArgumentException for a point that is not finite, a latitude beyond &plusmn;90&deg; or a point
     *         the target projection cannot represent (e.g. 90&deg; from a Transverse Mercator central meridian)
     */
    public double[] apply(double x, double y) {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException(point(x, y) + " has a coordinate that is not a finite number");
        }
        if (fromGeographic && Math.abs(y) > MAX_LATITUDE) {
            throw new IllegalArgumentException(point(x, y) + ": latitude y = " + y + " is beyond +/-90 degrees; "
                    + "geographic coordinates are x = longitude, y = latitude");
        }
        ProjCoordinate result = new ProjCoordinate();
        try {
            synchronized (transform) {
                transform.transform(new ProjCoordinate(x, y), result);
            }
        } catch (Proj4jException e) {
            throw new IllegalArgumentException(point(x, y) + " cannot be moved to " + to + ": " + e.getMessage(), e);
        }
        if (!Double.isFinite(result.x) || !Double.isFinite(result.y)) {
            throw new IllegalArgumentException(point(x, y) + " lies outside the area " + to + " can represent");
        }
        return new double[] {result.x, result.y};
    }

    private String point(double x, double y) {
        return "point (" + x + ", " + y + ") in " + from;
    }

    /** {@code c} in {@link #to()}, with z and m unchanged; {@code c} itself is left alone. */
    public Coordinate apply(Coordinate c) {
        if (c == null) {
            throw new IllegalArgumentException("coordinate to reproject missing");
        }
        double[] xy = apply(c.getX(), c.getY());
        Coordinate moved = c.copy();
        moved.setX(xy[0]);
        moved.setY(xy[1]);
        return moved;
    }

    /** A copy of {@code geometry} with every vertex moved to {@link #to()}; z values are kept. */
    @SuppressWarnings("unchecked") // Geometry.copy() returns an instance of the geometry's own class
    public <G extends Geometry> G apply(G geometry) {
        if (geometry == null) {
            throw new IllegalArgumentException("geometry to reproject missing");
        }
        G copy = (G) geometry.copy();
        copy.apply(new VertexMover());
        return copy;
    }

    /** Reprojects each vertex in place. */
    private final class VertexMover implements CoordinateSequenceFilter {
        @Override
        public void filter(CoordinateSequence sequence, int i) {
            double[] xy = apply(sequence.getX(i), sequence.getY(i));
            sequence.setOrdinate(i, CoordinateSequence.X, xy[0]);
            sequence.setOrdinate(i, CoordinateSequence.Y, xy[1]);
        }

        @Override
        public boolean isDone() {
            return false;
        }

        @Override
        public boolean isGeometryChanged() {
            return true;
        }
    }
}
