package org.faultbench.juxtaposition;

import org.faultbench.faults.FaultPlaneColumns;

/**
 * Juxtaposition of a whole fault: runs the interval computation on every fault-plane column and sums areas and
 * windows per unit pair. Holds a reusable interval buffer, so keep one analyzer per thread and reuse it across
 * realisations; it is not thread-safe.
 */
public final class JuxtapositionAnalyzer {

    private final ColumnIntervals intervals = new ColumnIntervals();

    /** Juxtaposition of {@code walls} along {@code columns}; columns without cut-off data are skipped and counted. */
    public JuxtapositionResult analyze(FaultPlaneColumns columns, HungColumns walls) {
        PairAccumulator pairs = new PairAccumulator(columns, walls);
        int columnsWithoutData = 0;
        for (int k = 0; k < columns.count(); k++) {
            if (!columns.hasData(k)) {
                columnsWithoutData++;
                continue;
            }
            walls.juxtapose(columns.footwallDepth(k), columns.hangingWallDepth(k), intervals);
            pairs.add(k, intervals);
        }
        return new JuxtapositionResult(columns.faultId(), walls, pairs.pairAreas(), pairs.windows(),
                columnsWithoutData);
    }
}
