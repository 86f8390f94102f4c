package org.faultbench.faults.repair;

import java.util.List;

import org.faultbench.faults.profile.CutOffPair;
import org.faultbench.faults.qc.TestFaults;

/**
 * A model holding fault "f1": two opposite-dipping segments (throw +80 m on u in [0, 2000], -60 m on [2000, 4000])
 * correlated into one 4 km trace along x, mapped on horizons "Top A" (footwall 1000 m) and "Base A" (1100 m), with
 * cut-off stations every 100 m.
 */
final class TwoSegmentModel {

    private TwoSegmentModel() {
    }

    static FaultModel create() {
        FaultModel model = new FaultModel(List.of("Top A", "Base A"));
        model.addFault(TestFaults.eastWest("f1", 0, 0, 4000));
        double[] u = TestFaults.stations(0, 4000, 100);
        for (CutOffPair pair : List.of(TestFaults.pair("f1", "Top A", 1000, u, TestFaults.twoOppositeSegments()),
                TestFaults.pair("f1", "Base A", 1100, u, TestFaults.twoOppositeSegments()))) {
            model.putCutOff(pair.footwall());
            model.putCutOff(pair.hangingWall());
        }
        return model;
    }
}
