package org.faultbench.digitize.crs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Look-up by EPSG code: names and units as registered in the EPSG Geodetic Parameter Dataset (IOGP). */
class CoordinateSystemsTest {
    @Test
    void projectedSystemHasItsEpsgNameAndMetres() {
        CoordinateSystem grid = CoordinateSystems.byEpsg(27700);
        assertEquals(27700, grid.epsgCode());
        // EPSG Geodetic Parameter Dataset, code 27700
        assertEquals("OSGB 1936 / British National Grid", grid.name());
        assertEquals("metre", grid.units());
        assertEquals("EPSG:27700", grid.code());
    }

    @Test
    void utmZoneIsNamedAfterDatumAndZone() {
        // EPSG Geodetic Parameter Dataset, code 32631
        assertEquals("WGS 84 / UTM zone 31N", CoordinateSystems.byEpsg(32631).name());
    }

    @Test
    void geographicSystemIsInDegrees() {
        CoordinateSystem wgs84 = CoordinateSystems.byEpsg(4326);
        // EPSG Geodetic Parameter Dataset, code 4326
        assertEquals("WGS 84", wgs84.name());
        assertEquals("degree", wgs84.units());
    }

    @Test
    void statePlaneSystemIsInUsSurveyFeet() {
        CoordinateSystem texas = CoordinateSystems.byEpsg(32040);
        // EPSG Geodetic Parameter Dataset, code 32040: axes in US survey feet
        assertEquals("NAD27 / Texas South Central", texas.name());
        assertEquals("U.S. foot", texas.units());
    }

    @Test
    void sameCodeGivesEqualSystems() {
        assertEquals(CoordinateSystems.byEpsg(32631), CoordinateSystems.byEpsg(32631));
    }

    @Test
    void unknownCodeIsRefusedByNumber() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CoordinateSystems.byEpsg(999_999));
        assertTrue(e.getMessage().contains("999999"), e.getMessage());
    }

    @Test
    void nonPositiveCodeIsRefusedByNumber() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CoordinateSystems.byEpsg(-5));
        assertTrue(e.getMessage().contains("-5"), e.getMessage());
    }
}
