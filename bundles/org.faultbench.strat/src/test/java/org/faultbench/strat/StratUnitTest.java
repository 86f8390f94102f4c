package org.faultbench.strat;

import org.faultbench.core.column.ReservoirProperties;
import static org.faultbench.core.uncertain.UncertainValue.fixed;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.faultbench.core.LithologyClass;
import org.faultbench.core.uncertain.NormalValue;
import org.faultbench.core.uncertain.UncertainValue;
import org.junit.jupiter.api.Test;

class StratUnitTest {

    static StratUnit sand(String name, UncertainValue thickness, UncertainValue porosity) {
        return new StratUnit(name, LithologyClass.RESERVOIR, true, thickness, fixed(0.1), fixed(0.8), porosity,
                fixed(0.3), fixed(1.2));
    }

    @Test
    void negativeThicknessIsRejectedNamingUnitAndField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> sand("Sand A", fixed(-5), fixed(0.2)));
        assertEquals("unit 'Sand A' thickness: value -5.0 leaves the allowed range [0.0, +inf)", e.getMessage());
    }

    @Test
    void clayFractionOutsideZeroToOneIsRejectedNamingUnitAndField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StratUnit.nonReservoir("Shale", LithologyClass.SEAL, fixed(10), fixed(1.2)));
        assertTrue(e.getMessage().startsWith("unit 'Shale' clay fraction:"), e.getMessage());
    }

    @Test
    void formationVolumeFactorBelowOneIsRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new StratUnit("Sand", LithologyClass.RESERVOIR, true, fixed(10), fixed(0.1), fixed(0.8),
                        fixed(0.2), fixed(0.3), fixed(0.9)));
        assertTrue(e.getMessage().startsWith("unit 'Sand' oil formation volume factor:"), e.getMessage());
    }

    @Test
    void missingFieldsAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> sand("Sand", null, fixed(0.2)));
        assertThrows(IllegalArgumentException.class, () -> sand(" ", fixed(1), fixed(0.2)));
        assertThrows(IllegalArgumentException.class,
                () -> StratUnit.nonReservoir("Shale", null, fixed(10), fixed(0.9)));
    }

    @Test
    void normalInputsAreTruncatedToTheirPhysicalRange() {
        StratUnit unit = sand("Sand", UncertainValue.normal(5, 4), UncertainValue.normal(0.05, 0.1));
        assertEquals(new NormalValue(5, 4, 0, Double.POSITIVE_INFINITY), unit.thickness());
        assertEquals(new NormalValue(0.05, 0.1, 0, 1), unit.porosity());
        RandomGenerator rng = new Well19937c(21);
        for (int i = 0; i < 10_000; i++) {
            double phi = unit.sampleReservoirProperties(rng).porosity();
            assertTrue(phi >= 0 && phi <= 1, "porosity " + phi);
        }
    }

    @Test
    void reservoirPropertiesAreDrawnNetToGrossPorositySaturationBo() {
        StratUnit unit = new StratUnit("Sand", LithologyClass.RESERVOIR, true, fixed(10), fixed(0.1),
                UncertainValue.uniform(0.5, 0.9), UncertainValue.uniform(0.1, 0.3), UncertainValue.uniform(0.2, 0.4),
                UncertainValue.uniform(1.1, 1.5));
        RandomGenerator twin = new Well19937c(8);
        ReservoirProperties sampled = unit.sampleReservoirProperties(new Well19937c(8));
        assertEquals(0.5 + 0.4 * twin.nextDouble(), sampled.netToGross(), 1e-12);
        assertEquals(0.1 + 0.2 * twin.nextDouble(), sampled.porosity(), 1e-12);
        assertEquals(0.2 + 0.2 * twin.nextDouble(), sampled.waterSaturation(), 1e-12);
        assertEquals(1.1 + 0.4 * twin.nextDouble(), sampled.oilFormationVolumeFactor(), 1e-12);
        ReservoirProperties nominal = unit.nominalReservoirProperties();
        assertEquals(0.7, nominal.netToGross(), 1e-12, "uniform midpoints");
        assertEquals(0.2, nominal.porosity(), 1e-12);
        assertEquals(0.3, nominal.waterSaturation(), 1e-12);
        assertEquals(1.3, nominal.oilFormationVolumeFactor(), 1e-12);
    }

    @Test
    void nonReservoirUnitHoldsNoOil() {
        StratUnit shale = StratUnit.nonReservoir("Shale", LithologyClass.SEAL, fixed(10), fixed(0.9));
        assertEquals(0, shale.nominalReservoirProperties().stockTankOilPerRockVolume(), 0);
        assertEquals(false, shale.reservoir());
    }
}
