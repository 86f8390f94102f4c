package org.faultbench.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class VolumeUnitTest {

    @Test
    void barrelIs42UsGallons() {
        // NIST SP 811 (2008), Appendix B.8: barrel (for petroleum, 42 gallons (U.S.)) = 1.589 873 E-01 m3
        assertEquals(0.1589873, VolumeUnit.BARREL.toCubicMetres(1), 5e-8);
        // 42 gal x 231 in3 x (0.0254 m)^3 = 0.158987294928 m3 (exact from the gallon and inch definitions)
        assertEquals(0.158987294928, VolumeUnit.BARREL.toCubicMetres(1), 1e-15);
    }

    @Test
    void oneCubicMetreIs6point2898Barrels() {
        // 1 / 0.158987294928 = 6.2898 bbl (arithmetic from the NIST factor)
        assertEquals(6.2898, VolumeUnit.BARREL.fromCubicMetres(1), 0.00005);
        assertEquals(1, VolumeUnit.CUBIC_METRE.toCubicMetres(1), 0);
    }
}
