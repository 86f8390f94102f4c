package org.faultbench.sim;

import java.util.Arrays;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.PhysicalConstants;
import org.faultbench.juxtaposition.ColumnIntervals;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.juxtaposition.JuxtapositionClass;
import org.faultbench.seal.FaultPointContext;
import org.faultbench.seal.SealCriterion;
import org.faultbench.trap.Crest;
import org.faultbench.trap.CrestFinder;
import org.faultbench.trap.Mechanism;
import org.faultbench.trap.SpillPoint;
import org.faultbench.trap.SpillPointFinder;
import org.faultbench.trap.volume.AtticAnalysis;

/**
 * Evaluates one realisation: perturbs the reference horizon and the fault cut-offs, juxtaposes the columns on every
 * bounding fault, finds each reservoir unit's leak point (z + P_th / (Δρ·g), minimum over the reservoir/reservoir
 * contacts of that unit on the compartment side), spill point, controlling depth, attic contact and volumes.
 * Also marks the fault-plane cells that would leak before the trap fills to its spill point.
 *
 * <p>Not thread-safe: one evaluator per worker (it reuses its interval buffer).
 */
final class RealisationEvaluator {
    /** Step below a window top for its first sample, so boundary round-off does not put the point in the unit above. */
    private static final double INSIDE = 1e-6;

    private final StudyGeometry geometry;
    private final int[] reservoirUnits;
    private final int[] slotOfUnit;
    private final ColumnIntervals intervals = new ColumnIntervals();
    private final SealCriterion criterion;
    private final boolean juxtapositionOnly;
    private final int atticFault;
    /** Per fault: the realisation that last marked each cell, so a cell counts once per realisation. */
    private final long[][] markStamp;

    RealisationEvaluator(StudyGeometry geometry) {
        this.geometry = geometry;
        var units = geometry.study.stratigraphy().units();
        slotOfUnit = new int[units.size()];
        Arrays.fill(slotOfUnit, -1);
        reservoirUnits = java.util.stream.IntStream.range(0, units.size()).filter(i -> units.get(i).reservoir())
                .toArray();
        for (int s = 0; s < reservoirUnits.length; s++) {
            slotOfUnit[reservoirUnits[s]] = s;
        }
        criterion = geometry.study.seal().criterion();
        juxtapositionOnly = geometry.study.seal().juxtapositionOnly();
        atticFault = geometry.study.attic().map(a -> geometry.faultIndex(a.drainedFaultId())).orElse(-1);
        markStamp = new long[geometry.faults.size()][];
        for (FaultPlaneFrame frame : geometry.faults) {
            markStamp[frame.index] = new long[frame.cells()];
            Arrays.fill(markStamp[frame.index], -1);
        }
    }

    int[] reservoirUnits() {
        return reservoirUnits.clone();
    }

