package org.faultbench.digitize.ui.map;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.core.resources.IMarker;
import org.eclipse.core.runtime.Adapters;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.draw2d.FigureCanvas;
import org.eclipse.draw2d.PositionConstants;
import org.eclipse.gef.DefaultEditDomain;
import org.eclipse.gef.EditPart;
import org.eclipse.gef.GraphicalViewer;
import org.eclipse.gef.MouseWheelHandler;
import org.eclipse.gef.MouseWheelZoomHandler;
import org.eclipse.gef.commands.CommandStack;
import org.eclipse.gef.editparts.ZoomManager;
import org.eclipse.gef.palette.PaletteRoot;
import org.eclipse.gef.ui.actions.ActionRegistry;
import org.eclipse.gef.ui.actions.ZoomInAction;
import org.eclipse.gef.ui.actions.ZoomOutAction;
import org.eclipse.gef.ui.palette.FlyoutPaletteComposite;
import org.eclipse.gef.ui.palette.FlyoutPaletteComposite.FlyoutPreferences;
import org.eclipse.gef.ui.parts.GraphicalEditorWithFlyoutPalette;
import org.eclipse.gef.ui.parts.GraphicalViewerKeyHandler;
import org.eclipse.jface.action.IAction;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorSite;
import org.eclipse.ui.IPathEditorInput;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.IURIEditorInput;
import org.eclipse.ui.IWorkbenchCommandConstants;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.actions.ActionFactory;
import org.faultbench.digitize.raster.ImagePyramid;
import org.faultbench.digitize.sketch.FeatureId;
import org.faultbench.digitize.ui.editing.MapDocument;
import org.faultbench.digitize.ui.store.MapDocuments;
import org.faultbench.digitize.ui.store.MapSheetDocumentStore;
import org.faultbench.digitize.ui.store.VersionedMapSheetStore;

/**
 * The map editor: a scanned depth-structure map (drawn from its image pyramid) with the digitized sheet over it.
 * Opened on a scan image (its control points are read from the {@code .control-points.csv} beside it) or on a
 * map-sheet file. Every change goes through the GEF command stack, so the workbench's Undo and Redo, the dirty
 * mark and Save follow it; saving goes through a {@link MapSheetDocumentStore}. The Properties view edits the
 * selection through GEF's undoable property sheet, so attribute changes are commands too.
 */
public final class MapSheetEditor extends GraphicalEditorWithFlyoutPalette {
    public static final String ID = "org.faultbench.digitize.ui.mapSheetEditor";
    /** Zoom levels offered, from a whole large scan on screen to close work on a line. */
    static final double[] ZOOM_LEVELS = { 0.05, 0.1, 0.125, 0.25, 0.375, 0.5, 0.75, 1, 1.5, 2, 3, 4, 6, 8 };
    private static final int PALETTE_WIDTH = 150;

    private final MapSheetDocumentStore store = new VersionedMapSheetStore();
    private PaletteRoot palette;
    private MapDocument document;
    private Path saveTo;
    private ImagePyramid pyramid;
    private TopologyWatch topology;
    private final ISelectionListener problemSelection = (part, selection) -> {
        if (selection instanceof IStructuredSelection chosen && chosen.getFirstElement() != null) {
            IMarker marker = Adapters.adapt(chosen.getFirstElement(), IMarker.class);
            if (marker != null) {
                showProblem(marker);
            }
        }
    };

    public MapSheetEditor() {
        setEditDomain(new DefaultEditDomain(this));
    }

    @Override
    public void init(IEditorSite site, IEditorInput input) throws PartInitException {
        Path file = fileOf(input);
        try {
            MapDocuments.Opened opened = MapDocuments.open(file, store);
            document = opened.document();
            saveTo = opened.saveTo();
            if (document.scan().isPresent()) {
                pyramid = ScanPyramids.builtOrBuild(document.scan().get());
            }
        } catch (IOException | RuntimeException unreadable) {
            throw new PartInitException("Cannot open " + file + ": " + unreadable.getMessage(), unreadable);
        }
        super.init(site, input);
        setPartName(input.getName());
        site.getPage().addSelectionListener(problemSelection);
    }

