package org.faultbench.sim;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.fluid.FluidKind;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.seal.JuxtapositionOnlyCriterion;
import org.faultbench.seal.SealCriterion;
import org.faultbench.strat.StratUnit;
import org.faultbench.strat.Stratigraphy;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * A hand-checkable test structure: a cone-shaped top of Sand A, z = 1000 + 0.05·r around (−500, 0), cut by a
 * north–south normal fault along x = 0 dipping east; the compartment is the footwall west of it, the hanging wall
 * east is down-thrown by a constant throw T. Column: Top Seal 50 m, Sand A 30 m (reference), Shale 10 m, Sand B 60 m.
 * <ul>
 * <li>Crest 1000 m at (−500, 0); computed spill point at the west grid edge (−2000, 0): 1000 + 0.05·1500 = 1075 m.</li>
 * <li>Shallowest footwall cut-off 1025 m at y = 0 (500 m from the apex).</li>
 * </ul>
 */
final class SingleFaultDome {
    static final GeometryFactory GF = new GeometryFactory();
    static final GridGeometry GRID = new GridGeometry(201, 201, -2000, -2000, 20, 20);

    private SingleFaultDome() {
    }

    static double topFootwall(double x, double y) {
        return 1000 + 0.05 * Math.hypot(x + 500, y);
    }

    static Stratigraphy column(UncertainValue sandAThickness) {
        return new Stratigraphy(List.of(
                StratUnit.nonReservoir("Top Seal", LithologyClass.SEAL, UncertainValue.fixed(50), UncertainValue.fixed(0.8)),
                reservoir("Sand A", sandAThickness),
                StratUnit.nonReservoir("Shale", LithologyClass.SEAL, UncertainValue.fixed(10), UncertainValue.fixed(0.9)),
                reservoir("Sand B", UncertainValue.fixed(60))), 1);
    }

    static StratUnit reservoir(String name, UncertainValue thickness) {
        return new StratUnit(name, LithologyClass.RESERVOIR, true, thickness, UncertainValue.fixed(0.1),
                UncertainValue.fixed(0.8), UncertainValue.fixed(0.25), UncertainValue.fixed(0.3), UncertainValue.fixed(1.2));
    }

    static TrapStudy study(double throwMetres, SealCriterion criterion, UncertainValue throwScale,
            Optional<AtticSetup> attic) {
        return study(throwMetres, criterion, throwScale, attic, column(UncertainValue.fixed(30)), DepthUncertainty.NONE,
                UncertainValue.fixed(750), UncertainValue.fixed(1050));
    }

    static TrapStudy study(double throwMetres, SealCriterion criterion, UncertainValue throwScale,
            Optional<AtticSetup> attic, Stratigraphy strat, DepthUncertainty depth, UncertainValue oilDensity,
            UncertainValue brineDensity) {
        // the mapped surface: footwall cone west of the fault, hanging wall down by T east of it
        RegularGrid top = RegularGrid.sample(GRID, (x, y) -> topFootwall(x, y) + (x > 0 ? throwMetres : 0));
        Fault fault = new Fault("F1", "Test fault", GF.createLineString(new Coordinate[] {
                new Coordinate(0, -1990), new Coordinate(0, 1990) }), 60, 90, true);
        CutOffLine footwall = CutOffLine.sampled(fault, "Sand A", Wall.FOOTWALL, SingleFaultDome::topFootwall, 0, 399);
        CutOffLine hangingWall = CutOffLine.sampled(fault, "Sand A", Wall.HANGING_WALL,
                (x, y) -> topFootwall(x, y) + throwMetres, 0, 399);
        var outline = GF.createPolygon(new Coordinate[] { new Coordinate(-2000, -2000), new Coordinate(-1, -2000),
                new Coordinate(-1, 2000), new Coordinate(-2000, 2000), new Coordinate(-2000, -2000) });
        return new TrapStudy("single-fault dome", strat, top, outline,
                List.of(new BoundingFault(fault, footwall, hangingWall, throwScale, 399)),
                new FluidContrast(FluidKind.OIL, oilDensity, brineDensity),
                new SealSetup(criterion, 2000, UncertainValue.fixed(0), 1), depth, Optional.empty(), Optional.empty(),
                attic);
    }

    static TrapStudy juxtapositionOnly(double throwMetres) {
        return study(throwMetres, new JuxtapositionOnlyCriterion(), UncertainValue.fixed(1), Optional.empty());
    }
}
