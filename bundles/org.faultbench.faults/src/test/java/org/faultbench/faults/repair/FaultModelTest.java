package org.faultbench.faults.repair;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.BellProfile;
import org.faultbench.faults.qc.FaultQcContext;
import org.faultbench.faults.qc.TestFaults;
import org.faultbench.faults.scaling.DisplacementLengthData;
import org.faultbench.faults.scaling.DisplacementLengthPoint;
import org.junit.jupiter.api.Test;

class FaultModelTest {

    private static CutOffLine line(String horizon, Wall wall, double depth) {
        return new CutOffLine("f1", horizon, wall, new double[] {0, 1000}, new double[] {depth, depth});
    }

    @Test
    void cutOffPairsComeInStratigraphicOrderForHorizonsMappedOnBothWalls() {
        FaultModel model = new FaultModel(List.of("Top A", "Base A", "Top B"));
        model.addFault(TestFaults.eastWest("f1", 0, 0, 1000));
        model.putCutOff(line("Base A", Wall.FOOTWALL, 1100));
        model.putCutOff(line("Base A", Wall.HANGING_WALL, 1150));
        model.putCutOff(line("Top A", Wall.HANGING_WALL, 1050));
        model.putCutOff(line("Top A", Wall.FOOTWALL, 1000));
        model.putCutOff(line("Top B", Wall.FOOTWALL, 1300));
        assertEquals(List.of("Top A", "Base A"), model.cutOffPairs("f1").stream().map(p -> p.horizon()).toList(),
                "Top B has no hanging-wall line");
        model.putCutOff(line("Top A", Wall.HANGING_WALL, 1060));
        assertEquals(60, model.throwProfiles("f1").get(0).throwAtU(500), 1e-9, "the new line replaced the old");
    }

    @Test
    void everyFaultsProfilesFeedTheDisplacementLengthPlot() {
        FaultModel model = TwoSegmentModel.create();
        model.addFault(TestFaults.eastWest("bare", 0, 9000, 1000));
        DisplacementLengthData data = DisplacementLengthData.collect(model.throwProfilesByFault(), new BellProfile());
        assertEquals(List.of("f1"), data.points().stream().map(DisplacementLengthPoint::faultId).toList());
        // the fitted bell spans the larger (+80 m) segment: throw near 80 m (hand construction of the synthetic data)
        assertEquals(80, data.points().get(0).maxThrow(), 10);
        assertEquals(1, data.skipped().size(), "the fault without cut-offs");
    }

    @Test
    void qcContextCarriesTheOtherFaultsAndTheGrowthFlag() {
        FaultModel model = new FaultModel(List.of("Top A"));
        model.addFault(TestFaults.eastWest("f1", 0, 0, 1000));
        model.addFault(TestFaults.eastWest("f2", 0, 500, 1000));
        assertFalse(model.isGrowthFault("f1"));
        model.setGrowthFault("f1", true);
        FaultQcContext ctx = model.qcContext("f1", null);
        assertTrue(ctx.isGrowthFault());
        assertEquals("f2", ctx.otherFaults().get(0).id());
        assertEquals(1, ctx.otherFaults().size());
    }

    @Test
    void unknownHorizonsFaultsAndTakenIdsAreRejected() {
        FaultModel model = new FaultModel(List.of("Top A"));
        model.addFault(TestFaults.eastWest("f1", 0, 0, 1000));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> model.putCutOff(line("Top Z", Wall.FOOTWALL, 1000)));
        assertTrue(e.getMessage().contains("Top Z"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> model.addFault(TestFaults.eastWest("f1", 0, 9, 10)));
        e = assertThrows(IllegalArgumentException.class, () -> model.fault("nope"));
        assertTrue(e.getMessage().contains("nope"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new FaultModel(List.of("Top A", "Top A")));
    }
}
