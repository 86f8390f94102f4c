package org.faultbench.strat;

import org.faultbench.core.column.ReservoirProperties;
import static org.faultbench.core.uncertain.UncertainValue.fixed;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.uncertain.UncertainValue;
import org.junit.jupiter.api.Test;

class StratigraphyTest {

    private static final StratUnit CAP = StratUnit.nonReservoir("Cap shale", LithologyClass.SEAL, fixed(30),
            UncertainValue.uniform(0.7, 0.9));
    private static final StratUnit SAND = StratUnitTest.sand("Sand A", UncertainValue.triangular(40, 50, 90),
            fixed(0.2));
    private static final StratUnit BASE = StratUnit.nonReservoir("Base shale", LithologyClass.SEAL,
            UncertainValue.uniform(10, 20), fixed(0.8));

    private final Stratigraphy strat = new Stratigraphy(List.of(CAP, SAND, BASE), 1);

    @Test
    void nominalColumnUsesTheMeanOfEachInput() {
        ResolvedColumn column = strat.nominal();
        assertEquals(3, column.size());
        assertEquals(0.8, column.unit(0).clayFraction(), 1e-12);
        assertEquals(60, column.unit(1).thickness(), 1e-12, "triangular mean (40 + 50 + 90) / 3");
        assertEquals(30 + 60 + 15, column.thickness(), 1e-12);
        assertEquals(30, column.top(strat.referenceUnitIndex()), 0, "reference horizon at the top of Sand A");
        assertEquals("Sand A", strat.referenceUnit().name());
    }

    @Test
    void sampleDrawsThicknessThenClayFractionUnitByUnit() {
        RandomGenerator twin = new Well19937c(4);
        ResolvedColumn column = strat.sample(new Well19937c(4));
        twin.nextDouble();                                   // cap shale thickness (fixed, still one draw)
        assertEquals(0.7 + 0.2 * twin.nextDouble(), column.unit(0).clayFraction(), 1e-12);
        assertEquals(SAND.thickness().quantile(twin.nextDouble()), column.unit(1).thickness(), 1e-12);
        twin.nextDouble();                                   // sand clay fraction
        assertEquals(10 + 10 * twin.nextDouble(), column.unit(2).thickness(), 1e-12);
    }

    @Test
    void sameSeedReproducesTheColumnAndTheReservoirProperties() {
        ResolvedColumn first = strat.sample(new Well19937c(12));
        ResolvedColumn second = strat.sample(new Well19937c(12));
        assertEquals(first.units(), second.units());
        assertEquals(strat.sampleReservoirProperties(new Well19937c(5)),
                strat.sampleReservoirProperties(new Well19937c(5)));
        assertEquals(3, strat.nominalReservoirProperties().size());
    }

    @Test
    void thicknessModelIsTheSeamForIsochores() {
        Stratigraphy doubled = strat.withThicknessModel(unit -> fixed(2 * unit.thickness().nominal()));
        assertEquals(2 * strat.nominal().thickness(), doubled.nominal().thickness(), 1e-9);
        assertEquals(ConstantThickness.INSTANCE, strat.thicknessModel());
    }

    @Test
    void duplicateNamesAreRejectedIgnoringCase() {
        StratUnit again = StratUnit.nonReservoir("sand a ", LithologyClass.SEAL, fixed(5), fixed(0.5));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Stratigraphy(List.of(CAP, SAND, again), 0));
        assertEquals("stratigraphy: unit name 'sand a ' is used twice (positions 2 and 3)", e.getMessage());
    }

    @Test
    void referenceIndexMustNameAUnit() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Stratigraphy(List.of(CAP, SAND), 2));
        assertEquals("stratigraphy: reference unit index must be in 0..1, was 2", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Stratigraphy(List.of(), 0));
        assertThrows(IllegalArgumentException.class, () -> new Stratigraphy(List.of(CAP), 0, null));
    }

    @Test
    void wellTopsOutOfOrderAreDetected() {
        assertDoesNotThrow(() -> strat.validateTopsOrder(Map.of("Cap shale", 1500.0, "Base shale", 1600.0)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> strat.validateTopsOrder(Map.of("Cap shale", 1500.0, "Sand A", 1450.0)));
        assertEquals("units out of order: top of unit 'Sand A' at 1450.0 m is shallower than top of unit "
                + "'Cap shale' at 1500.0 m, which lies above it in the stratigraphy", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> strat.validateTopsOrder(Map.of("Chalk", 1500.0)));
        assertThrows(IllegalArgumentException.class, () -> strat.validateTopsOrder(Map.of("Sand A", Double.NaN)));
        assertThrows(IllegalArgumentException.class,
                () -> strat.validateTopsOrder(Map.of("Sand A", 1500.0, "SAND A", 1510.0)));
    }

    @Test
    void indexOfFindsUnitsByName() {
        assertEquals(2, strat.indexOf(" base SHALE"));
        assertEquals(-1, strat.indexOf("Chalk"));
    }
}
