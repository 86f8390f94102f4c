package org.faultbench.report.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.OptionalDouble;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.core.grid.GridGeometry;
import org.faultbench.core.grid.RegularGrid;
import org.faultbench.faults.Fault;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.Wall;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.juxtaposition.AllanDiagram;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.sim.LeakProbabilityMap;
import org.faultbench.sim.TornadoBar;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/** Each chart draws what it claims where it claims: checked on pixels of small invented cases. */
class ChartRenderersTest {
    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    @BeforeAll
    static void headless() {
        System.setProperty("java.awt.headless", "true");
    }

    /** Flat cut-offs at 1000 m (footwall) and 1040 m (hanging wall): shale 20 m, sand 30 m, shale 50 m. */
    private static AllanDiagram flatDiagram() {
        int n = 11;
        double[] u = new double[n];
        double[] x = new double[n];
        double[] y = new double[n];
        double[] fw = new double[n];
        double[] hw = new double[n];
        for (int k = 0; k < n; k++) {
            u[k] = 50 + 100 * k;
            x[k] = u[k];
            fw[k] = 1000;
            hw[k] = 1040;
        }
        FaultPlaneColumns columns = new FaultPlaneColumns("F1", "Top Sand", 100, u, x, y, fw, hw);
        ResolvedColumn column = new ResolvedColumn(List.of(
                new UnitSlice("Shale", LithologyClass.SEAL, false, 20, 0.7),
                new UnitSlice("Sand", LithologyClass.RESERVOIR, true, 30, 0.1),
                new UnitSlice("Base", LithologyClass.SEAL, false, 50, 0.7)));
        return AllanDiagram.of(columns, new HungColumns(column, column, 1));
    }

    @Test
    void allanContactLineIsDrawnAtItsDepthRowAndOnlyAcrossTheSand() {
        AllanChart chart = new AllanChart(flatDiagram(), Wall.FOOTWALL, "test");
        BufferedImage image = chart.render(List.of(new ContactLevels(1, "Sand", Double.NaN, 1015, Double.NaN)),
                OptionalDouble.empty(), "");
        int row = (int) Math.round(chart.rowOf(1015));
        int column = (int) Math.round(chart.columnOf(500));
        // footwall sand spans 1000-1030 m, so a contact at 1015 m lies inside it: the P50 line is solid green
        assertEquals(Palette.GREEN.getRGB(), image.getRGB(column, row), "contact colour at its row");
        assertTrue(image.getRGB(column, row - 6) != Palette.GREEN.getRGB(), "not 6 px above");
        int rowOutside = (int) Math.round(chart.rowOf(1015 + 40));
        assertTrue(image.getRGB(column, rowOutside) != Palette.GREEN.getRGB(), "no line outside the sand");
    }

    @Test
    void drainageLineIsDrawnAtItsDepth() {
        AllanChart chart = new AllanChart(flatDiagram(), Wall.FOOTWALL, "test");
        BufferedImage image = chart.render(List.of(), OptionalDouble.of(1080), "drainage");
        int row = (int) Math.round(chart.rowOf(1080));
        assertTrue(purpleWithin(image, chart, row - 1, row + 1), "purple drainage line within 1 px of row " + row);
        assertTrue(!purpleWithin(image, chart, row - 8, row - 4) && !purpleWithin(image, chart, row + 4, row + 8),
                "and nowhere else near it");
    }

