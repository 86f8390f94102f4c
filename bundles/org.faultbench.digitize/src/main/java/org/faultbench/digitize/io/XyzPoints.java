package org.faultbench.digitize.io;

import java.util.List;

/**
 * The points of an XYZ file and how many rows were skipped for a null z, so that the user can see how much of the
 * file was used.
 *
 * @param points points in file order, metres
 * @param nullRows number of rows skipped because z was a null marker
 */
public record XyzPoints(List<XyzPoint> points, int nullRows) {

    public XyzPoints {
        if (points == null) {
            throw new IllegalArgumentException("point list missing");
        }
        if (nullRows < 0) {
            throw new IllegalArgumentException("null row count must be >= 0, was " + nullRows);
        }
        points = List.copyOf(points);
    }
}
