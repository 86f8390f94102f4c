package org.faultbench.digitize.sketch;

import java.math.BigDecimal;
import java.util.Locale;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;

/** Checks and formatting shared by the sheet features, so that every feature reports bad input the same way. */
final class SheetGeometry {
    static final GeometryFactory FACTORY = new GeometryFactory();

    private SheetGeometry() {
    }

    /** A private copy of {@code line}, which must have at least two points with finite x and y. */
    static LineString line(LineString line, String what) {
        if (line == null || line.getNumPoints() < 2) {
            throw new IllegalArgumentException(what + " needs a line of at least 2 points, was "
                    + (line == null ? "missing" : line.getNumPoints() + " point(s)"));
        }
        for (Coordinate c : line.getCoordinates()) {
            requireFinite(what, c.x, c.y);
        }
        return (LineString) line.copy();
    }

    static Point point(double x, double y, String what) {
        requireFinite(what, x, y);
        return FACTORY.createPoint(new Coordinate(x, y));
    }

    static String name(String name, String field) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException(field + " is empty");
        }
        return name.strip();
    }

    static <T> T required(T value, String field) {
        if (value == null) {
            throw new IllegalArgumentException(field + " is missing");
        }
        return value;
    }

    private static void requireFinite(String what, double x, double y) {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException(what + ": point must have finite x and y, was (" + x + ", " + y + ")");
        }
    }

    /** A depth as typed by a geologist: 1500, 1500.5 (no trailing zeros, no exponent). */
    static String number(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    /** A map position for messages, to 0.1 m. */
    static String position(Coordinate c) {
        return String.format(Locale.ROOT, "(%.1f, %.1f)", c.x, c.y);
    }
}
