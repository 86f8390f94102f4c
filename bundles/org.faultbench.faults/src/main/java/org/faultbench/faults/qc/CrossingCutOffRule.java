package org.faultbench.faults.qc;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.TreeSet;

import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.CutOffPair;

/**
 * Cut-off lines of successive horizons that cross on one wall: a deeper horizon above a shallower one on the same
 * block is impossible without overturning, so one of the lines is mis-picked or the horizons are mis-correlated
 * (common practice). Checked between stratigraphically successive horizons, which finds every crossing: if a
 * deeper line rises above a shallower one, it rises above its neighbour too. One finding per pair and wall, at the
 * first crossing.
 */
public final class CrossingCutOffRule implements FaultQcRule {

    public static final String ID = "crossing-cut-offs";

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Crossing cut-off lines";
    }

    @Override
    public List<QcFinding> check(FaultQcContext ctx) {
        List<QcFinding> findings = new ArrayList<>();
        List<CutOffPair> pairs = ctx.cutOffs();
        for (int k = 0; k + 1 < pairs.size(); k++) {
            for (Wall wall : Wall.values()) {
                CutOffLine upper = pairs.get(k).line(wall);
                CutOffLine lower = pairs.get(k + 1).line(wall);
                firstInversion(upper, lower).ifPresent(u -> findings.add(finding(ctx, upper, lower, u)));
            }
        }
        return findings;
    }

    /** First station (of either line) where the lower horizon's cut-off is shallower than the upper one's. */
    private static OptionalDouble firstInversion(CutOffLine upper, CutOffLine lower) {
        TreeSet<Double> stations = new TreeSet<>();
        for (CutOffLine line : new CutOffLine[] {upper, lower}) {
            for (int i = 0; i < line.stationCount(); i++) {
                stations.add(line.stationU(i));
            }
        }
        for (double u : stations) {
            if (lower.stationOrInterpolatedDepth(u) < upper.stationOrInterpolatedDepth(u)) {
                return OptionalDouble.of(u);
            }
        }
        return OptionalDouble.empty();
    }

    private QcFinding finding(FaultQcContext ctx, CutOffLine upper, CutOffLine lower, double u) {
        String wall = upper.wall() == Wall.FOOTWALL ? "footwall" : "hanging wall";
        String message = "On the " + wall + " at u = " + Numbers.metres(u) + " the cut-off of the deeper horizon '"
                + lower.horizon() + "' (" + Numbers.metres(lower.stationOrInterpolatedDepth(u))
                + ") lies above that of '" + upper.horizon() + "' ("
                + Numbers.metres(upper.stationOrInterpolatedDepth(u)) + "): the cut-off lines cross.";
        String suggestion = "Re-pick the " + wall + " cut-offs of '" + upper.horizon() + "' and '" + lower.horizon()
                + "' here, or check the horizon order and the wall each line was assigned to.";
        return new QcFinding(ID, Severity.ERROR, ctx.fault().id(), u, lower.horizon(), message, suggestion);
    }
}
