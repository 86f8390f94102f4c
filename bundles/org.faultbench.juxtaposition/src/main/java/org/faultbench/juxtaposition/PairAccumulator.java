package org.faultbench.juxtaposition;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.faultbench.faults.FaultPlaneColumns;

/**
 * Sums juxtaposition intervals per (footwall unit, hanging-wall unit) pair over the fault-plane columns and cuts each
 * pair's columns into windows (runs of adjacent columns), tracking each window's shallowest top. State is held in
 * arrays indexed by pair so adding an interval allocates nothing.
 */
final class PairAccumulator {

    private static final int NO_RUN = -2;

    private final FaultPlaneColumns columns;
    private final HungColumns walls;
    private final int hangingWallSpan;
    private final double[] pairArea;
    private final int[] runFirst;
    private final int[] runLast;
    private final double[] runArea;
    private final double[] runTop;
    private final int[] runTopColumn;
    private final List<JuxtapositionWindow> windows = new ArrayList<>();

    PairAccumulator(FaultPlaneColumns columns, HungColumns walls) {
        this.columns = columns;
        this.walls = walls;
        this.hangingWallSpan = walls.hangingWall().size() + 2;
        int pairs = (walls.footwall().size() + 2) * hangingWallSpan;
        this.pairArea = new double[pairs];
        this.runFirst = new int[pairs];
        this.runLast = new int[pairs];
        this.runArea = new double[pairs];
        this.runTop = new double[pairs];
        this.runTopColumn = new int[pairs];
        Arrays.fill(runFirst, NO_RUN);
    }

    /** Adds every interval of fault-plane column {@code column}; columns must come in increasing order. */
    void add(int column, ColumnIntervals intervals) {
        for (int n = 0; n < intervals.count(); n++) {
            int pair = (intervals.footwallUnit(n) + 1) * hangingWallSpan + intervals.hangingWallUnit(n) + 1;
            double area = intervals.length(n) * columns.width();
            pairArea[pair] += area;
            if (runFirst[pair] == NO_RUN || runLast[pair] != column - 1) {
                closeRun(pair);
                runFirst[pair] = column;
                runArea[pair] = 0;
                runTop[pair] = Double.POSITIVE_INFINITY;
            }
            runLast[pair] = column;
            runArea[pair] += area;
            if (intervals.top(n) < runTop[pair]) {
                runTop[pair] = intervals.top(n);
                runTopColumn[pair] = column;
            }
        }
    }

    double[] pairAreas() {
        return pairArea.clone();
    }

    /** Closes the open runs and returns every window found. */
    List<JuxtapositionWindow> windows() {
        for (int pair = 0; pair < runFirst.length; pair++) {
            closeRun(pair);
        }
        return List.copyOf(windows);
    }

    private void closeRun(int pair) {
        if (runFirst[pair] == NO_RUN) {
            return;
        }
        int footwallUnit = pair / hangingWallSpan - 1;
        int hangingWallUnit = pair % hangingWallSpan - 1;
        HungColumn footwall = walls.footwall();
        HungColumn hangingWall = walls.hangingWall();
        windows.add(new JuxtapositionWindow(footwallUnit, hangingWallUnit,
                JuxtapositionClass.of(footwall.isReservoir(footwallUnit), hangingWall.isReservoir(hangingWallUnit)),
                isSelfJuxtaposed(footwallUnit, hangingWallUnit), runFirst[pair], runLast[pair], runArea[pair],
                new FaultPlanePoint(columns.u(runTopColumn[pair]), runTop[pair], runTopColumn[pair])));
        runFirst[pair] = NO_RUN;
    }

    private boolean isSelfJuxtaposed(int footwallUnit, int hangingWallUnit) {
        boolean real = footwallUnit >= 0 && footwallUnit < walls.footwall().size()
                && hangingWallUnit >= 0 && hangingWallUnit < walls.hangingWall().size();
        return real && walls.footwall().unitName(footwallUnit).equals(walls.hangingWall().unitName(hangingWallUnit));
    }
}
