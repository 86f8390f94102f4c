package org.faultbench.digitize.crs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The value record: checks of its fields and its text form. */
class CoordinateSystemTest {
    @Test
    void textNamesCodeNameAndUnits() {
        assertEquals("EPSG:32631 WGS 84 / UTM zone 31N (metre)",
                new CoordinateSystem(32631, "WGS 84 / UTM zone 31N", "metre").toString());
    }

    @Test
    void codeMustBePositive() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new CoordinateSystem(0, "none", "metre"));
        assertTrue(e.getMessage().contains("EPSG code") && e.getMessage().contains("0"), e.getMessage());
    }

    @Test
    void nameAndUnitsAreRequired() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new CoordinateSystem(4326, " ", "degree"))
                .getMessage().contains("name of EPSG:4326"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new CoordinateSystem(4326, "WGS 84", null))
                .getMessage().contains("units of EPSG:4326"));
    }
}
