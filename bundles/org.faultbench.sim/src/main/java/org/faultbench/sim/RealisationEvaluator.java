package org.faultbench.sim;

import java.util.Arrays;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.units.PhysicalConstants;
import org.faultbench.trap.Crest;
import org.faultbench.trap.CrestFinder;
import org.faultbench.trap.Mechanism;
import org.faultbench.trap.SpillPoint;
import org.faultbench.trap.SpillPointFinder;
import org.faultbench.trap.volume.AreaDepthTable;
import org.faultbench.trap.volume.AtticAnalysis;

/**
 * Evaluates one realisation: perturbs the reference horizon and the fault cut-offs, finds each reservoir unit's leak
 * point on the bounding faults ({@link LeakSearch}), spill point, controlling depth, attic contact and volumes.
 * Also marks the fault-plane cells that would leak before the trap fills to its spill point.
 *
 * <p>Not thread-safe: one evaluator per worker (its leak search keeps per-realisation state).
 */
final class RealisationEvaluator {
    private final StudyGeometry geometry;
    private final int[] reservoirUnits;
    private final int atticFault;
    private final LeakSearch leakSearch;

    RealisationEvaluator(StudyGeometry geometry) {
        this.geometry = geometry;
        var units = geometry.study.stratigraphy().units();
        int[] slotOfUnit = new int[units.size()];
        Arrays.fill(slotOfUnit, -1);
        reservoirUnits = java.util.stream.IntStream.range(0, units.size()).filter(i -> units.get(i).reservoir())
                .toArray();
        for (int s = 0; s < reservoirUnits.length; s++) {
            slotOfUnit[reservoirUnits[s]] = s;
        }
        atticFault = geometry.study.attic().map(a -> geometry.faultIndex(a.drainedFaultId())).orElse(-1);
        leakSearch = new LeakSearch(geometry, slotOfUnit, atticFault);
    }

    int[] reservoirUnits() {
        return reservoirUnits.clone();
    }

    /** @param leakRuns where the runs of cells that leak in this realisation are added; may be null */
    RealisationOutcome evaluate(RealisationInputs in, LeakRuns leakRuns) {
        boolean isochores = in.columns() != null && in.columns().variesWithPosition();
        // with isochores, the unit offsets of crest and spill are those at the crest (common practice: layer cake there)
        ResolvedColumn column = isochores ? in.columns().columnAt(geometry.crest.x(), geometry.crest.y()) : in.column();
        int ref = geometry.referenceUnit;
        double contrast = in.densityContrast();
        if (!(contrast > 0)) {
            throw new IllegalArgumentException("brine density (" + in.brineDensity() + " kg/m3) must exceed the trapped"
                    + " fluid density (" + in.hydrocarbonDensity() + " kg/m3)");
        }
        double buoyancyPerMetre = contrast * PhysicalConstants.G;

        ReferenceTrap trap = referenceTrap(in);
        RealisationOutcome out = new RealisationOutcome(reservoirUnits.length);
        double[] spill = new double[reservoirUnits.length];
        double[] leak = new double[reservoirUnits.length];
        double[] connection = new double[reservoirUnits.length];
        for (int s = 0; s < reservoirUnits.length; s++) {
            double offset = column.top(reservoirUnits[s]) - column.top(ref);
            spill[s] = (Double.isNaN(in.userSpillDepth()) ? trap.spillDepth : in.userSpillDepth()) + offset;
            out.set(s, UnitQuantity.CREST, trap.crestDepth + offset);
            out.set(s, UnitQuantity.SPILL_DEPTH, spill[s]);
        }

        leakSearch.run(in, buoyancyPerMetre, spill, leak, connection, out.leakLocation, leakRuns);

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
            if (!Double.isFinite(contact)) {
                continue;
            }
            boolean attic = atticFault >= 0;
            double after = attic ? AtticAnalysis.contactAfterDepletion(contact, connection[s], in.drainageDepth())
                    : Double.NaN;
            // with isochores one pass over the nodes gives both volumes: each node's top and base are found once
            double[] volumes = isochores ? trap.nodeVolume().grossRockVolumes(in.columns(), unit, ref,
                    attic ? new double[] { contact, after } : new double[] { contact }) : null;
            out.set(s, UnitQuantity.STOIIP, properties.stockTankOil(isochores ? volumes[0]
                    : trap.areaDepth.grossRockVolume(offset, contact, thickness)));
            if (attic) {
                out.set(s, UnitQuantity.CONNECTION_DEPTH, connection[s]);
                out.set(s, UnitQuantity.ATTIC_CONTACT, after);
                out.set(s, UnitQuantity.ATTIC_COLUMN, Math.max(0, after - crest));
                out.set(s, UnitQuantity.ATTIC_STOIIP, properties.stockTankOil(isochores ? volumes[1]
                        : trap.areaDepth.grossRockVolume(offset, after, thickness)));
            }
        }
        return out;
    }

    /** Crest and spill depth of the reference top in this realisation, and the area-depth table to use. */
    private ReferenceTrap referenceTrap(RealisationInputs in) {
        if (in.residual() == null) {
            return new ReferenceTrap(geometry.crest.z() + in.depthShift(), geometry.spill.depth() + in.depthShift(),
                    geometry.areaDepth, in.depthShift(), geometry.study.referenceTop(), geometry.trapped);
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
        GridMask trapped = geometry.trappedPart(spill);
        return new ReferenceTrap(crest.z(), spill.depth(), new AreaDepthTable(perturbed, trapped), 0, perturbed,
                trapped);
    }

    /** The reference top's trap in one realisation; offsets of deeper units are added to the table's surface. */
    private record ReferenceTrap(double crestDepth, double spillDepth, AreaDepthTable areaDepth, double tableShift,
            RegularGrid surface, GridMask trapped) {
        double offsetOf(ResolvedColumn column, int unit, int ref) {
            return tableShift + column.top(unit) - column.top(ref);
        }

        /** Node-by-node volumes for thicknesses that vary with position. */
        IsochoreRockVolume nodeVolume() {
            return new IsochoreRockVolume(surface, trapped, tableShift);
        }
    }
}