    /**
     * @param leakCells per fault, counts of realisations in which each cell leaks (incremented here); may be null
     * @param realisation index used to count each cell once per realisation
     */
    RealisationOutcome evaluate(RealisationInputs in, int[][] leakCells, long realisation) {
        ResolvedColumn column = in.column();
        int ref = geometry.referenceUnit;
        double contrast = in.densityContrast();
        if (!(contrast > 0)) {
            throw new IllegalArgumentException("brine density (" + in.brineDensity() + " kg/m3) must exceed the trapped"
                    + " fluid density (" + in.hydrocarbonDensity() + " kg/m3)");
        }
        double buoyancyPerMetre = contrast * PhysicalConstants.G;
        double thresholdFactor = geometry.study.seal().thresholdScale() * Math.pow(10, -in.calibrationShift());

        ReferenceTrap trap = referenceTrap(in);
        RealisationOutcome out = new RealisationOutcome(reservoirUnits.length);
        double[] spill = new double[reservoirUnits.length];
        double[] leak = new double[reservoirUnits.length];
        double[] connection = new double[reservoirUnits.length];
        Arrays.fill(leak, Double.POSITIVE_INFINITY);
        Arrays.fill(connection, Double.POSITIVE_INFINITY);
        for (int s = 0; s < reservoirUnits.length; s++) {
            double offset = column.top(reservoirUnits[s]) - column.top(ref);
            spill[s] = (Double.isNaN(in.userSpillDepth()) ? trap.spillDepth : in.userSpillDepth()) + offset;
            out.set(s, UnitQuantity.CREST, trap.crestDepth + offset);
            out.set(s, UnitQuantity.SPILL_DEPTH, spill[s]);
        }

        HungColumns hung = new HungColumns(column, column, ref);
        for (FaultPlaneFrame frame : geometry.faults) {
            scanFault(frame, in, hung, column, spill, leak, connection, out, buoyancyPerMetre, thresholdFactor,
                    leakCells == null ? null : leakCells[frame.index], realisation);
        }

        for (int s = 0; s < reservoirUnits.length; s++) {
            int unit = reservoirUnits[s];
            double crest = out.get(s, UnitQuantity.CREST);
            double topSeal = Double.isNaN(in.topSealCapacity()) ? Double.POSITIVE_INFINITY
                    : crest + in.topSealCapacity() / buoyancyPerMetre;
            double contact = Math.min(spill[s], Math.min(leak[s], topSeal));
            out.mechanism[s] = contact == spill[s] ? Mechanism.SPILL
                    : contact == leak[s] ? Mechanism.LEAK : Mechanism.TOP_SEAL;
            out.set(s, UnitQuantity.LEAK_DEPTH, leak[s]);
            out.set(s, UnitQuantity.CONTACT, contact);
            out.set(s, UnitQuantity.COLUMN, Math.max(0, contact - crest));
            double offset = trap.offsetOf(column, unit, ref);
            double thickness = column.unit(unit).thickness();
            var properties = in.reservoirProperties().get(unit);
            if (Double.isFinite(contact)) {
                out.set(s, UnitQuantity.STOIIP,
                        properties.stockTankOil(trap.areaDepth.grossRockVolume(offset, contact, thickness)));
            }
            if (atticFault >= 0 && Double.isFinite(contact)) {
                double after = AtticAnalysis.contactAfterDepletion(contact, connection[s], in.drainageDepth());
                out.set(s, UnitQuantity.CONNECTION_DEPTH, connection[s]);
                out.set(s, UnitQuantity.ATTIC_CONTACT, after);
                out.set(s, UnitQuantity.ATTIC_COLUMN, Math.max(0, after - crest));
                out.set(s, UnitQuantity.ATTIC_STOIIP,
                        properties.stockTankOil(trap.areaDepth.grossRockVolume(offset, after, thickness)));
            }
        }
        return out;
    }

    private void scanFault(FaultPlaneFrame frame, RealisationInputs in, HungColumns hung, ResolvedColumn column,
            double[] spill, double[] leak, double[] connection, RealisationOutcome out, double buoyancyPerMetre,
            double thresholdFactor, int[] cells, long realisation) {
        double scale = in.throwScale()[frame.index];
        boolean onFootwall = frame.compartmentOnFootwall();
        double refTop = column.top(geometry.referenceUnit);
        double burial = geometry.study.seal().burialDepth();
        for (int k = 0; k < frame.columns; k++) {
            if (!frame.hasData[k]) {
                continue;
            }
            double zFw = frame.footwall[k] + in.depthError(frame.x[k], frame.y[k]);
            double throwK = scale * (frame.hangingWall[k] - frame.footwall[k]);
            double zHw = zFw + throwK;
            hung.juxtapose(zFw, zHw, intervals);
            for (int n = 0; n < intervals.count(); n++) {
                if (intervals.juxtapositionClass(n) != JuxtapositionClass.RESERVOIR_RESERVOIR) {
                    continue;
                }
                int unit = onFootwall ? intervals.footwallUnit(n) : intervals.hangingWallUnit(n);
                int s = slotOfUnit[unit];
                double top = intervals.top(n);
                double base = intervals.base(n);
                if (frame.index == atticFault) {
                    connection[s] = Math.min(connection[s], top);
                }
                if (juxtapositionOnly) {
                    if (top < leak[s]) {
                        leak[s] = top;
                        out.leakLocation[s] = new LeakLocation(frame.bounding.id(), frame.u[k], top);
                    }
                    markCells(frame, k, top, base, spill[s], cells, realisation);
                    continue;
                }
                double sFootwall = refTop - zFw;
                double sHangingWall = refTop - zHw;
                for (double z = top + INSIDE; z < base; z = nextSample(frame, z)) {
                    FaultPointContext ctx = throwK >= 0
                            ? new FaultPointContext(z, throwK, z + sFootwall, column, burial)
                            : new FaultPointContext(z, -throwK, z + sHangingWall, column, burial);
                    double pressure = criterion.evaluate(ctx).thresholdPressure() * thresholdFactor;
                    double freeWaterLevel = z + pressure / buoyancyPerMetre;
                    if (freeWaterLevel < leak[s]) {
                        leak[s] = freeWaterLevel;
                        out.leakLocation[s] = new LeakLocation(frame.bounding.id(), frame.u[k], z);
                    }
                    if (cells != null && freeWaterLevel < spill[s] && z > top + INSIDE) {
                        mark(frame, k, frame.row(z), cells, realisation);
                    }
                }
            }
        }
    }

