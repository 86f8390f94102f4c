package org.faultbench.digitize.ui.map;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.draw2d.FreeformLayer;
import org.eclipse.draw2d.IFigure;
import org.eclipse.draw2d.geometry.Point;
import org.eclipse.draw2d.geometry.PrecisionPoint;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.EditPolicy;
import org.eclipse.gef.editparts.AbstractGraphicalEditPart;
import org.eclipse.gef.editparts.ZoomListener;
import org.eclipse.gef.editpolicies.RootComponentEditPolicy;
import org.eclipse.ui.views.properties.IPropertySource;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MapSheetEdit;
import org.faultbench.digitize.sketch.MapSheetListener;
import org.faultbench.digitize.sketch.SheetFeature;
import org.faultbench.digitize.sketch.SnapResult;
import org.faultbench.digitize.sketch.Snapper;
import org.faultbench.digitize.ui.editing.Georeference;
import org.faultbench.digitize.ui.editing.MapDocument;
import org.faultbench.digitize.ui.editing.ScanProjection;
import org.faultbench.digitize.ui.editing.SnapTolerance;
import org.locationtech.jts.geom.Coordinate;

/**
 * The map sheet in the viewer: its children are the features (by id, in drawing order) and the control points; the
 * scan is drawn on the raster layer below them. It redraws on every sheet edit and refit, converts screen positions
 * to map metres and snaps them with the model {@link Snapper}.
 */
public final class SheetEditPart extends AbstractGraphicalEditPart implements MapSheetListener,
        Georeference.Listener {
    private final ImagePyramid pyramid;
    private TileImageCache tiles;
    private RasterFigure raster;
    private double snapPixels = SnapTolerance.DEFAULT_SCREEN_PIXELS;
    /** Symbol sizes and figure margins are in screen pixels, so the children are laid out again on zoom. */
    private final ZoomListener relayout = zoom -> refreshChildVisuals();

    /** @param pyramid the scan's pyramid, or null for a sheet without a scan */
    public SheetEditPart(MapDocument document, ImagePyramid pyramid) {
        setModel(document);
        this.pyramid = pyramid;
    }

    public MapDocument document() {
        return (MapDocument) getModel();
    }

    public ScanProjection projection() {
        return document().georeference().projection();
    }

    public double zoom() {
        return ((MapRootEditPart) getRoot()).getZoomManager().getZoom();
    }

    public void setSnapPixels(double pixels) {
        snapPixels = pixels;
    }

    /** The drawing position of an absolute (viewer control) location. */
    public PrecisionPoint toDrawing(Point absolute) {
        PrecisionPoint p = new PrecisionPoint(absolute.x, absolute.y);
        getFigure().translateToRelative(p);
        return p;
    }

    /**
     * The map position for drawing position (u, v), snapped to the features other than {@code exclude} within the
     * snapping distance in screen pixels.
     */
    public SnapResult snap(double u, double v, FeatureId exclude) {
        ScanProjection projection = projection();
        double[] map = projection.toMap(u, v);
        double tolerance = SnapTolerance.metres(snapPixels, zoom(), projection, u, v);
        List<SheetFeature> candidates = new ArrayList<>(document().sheet().features());
        candidates.removeIf(f -> f.id().equals(exclude));
        return new Snapper(tolerance, tolerance).snap(candidates, map[0], map[1]);
    }

    /** {@link #snap} as a coordinate. */
    public Coordinate snapped(double u, double v, FeatureId exclude) {
        SnapResult result = snap(u, v, exclude);
        return new Coordinate(result.x(), result.y());
    }

    @Override
    protected IFigure createFigure() {
        return new FreeformLayer();
    }

    @Override
    protected void createEditPolicies() {
        installEditPolicy(EditPolicy.COMPONENT_ROLE, new RootComponentEditPolicy());
        installEditPolicy(EditPolicy.LAYOUT_ROLE, new SheetLayoutPolicy());
    }

    @Override
    protected List<Object> getModelChildren() {
        List<Object> children = new ArrayList<>();
        for (SheetFeature feature : document().sheet().features()) {
            children.add(feature.id());
        }
        document().georeference().points().forEach(p -> children.add(new ControlPointKey(p.id())));
        return children;
    }

    @Override
    public void activate() {
        super.activate();
        document().sheet().addListener(this);
        document().georeference().addListener(this);
        ((MapRootEditPart) getRoot()).getZoomManager().addZoomListener(relayout);
        if (pyramid != null) {
            tiles = new TileImageCache(pyramid);
            raster = new RasterFigure(tiles, this::zoom);
            getLayer(MapRootEditPart.RASTER_LAYER).add(raster);
        }
    }

    @Override
    public void deactivate() {
        document().sheet().removeListener(this);
        document().georeference().removeListener(this);
        ((MapRootEditPart) getRoot()).getZoomManager().removeZoomListener(relayout);
        if (raster != null) {
            getLayer(MapRootEditPart.RASTER_LAYER).remove(raster);
            tiles.dispose();
        }
        super.deactivate();
    }

    /** Tiles held as images right now (for tests of the cache). */
    public int cachedTiles() {
        return tiles == null ? 0 : tiles.size();
    }

    @Override
    public void sheetChanged(MapSheet sheet, MapSheetEdit edit) {
        if (edit.before() == null || edit.after() == null) {
            refreshChildren();
        } else {
            Object part = getViewer().getEditPartRegistry().get(edit.featureId());
            if (part instanceof EditPart child) {
                child.refresh();
            }
        }
    }

    @Override
    public void georeferenceChanged(Georeference georeference) {
        refreshChildren();
        refreshChildVisuals();
    }

    private void refreshChildVisuals() {
        for (Object child : getChildren()) {
            ((EditPart) child).refresh();
        }
    }

    @Override
    public Object getAdapter(@SuppressWarnings("rawtypes") Class key) {
        if (key == IPropertySource.class) {
            return new DefaultsPropertySource(document().defaults());
        }
        return super.getAdapter(key);
    }
}
