package org.faultbench.faults.repair;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
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
import org.faultbench.faults.qc.PolarityFlipRule;
import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.QcRuleCatalog;
import org.junit.jupiter.api.Test;

class SplitFaultOperationTest {

    private final IOperationHistory history = new DefaultOperationHistory();

    @Test
    void splittingAtTheFlaggedPolarityFlipClearsTheFlag() throws ExecutionException {
        FaultModel model = TwoSegmentModel.create();
        PolarityFlipRule rule = new PolarityFlipRule();
        List<QcFinding> flips = rule.check(model.qcContext("f1", null));
        assertEquals(2, flips.size(), "one flip per horizon: " + flips);
        double flip = flips.get(0).u();
        assertEquals(2000, flip, 100, "segments meet at u = 2000 m (hand construction)");

        history.execute(new SplitFaultOperation(model, "f1", flip), null, null);

        assertEquals(List.of("f1-a", "f1-b"), model.faults().stream().map(Fault::id).toList());
        assertEquals(List.of(), rule.check(model.qcContext("f1-a", null)));
        assertEquals(List.of(), rule.check(model.qcContext("f1-b", null)));
    }

    @Test
    void splitThenSwapOfTheReversePartLeavesNoFindingOfAnyBuiltInRule() throws ExecutionException {
        FaultModel model = TwoSegmentModel.create();
        QcRuleCatalog catalog = QcRuleCatalog.withBuiltIns();
        // before: polarity flip, footwall below hanging wall and a throw minimum (the relay), on both horizons
        assertEquals(6, model.check(catalog, null).size(), model.check(catalog, null).toString());
        history.execute(new SplitFaultOperation(model, "f1", 2000), null, null);
        history.execute(new SwapWallsOperation(model, "f1-b"), null, null);
        assertEquals(List.of(), model.check(catalog, null));
    }

    @Test
    void partsKeepTheGeometryAndCutOffsOnTheirOwnAlongStrikeDistance() throws ExecutionException {
        FaultModel model = TwoSegmentModel.create();
        ThrowProfile before = model.throwProfiles("f1").get(0);
        history.execute(new SplitFaultOperation(model, "f1", 2050), null, null);
        Fault second = model.fault("f1-b");
        assertEquals(2050, model.fault("f1-a").length(), 1e-9);
        assertEquals(1950, second.length(), 1e-9);
        assertEquals(60, second.dipDegrees(), 0);
        assertEquals(180, second.dipAzimuthDegrees(), 0);
        CutOffLine hangingWall = model.cutOff("f1-b", "Top A", Wall.HANGING_WALL).orElseThrow();
        assertEquals(0, hangingWall.minU(), 0, "u of the second part starts at the split");
        assertEquals(1950, hangingWall.maxU(), 1e-9);
        ThrowProfile after = model.throwProfiles("f1-b").get(0);
        for (double u : new double[] {0, 50, 950, 1950}) {
            assertEquals(before.throwAtU(u + 2050), after.throwAtU(u), 1e-9, "throw at old u = " + (u + 2050));
        }
    }

    @Test
    void undoRestoresTheOriginalFaultAndRedoTheParts() throws ExecutionException {
        FaultModel model = TwoSegmentModel.create();
        Fault original = model.fault("f1");
        CutOffLine line = model.cutOff("f1", "Base A", Wall.FOOTWALL).orElseThrow();
        history.execute(new SplitFaultOperation(model, "f1", 2000), null, null);
        assertTrue(history.canUndo(model.undoContext()));

        history.undo(model.undoContext(), null, null);
        assertEquals(List.of("f1"), model.faults().stream().map(Fault::id).toList());
        assertSame(original, model.fault("f1"));
        assertSame(line, model.cutOff("f1", "Base A", Wall.FOOTWALL).orElseThrow());

        history.redo(model.undoContext(), null, null);
        assertEquals(List.of("f1-a", "f1-b"), model.faults().stream().map(Fault::id).toList());
    }

    @Test
    void splitOutsideTheTraceFailsAndLeavesTheModelAlone() {
        FaultModel model = TwoSegmentModel.create();
        ExecutionException e = assertThrows(ExecutionException.class,
                () -> history.execute(new SplitFaultOperation(model, "f1", 4000), null, null));
        assertTrue(e.getMessage().contains("inside the trace"), e.getMessage());
        assertEquals(List.of("f1"), model.faults().stream().map(Fault::id).toList());
    }
}
