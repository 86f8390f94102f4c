package org.faultbench.digitize.vector;

import java.util.Set;
import java.util.function.DoubleUnaryOperator;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;

/** The geometry types exchanged here and their conversion between file units and metres. */
final class FeatureGeometry {
    /** JTS / OGC type names of the geometries read and written. */
    static final Set<String> SUPPORTED = Set.of(Geometry.TYPENAME_LINESTRING, Geometry.TYPENAME_MULTILINESTRING,
            Geometry.TYPENAME_POLYGON);

    private FeatureGeometry() {
    }

    static void requireSupported(Geometry geometry) {
        if (!SUPPORTED.contains(geometry.getGeometryType())) {
            throw new IllegalArgumentException(unsupported(geometry.getGeometryType()));
        }
    }

    static String unsupported(String type) {
        return "geometry type '" + type + "' is not read or written here; expected LineString, MultiLineString or "
                + "Polygon";
    }

    /** A copy of {@code geometry} with x and y converted by {@code xy} and z by {@code z}. */
    static Geometry converted(Geometry geometry, DoubleUnaryOperator xy, DoubleUnaryOperator z) {
        Geometry copy = geometry.copy();
        copy.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence sequence, int i) {
                sequence.setOrdinate(i, CoordinateSequence.X, xy.applyAsDouble(sequence.getX(i)));
                sequence.setOrdinate(i, CoordinateSequence.Y, xy.applyAsDouble(sequence.getY(i)));
                if (sequence.hasZ()) {
                    sequence.setOrdinate(i, CoordinateSequence.Z, z.applyAsDouble(sequence.getZ(i)));
                }
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        return copy;
    }
}
