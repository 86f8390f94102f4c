package org.faultbench.faults;

import java.util.Optional;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateArrays;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.linearref.LengthIndexedLine;

/**
 * A mapped fault: its map trace, dip and sense of throw. The along-strike coordinate u of the fault plane is the
 * distance along the trace from its first point, so Allan diagrams and throw profiles share one abscissa.
 *
 * <p>The hanging wall is the block on the dip-direction side of the trace. For a vertical fault the plane has no
 * geometric hanging wall; the dip azimuth then only names the side treated as hanging wall (for a normal fault, the
 * downthrown side) and sets no plane geometry.
 */
public final class Fault {

    /** Smallest angle between dip direction and trace direction that still tells one side of the trace. */
    private static final double MIN_DIP_TO_TRACE_ANGLE_DEGREES = 10;

    private final String id;
    private final String name;
    private final LineString trace;
    private final LengthIndexedLine along;
    private final double dipDegrees;
    private final double dipAzimuthDegrees;
    private final boolean normal;
    private final int hangingWallSide;

    /**
     * @param id unique identifier
     * @param name display name, used in messages
     * @param trace map trace (x, y); repeated consecutive points are dropped, at least two distinct points remain
     * @param dipDegrees dip in degrees, 0 &lt; dip &le; 90 (90 = vertical)
     * @param dipAzimuthDegrees dip direction, degrees clockwise from map north (+y); must point to one side of the
     *     trace
     * @param normal whether the hanging wall moved down (normal fault) rather than up (reverse fault)
     */
    public Fault(String id, String name, LineString trace, double dipDegrees, double dipAzimuthDegrees, boolean normal) {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("fault id is empty");
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("fault '" + id + "': name is empty");
        }
        this.id = id;
        this.name = name;
        this.trace = cleanTrace(trace);
        this.along = new LengthIndexedLine(this.trace);
        this.dipDegrees = checkDip(dipDegrees);
        this.dipAzimuthDegrees = checkAzimuth(dipAzimuthDegrees);
        this.normal = normal;
        this.hangingWallSide = dipSide();
    }

    private LineString cleanTrace(LineString raw) {
        if (raw == null) {
            throw new IllegalArgumentException("fault '" + name + "': trace is missing");
        }
        Coordinate[] points = CoordinateArrays.removeRepeatedPoints(raw.getCoordinates());
        for (int i = 0; i < points.length; i++) {
            if (!Double.isFinite(points[i].x) || !Double.isFinite(points[i].y)) {
                throw new IllegalArgumentException("fault '" + name + "': trace point " + i + " has a non-finite"
                        + " coordinate (" + points[i].x + ", " + points[i].y + ")");
            }
        }
        if (points.length < 2) {
            throw new IllegalArgumentException("fault '" + name + "': trace needs at least two distinct points, has "
                    + points.length);
        }
        return new GeometryFactory(raw.getPrecisionModel(), raw.getSRID()).createLineString(points);
    }

    private double checkDip(double dip) {
        if (!(dip > 0 && dip <= 90)) {
            throw new IllegalArgumentException("fault '" + name + "': dip must be in (0, 90] degrees, was " + dip);
        }
        return dip;
    }

    private double checkAzimuth(double azimuth) {
        if (!Double.isFinite(azimuth)) {
            throw new IllegalArgumentException("fault '" + name + "': dip azimuth must be a finite number of degrees, was "
                    + azimuth);
        }
        double normalised = azimuth % 360;
        return normalised < 0 ? normalised + 360 : normalised;
    }

    /** Side of the trace (walking from its first point) that the dip direction points to. */
    private int dipSide() {
        Coordinate start = trace.getCoordinateN(0);
        Coordinate end = trace.getCoordinateN(trace.getNumPoints() - 1);
        double tx = end.x - start.x;
        double ty = end.y - start.y;
        double chord = Math.hypot(tx, ty);
        if (chord == 0) {
            throw new IllegalArgumentException("fault '" + name + "': trace starts and ends at the same point, so the"
                    + " dip side cannot be told");
        }
        double azimuth = Math.toRadians(dipAzimuthDegrees);
        double sine = (tx * Math.cos(azimuth) - ty * Math.sin(azimuth)) / chord;
        if (Math.abs(sine) < Math.sin(Math.toRadians(MIN_DIP_TO_TRACE_ANGLE_DEGREES))) {
            throw new IllegalArgumentException("fault '" + name + "': dip azimuth " + dipAzimuthDegrees
                    + " degrees runs along the trace; it must point to one side of it");
        }
        return sine > 0 ? Orientation.LEFT : Orientation.RIGHT;
    }

    public String id() {
        return id;
    }

    public String name() {
        return name;
    }

    /** A copy of the cleaned map trace. */
    public LineString trace() {
        return (LineString) trace.copy();
    }

    public double dipDegrees() {
        return dipDegrees;
    }

    /** Dip direction in [0, 360) degrees clockwise from map north. */
    public double dipAzimuthDegrees() {
        return dipAzimuthDegrees;
    }

    public boolean isVertical() {
        return dipDegrees == 90;
    }

    /** Whether the hanging wall moved down, so that throw (hanging-wall minus footwall cut-off depth) is positive. */
    public boolean isNormal() {
        return normal;
    }

    /** Trace length: the range of u is [0, length()]. */
    public double length() {
        return trace.getLength();
    }

    /** Map position (x, y) of the trace point at along-strike distance {@code u}. */
    public Coordinate positionAt(double u) {
        return along.extractPoint(checkU(u));
    }

    /**
     * Map position at along-strike distance {@code u}, moved {@code distance} horizontally off the trace,
     * perpendicular to the trace segment at u, onto {@code wall}.
     */
    public Coordinate positionAt(double u, Wall wall, double distance) {
        if (!(distance >= 0) || Double.isInfinite(distance)) {
            throw new IllegalArgumentException("fault '" + name + "': offset from the trace must be a finite number"
                    + " >= 0, was " + distance);
        }
        int side = wall == Wall.HANGING_WALL ? hangingWallSide : -hangingWallSide;
        return along.extractPoint(checkU(u), side == Orientation.LEFT ? distance : -distance);
    }

    /** Along-strike distance u of the trace point nearest to map point (x, y). */
    public double project(double x, double y) {
        return along.project(new Coordinate(x, y));
    }

    /** Wall on which map point (x, y) lies; empty on the trace or on the prolongation of its end segments. */
    public Optional<Wall> wallAt(double x, double y) {
        int side = TraceSide.of(trace.getCoordinates(), new Coordinate(x, y));
        if (side == Orientation.COLLINEAR) {
            return Optional.empty();
        }
        return Optional.of(side == hangingWallSide ? Wall.HANGING_WALL : Wall.FOOTWALL);
    }

    private double checkU(double u) {
        double length = length();
        double tolerance = 1e-9 * Math.max(1, length);
        if (!(u >= -tolerance && u <= length + tolerance)) {
            throw new IllegalArgumentException("fault '" + name + "': along-strike distance u = " + u
                    + " is outside the trace [0, " + length + "]");
        }
        return Math.min(Math.max(u, 0), length);
    }

    @Override
    public String toString() {
        return "Fault[" + id + " '" + name + "', dip " + dipDegrees + " towards " + dipAzimuthDegrees
                + (normal ? ", normal]" : ", reverse]");
    }
}
