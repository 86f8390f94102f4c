package org.faultbench.digitize.crs;

import org.locationtech.proj4j.CoordinateReferenceSystem;

/** Looks up coordinate reference systems by EPSG code. */
public final class CoordinateSystems {
    private CoordinateSystems() {
    }

    /**
     * The coordinate reference system with EPSG code {@code code}.
     *
     * @throws IllegalArgumentException if the EPSG dataset shipped with proj4j has no such code
     */
    public static CoordinateSystem byEpsg(int code) {
        CoordinateReferenceSystem crs = EpsgDataset.crs(code);
        return new CoordinateSystem(code, EpsgDataset.name(code), crs.getProjection().getUnits().name);
    }
}
