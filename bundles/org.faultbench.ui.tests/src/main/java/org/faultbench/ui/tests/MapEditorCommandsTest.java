package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.gef.commands.CommandStack;
import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.io.FormatException;
import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.CutOffFeature;
import org.faultbench.digitize.sketch.FaultPolygonFeature;
import org.faultbench.digitize.sketch.FaultTraceFeature;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MarkerFeature;
import org.faultbench.digitize.sketch.MarkerKind;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.TraceSide;
import org.faultbench.digitize.sketch.Wall;
import org.faultbench.digitize.sketch.WellFeature;
import org.faultbench.digitize.ui.editing.ControlPointCommand;
import org.faultbench.digitize.ui.editing.DigitizeKind;
import org.faultbench.digitize.ui.editing.DigitizingDefaults;
import org.faultbench.digitize.ui.editing.FeatureEdits;
import org.faultbench.digitize.ui.editing.Georeference;
import org.faultbench.digitize.ui.editing.ResidualRow;
import org.faultbench.digitize.ui.editing.ResidualTable;
import org.faultbench.digitize.ui.editing.SheetEditCommand;
import org.faultbench.digitize.ui.editing.SnapTolerance;
import org.faultbench.digitize.ui.editing.TraceTicks;
import org.faultbench.digitize.ui.editing.TransformKindCommand;
import org.faultbench.digitize.ui.editing.WellTopsText;
import org.faultbench.digitize.ui.store.ControlPointCsv;
import org.faultbench.digitize.ui.store.VersionedMapSheetStore;
import org.faultbench.digitize.ui.store.MapSheetDocument;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/** The display-free logic of the map editor: commands, snapping distance, residual rows, ticks, files. */
class MapEditorCommandsTest {
    private static final GeometryFactory F = new GeometryFactory();

    private static LineString line(double... xy) {
        Coordinate[] c = new Coordinate[xy.length / 2];
        for (int i = 0; i < c.length; i++) {
            c[i] = new Coordinate(xy[2 * i], xy[2 * i + 1]);
        }
        return F.createLineString(c);
    }

    private static Path demo() {
        return Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
    }

    /** 3 × 3 pixel grid mapped exactly by x = 1000 + 2.5 col, y = 5000 − 2.5 row (2.5 m per pixel, north up). */
    private static List<ControlPoint> exactGrid() {
        List<ControlPoint> points = new java.util.ArrayList<>();
        int n = 1;
        for (int row = 100; row <= 900; row += 400) {
            for (int col = 100; col <= 900; col += 400) {
                points.add(ControlPoint.of("P" + n++, col, row, 1000 + 2.5 * col, 5000 - 2.5 * row));
            }
        }
        return points;
    }

    @Test
    void drawingMovingAndDeletingUndoAndRedoToTheSameSheet() {
        MapSheet sheet = new MapSheet();
        CommandStack stack = new CommandStack();
        DigitizingDefaults defaults = new DigitizingDefaults();
        SheetFeature contour = FeatureEdits.create(DigitizeKind.CONTOUR, sheet.nextId(),
                List.of(new Coordinate(0, 0), new Coordinate(100, 20), new Coordinate(200, 0)), defaults);
        stack.execute(SheetEditCommand.adding(sheet, contour));
        List<SheetFeature> afterAdd = sheet.features();
        stack.execute(SheetEditCommand.replacing(sheet, FeatureEdits.withVertex(contour, 1, 100, 40)));
        List<SheetFeature> afterMove = sheet.features();
        assertEquals(new Coordinate(100, 40), sheet.require(contour.id()).geometry().getCoordinates()[1]);
        stack.execute(SheetEditCommand.removing(sheet, sheet.require(contour.id())));
        assertTrue(sheet.features().isEmpty());

        stack.undo();
        assertEquals(afterMove, sheet.features());
        stack.undo();
        assertEquals(afterAdd, sheet.features());
        stack.undo();
        assertTrue(sheet.features().isEmpty());
        stack.redo();
        stack.redo();
        assertEquals(afterMove, sheet.features());
        stack.redo();
        assertTrue(sheet.features().isEmpty());
    }

