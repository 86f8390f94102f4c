package org.faultbench.digitize.raster;

/** Where a raster's georeference came from, shown to the user so a surprising placement can be traced. */
public enum GeoreferenceOrigin {
    /** No georeference: the scan must be georeferenced with control points. */
    NONE,
    /** A world file beside the image. */
    WORLD_FILE,
    /** GeoTIFF tags inside the TIFF file. */
    GEOTIFF_TAGS
}
