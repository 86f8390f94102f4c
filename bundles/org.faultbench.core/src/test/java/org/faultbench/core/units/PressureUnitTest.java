package org.faultbench.core.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PressureUnitTest {

    @Test
    void psiMatchesTheNistFactor() {
        // NIST SP 811 (2008), Appendix B.8: pound-force per square inch = 6.894 757 E+03 Pa
        assertEquals(6894.757, PressureUnit.PSI.toPascals(1), 0.0005);
        assertEquals(1, PressureUnit.PSI.fromPascals(6894.757), 1e-7);
    }

    @Test
    void barAndKilopascalAreDecimal() {
        // NIST SP 811 (2008), Appendix B.8: bar = 1.0 E+05 Pa (exact)
        assertEquals(1e5, PressureUnit.BAR.toPascals(1), 0);
        assertEquals(1.7408, PressureUnit.BAR.fromPascals(174_080), 1e-12);
        assertEquals(294.3, PressureUnit.KILOPASCAL.fromPascals(294_300), 1e-12);
        // SI prefix mega = 10^6 (SI Brochure, 9th ed. 2019, Table 7): 1 MPa = 10 bar
        assertEquals(10, PressureUnit.BAR.fromPascals(PressureUnit.MEGAPASCAL.toPascals(1)), 1e-12);
        // 1 bar = 14.5038 psi (arithmetic from the NIST factors)
        assertEquals(14.5038, PressureUnit.PSI.fromPascals(PressureUnit.BAR.toPascals(1)), 0.00005);
    }

    @Test
    void onePsiPerFootIs22point62KilopascalPerMetre() {
        // 6894.757 Pa / 0.3048 m = 22.6206 kPa/m (arithmetic from the NIST factors)
        double kilopascalPerMetre = PressureUnit.KILOPASCAL.fromPascals(PressureUnit.PSI.toPascals(1))
                / LengthUnit.FOOT.toMetres(1);
        assertEquals(22.6206, kilopascalPerMetre, 0.00005);
    }
}
