package org.faultbench.benchmarks;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleBinaryOperator;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.fluid.FluidKind;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.faults.CutOffLine;
import org.faultbench.faults.Fault;
import org.faultbench.faults.Wall;
import org.faultbench.seal.SealCriterion;
import org.faultbench.sim.BoundingFault;
import org.faultbench.sim.DepthUncertainty;
import org.faultbench.sim.FluidContrast;
import org.faultbench.sim.SealSetup;
import org.faultbench.sim.TrapStudy;
import org.faultbench.strat.StratUnit;
import org.faultbench.strat.Stratigraphy;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * The synthetic study of the benchmarks, sized like the performance targets: a compartment bounded by 3 faults with
 * {@value #COLUMNS} fault-plane columns each and a column of 12 units. The geometry is invented:
 * <ul>
 * <li>Reference horizon: top of Sand 1. In the compartment it is a tilted block that deepens westwards and away from
 * the axis y = 0: z = 1900 + 0.03·(1500 − x) + 4·10⁻⁵·y² m, crest 1901.5 m at the node next to the east fault.
 * The grid is 121 × 101 nodes at 50 m, x from −4000 to 2000 m, y from −2500 to 2500 m; the block is open to the
 * west, so the trap spills at the west edge of the grid (2065 m).</li>
 * <li>Three normal faults: F-North along y = 1500 and F-South along y = −1500, both from x = −3000 to 1500 and
 * dipping away from the compartment (the compartment is their footwall), with throws growing from 0 at their free
 * west tips to 110 m and 80 m at the east corners; F-East along x = 1500, dipping west (the compartment is its
 * hanging wall, the block to the east is up-thrown) with a throw of 120 m in the middle and 60 m at the corners.
 * Throws of 0–120 m across sands of 20–40 m and shales of 8–40 m put sand against sand in many windows.</li>
 * <li>Column: six shales alternating with six sands, each thickness and Vcl uncertain; oil over brine; a common
 * depth shift of ±10 m (1 sd), a throw-scale uncertainty of 15 % per fault, no correlated depth residual.</li>
 * </ul>
 * In the base case every sand leaks, five of six on F-East, when juxtaposition alone decides; with shale gouge ratio
 * the fault rock holds columns of tens of metres, and the deepest sand mostly fills to spill.
 */
public final class ThreeFaultCompartment {
    /** Fault-plane columns per fault. */
    public static final int COLUMNS = 1000;
    private static final int CUT_OFF_STATIONS = 201;
    private static final double EAST = 1500;
    private static final double NORTH = 1500;
    private static final double WEST_TIP = -3000;
    private static final double BURIAL_DEPTH = 2300;
    private static final GeometryFactory GF = new GeometryFactory();
    private static final GridGeometry GRID = new GridGeometry(121, 101, -4000, -2500, 50, 50);

    private ThreeFaultCompartment() {
    }

    /** The study with {@code criterion} judging the fault rock. */
    public static TrapStudy study(SealCriterion criterion) {
        RegularGrid top = RegularGrid.sample(GRID, ThreeFaultCompartment::mappedTop);
        return new TrapStudy("three-fault compartment (synthetic)", stratigraphy(), top, compartmentOutline(),
                faults(), new FluidContrast(FluidKind.OIL, UncertainValue.normal(750, 20),
                        UncertainValue.normal(1040, 10)),
                new SealSetup(criterion, BURIAL_DEPTH, UncertainValue.normal(0, 0.1), 1),
                new DepthUncertainty(UncertainValue.normal(0, 10), 0, 1000), Optional.empty(), Optional.empty(),
                Optional.empty());
    }

    /** Top of Sand 1 in the compartment. */
    private static double compartmentTop(double x, double y) {
        return 1900 + 0.03 * (EAST - x) + 4e-5 * y * y;
    }

    /** F-North and F-South: no throw at the west tip, growing towards the linked east corner. */
    private static double northThrow(double x) {
        return sideThrow(x, 110);
    }

    private static double southThrow(double x) {
        return sideThrow(x, 80);
    }

    private static double sideThrow(double x, double maximum) {
        double d = Math.max(0, Math.min(1, (x - WEST_TIP) / (EAST - WEST_TIP)));
        return maximum * d * (2 - d);
    }

    private static double eastThrow(double y) {
        double clamped = Math.max(-NORTH, Math.min(NORTH, y));
        return 90 + 30 * Math.cos(Math.PI * clamped / NORTH);
    }

    /** The mapped horizon over the whole grid: compartment, down-thrown north and south blocks, up-thrown east block. */
    private static double mappedTop(double x, double y) {
        double z = compartmentTop(x, y);
        if (x > EAST) {
            return z - eastThrow(y);
        }
        if (y > NORTH) {
            return z + northThrow(x);
        }
        return y < -NORTH ? z + southThrow(x) : z;
    }

    private static LineString line(double x0, double y0, double x1, double y1) {
        return GF.createLineString(new Coordinate[] { new Coordinate(x0, y0), new Coordinate(x1, y1) });
    }

    private static Polygon compartmentOutline() {
        return GF.createPolygon(new Coordinate[] { new Coordinate(WEST_TIP, -NORTH), new Coordinate(EAST, -NORTH),
                new Coordinate(EAST, NORTH), new Coordinate(WEST_TIP, NORTH), new Coordinate(WEST_TIP, -NORTH) });
    }

    private static List<BoundingFault> faults() {
        List<BoundingFault> faults = new ArrayList<>();
        faults.add(bounding(new Fault("F-North", "North fault", line(WEST_TIP, NORTH, EAST, NORTH), 60, 0, true),
                ThreeFaultCompartment::compartmentTop, (x, y) -> compartmentTop(x, y) + northThrow(x)));
        faults.add(bounding(new Fault("F-East", "East fault", line(EAST, NORTH, EAST, -NORTH), 60, 270, true),
                (x, y) -> compartmentTop(x, y) - eastThrow(y), ThreeFaultCompartment::compartmentTop));
        faults.add(bounding(new Fault("F-South", "South fault", line(EAST, -NORTH, WEST_TIP, -NORTH), 60, 180, true),
                ThreeFaultCompartment::compartmentTop, (x, y) -> compartmentTop(x, y) + southThrow(x)));
        return faults;
    }

    private static BoundingFault bounding(Fault fault, DoubleBinaryOperator footwall, DoubleBinaryOperator hangingWall) {
        return new BoundingFault(fault,
                CutOffLine.sampled(fault, "Sand 1", Wall.FOOTWALL, footwall, 0, CUT_OFF_STATIONS),
                CutOffLine.sampled(fault, "Sand 1", Wall.HANGING_WALL, hangingWall, 0, CUT_OFF_STATIONS),
                UncertainValue.truncatedNormal(1, 0.15, 0, Double.POSITIVE_INFINITY), COLUMNS);
    }

    private static Stratigraphy stratigraphy() {
        double[][] shales = { { 40, 4 }, { 12, 2 }, { 10, 2 }, { 15, 2 }, { 8, 2 }, { 12, 2 } };
        double[][] sands = { { 30, 3 }, { 25, 3 }, { 35, 4 }, { 20, 3 }, { 30, 3 }, { 40, 4 } };
        List<StratUnit> units = new ArrayList<>();
        for (int i = 0; i < shales.length; i++) {
            units.add(StratUnit.nonReservoir("Shale " + (i + 1), LithologyClass.SEAL,
                    UncertainValue.normal(shales[i][0], shales[i][1]), UncertainValue.triangular(0.55, 0.7, 0.85)));
            units.add(sand("Sand " + (i + 1), UncertainValue.normal(sands[i][0], sands[i][1])));
        }
        return new Stratigraphy(units, 1);
    }

    private static StratUnit sand(String name, UncertainValue thickness) {
        return new StratUnit(name, LithologyClass.RESERVOIR, true, thickness, UncertainValue.triangular(0.05, 0.1, 0.2),
                UncertainValue.uniform(0.6, 0.9), UncertainValue.normal(0.22, 0.02), UncertainValue.normal(0.3, 0.05),
                UncertainValue.triangular(1.15, 1.2, 1.3));
    }
}
