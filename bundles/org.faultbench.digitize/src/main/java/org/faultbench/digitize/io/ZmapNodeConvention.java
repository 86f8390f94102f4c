package org.faultbench.digitize.io;

/**
 * How the xmin, xmax, ymin, ymax of a ZMAP+ header relate to the grid nodes. Writers disagree, and a wrong guess
 * shifts the map by half a cell and changes the spacing, so the user chooses on import.
 */
public enum ZmapNodeConvention {
    /**
     * The bounds are the outer node positions: dx = (xmax - xmin) / (ncols - 1), first node at xmin. Most oil and gas
     * writers use this; it is the default.
     */
    PIXEL_IS_POINT(0),
    /**
     * The bounds are the outer cell edges: dx = (xmax - xmin) / ncols, first node half a cell inside, at
     * xmin + dx/2. The default of GDAL's ZMap driver.
     */
    PIXEL_IS_AREA(0.5);

    /** Distance from a bound to the outer node, in cells. */
    private final double inset;

    ZmapNodeConvention(double inset) {
        this.inset = inset;
    }

    /** Node spacing for {@code nodes} nodes between the bounds {@code min} and {@code max}. */
    double spacing(double min, double max, int nodes) {
        return (max - min) / (nodes - 1 + 2 * inset);
    }

    /** Position of the first node above the lower bound {@code min}. */
    double firstNode(double min, double spacing) {
        return min + inset * spacing;
    }

    /** Lower bound written for a first node at {@code firstNode}. */
    double lowerBound(double firstNode, double spacing) {
        return firstNode - inset * spacing;
    }

    /** Upper bound written for {@code nodes} nodes from {@code firstNode}. */
    double upperBound(double firstNode, double spacing, int nodes) {
        return firstNode + (nodes - 1 + inset) * spacing;
    }
}
