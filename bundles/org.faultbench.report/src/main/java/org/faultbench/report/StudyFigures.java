package org.faultbench.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.FaultPlaneSampler;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.CutOffPair;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.juxtaposition.AllanDiagram;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.report.chart.AllanChart;
import org.faultbench.report.chart.ContactLevels;
import org.faultbench.report.chart.LeakProbabilityChart;
import org.faultbench.report.chart.MapChart;
import org.faultbench.report.chart.ThrowProfileChart;
import org.faultbench.sim.BoundingFault;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.LeakProbabilityMap;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.TrapStudy;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.study.AnalysisFile;
import org.locationtech.jts.geom.Point;

/** The figure sections drawn from the study's geometry and the run's result: map, throw, Allan, leak probability. */
final class StudyFigures {
    private final AnalysisFile analysis;
    private final TrapStudy study;
    private final SimulationResult result;

    StudyFigures(AnalysisFile analysis, SimulationResult result) {
        this.analysis = analysis;
        this.study = analysis.study();
        this.result = result;
    }

    private String referenceHorizon() {
        return "Top " + study.stratigraphy().referenceUnit().name();
    }

    List<Block> map() {
        MapChart chart = new MapChart(study.referenceTop(),
                study.faults().stream().map(BoundingFault::fault).toList(), study.compartment(),
                ReportWells.of(analysis.document(), analysis.file().getFileName().toString()));
        return List.of(new Block.Figure("map-figure", referenceHorizon() + " depth with the bounding faults (ticks on"
                + " the downthrown side), the compartment (dashed outline) and the wells. Coordinates in the study's"
                + " map grid, metres.", chart.render(referenceHorizon() + " depth map", referenceHorizon())));
    }

    List<Block> throwProfiles() {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Paragraph("Throw (hanging-wall minus footwall cut-off depth of " + referenceHorizon()
                + ") along each bounding fault, from the cut-off lines the analysis uses. A sound fault shows one"
                + " smooth maximum dying out towards its tips."));
        for (BoundingFault f : study.faults()) {
            ThrowProfile profile = ThrowProfile.of(new CutOffPair(f.footwallCutOff(), f.hangingWallCutOff()));
            blocks.add(new Block.Figure("throw-" + Slug.of(f.id()), String.format(Locale.ROOT,
                    "Throw profile of %s at %s; largest throw %s m.", f.fault().name(), referenceHorizon(),
                    ReportNumbers.metres(profile.maxAbsThrow())),
                    ThrowProfileChart.render(profile, "Throw profile " + f.fault().name())));
        }
        return blocks;
    }

    List<Block> allanDiagrams() {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Paragraph("Allan diagrams in the base case (every input at its nominal value);"
                + " distance u runs along the fault trace from its first point."
                + " Green lines are each compartment sand's contacts, " + ExceedanceLevel.CONVENTION
                + ", drawn only across that sand on the compartment wall."));
        ResolvedColumn column = study.stratigraphy().nominal();
        int reference = study.stratigraphy().referenceUnitIndex();
        Point inside = study.compartment().getInteriorPoint();
        for (BoundingFault f : study.faults()) {
            FaultPlaneColumns columns = new FaultPlaneSampler(f.columns()).sample(f.fault(), f.footwallCutOff(),
                    f.hangingWallCutOff());
            AllanDiagram diagram = AllanDiagram.of(columns, new HungColumns(column, column, reference));
            Wall compartmentWall = f.fault().wallAt(inside.getX(), inside.getY()).orElse(Wall.FOOTWALL);
            OptionalDouble drainage = study.attic().filter(a -> a.drainedFaultId().equals(f.id()))
                    .map(a -> OptionalDouble.of(a.drainageDepth().nominal())).orElse(OptionalDouble.empty());
            String wallText = compartmentWall == Wall.FOOTWALL ? "footwall" : "hanging wall";
            String caption = "Allan diagram of " + f.fault().name() + "; the compartment is on the " + wallText + "."
                    + (drainage.isPresent() ? " The drained block lies across this fault; its well drains down to "
                            + ReportNumbers.metres(drainage.getAsDouble()) + " m (nominal)." : "");
            blocks.add(new Block.Figure("allan-" + Slug.of(f.id()), caption,
                    new AllanChart(diagram, compartmentWall, "Allan diagram " + f.fault().name())
                            .render(contacts(), drainage, "well drainage depth (nominal)")));
        }
        return blocks;
    }

    private List<ContactLevels> contacts() {
        List<ContactLevels> contacts = new ArrayList<>();
        for (UnitSummary unit : result.units()) {
            var s = unit.statistics(UnitQuantity.CONTACT);
            contacts.add(new ContactLevels(study.stratigraphy().indexOf(unit.unitName()), unit.unitName(),
                    s.level(ExceedanceLevel.P90), s.level(ExceedanceLevel.P50), s.level(ExceedanceLevel.P10)));
        }
        return contacts;
    }

    List<Block> leakProbability() {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Paragraph("Share of realisations in which each fault-plane cell leaks: a sand-on-sand"
                + " contact whose supported free-water level lies above the unit's spill depth."));
        for (LeakProbabilityMap map : result.leakMaps()) {
            blocks.add(new Block.Figure("leak-" + Slug.of(map.faultId()), "Leak probability on " + map.faultId()
                    + "; highest " + ReportNumbers.percent(map.maximum()) + ".",
                    LeakProbabilityChart.render(map, "Leak probability " + map.faultId())));
        }
        return blocks;
    }
}
