package org.faultbench.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class LengthUnitTest {

    @Test
    void internationalFootIsExactly0point3048Metre() {
        // NIST SP 811 (2008), Appendix B.8: foot = 3.048 E-01 m (exact)
        assertEquals(0.3048, LengthUnit.FOOT.toMetres(1), 0);
        assertEquals(10_000 * 0.3048, LengthUnit.FOOT.toMetres(10_000), 1e-9);
        // 1000 m = 3280.84 ft (hand calculation from the exact definition)
        assertEquals(3280.84, LengthUnit.FOOT.fromMetres(1000), 0.005);
    }

    @Test
    void metreIsTheInternalUnit() {
        assertEquals(1234.5, LengthUnit.METRE.toMetres(1234.5), 0);
        assertEquals("m", LengthUnit.METRE.symbol());
        assertEquals("ft", LengthUnit.FOOT.symbol());
    }
}