    @Test
    void settingAContourValueIsUndoneAndNextValueStepsByTheInterval() {
        MapSheet sheet = new MapSheet();
        ContourFeature contour = new ContourFeature(sheet.nextId(), "Top A", 1500, line(0, 0, 10, 10));
        sheet.add(contour);
        CommandStack stack = new CommandStack();
        stack.execute(SheetEditCommand.replacing(sheet, new ContourFeature(contour.id(), "Top A", 1520,
                contour.line())));
        assertEquals(1520, ((ContourFeature) sheet.require(contour.id())).depth());
        stack.undo();
        assertEquals(contour, sheet.require(contour.id()));

        DigitizingDefaults defaults = new DigitizingDefaults();
        defaults.setContourInterval(0.1);
        defaults.contourDrawn(1500.2);
        // decimal stepping as typed (ContourValueStepper): 1500.2 + 0.1 = 1500.3 exactly, no binary round-off
        assertEquals(1500.3, defaults.nextContourValue());
    }

    @Test
    void wellNamesCountOnAndTopsAreTypedAsSurfaceEqualsDepth() {
        assertEquals("W-2", DigitizingDefaults.nextName("W-1"));
        assertEquals("W-10", DigitizingDefaults.nextName("W-09"), "leading zeros kept while they fit");
        assertEquals("A-100", DigitizingDefaults.nextName("A-099"));
        assertEquals("Discovery-2", DigitizingDefaults.nextName("Discovery"));
        DigitizingDefaults defaults = new DigitizingDefaults();
        SheetFeature posted = FeatureEdits.create(DigitizeKind.WELL, new MapSheet().nextId(),
                List.of(new Coordinate(100, 200)), defaults);
        WellFeature well = (WellFeature) posted;
        assertEquals("W-1", well.name());
        assertTrue(well.tops().isEmpty());

        List<WellTop> tops = WellTopsText.parse(" Top A = 1523.5 ; Top B=1610m;", well);
        assertEquals(List.of(new WellTop("W-1", "Top A", 100, 200, 1523.5, Double.NaN),
                new WellTop("W-1", "Top B", 100, 200, 1610, Double.NaN)), tops);
        assertEquals("Top A = 1523.5; Top B = 1610", WellTopsText.format(tops));
        WellFeature deviated = new WellFeature(well.id(), "W-1", 100, 200,
                List.of(new WellTop("W-1", "Top A", 130, 240, 1500, 1620)));
        assertEquals(new WellTop("W-1", "Top A", 130, 240, 1525, 1620),
                WellTopsText.parse("Top A = 1525", deviated).get(0), "a deviated pick keeps its position and MD");
        assertTrue(WellTopsText.parse("  ", well).isEmpty());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> WellTopsText.parse("Top A 1523", well));
        assertTrue(e.getMessage().contains("'Top A 1523' is not 'surface = depth'"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> WellTopsText.parse("Top A = deep", well));
        assertTrue(e.getMessage().contains("depth of 'Top A' must be a number"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> WellTopsText.parse("Top A = 1; Top A = 2", well));
        assertTrue(e.getMessage().contains("given twice"), e.getMessage());
    }

    @Test
    void aStaleEditCannotBeUndone() {
        MapSheet sheet = new MapSheet();
        CommandStack stack = new CommandStack();
        ContourFeature contour = new ContourFeature(sheet.nextId(), "Top A", 1500, line(0, 0, 10, 10));
        stack.execute(SheetEditCommand.adding(sheet, contour));
        sheet.replace(new ContourFeature(contour.id(), "Top A", 1510, contour.line()));
        assertThrows(IllegalStateException.class, stack::undo);
    }

    @Test
    void fittedPolygonClosesAndMovingItsFirstCornerMovesItsLast() {
        SheetFeature polygon = FeatureEdits.create(DigitizeKind.FAULT_POLYGON, new MapSheet().nextId(),
                List.of(new Coordinate(0, 0), new Coordinate(10, 0), new Coordinate(10, 10)),
                new DigitizingDefaults());
        assertEquals(0, ((FaultPolygonFeature) polygon).closingGap());
        SheetFeature moved = FeatureEdits.withVertex(polygon, 0, -5, -5);
        Coordinate[] c = moved.geometry().getCoordinates();
        assertEquals(new Coordinate(-5, -5), c[0]);
        assertEquals(new Coordinate(-5, -5), c[c.length - 1]);
    }

    @Test
    void controlPointEditsAndTransformKindAreUndoable() {
        Georeference georeference = new Georeference(TransformKind.AFFINE, exactGrid());
        CommandStack stack = new CommandStack();
        List<ControlPoint> before = georeference.points();
        ControlPoint moved = new ControlPoint("P5", 510, 505, 2250, 3750, true);
        stack.execute(ControlPointCommand.replacing(georeference, moved));
        stack.execute(ControlPointCommand.adding(georeference, ControlPoint.of(georeference.nextId(), 0, 0, 1000,
                5000)));
        stack.execute(ControlPointCommand.removing(georeference, georeference.points().get(0)));
        stack.execute(new TransformKindCommand(georeference, TransformKind.PROJECTIVE));
        assertEquals(TransformKind.PROJECTIVE, georeference.kind());
        while (stack.canUndo()) {
            stack.undo();
        }
        assertEquals(before, georeference.points());
        assertEquals(TransformKind.AFFINE, georeference.kind());
    }

    @Test
    void screenSnappingDistanceBecomesMetresThroughZoomAndPixelSize() {
        Georeference georeference = new Georeference(TransformKind.AFFINE, exactGrid());
        // by definition: at zoom z, p screen pixels = p / z scan pixels; 2.5 m per scan pixel (the grid above)
        assertEquals(8.0 / 2 * 2.5, SnapTolerance.metres(8, 2, georeference.projection(), 400, 400), 1e-9);
        assertEquals(8.0 / 0.25 * 2.5, SnapTolerance.metres(8, 0.25, georeference.projection(), 400, 400), 1e-9);
        assertThrows(IllegalArgumentException.class,
                () -> SnapTolerance.metres(8, 0, georeference.projection(), 0, 0));
    }

    @Test
    void demoScanIsFiveMetresPerPixel() throws Exception {
        Georeference georeference = new Georeference(TransformKind.AFFINE,
                ControlPointCsv.read(demo().resolve("maps/depth-structure-scan.control-points.csv")));
        // CP1 → CP2 in the demo file: 2000 m east over (399.88, 9.78) pixels, i.e. 2000 / 400.00 = 5.00 m per pixel
        assertEquals(5.0, georeference.projection().metresPerUnit(700, 700), 0.01);
        double[] drawing = georeference.projection().toDrawing(403000, 6203000);
        // CP5 of the demo file: pixel (778.17, 707.02), drawn at the pixel centre (+0.5), within the fit's residual
        assertEquals(778.67, drawing[0], 0.2);
        assertEquals(707.52, drawing[1], 0.2);
    }

    @Test
    void residualRowsFlagTheDisplacedPointWithItsLeaveOneOutResidual() {
        List<ControlPoint> points = new java.util.ArrayList<>(exactGrid());
        ControlPoint centre = points.get(4);
        points.set(4, new ControlPoint("P5", centre.col(), centre.row(), centre.x() + 30, centre.y(), true));
        points.add(new ControlPoint("OFF", 300, 300, 0, 0, false));
        Georeference georeference = new Georeference(TransformKind.AFFINE, points);
        List<ResidualRow> rows = ResidualTable.rows(georeference.points(), georeference.fit());
        assertEquals(10, rows.size());
        ResidualRow p5 = rows.get(4);
        assertTrue(p5.worst());
        assertEquals(1, rows.stream().filter(ResidualRow::worst).count());
        // least-squares leverage of the centre of a symmetric 3 × 3 design with terms 1, col, row is h = 1/9, so its
        // residual is 30 (1 − h) = 26.667 m and its leave-one-out (PRESS) residual e / (1 − h) = 30 m
        // (Cook & Weisberg 1982, Residuals and Influence in Regression, ch. 2)
        assertEquals(30 * 8.0 / 9, p5.dx().getAsDouble(), 1e-6);
        assertEquals(0, p5.dy().getAsDouble(), 1e-6);
        assertEquals(30, p5.leaveOneOut().getAsDouble(), 1e-6);
        ResidualRow off = rows.get(9);
        assertFalse(off.worst());
        assertTrue(off.dx().isEmpty() && off.leaveOneOut().isEmpty());
    }

    @Test
    void tooFewPointsLeaveTheScanInPixelUnitsWithTheReason() {
        Georeference georeference = new Georeference(TransformKind.AFFINE, exactGrid().subList(0, 2));
        assertTrue(georeference.fit().isEmpty());
        assertFalse(georeference.projection().georeferenced());
        assertTrue(georeference.problem().contains("at least 3"), georeference.problem());
        assertTrue(ResidualTable.rows(georeference.points(), georeference.fit()).stream()
                .noneMatch(ResidualRow::worst));
    }

    @Test
    void faultTicksPointToTheHangingWallSide() {
        // a trace drawn west to east (u grows, v fixed): its left, seen on a north-up map, is north = up = −v
        // (map convention: ticks on the downthrown side, Tearpock & Bischke 2003, fault-map symbols)
        List<double[]> left = TraceTicks.ticks(new double[] { 0, 100 }, new double[] { 50, 50 }, TraceSide.LEFT, 8,
                40);
        assertEquals(2, left.size()); // at 20 and 60 along the 100-unit trace
        assertEquals(20, left.get(0)[0], 1e-9);
        assertEquals(42, left.get(0)[3], 1e-9);
        List<double[]> right = TraceTicks.ticks(new double[] { 0, 100 }, new double[] { 50, 50 }, TraceSide.RIGHT,
                8, 40);
        assertEquals(58, right.get(0)[3], 1e-9);
        // shorter than one spacing: one tick in the middle
        assertEquals(1, TraceTicks.ticks(new double[] { 0, 10 }, new double[] { 0, 0 }, TraceSide.LEFT, 8, 40)
                .size());
    }

    @Test
    void controlPointFileErrorsNameFileLineAndField() throws Exception {
        Path dir = Files.createTempDirectory("cp");
        Path file = dir.resolve("scan.control-points.csv");
        Files.writeString(file, "id,pixel_col,pixel_row,map_x,map_y\nA,1,2,3,4\nB,1,x,3,4\n");
        FormatException error = assertThrows(FormatException.class, () -> ControlPointCsv.read(file));
        assertEquals("scan.control-points.csv", error.fileName());
        assertEquals(3, error.line());
        assertEquals(3, error.field());
        assertTrue(error.getMessage().contains("pixel_row"), error.getMessage());
        assertEquals(dir.resolve("scan.control-points.csv"), ControlPointCsv.sidecarOf(dir.resolve("scan.png")));
    }

    @Test
    void versionedStoreKeepsEveryFeatureControlPointsTransformAndScan() throws Exception {
        Path dir = Files.createTempDirectory("sheet");
        Path scan = dir.resolve("scan.png");
        MapSheet sheet = new MapSheet();
        sheet.add(new ContourFeature(sheet.nextId(), "Top A", 1502.5, line(0, 0, 10, 5, 20, 0)));
        sheet.add(new FaultTraceFeature(sheet.nextId(), "F1", line(5, -5, 5, 20), TraceSide.RIGHT));
        sheet.add(new CutOffFeature(sheet.nextId(), "F1", "Top A", Wall.HANGING_WALL, line(6, -5, 6, 20)));
        // markers were lost by the earlier stand-in store; the versioned file keeps them
        sheet.add(new MarkerFeature(sheet.nextId(), MarkerKind.CREST, 12, 3, "Top A", "crest of the horst"));
        VersionedMapSheetStore store = new VersionedMapSheetStore();
        Path file = store.defaultFileFor(scan);
        assertTrue(store.handles(file));
        store.save(file, new MapSheetDocument(sheet, exactGrid(), TransformKind.SIMILARITY,
                java.util.Optional.of(scan)));
        MapSheetDocument loaded = store.load(file);
        assertEquals(sheet.features(), loaded.sheet().features());
        assertEquals(exactGrid(), loaded.controlPoints());
        assertEquals(TransformKind.SIMILARITY, loaded.transformKind());
        assertEquals(scan, loaded.scan().orElseThrow());
    }
}
