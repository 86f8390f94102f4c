package org.faultbench.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PhysicalConstantsTest {

    @Test
    void gravityValues() {
        // standard acceleration of gravity 9.806 65 m/s^2 (3rd CGPM 1901; NIST SP 811 (2008), Appendix B.8)
        assertEquals(9.80665, PhysicalConstants.STANDARD_GRAVITY, 0);
        // 9.81 m/s^2: rounded value of common practice, the Faultbench default
        assertEquals(9.81, PhysicalConstants.G, 0);
    }
}