    /** The next sample depth: the centre of the next leak-probability cell below z (cells continue past the frame). */
    private static double nextSample(FaultPlaneFrame frame, double z) {
        double centre = frame.zTop + (Math.floor((z - frame.zTop) / frame.cellHeight) + 0.5) * frame.cellHeight;
        return centre > z ? centre : centre + frame.cellHeight;
    }

    /** Juxtaposition only: every cell centre of the window above the spill depth leaks. */
    private void markCells(FaultPlaneFrame frame, int column, double top, double base, double spill, int[] cells,
            long realisation) {
        if (cells == null) {
            return;
        }
        double bottom = Math.min(base, spill);
        for (int row = Math.max(0, frame.row(top)); row < frame.rows; row++) {
            double centre = frame.rowCentre(row);
            if (centre >= bottom) {
                break;
            }
            if (centre >= top) {
                mark(frame, column, row, cells, realisation);
            }
        }
    }

    private void mark(FaultPlaneFrame frame, int column, int row, int[] cells, long realisation) {
        if (row < 0 || row >= frame.rows) {
            return;
        }
        int cell = row * frame.columns + column;
        long[] stamps = markStamp[frame.index];
        if (stamps[cell] != realisation) {
            stamps[cell] = realisation;
            cells[cell]++;
        }
    }

    /** Crest and spill depth of the reference top in this realisation, and the area-depth table to use. */
    private ReferenceTrap referenceTrap(RealisationInputs in) {
        if (in.residual() == null) {
            return new ReferenceTrap(geometry.crest.z() + in.depthShift(), geometry.spill.depth() + in.depthShift(),
                    geometry.areaDepth, in.depthShift());
        }
        RegularGrid nominal = geometry.study.referenceTop();
        GridGeometry g = nominal.geometry();
        double[] values = nominal.values();
        for (int k = 0; k < values.length; k++) {
            values[k] += in.depthError(g.x(g.column(k)), g.y(g.row(k)));
        }
        RegularGrid perturbed = new RegularGrid(g, values);
        Crest crest = CrestFinder.find(perturbed, geometry.compartment);
        SpillPoint spill = new SpillPointFinder().find(perturbed, geometry.barriers, crest);
        return new ReferenceTrap(crest.z(), spill.depth(), new AreaDepthTable(perturbed, geometry.trappedPart(spill)),
                0);
    }

    /** The reference top's trap in one realisation; offsets of deeper units are added to the table's surface. */
    private record ReferenceTrap(double crestDepth, double spillDepth, AreaDepthTable areaDepth, double tableShift) {
        double offsetOf(ResolvedColumn column, int unit, int ref) {
            return tableShift + column.top(unit) - column.top(ref);
        }
    }
}
