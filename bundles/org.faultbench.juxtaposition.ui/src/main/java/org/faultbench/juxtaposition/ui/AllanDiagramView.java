package org.faultbench.juxtaposition.ui;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.IAction;
import org.eclipse.jface.action.IMenuManager;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.juxtaposition.paint.AttributePainter;
import org.faultbench.juxtaposition.paint.AttributePainterContributions;
import org.faultbench.juxtaposition.paint.Overlay;
import org.faultbench.juxtaposition.paint.OverlayContributions;
import org.faultbench.sim.BoundingFault;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.LeakProbabilityMap;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.TrapStudy;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFile;
import org.faultbench.ui.CautionBanner;
import org.faultbench.ui.preferences.FaultbenchPreferences;

/**
 * The Allan diagram of a bounding fault of the active study: juxtaposition on the unrolled fault plane, reservoir
 * windows, leak probability after a run, the chosen unit's P90/P50/P10 contacts and the drained block's well drainage
 * depth; a hover read-out and PNG and SVG export. The "Colour by" choice lists every attribute painter of the platform
 * (built-in and contributed) and the view menu every overlay.
 */
public class AllanDiagramView extends ViewPart {
    /** Axis labels and depth lines follow the length unit of the preferences. */
    private final org.eclipse.jface.util.IPropertyChangeListener unitsChanged = e -> redrawLater();
    public static final String ID = "org.faultbench.juxtaposition.ui.allanDiagram";