    private static Path fileOf(IEditorInput input) throws PartInitException {
        if (input instanceof MapSheetEditorInput mapInput) {
            return mapInput.file();
        }
        if (input instanceof IPathEditorInput pathInput) {
            return pathInput.getPath().toPath();
        }
        if (input instanceof IURIEditorInput uriInput) {
            return Path.of(uriInput.getURI());
        }
        throw new PartInitException("The map editor opens files on disk, not " + input.getName());
    }

    @Override
    protected PaletteRoot getPaletteRoot() {
        if (palette == null) {
            palette = MapPalette.create();
        }
        return palette;
    }

    @Override
    protected FlyoutPreferences getPalettePreferences() {
        return new FlyoutPreferences() {
            private int width = PALETTE_WIDTH;

            @Override
            public int getDockLocation() {
                return PositionConstants.WEST;
            }

            @Override
            public int getPaletteState() {
                return FlyoutPaletteComposite.STATE_PINNED_OPEN;
            }

            @Override
            public int getPaletteWidth() {
                return width;
            }

            @Override
            public void setDockLocation(int location) {
                // fixed on the left: re-docking needs a workbench-internal class GEF 3.2 cannot find
            }

            @Override
            public void setPaletteState(int state) {
                // always pinned open
            }

            @Override
            public void setPaletteWidth(int newWidth) {
                width = newWidth;
            }
        };
    }

    @Override
    protected void configureGraphicalViewer() {
        super.configureGraphicalViewer();
        GraphicalViewer viewer = getGraphicalViewer();
        MapRootEditPart root = new MapRootEditPart();
        viewer.setRootEditPart(root);
        viewer.setEditPartFactory(new MapEditPartFactory(pyramid));
        viewer.setKeyHandler(new GraphicalViewerKeyHandler(viewer));
        ZoomManager zoom = root.getZoomManager();
        zoom.setZoomLevels(ZOOM_LEVELS);
        zoom.setZoomLevelContributions(List.of(ZoomManager.FIT_ALL, ZoomManager.FIT_WIDTH, ZoomManager.FIT_HEIGHT));
        viewer.setProperty(MouseWheelHandler.KeyGenerator.getKey(SWT.MOD1), MouseWheelZoomHandler.SINGLETON);
        MiddleDragPanner.install((FigureCanvas) viewer.getControl());
        ActionRegistry actions = getActionRegistry();
        actions.registerAction(new ZoomInAction(zoom));
        actions.registerAction(new ZoomOutAction(zoom));
        actions.registerAction(new ZoomToFitAction(zoom));
    }

    /**
     * Gives the stack actions the workbench command ids, so that the workbench's Edit commands (and their key
     * bindings) find them as the active editor's handlers; GEF 3.2 leaves the definition ids empty.
     */
    @Override
    protected void createActions() {
        super.createActions();
        ActionRegistry actions = getActionRegistry();
        define(actions, ActionFactory.UNDO.getId(), IWorkbenchCommandConstants.EDIT_UNDO);
        define(actions, ActionFactory.REDO.getId(), IWorkbenchCommandConstants.EDIT_REDO);
        define(actions, ActionFactory.DELETE.getId(), IWorkbenchCommandConstants.EDIT_DELETE);
        define(actions, ActionFactory.SELECT_ALL.getId(), IWorkbenchCommandConstants.EDIT_SELECT_ALL);
        define(actions, ActionFactory.SAVE.getId(), IWorkbenchCommandConstants.FILE_SAVE);
    }

    private static void define(ActionRegistry actions, String id, String commandId) {
        IAction action = actions.getAction(id);
        if (action != null && action.getActionDefinitionId() == null) {
            action.setActionDefinitionId(commandId);
        }
    }

