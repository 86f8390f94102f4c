package org.faultbench.sim;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.grid.Barriers;
import org.faultbench.core.grid.GridMask;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.trap.Crest;
import org.faultbench.trap.CrestFinder;
import org.faultbench.trap.SpillPoint;
import org.faultbench.trap.volume.AreaDepthTable;
import org.faultbench.trap.SpillPointFinder;
import org.locationtech.jts.geom.LineString;

/**
 * What is computed once per run from the nominal inputs: compartment and barrier masks, the crest and computed spill
 * point of the mapped reference top, the trapped area's area-depth table, and the frame of every bounding fault.
 */
final class StudyGeometry {
    final TrapStudy study;
    final GridMask compartment;
    final GridMask barriers;
    final Crest crest;
    final SpillPoint spill;
    /** Nodes of the compartment above the nominal spill point. */
    final GridMask trapped;
    final AreaDepthTable areaDepth;
    final List<FaultPlaneFrame> faults;
    final int referenceUnit;

    StudyGeometry(TrapStudy study, double cellHeight) {
        this.study = study;
        RegularGrid top = study.referenceTop();
        referenceUnit = study.stratigraphy().referenceUnitIndex();
        List<LineString> traces = study.faults().stream().map(f -> f.fault().trace()).toList();
        barriers = Barriers.rasterize(top.geometry(), traces);
        compartment = CompartmentMask.and(CompartmentMask.of(top.geometry(), study.compartment()), barriers.not());
        if (compartment.count() == 0) {
            throw new IllegalArgumentException("the compartment outline contains no grid node off the fault traces");
        }
        crest = CrestFinder.find(top, compartment);
        spill = new SpillPointFinder().find(top, barriers, crest);
        trapped = trappedPart(spill);
        areaDepth = new AreaDepthTable(top, trapped);
        ResolvedColumn nominal = study.stratigraphy().nominal();
        faults = new ArrayList<>();
        for (int f = 0; f < study.faults().size(); f++) {
            faults.add(new FaultPlaneFrame(study.faults().get(f), f, crest.x(), crest.y(), nominal, referenceUnit,
                    cellHeight));
        }
    }

    /** Nodes of the compartment that the flood from its crest reaches above the spill depth. */
    GridMask trappedPart(SpillPoint spillPoint) {
        return CompartmentMask.and(spillPoint.trapped(), compartment);
    }

    int faultIndex(String id) {
        for (FaultPlaneFrame frame : faults) {
            if (frame.bounding.id().equals(id)) {
                return frame.index;
            }
        }
        return -1;
    }
}
