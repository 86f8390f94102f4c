package org.faultbench.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.draw2d.FigureCanvas;
import org.eclipse.draw2d.geometry.PrecisionPoint;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.ui.actions.ActionRegistry;
import org.eclipse.gef.ui.actions.GEFActionConstants;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.ui.IWorkbenchCommandConstants;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.views.properties.IPropertySource;
import org.faultbench.digitize.sketch.ContourFeature;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.WellFeature;
import org.faultbench.digitize.ui.editing.DigitizeKind;
import org.faultbench.digitize.ui.editing.MapDocument;
import org.faultbench.digitize.ui.editing.SheetEditCommand;
import org.faultbench.digitize.ui.georef.ControlPointsView;
import org.faultbench.digitize.ui.map.MapSheetEditor;
import org.faultbench.digitize.ui.map.MapSheetEditorInput;
import org.faultbench.digitize.ui.map.SheetEditPart;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * The map editor on the demo scan in the real workbench: a contour digitized with three clicks (real SWT mouse
 * events on the viewer's canvas), undone and redone through the workbench's Undo and Redo commands; zoom; the
 * Properties source of the contour; the control-point table.
 */
class MapEditorUiTest {
    private IWorkbenchPage page;
    private MapSheetEditor editor;

    @BeforeEach
    void openDemoScan() throws Exception {
        Path demo = Path.of(System.getProperty("faultbench.demo", "../../demo-workspace"));
        page = PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
        page.setEditorAreaVisible(true);
        editor = assertInstanceOf(MapSheetEditor.class, page.openEditor(
                new MapSheetEditorInput(demo.resolve("maps/depth-structure-scan.png")), MapSheetEditor.ID));
        page.setPartState(page.getReference(editor), IWorkbenchPage.STATE_MAXIMIZED);
        WorkbenchSmokeTest.spin(500);
        editor.zoomManager().setZoom(1.0);
        editor.zoomManager().setViewLocation(new Point(0, 0));
        WorkbenchSmokeTest.spin(200);
    }

    @AfterEach
    void close() {
        page.closeEditor(editor, false);
        WorkbenchSmokeTest.spin(100);
    }

    private Point screenOf(double x, double y) {
        SheetEditPart sheet = (SheetEditPart) editor.viewer().getContents();
        double[] d = sheet.projection().toDrawing(x, y);
        PrecisionPoint p = new PrecisionPoint(d[0], d[1]);
        sheet.getFigure().translateToAbsolute(p);
        return new Point(p.x, p.y);
    }

    private static void mouse(FigureCanvas canvas, int type, Point at) {
        Event e = new Event();
        e.type = type;
        e.x = at.x;
        e.y = at.y;
        e.button = type == SWT.MouseMove ? 0 : 1;
        e.count = type == SWT.MouseDoubleClick ? 2 : 1;
        e.widget = canvas;
        canvas.notifyListeners(type, e);
    }

    private static void click(FigureCanvas canvas, Point at, boolean doubleClick) {
        mouse(canvas, SWT.MouseMove, at);
        mouse(canvas, SWT.MouseDown, at);
        mouse(canvas, SWT.MouseUp, at);
        if (doubleClick) {
            mouse(canvas, SWT.MouseDown, at);
            mouse(canvas, SWT.MouseDoubleClick, at);
            mouse(canvas, SWT.MouseUp, at);
        }
        WorkbenchSmokeTest.spin(30);
    }

    @Test
    void crossingContoursAreListedInProblemsUntilUndoneAndChoosingOneSelectsThem() throws Exception {
        MapSheet sheet = editor.document().sheet();
        GeometryFactory gf = new GeometryFactory();
        ContourFeature a = new ContourFeature(sheet.nextId(), "Top A", 1500, gf.createLineString(new Coordinate[] {
            new Coordinate(400600, 6205200), new Coordinate(401400, 6205200) }));
        ContourFeature b = new ContourFeature(sheet.nextId(), "Top A", 1510, gf.createLineString(new Coordinate[] {
            new Coordinate(401000, 6204800), new Coordinate(401000, 6205600) }));
        editor.commandStack().execute(SheetEditCommand.adding(sheet, a));
        editor.commandStack().execute(SheetEditCommand.adding(sheet, b));
        IMarker[] markers = topologyMarkers();
        // contours of different depth cannot cross (common practice; the checker calls it an error)
        IMarker crossing = Arrays.stream(markers).filter(m -> m.getAttribute(IMarker.SEVERITY, -1)
                == IMarker.SEVERITY_ERROR).findFirst().orElseThrow(() -> new AssertionError("no error marker"));
        assertTrue(crossing.getAttribute(IMarker.MESSAGE, "").contains("1500")
                && crossing.getAttribute(IMarker.LOCATION, "").contains("x 401000, y 6205200"),
                crossing.getAttribute(IMarker.MESSAGE, "") + " at " + crossing.getAttribute(IMarker.LOCATION, ""));

        assertTrue(editor.showProblem(crossing));
        WorkbenchSmokeTest.spin(100);
        List<?> selected = editor.viewer().getSelectedEditParts();
        assertEquals(Set.of(a.id(), b.id()), selected.stream().map(p -> ((EditPart) p).getModel())
                .collect(Collectors.toSet()), "both contours selected");

        editor.commandStack().undo();
        assertEquals(0, topologyMarkers().length, "undoing the second contour clears the problem");

        // the problem back, then the map closed before its check has run: closing stops the check and clears the
        // sheet's markers
        editor.commandStack().redo();
        assertEquals(2, sheet.features().size());
        Job pending = editor.topologyCheck();
        page.closeEditor(editor, false);
        pending.join(10_000, null);
        assertEquals(0, ResourcesPlugin.getWorkspace().getRoot().findMarkers(MapSheetEditor.topologyMarkerType(),
                false, IResource.DEPTH_ZERO).length, "a closed map leaves no problems behind");
    }

    private IMarker[] topologyMarkers() throws Exception {
        WorkbenchSmokeTest.spin(50);
        long end = System.currentTimeMillis() + 10_000;
        while (System.currentTimeMillis() < end) {
            Job check = editor.topologyCheck();
            if (check.getState() == Job.NONE) {
                break;
            }
            WorkbenchSmokeTest.spin(50);
        }
        return ResourcesPlugin.getWorkspace().getRoot().findMarkers(MapSheetEditor.topologyMarkerType(), false,
                IResource.DEPTH_ZERO);
    }

    @Test
    void demoScanOpensGeoreferencedByItsNineControlPoints() {
        MapDocument document = editor.document();
        assertEquals(9, document.georeference().points().size());
        assertTrue(document.georeference().fit().isPresent(), document.georeference().problem());
        // the demo control points sit on a 2000 m grid 400 pixels apart: 5 m per pixel (demo README, maps/)
        assertEquals(5.0, document.georeference().projection().metresPerUnit(700, 700), 0.01);
        assertTrue(((SheetEditPart) editor.viewer().getContents()).cachedTiles() > 0, "scan tiles are drawn");
        assertFalse(editor.isDirty());
    }

    @Test
    void contourOfThreeClicksIsUndoneAndRedoneByTheWorkbench() throws Exception {
        MapSheet sheet = editor.document().sheet();
        editor.activateTool(DigitizeKind.CONTOUR);
        FigureCanvas canvas = (FigureCanvas) editor.viewer().getControl();
        double[][] map = { { 400600, 6205200 }, { 401000, 6205400 }, { 401400, 6205300 } };
        for (int i = 0; i < map.length; i++) {
            click(canvas, screenOf(map[i][0], map[i][1]), i == map.length - 1);
        }
        assertEquals(1, sheet.features().size(), "one contour digitized");
        ContourFeature contour = assertInstanceOf(ContourFeature.class, sheet.features().get(0));
        assertEquals(3, contour.line().getNumPoints());
        assertEquals(1500, contour.depth()); // the default first contour value
        for (int i = 0; i < map.length; i++) {
            Coordinate c = contour.line().getCoordinateN(i);
            // clicks land on whole screen pixels: at zoom 1 and 5 m per pixel, within one pixel diagonal (7.1 m)
            assertEquals(map[i][0], c.x, 7.1);
            assertEquals(map[i][1], c.y, 7.1);
        }
        assertEquals(1510, editor.document().defaults().nextContourValue()); // 1500 + 10 m interval
        assertTrue(editor.isDirty());

        IHandlerService handlers = PlatformUI.getWorkbench().getActiveWorkbenchWindow()
                .getService(IHandlerService.class);
        handlers.executeCommand(IWorkbenchCommandConstants.EDIT_UNDO, null);
        WorkbenchSmokeTest.spin(100);
        assertTrue(sheet.features().isEmpty(), "undo removed the contour");
        assertFalse(editor.isDirty());
        handlers.executeCommand(IWorkbenchCommandConstants.EDIT_REDO, null);
        WorkbenchSmokeTest.spin(100);
        assertEquals(contour, sheet.features().get(0));

        EditPart part = (EditPart) editor.viewer().getEditPartRegistry().get(contour.id());
        editor.viewer().select(part);
        IPropertySource properties = (IPropertySource) part.getAdapter(IPropertySource.class);
        assertEquals("Contour", properties.getPropertyValue("kind"));
        assertEquals("1500", properties.getPropertyValue("depth"));
    }

    @Test
    void aWellIsPostedWithOneClickAndGetsItsTopsInProperties() {
        MapSheet sheet = editor.document().sheet();
        editor.activateTool(DigitizeKind.WELL);
        FigureCanvas canvas = (FigureCanvas) editor.viewer().getControl();
        click(canvas, screenOf(401000, 6205400), false);
        WellFeature well = assertInstanceOf(WellFeature.class, sheet.features().get(0));
        assertEquals("W-1", well.name());
        // one click at zoom 1 and 5 m per pixel: within one pixel diagonal (7.1 m)
        assertEquals(401000, well.x(), 7.1);
        assertEquals(6205400, well.y(), 7.1);
        assertEquals("W-2", editor.document().defaults().wellName(), "the next well gets the next number");

        EditPart part = (EditPart) editor.viewer().getEditPartRegistry().get(well.id());
        IPropertySource properties = (IPropertySource) part.getAdapter(IPropertySource.class);
        properties.setPropertyValue("tops", "Top A = 1523.5; Top B = 1610 m");
        WellFeature withTops = (WellFeature) sheet.require(well.id());
        assertEquals(List.of("Top A", "Top B"), withTops.tops().stream().map(t -> t.surface()).toList());
        assertEquals(1610, withTops.topsOn("Top B").get(0).tvdss(), 0);
        assertEquals("Top A = 1523.5; Top B = 1610", properties.getPropertyValue("tops"));
        properties.setPropertyValue("wellName", "Appraisal-3");
        assertEquals("Appraisal-3", ((WellFeature) sheet.require(well.id())).topsOn("Top A").get(0).well());
    }

    @Test
    void zoomInActionGoesToTheNextLevel() {
        ActionRegistry actions = (ActionRegistry) editor.getAdapter(ActionRegistry.class);
        actions.getAction(GEFActionConstants.ZOOM_IN).run();
        WorkbenchSmokeTest.spin(100);
        assertEquals(1.5, editor.zoomManager().getZoom(), 1e-9);
        actions.getAction(GEFActionConstants.ZOOM_OUT).run();
        actions.getAction(GEFActionConstants.ZOOM_OUT).run();
        assertEquals(0.75, editor.zoomManager().getZoom(), 1e-9);
    }

    @Test
    void controlPointViewShowsTheResidualsOfTheFit() throws Exception {
        ControlPointsView view = (ControlPointsView) page.showView(ControlPointsView.ID);
        page.activate(editor);
        WorkbenchSmokeTest.spin(200);
        assertEquals(9, view.rows().size());
        assertEquals(1, view.rows().stream().filter(r -> r.worst()).count());
        assertTrue(view.summaryText().startsWith("affine fit to 9 points"), view.summaryText());
        page.hideView(view);
    }
}
