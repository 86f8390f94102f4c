package org.faultbench.digitize.crs;

/**
 * A coordinate reference system identified by its EPSG code, as shown to the user and stored with a study. Obtain
 * one from {@link CoordinateSystems#byEpsg(int)}, which fills in the name and units from the EPSG dataset.
 * <p>
 * Axis order is always x = east, y = north: easting, northing for projected systems and longitude, latitude in
 * decimal degrees for geographic ones (proj4j's convention, whatever order the EPSG dataset gives the axes).
 *
 * @param epsgCode the EPSG code, e.g. 32631
 * @param name the EPSG name, e.g. "WGS 84 / UTM zone 31N"
 * @param units the unit of x and y, e.g. "metre", "degree" or "U.S. foot"
 */
public record CoordinateSystem(int epsgCode, String name, String units) {
    public CoordinateSystem {
        if (epsgCode <= 0) {
            throw new IllegalArgumentException("EPSG code must be positive, was " + epsgCode);
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("name of EPSG:" + epsgCode + " missing");
        }
        if (units == null || units.isBlank()) {
            throw new IllegalArgumentException("units of EPSG:" + epsgCode + " missing");
        }
    }

    /** The authority code as written in files and notes, e.g. "EPSG:32631". */
    public String code() {
        return EpsgDataset.AUTHORITY_PREFIX + epsgCode;
    }

    @Override
    public String toString() {
        return code() + " " + name + " (" + units + ")";
    }
}
