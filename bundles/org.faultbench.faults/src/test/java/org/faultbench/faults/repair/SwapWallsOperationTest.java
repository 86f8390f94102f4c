package org.faultbench.faults.repair;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;

import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.commands.operations.DefaultOperationHistory;
import org.eclipse.core.commands.operations.IOperationHistory;
import org.faultbench.faults.Fault;
import org.faultbench.faults.qc.QcRuleCatalog;
import org.faultbench.faults.qc.TestFaults;
import org.faultbench.faults.qc.WallOrderRule;
import org.junit.jupiter.api.Test;

class SwapWallsOperationTest {

    private final IOperationHistory history = new DefaultOperationHistory();

    private static FaultModel reversedWalls() {
        FaultModel model = new FaultModel(List.of("Top A"));
        model.addFault(TestFaults.eastWest("f1", 0, 0, 4000));
        var pair = TestFaults.pair("f1", "Top A", 1000, TestFaults.stations(0, 4000, 100),
                TestFaults.bell(-80, 2000, 2000));
        model.putCutOff(pair.footwall());
        model.putCutOff(pair.hangingWall());
        return model;
    }

    @Test
    void swappingTurnsTheDipAndTheSignOfThrow() throws ExecutionException {
        FaultModel model = reversedWalls();
        assertEquals(1, new WallOrderRule().check(model.qcContext("f1", null)).size());
        history.execute(new SwapWallsOperation(model, "f1"), null, null);
        assertEquals(0, model.fault("f1").dipAzimuthDegrees(), 1e-9, "180 + 180 degrees");
        assertEquals(80, model.throwProfiles("f1").get(0).throwAtU(2000), 1e-9);
        assertEquals(List.of(), QcRuleCatalog.withBuiltIns().check(model.qcContext("f1", null)));
    }

    @Test
    void undoAndRedoSwapBack() throws ExecutionException {
        FaultModel model = reversedWalls();
        Fault original = model.fault("f1");
        history.execute(new SwapWallsOperation(model, "f1"), null, null);
        history.undo(model.undoContext(), null, null);
        assertSame(original, model.fault("f1"));
        assertEquals(-80, model.throwProfiles("f1").get(0).throwAtU(2000), 1e-9);
        history.redo(model.undoContext(), null, null);
        assertEquals(80, model.throwProfiles("f1").get(0).throwAtU(2000), 1e-9);
    }
}
