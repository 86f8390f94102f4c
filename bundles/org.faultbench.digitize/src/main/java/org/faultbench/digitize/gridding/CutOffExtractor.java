package org.faultbench.digitize.gridding;

import org.faultbench.core.grid.RegularGrid;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.linearref.LengthIndexedLine;

/**
 * Reads a gridded horizon just beside a fault trace on both sides, giving its footwall and hanging-wall cut-off
 * depths along the fault (common practice: horizon&ndash;fault intersection from gridded horizons).
 * <p>
 * Stations lie every {@code spacing} metres along the trace, plus its last point. At each station the surface is
 * read {@code offset} metres to the left and right of the trace (perpendicular to the segment at the station; JTS
 * {@link LengthIndexedLine}) with {@link SurfaceSampler}, so no value from across the fault is mixed in. The offset
 * should clear the fault polygon (heave) and the null nodes next to the trace, typically one to two node spacings.
 */
public final class CutOffExtractor {
    private final double spacing;
    private final double offset;

    /**
     * @param spacing distance between stations along the trace, metres, &gt; 0
     * @param offset distance from the trace at which the surface is read, metres, &gt; 0
     */
    public CutOffExtractor(double spacing, double offset) {
        if (!(spacing > 0) || Double.isInfinite(spacing)) {
            throw new IllegalArgumentException("cut-off station spacing must be a finite number > 0 m, was " + spacing);
        }
        if (!(offset > 0) || Double.isInfinite(offset)) {
            throw new IllegalArgumentException("cut-off sampling offset must be a finite number > 0 m, was " + offset);
        }
        this.spacing = spacing;
        this.offset = offset;
    }

    /**
     * @param horizon gridded horizon, metres
     * @param barriers the faults the horizon was gridded with; {@code trace} is added to them
     * @param trace the fault trace to sample along
     * @param footwall side of the trace on which the footwall lies
     */
    public CutOffSamples extract(RegularGrid horizon, FaultBarriers barriers, LineString trace,
            FootwallSide footwall) {
        if (horizon == null || barriers == null || trace == null || trace.isEmpty() || footwall == null) {
            throw new IllegalArgumentException("cut-off extraction needs a horizon, fault barriers, a non-empty trace"
                    + " and the footwall side");
        }
        SurfaceSampler sampler = new SurfaceSampler(horizon, barriers.withTrace(trace));
        LengthIndexedLine line = new LengthIndexedLine(trace);
        double length = line.getEndIndex();
        int stations = (int) Math.ceil(length / spacing - 1e-9) + 1;
        double[] u = new double[stations];
        double[] left = new double[stations];
        double[] right = new double[stations];
        for (int s = 0; s < stations; s++) {
            u[s] = Math.min(s * spacing, length);
            Coordinate l = line.extractPoint(u[s], offset);
            Coordinate r = line.extractPoint(u[s], -offset);
            left[s] = sampler.valueAt(l.x, l.y);
            right[s] = sampler.valueAt(r.x, r.y);
        }
        return footwall == FootwallSide.LEFT ? new CutOffSamples(u, left, right) : new CutOffSamples(u, right, left);
    }
}