    private static boolean purpleWithin(BufferedImage image, AllanChart chart, int fromRow, int toRow) {
        for (int y = fromRow; y <= toRow; y++) {
            for (int x = (int) chart.columnOf(600); x < chart.columnOf(900); x++) {
                if (image.getRGB(x, y) == Palette.PURPLE.getRGB()) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Whether two colours differ by at most {@code tolerance} in every channel. */
    private static boolean close(Color expected, int rgb, int tolerance) {
        Color actual = new Color(rgb);
        return Math.abs(expected.getRed() - actual.getRed()) <= tolerance
                && Math.abs(expected.getGreen() - actual.getGreen()) <= tolerance
                && Math.abs(expected.getBlue() - actual.getBlue()) <= tolerance;
    }

    @Test
    void leakLegendRunsFromZeroAtTheBottomToOneAtTheTop() {
        double[] probability = new double[4 * 3];
        probability[5] = 1;
        BufferedImage image = LeakProbabilityChart.render(new LeakProbabilityMap("F1", new double[] { 5, 15, 25, 35 },
                1000, 5, 3, probability), "test");
        assertEquals(LeakProbabilityChart.WIDTH, image.getWidth());
        assertEquals(LeakProbabilityChart.HEIGHT, image.getHeight());
        int x = LeakProbabilityChart.BAR_X + 9; // 3 px inside the bar, clear of its antialiased frame
        assertTrue(close(Palette.probability(1), image.getRGB(x, LeakProbabilityChart.BAR_TOP + 3), 3), "1 at the top");
        assertTrue(close(Palette.probability(0), image.getRGB(x, LeakProbabilityChart.BAR_BOTTOM - 3), 3), "0 at the bottom");
        assertTrue(!close(Palette.probability(0), image.getRGB(x, LeakProbabilityChart.BAR_TOP + 1), 40), "ends differ");
    }

    @Test
    void probabilityRampGetsDarkerMonotonically() {
        double last = Double.MAX_VALUE;
        for (int i = 0; i <= 10; i++) {
            Color c = Palette.probability(i / 10.0);
            // relative luminance weights of ITU-R BT.709
            double lum = 0.2126 * c.getRed() + 0.7152 * c.getGreen() + 0.0722 * c.getBlue();
            assertTrue(lum < last, "luminance falls with probability at " + i / 10.0);
            last = lum;
        }
    }

    @Test
    void tornadoHasOneRowPerInputAndBarsOnTheRightSides() {
        BufferedImage image = TornadoChart.render("test", 1500,
                List.of(new TornadoBar("a", 1480, 1520), new TornadoBar("b", 1510, 1495)));
        assertEquals(TornadoChart.WIDTH, image.getWidth());
        assertEquals(34 + 62 + 2 * TornadoChart.BAR_HEIGHT + 36, image.getHeight());
        // x axis 1476.8-1523.2 m (range 1480-1520 padded by 8 %) over pixels 250-870: 1485 m at x 360, 1515 m at 760
        int y = 34 + TornadoChart.BAR_HEIGHT / 2;
        assertEquals(Palette.BLUE.getRGB(), image.getRGB(360, y), "first row: low input gives a shallower contact");
        assertEquals(Palette.ORANGE.getRGB(), image.getRGB(760, y), "first row: high input gives a deeper one");
        int second = y + TornadoChart.BAR_HEIGHT;
        assertEquals(Palette.BLUE.getRGB(), image.getRGB(680, second), "second row: low input deeper (1510 m)");
        assertEquals(Color.WHITE.getRGB(), image.getRGB(360, second), "nothing at 1485 m on the second row");
    }

    @Test
    void throwProfileChartHasItsSizeAndDrawsTheMaximum() {
        ThrowProfile profile = new ThrowProfile("F1", "Top", new double[] { 0, 500, 1000 }, new double[] { 0, 50, 0 });
        BufferedImage image = ThrowProfileChart.render(profile, "test");
        assertEquals(ThrowProfileChart.WIDTH, image.getWidth());
        assertEquals(ThrowProfileChart.HEIGHT, image.getHeight());
        // y range 0 .. 50 + pad 5: the maximum at u = 500 sits in the middle column, near the top of the plot
        int column = (70 + ThrowProfileChart.WIDTH - 24) / 2;
        boolean blue = false;
        for (int y = 34; y < 34 + 40; y++) {
            blue |= image.getRGB(column, y) == Palette.BLUE.getRGB();
        }
        assertTrue(blue, "profile peak drawn near the top");
    }

    @Test
    void mapKeepsOneMetrePerPixelOnBothAxesAndMarksWells() {
        GridGeometry geo = new GridGeometry(51, 101, 0, 0, 20, 20);
        RegularGrid grid = RegularGrid.sample(geo, (x, y) -> 1000 + 0.05 * x + 0.02 * y);
        Fault fault = new Fault("F1", "F1", GEOMETRY.createLineString(new Coordinate[] { new Coordinate(400, 500),
                new Coordinate(600, 1500) }), 60, 90, true);
        var compartment = GEOMETRY.createPolygon(new Coordinate[] { new Coordinate(400, 500), new Coordinate(600, 1500),
                new Coordinate(300, 1500), new Coordinate(400, 500) });
        MapChart chart = new MapChart(grid, List.of(fault), compartment, List.of(new MapWell("W-1", 200, 1000, "")));
        var view = chart.view();
        BufferedImage image = chart.render("test", "Top");
        int plotHeight = image.getHeight() - 34 - 70;
        assertEquals(view.getHeight() / view.getWidth(), plotHeight / (double) MapChart.PLOT_WIDTH, 0.01);
        int wx = (int) Math.round(96 + (200 - view.getMinX()) / view.getWidth() * MapChart.PLOT_WIDTH);
        int wy = (int) Math.round(34 + (view.getMaxY() - 1000) / view.getHeight() * plotHeight);
        assertEquals(Palette.INK.getRGB(), image.getRGB(wx, wy), "well symbol centre");
    }
}