    @Override
    protected void initializeGraphicalViewer() {
        super.initializeGraphicalViewer();
        getGraphicalViewer().setContents(document);
        topology = new TopologyWatch(document.sheet(), saveTo.getFileName().toString());
        topology.start();
        Display.getCurrent().asyncExec(() -> {
            if (getGraphicalViewer().getControl() != null && !getGraphicalViewer().getControl().isDisposed()) {
                zoomManager().setZoomAsText(ZoomManager.FIT_ALL);
            }
        });
    }

    @Override
    public void doSave(IProgressMonitor monitor) {
        try {
            store.save(saveTo, MapDocuments.toSaved(document));
            getCommandStack().markSaveLocation();
        } catch (IOException | RuntimeException failed) {
            MessageDialog.openError(getSite().getShell(), "Map sheet not saved",
                    "Cannot save " + saveTo + ": " + failed.getMessage());
            if (monitor != null) {
                monitor.setCanceled(true);
            }
        }
    }

    @Override
    public boolean isSaveAsAllowed() {
        return false;
    }

    @Override
    public Object getAdapter(@SuppressWarnings("rawtypes") Class type) {
        if (type == ZoomManager.class) {
            return zoomManager();
        }
        if (type == MapDocument.class) {
            return document;
        }
        return super.getAdapter(type);
    }

    /** The document being edited. */
    public MapDocument document() {
        return document;
    }

    /** Where Save writes. */
    public Path saveTarget() {
        return saveTo;
    }

    public GraphicalViewer viewer() {
        return getGraphicalViewer();
    }

    public CommandStack commandStack() {
        return getCommandStack();
    }

    public ZoomManager zoomManager() {
        return ((MapRootEditPart) getGraphicalViewer().getRootEditPart()).getZoomManager();
    }

    /** Makes the palette tool for {@code kind} (or Select for null) the active tool, as a click on it would. */
    public void activateTool(org.faultbench.digitize.ui.editing.DigitizeKind kind) {
        if (kind == null) {
            getEditDomain().loadDefaultTool();
            return;
        }
        for (Object entry : ((org.eclipse.gef.palette.PaletteContainer) getPaletteRoot().getChildren().get(2))
                .getChildren()) {
            org.eclipse.gef.palette.ToolEntry tool = (org.eclipse.gef.palette.ToolEntry) entry;
            if (kind.name().equals(tool.getId())) {
                getEditDomain().getPaletteViewer().setActiveTool(tool);
                return;
            }
        }
    }

    /**
     * Selects the features a topology marker of this sheet names (as when it is chosen in the Problems view);
     * returns whether the marker was one of this sheet's.
     */
    public boolean showProblem(IMarker marker) {
        if (topology == null || !topology.sheetName().equals(marker.getAttribute(TopologyMarkers.SHEET, null))) {
            return false;
        }
        selectFeatures(TopologyMarkers.features(marker));
        return true;
    }

    /** Selects the edit parts of the features still on the sheet and scrolls the first into view. */
    public void selectFeatures(List<FeatureId> features) {
        List<EditPart> parts = new java.util.ArrayList<>();
        for (FeatureId id : features) {
            Object part = getGraphicalViewer().getEditPartRegistry().get(id);
            if (part instanceof EditPart editPart) {
                parts.add(editPart);
            }
        }
        if (!parts.isEmpty()) {
            getGraphicalViewer().setSelection(new StructuredSelection(parts));
            getGraphicalViewer().reveal(parts.get(0));
        }
    }

    /** The background check of the sheet's topology, so that callers can wait for the markers to be current. */
    public org.eclipse.core.runtime.jobs.Job topologyCheck() {
        return topology.job();
    }

    /** Marker type of the map topology problems in the Problems view. */
    public static String topologyMarkerType() {
        return TopologyMarkers.TYPE;
    }

    @Override
    public void dispose() {
        getSite().getPage().removeSelectionListener(problemSelection);
        if (topology != null) {
            topology.stop();
        }
        if (document != null) {
            document.scan().ifPresent(ScanPyramids::release);
        }
        super.dispose();
    }
}
