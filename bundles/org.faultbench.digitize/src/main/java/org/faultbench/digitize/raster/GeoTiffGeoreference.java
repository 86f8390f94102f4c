package org.faultbench.digitize.raster;

import java.util.Optional;

import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.plugins.tiff.GeoTIFFTagSet;
import javax.imageio.plugins.tiff.TIFFDirectory;
import javax.imageio.plugins.tiff.TIFFField;

import org.faultbench.digitize.georef.WorldFile;

/**
 * The affine georeference held in the GeoTIFF tags of a TIFF file, expressed as the equivalent world file so that a
 * georeferenced TIFF and a TIFF with a ".tfw" beside it reach the workbench in the same form.
 * <p>
 * Tags read (GeoTIFF Format Specification rev. 1.0, Ritter &amp; Ruth 1995, sec. 2.6.1 and 2.5.2.2; OGC GeoTIFF
 * 1.1, 2019; from memory): ModelPixelScale (33550) with one ModelTiepoint (33922), or ModelTransformation (34264);
 * GTRasterTypeGeoKey (1025) in the GeoKeyDirectory (34735) tells whether raster coordinates name pixel corners
 * (PixelIsArea, the default) or pixel centres (PixelIsPoint).
 * <p>
 * Half-pixel shift: a world file's C, F locate the <em>centre</em> of the upper-left pixel, whereas in PixelIsArea
 * raster space the raster point (0, 0) is the upper-left <em>corner</em> of that pixel and its centre is (0.5, 0.5).
 * So for PixelIsArea the world file origin is the model position of raster point (0.5, 0.5); for PixelIsPoint it is
 * that of (0, 0). Several tie points without a pixel scale describe a rubber-sheet, not an affine transform, and are
 * not converted (georeference such a scan with control points instead).
 */
public final class GeoTiffGeoreference {
    private static final int GEO_KEY_RASTER_TYPE = 1025;
    private static final int RASTER_PIXEL_IS_POINT = 2;
    private static final int GEO_KEY_HEADER_LENGTH = 4;
    private static final int GEO_KEY_ENTRY_LENGTH = 4;
    private static final int TIEPOINT_LENGTH = 6;
    private static final int MATRIX_LENGTH = 16;

    /** What an integer raster coordinate names in GeoTIFF raster space. */
    public enum RasterSpace {
        /** Raster point (i, j) is the upper-left corner of pixel (i, j); the GeoTIFF default. */
        PIXEL_IS_AREA,
        /** Raster point (i, j) is the centre of pixel (i, j). */
        PIXEL_IS_POINT
    }

    private GeoTiffGeoreference() {
    }

    /**
     * The world file equivalent to the GeoTIFF tags in TIFF image metadata (native format
     * "javax_imageio_tiff_image_1.0"), or empty when the tags are absent or do not describe an affine transform.
     *
     * @throws IIOInvalidTreeException when the metadata is not TIFF image metadata
     */
    public static Optional<WorldFile> fromMetadata(IIOMetadata tiffMetadata) throws IIOInvalidTreeException {
        TIFFDirectory directory = TIFFDirectory.createFromMetadata(tiffMetadata);
        RasterSpace space = rasterSpace(directory.getTIFFField(GeoTIFFTagSet.TAG_GEO_KEY_DIRECTORY));
        TIFFField matrix = directory.getTIFFField(GeoTIFFTagSet.TAG_MODEL_TRANSFORMATION);
        if (matrix != null) {
            return Optional.of(fromModelTransformation(matrix.getAsDoubles(), space));
        }
        TIFFField scale = directory.getTIFFField(GeoTIFFTagSet.TAG_MODEL_PIXEL_SCALE);
        TIFFField tiepoints = directory.getTIFFField(GeoTIFFTagSet.TAG_MODEL_TIE_POINT);
        if (scale == null || tiepoints == null) {
            return Optional.empty();
        }
        return Optional.of(fromScaleAndTiepoint(scale.getAsDoubles(), tiepoints.getAsDoubles(), space));
    }

    /**
     * World file from ModelPixelScale (Sx, Sy, Sz) and the first ModelTiepoint (I, J, K, X, Y, Z):
     * X = (i − I)·Sx + X0, Y = −(j − J)·Sy + Y0 (Sy positive for a north-up map).
     */
    public static WorldFile fromScaleAndTiepoint(double[] pixelScale, double[] tiepoint, RasterSpace space) {
        requireLength("ModelPixelScale", pixelScale, 2);
        requireLength("ModelTiepoint", tiepoint, TIEPOINT_LENGTH);
        double sx = pixelScale[0];
        double sy = pixelScale[1];
        return worldFile(sx, 0, tiepoint[3] - tiepoint[0] * sx, 0, -sy, tiepoint[4] + tiepoint[1] * sy, space);
    }

    /**
     * World file from the row-major 4×4 ModelTransformation matrix: X = m0·i + m1·j + m3, Y = m4·i + m5·j + m7 (the
     * raster K and model Z terms do not affect a map).
     */
    public static WorldFile fromModelTransformation(double[] matrix, RasterSpace space) {
        requireLength("ModelTransformation", matrix, MATRIX_LENGTH);
        return worldFile(matrix[0], matrix[1], matrix[3], matrix[4], matrix[5], matrix[7], space);
    }

    private static WorldFile worldFile(double a, double b, double x0, double d, double e, double y0,
            RasterSpace space) {
        double centre = space == RasterSpace.PIXEL_IS_AREA ? 0.5 : 0.0;
        return new WorldFile(a, d, b, e, x0 + (a + b) * centre, y0 + (d + e) * centre);
    }

    private static RasterSpace rasterSpace(TIFFField geoKeyDirectory) {
        if (geoKeyDirectory == null) {
            return RasterSpace.PIXEL_IS_AREA;
        }
        int count = geoKeyDirectory.getCount();
        for (int i = GEO_KEY_HEADER_LENGTH; i + GEO_KEY_ENTRY_LENGTH <= count; i += GEO_KEY_ENTRY_LENGTH) {
            boolean valueInline = geoKeyDirectory.getAsInt(i + 1) == 0;
            if (geoKeyDirectory.getAsInt(i) == GEO_KEY_RASTER_TYPE && valueInline) {
                return geoKeyDirectory.getAsInt(i + 3) == RASTER_PIXEL_IS_POINT
                        ? RasterSpace.PIXEL_IS_POINT
                        : RasterSpace.PIXEL_IS_AREA;
            }
        }
        return RasterSpace.PIXEL_IS_AREA;
    }

    private static void requireLength(String tag, double[] values, int minimum) {
        if (values.length < minimum) {
            throw new IllegalArgumentException("GeoTIFF tag " + tag + " needs at least " + minimum
                    + " values, found " + values.length);
        }
    }
}