    private Combo faultCombo;
    private Combo unitCombo;
    private Combo paintCombo;
    private Label readout;
    private AllanCanvas canvas;
    private final List<AttributePainter> painters = AttributePainterContributions.platformCatalog().list();
    private final List<OverlayAction> overlayActions = new ArrayList<>();
    private final ActiveStudy.Listener listener = source -> {
        if (canvas != null && !canvas.isDisposed()) {
            canvas.getDisplay().asyncExec(this::reload);
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(6, false));
        CautionBanner.create(parent);
        new Label(parent, SWT.NONE).setText("Fault:");
        faultCombo = new Combo(parent, SWT.READ_ONLY);
        faultCombo.addListener(SWT.Selection, e -> redrawDiagram());
        new Label(parent, SWT.NONE).setText("Contacts of unit:");
        unitCombo = new Combo(parent, SWT.READ_ONLY);
        unitCombo.addListener(SWT.Selection, e -> redrawDiagram());
        new Label(parent, SWT.NONE).setText("Colour by:");
        paintCombo = new Combo(parent, SWT.READ_ONLY);
        for (AttributePainter painter : painters) {
            paintCombo.add(painter.name());
        }
        paintCombo.select(0);
        paintCombo.addListener(SWT.Selection, e -> canvas.paintBy(painters.get(paintCombo.getSelectionIndex())));
        canvas = new AllanCanvas(parent);
        if (!painters.isEmpty()) {
            canvas.paintBy(painters.get(0));
        }
        canvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 6, 1));
        readout = new Label(parent, SWT.NONE);
        readout.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 6, 1));
        readout.setText("Juxtaposition on the unrolled fault plane: footwall and hanging-wall units and reservoir windows.");
        canvas.addListener(SWT.MouseMove, e -> {
            double[] at = canvas.toPlane(e.x, e.y);
            if (at != null && canvas.picture() != null) {
                readout.setText(canvas.picture().describe((int) at[0], at[1]));
            }
        });
        getViewSite().getActionBars().getToolBarManager().add(new ExportAction());
        getViewSite().getActionBars().getToolBarManager().add(new SvgExportAction(this));
        IMenuManager menu = getViewSite().getActionBars().getMenuManager();
        for (Overlay overlay : OverlayContributions.platformCatalog().list()) {
            OverlayAction action = new OverlayAction(overlay);
            overlayActions.add(action);
            menu.add(action);
        }
        applyOverlays();
        ActiveStudy.get().addListener(listener);
        FaultbenchPreferences.addListener(unitsChanged);
        reload();
    }

    private void reload() {
        if (faultCombo.isDisposed()) {
            return;
        }
        AnalysisFile analysis = ActiveStudy.get().analysis().orElse(null);
        String fault = faultCombo.getText();
        String unit = unitCombo.getText();
        faultCombo.setItems(analysis == null ? new String[0]
                : analysis.study().faults().stream().map(BoundingFault::id).toArray(String[]::new));
        unitCombo.setItems(analysis == null ? new String[0]
                : analysis.study().stratigraphy().units().stream().filter(u -> u.reservoir()).map(u -> u.name())
                        .toArray(String[]::new));
        faultCombo.select(Math.max(0, faultCombo.indexOf(fault)));
        unitCombo.select(Math.max(0, unitCombo.indexOf(unit)));
        faultCombo.getParent().layout(true, true);
        redrawDiagram();
    }

    private void redrawDiagram() {
        AnalysisFile analysis = ActiveStudy.get().analysis().orElse(null);
        if (analysis == null || faultCombo.getSelectionIndex() < 0) {
            canvas.show(null, List.of());
            return;
        }
        TrapStudy study = analysis.study();
        BoundingFault fault = study.faults().get(faultCombo.getSelectionIndex());
        SimulationResult result = ActiveStudy.get().result().orElse(null);
        LeakProbabilityMap leak = result == null ? null
                : result.leakMaps().stream().filter(m -> m.faultId().equals(fault.id())).findFirst().orElse(null);
        canvas.show(new AllanPicture(study, fault, leak), depthLines(study, result));
    }

    private List<AllanCanvas.DepthLine> depthLines(TrapStudy study, SimulationResult result) {
        List<AllanCanvas.DepthLine> lines = new ArrayList<>();
        study.attic().ifPresent(a -> lines.add(new AllanCanvas.DepthLine("well drainage depth (median)",
                a.drainageDepth().quantile(0.5), new RGB(0, 0, 0), SWT.LINE_DASHDOT)));
        if (result == null) {
            return lines;
        }
        String unit = unitCombo.getText();
        UnitSummary summary = result.units().stream().filter(u -> u.unitName().equals(unit)).findFirst().orElse(null);
        if (summary == null) {
            return lines;
        }
        var contact = summary.statistics(UnitQuantity.CONTACT);
        lines.add(new AllanCanvas.DepthLine(unit + " contact P90 (low)", contact.level(ExceedanceLevel.P90),
                new RGB(120, 170, 220), SWT.LINE_DASH));
        lines.add(new AllanCanvas.DepthLine(unit + " contact P50", contact.level(ExceedanceLevel.P50),
                new RGB(30, 90, 180), SWT.LINE_SOLID));
        lines.add(new AllanCanvas.DepthLine(unit + " contact P10 (high)", contact.level(ExceedanceLevel.P10),
                new RGB(10, 40, 110), SWT.LINE_DASH));
        return lines;
    }

    private void applyOverlays() {
        canvas.overlay(overlayActions.stream().filter(Action::isChecked).map(a -> a.overlay).toList());
    }

    /** Selects a painter by id, as the colour choice does; false when no such painter is installed. */
    public boolean colourBy(String painterId) {
        for (int i = 0; i < painters.size(); i++) {
            if (painters.get(i).id().equals(painterId)) {
                paintCombo.select(i);
                canvas.paintBy(painters.get(i));
                return true;
            }
        }
        return false;
    }

    /** Names in the colour choice, in order. */
    public List<String> colourChoices() {
        return List.of(paintCombo.getItems());
    }

    /** The picture on show; null when no study is open. */
    AllanPicture picture() {
        return canvas.picture();
    }

    /** The depth lines drawn over the current picture (contacts of the chosen unit, drainage depth). */
    List<AllanCanvas.DepthLine> depthLines() {
        AnalysisFile analysis = ActiveStudy.get().analysis().orElse(null);
        return analysis == null ? List.of() : depthLines(analysis.study(), ActiveStudy.get().result().orElse(null));
    }

    /** Writes the diagram on show as SVG to {@code file} (tests and scripts); false when there is none. */
    public boolean exportSvg(java.nio.file.Path file) throws java.io.IOException {
        AllanPicture picture = picture();
        if (picture == null) {
            return false;
        }
        SvgExportAction.export(picture, depthLines(), file);
        return true;
    }

    /** The text of the read-out line under the diagram. */
    public String summaryText() {
        return readout.getText();
    }

    /** Renders the current diagram into an image of the canvas's size (caller disposes it). */
    public Image snapshot() {
        Point size = canvas.getSize();
        Image image = new Image(canvas.getDisplay(), Math.max(1, size.x), Math.max(1, size.y));
        GC gc = new GC(image);
        try {
            canvas.print(gc);
        } finally {
            gc.dispose();
        }
        return image;
    }

    @Override
    public void setFocus() {
        canvas.setFocus();
    }

    private void redrawLater() {
        if (canvas != null && !canvas.isDisposed()) {
            canvas.getDisplay().asyncExec(() -> {
                if (!canvas.isDisposed()) {
                    canvas.redraw();
                }
            });
        }
    }

    @Override
    public void dispose() {
        ActiveStudy.get().removeListener(listener);
        FaultbenchPreferences.removeListener(unitsChanged);
        super.dispose();
    }

    /** Shows or hides one overlay; every overlay starts shown. */
    private final class OverlayAction extends Action {
        final Overlay overlay;

        OverlayAction(Overlay overlay) {
            super("Show " + overlay.name(), IAction.AS_CHECK_BOX);
            this.overlay = overlay;
            setChecked(true);
        }

        @Override
        public void run() {
            applyOverlays();
        }
    }

    private final class ExportAction extends Action {
        ExportAction() {
            super("Export PNG...");
            setToolTipText("Save the Allan diagram as a PNG image");
        }

        @Override
        public void run() {
            FileDialog dialog = new FileDialog(canvas.getShell(), SWT.SAVE);
            dialog.setFilterExtensions(new String[] { "*.png" });
            dialog.setFileName("allan-" + faultCombo.getText() + ".png");
            dialog.setOverwrite(true);
            String file = dialog.open();
            if (file == null) {
                return;
            }
            Image image = snapshot();
            try {
                ImageLoader loader = new ImageLoader();
                loader.data = new org.eclipse.swt.graphics.ImageData[] { image.getImageData() };
                loader.save(file, SWT.IMAGE_PNG);
            } finally {
                image.dispose();
            }
        }
    }
}
