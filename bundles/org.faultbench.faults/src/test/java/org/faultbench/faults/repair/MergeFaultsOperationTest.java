package org.faultbench.faults.repair;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.commands.operations.DefaultOperationHistory;
import org.eclipse.core.commands.operations.IOperationHistory;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.faults.qc.TestFaults;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

class MergeFaultsOperationTest {

    private final IOperationHistory history = new DefaultOperationHistory();

    @Test
    void mergingTheSplitPartsGivesBackTheThrowProfile() throws ExecutionException {
        FaultModel model = TwoSegmentModel.create();
        ThrowProfile original = model.throwProfiles("f1").get(1);
        history.execute(new SplitFaultOperation(model, "f1", 1234), null, null);
        history.execute(new MergeFaultsOperation(model, "f1-a", "f1-b", new FaultLabel("f1", "Rejoined")), null,
                null);
        assertEquals(List.of("f1"), model.faults().stream().map(Fault::id).toList());
        assertEquals(4000, model.fault("f1").length(), 1e-9);
        ThrowProfile merged = model.throwProfiles("f1").get(1);
        for (double u = 0; u <= 4000; u += 50) {
            assertEquals(original.throwAtU(u), merged.throwAtU(u), 1e-9, "throw at u = " + u);
        }
    }

    @Test
    void secondFaultDrawnTheOtherWayIsReversedAndPlacedBeyondTheGap() throws ExecutionException {
        FaultModel model = new FaultModel(List.of("Top A"));
        model.addFault(TestFaults.eastWest("w", 0, 0, 1000));
        // east segment digitised from east to west, 200 m beyond the west segment's end, same dip side (south)
        model.addFault(new Fault("e", "East", new GeometryFactory().createLineString(new Coordinate[] {
            new Coordinate(2000, 0), new Coordinate(1200, 0)}), 60, 180, true));
        model.putCutOff(new CutOffLine("e", "Top A", Wall.FOOTWALL, new double[] {0, 800}, new double[] {900, 1000}));
        history.execute(new MergeFaultsOperation(model, "w", "e"), null, null);
        Fault merged = model.fault("w");
        assertEquals(2000, merged.length(), 1e-9, "1000 m + 200 m gap + 800 m");
        CutOffLine line = model.cutOff("w", "Top A", Wall.FOOTWALL).orElseThrow();
        // old u = 0 (x = 2000) is now u = 2000, old u = 800 (x = 1200) is u = 1200 (hand construction)
        assertEquals(1000, line.depthAt(1200), 1e-9);
        assertEquals(900, line.depthAt(2000), 1e-9);
    }

    @Test
    void undoAndRedoRestoreBothFaultsInTheirPlaces() throws ExecutionException {
        FaultModel model = new FaultModel(List.of("Top A"));
        model.addFault(TestFaults.eastWest("a", 0, 0, 1000));
        model.addFault(TestFaults.eastWest("x", 0, 5000, 1000));
        model.addFault(TestFaults.eastWest("b", 1000, 0, 1000));
        history.execute(new MergeFaultsOperation(model, "a", "b"), null, null);
        assertEquals(List.of("a", "x"), model.faults().stream().map(Fault::id).toList());
        history.undo(model.undoContext(), null, null);
        assertEquals(List.of("a", "x", "b"), model.faults().stream().map(Fault::id).toList());
        assertEquals(1000, model.fault("a").length(), 1e-9);
        history.redo(model.undoContext(), null, null);
        assertEquals(2000, model.fault("a").length(), 1e-9);
    }

    @Test
    void faultsDippingTowardsOppositeSidesAreNotMerged() {
        FaultModel model = new FaultModel(List.of("Top A"));
        model.addFault(TestFaults.eastWest("a", 0, 0, 1000));
        model.addFault(new Fault("b", "North-dipping", new GeometryFactory().createLineString(new Coordinate[] {
            new Coordinate(1000, 0), new Coordinate(2000, 0)}), 60, 0, true));
        ExecutionException e = assertThrows(ExecutionException.class,
                () -> history.execute(new MergeFaultsOperation(model, "a", "b"), null, null));
        assertTrue(e.getMessage().contains("opposite"), e.getMessage());
        assertEquals(2, model.faults().size());
    }
}
