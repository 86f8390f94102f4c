package org.faultbench.seal.carbonate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.util.Optional;

import org.junit.jupiter.api.Test;

class FaultRockThresholdTableTest {

    private static final String HEADER = FaultRockThresholdTable.HEADER + "\n";
    private final FaultRockThresholdTable bundled = FaultRockThresholdTable.bundled();

    private static FaultRockThresholdTable parse(String text) throws IOException {
        return FaultRockThresholdTable.read(new StringReader(text), "mine.csv");
    }

    private static String error(String text) {
        return assertThrows(IllegalArgumentException.class, () -> parse(text)).getMessage();
    }

    @Test
    void bundledTableCoversEveryFaciesAndSaysWhereEachRowComesFrom() {
        assertEquals(7, bundled.rows().size());
        for (CarbonateFacies facies : CarbonateFacies.values()) {
            assertTrue(bundled.rows().stream().anyMatch(row -> row.facies() == facies), facies.key());
        }
        for (FaultRockThresholdRow row : bundled.rows()) {
            assertTrue(row.source().contains("from memory"), "every seed value is marked as from memory: " + row);
        }
    }

    @Test
    void porousGrainstoneGetsACataclasiteThreshold() {
        // seed row: cataclasite in porous grainstone, Michie et al. 2014 (JSG 65) texture, Agosta et al. 2007
        // (Geofluids 7); 1 / 5 / 20 bar is an order-of-magnitude reading (from memory)
        HostRock porous = new HostRock(CarbonateFacies.GRAINSTONE, 0.20);
        assertEquals(Optional.of(1e5), bundled.threshold(porous, ThresholdCase.MIN));
        assertEquals(Optional.of(5e5), bundled.threshold(porous, ThresholdCase.MODE));
        assertEquals(Optional.of(20e5), bundled.threshold(porous, ThresholdCase.MAX));
    }

    @Test
    void porosityBandsSplitAtTheirLowerBound() {
        // tight grainstone fractures as well as forming cataclasite (Michie et al. 2014, JSG 65): 1 bar mode
        // (from memory); the band [0, 0.15) ends where the porous band begins
        assertEquals(Optional.of(1e5),
                bundled.threshold(new HostRock(CarbonateFacies.GRAINSTONE, 0.1499), ThresholdCase.MODE));
        assertEquals(Optional.of(5e5),
                bundled.threshold(new HostRock(CarbonateFacies.GRAINSTONE, 0.15), ThresholdCase.MODE));
        assertEquals(Optional.of(5e5),
                bundled.threshold(new HostRock(CarbonateFacies.GRAINSTONE, 1.0), ThresholdCase.MODE));
    }

    @Test
    void micriteDominatedAndFracturingHostsEarnNoSealCredit() {
        // micrite-dominated hosts fracture and brecciate, fault zones are conduits (Michie et al. 2014, JSG 65);
        // dolomite and boundstone fracture (from memory)
        for (CarbonateFacies facies : new CarbonateFacies[] {CarbonateFacies.WACKESTONE_MUDSTONE,
                CarbonateFacies.DOLOMITE, CarbonateFacies.BOUNDSTONE}) {
            HostRock host = new HostRock(facies, 0.1);
            assertTrue(bundled.lookup(host).isPresent(), "the row exists and documents why: " + facies);
            assertEquals(Optional.empty(), bundled.threshold(host, ThresholdCase.MAX), facies.key());
        }
        assertEquals(Optional.empty(),
                bundled.threshold(new HostRock(CarbonateFacies.PACKSTONE, 0.05), ThresholdCase.MODE));
    }

    @Test
    void userTableWithCommentsAndCommasInTheSource() throws IOException {
        FaultRockThresholdTable table = parse("# my lab data\n" + HEADER
                + "dolomite,0,1,2,3,4,core plugs, well X-1, mercury injection\n");
        assertEquals("core plugs, well X-1, mercury injection", table.rows().get(0).source());
        assertEquals(Optional.of(3e5), table.threshold(new HostRock(CarbonateFacies.DOLOMITE, 0.3), ThresholdCase.MODE));
        assertEquals(Optional.empty(),
                table.threshold(new HostRock(CarbonateFacies.GRAINSTONE, 0.3), ThresholdCase.MODE),
                "a facies the table does not list earns no credit");
    }

    @Test
    void errorsNameTheFileLineAndField() {
        assertEquals("mine.csv: the table is empty; expected the header line \"" + FaultRockThresholdTable.HEADER
                + "\"", error("# nothing\n"));
        assertTrue(error("facies,min\n").startsWith("mine.csv:1: expected the header line"));
        assertEquals("mine.csv:2: facies: expected a facies, one of [grainstone, packstone, wackestone-mudstone, "
                + "boundstone, dolomite]; found 'oolite'", error(HEADER + "oolite,0,1,1,2,3,x\n"));
        assertEquals("mine.csv:2: porosity_max: expected a number, found \"high\"",
                error(HEADER + "dolomite,0,high,1,2,3,x\n"));
        assertEquals("mine.csv:2: threshold_mode_bar: expected a number, found \"\"",
                error(HEADER + "dolomite,0,1,1,,3,x\n"));
        assertEquals("mine.csv:2: thresholds: expected 0 <= min <= mode <= max bar, found 3.0, 2.0, 1.0",
                error(HEADER + "dolomite,0,1,3,2,1,x\n"));
        assertEquals("mine.csv:2: expected 7 fields (" + FaultRockThresholdTable.HEADER + "), found 3",
                error(HEADER + "dolomite,0,1\n"));
        assertEquals("mine.csv:2: source: a source is required", error(HEADER + "dolomite,0,1,1,2,3, \n"));
        assertTrue(error(HEADER + "dolomite,0.3,0.2,1,2,3,x\n").startsWith("mine.csv:2: porosity band must satisfy"));
        assertEquals("mine.csv:3: porosity band [0.1, 1.0) of dolomite overlaps the band of line 2",
                error(HEADER + "dolomite,0,0.2,1,2,3,x\ndolomite,0.1,1,1,2,3,y\n"));
    }
}
