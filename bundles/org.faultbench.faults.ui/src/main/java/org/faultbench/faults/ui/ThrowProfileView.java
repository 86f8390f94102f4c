package org.faultbench.faults.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.resources.IMarker;
import org.eclipse.core.runtime.Adapters;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.ISelectionListener;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.faults.Fault;
import org.faultbench.faults.profile.ProfileFit;
import org.faultbench.faults.profile.ThrowProfile;
import org.faultbench.faults.profile.ThrowProfileFitter;
import org.faultbench.faults.profile.ThrowProfileModel;
import org.faultbench.faults.qc.QcFinding;
import org.faultbench.study.ActiveStudy;
import org.faultbench.ui.DisplayUnits;
import org.faultbench.ui.plot.PlotAxis;
import org.faultbench.ui.plot.PlotCanvas;
import org.faultbench.ui.plot.PlotSeries;
import org.faultbench.ui.plot.XYPlotFigure;

/**
 * Throw along strike for the chosen fault: the profile sampled from the mapped horizon, the best-fitting idealised
 * profile (dashed) and the positions of QC findings (red). Findings are also listed in the Problems view; selecting
 * one there brings its fault and position here.
 */
public class ThrowProfileView extends ViewPart {
    public static final String ID = "org.faultbench.faults.ui.throwProfiles";
    private static final RGB DATA = new RGB(20, 60, 140);
    private static final RGB MODEL = new RGB(230, 130, 20);
    private static final RGB FINDING = new RGB(200, 30, 30);
    private static final RGB PICKED = new RGB(0, 150, 80);

    private Combo faultCombo;
    private Label readout;
    private XYPlotFigure plot;
    private double pickedU = Double.NaN;
    private final FaultReview.Listener reviewListener = () -> asyncRefresh();
    private final ActiveStudy.Listener studyListener = source -> {
        if (source.result().isEmpty()) {
            source.analysis().ifPresent(this::reload);
        }
    };
    private final ISelectionListener markerListener = (part, selection) -> {
        if (selection instanceof IStructuredSelection s && s.getFirstElement() != null) {
            IMarker marker = Adapters.adapt(s.getFirstElement(), IMarker.class);
            if (marker != null && marker.getAttribute(QcMarkers.FAULT, null) != null) {
                goTo(marker.getAttribute(QcMarkers.FAULT, ""), parse(marker.getAttribute(QcMarkers.POSITION, "")));
            }
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(2, false));
        new Label(parent, SWT.NONE).setText("Fault:");
        faultCombo = new Combo(parent, SWT.READ_ONLY);
        faultCombo.addListener(SWT.Selection, e -> {
            pickedU = Double.NaN;
            draw();
        });
        readout = new Label(parent, SWT.WRAP);
        readout.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
        plot = new XYPlotFigure();
        PlotCanvas.create(parent, plot).setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 2, 1));
        FaultReview.get().addListener(reviewListener);
        ActiveStudy.get().addListener(studyListener);
        getSite().getPage().addSelectionListener(markerListener);
        ActiveStudy.get().analysis().ifPresent(this::reload);
        refresh();
    }

    private void reload(org.faultbench.study.AnalysisFile analysis) {
        Job job = Job.create("Fault review: throw profiles and QC", (IProgressMonitor monitor) -> {
            FaultReview.get().load(analysis);
            FaultReview.get().state().ifPresent(state -> {
                try {
                    QcMarkers.publish(state.findings());
                } catch (CoreException e) {
                    // the plot still shows the findings; only the Problems view list is missing
                }
            });
            return Status.OK_STATUS;
        });
        job.schedule();
    }

    private void asyncRefresh() {
        if (faultCombo != null && !faultCombo.isDisposed()) {
            faultCombo.getDisplay().asyncExec(this::refresh);
        }
    }

    private void refresh() {
        if (faultCombo.isDisposed()) {
            return;
        }
        String selected = faultCombo.getText();
        faultCombo.removeAll();
        FaultReview.get().state().ifPresent(s -> s.model().faults().forEach(f -> faultCombo.add(f.id())));
        int index = faultCombo.indexOf(selected);
        faultCombo.select(index >= 0 ? index : Math.max(0, firstFaultWithFindings()));
        faultCombo.getParent().layout(true);
        draw();
    }

    /** Index of the first fault QC found something on, so a review opens where there is work; -1 if none. */
    private int firstFaultWithFindings() {
        return FaultReview.get().state().flatMap(s -> s.findings().stream().findFirst())
                .map(f -> faultCombo.indexOf(f.faultId())).orElse(-1);
    }

    /** Shows fault {@code faultId} with position {@code u} (NaN: none) picked out, as from a Problems entry. */
    public void goTo(String faultId, double u) {
        int index = faultCombo.indexOf(faultId);
        if (index >= 0) {
            faultCombo.select(index);
            pickedU = u;
            draw();
        }
    }

    private void draw() {
        Optional<FaultReview.State> state = FaultReview.get().state();
        if (state.isEmpty() || faultCombo.getSelectionIndex() < 0) {
            plot.showMessage(FaultReview.get().problem().isEmpty() ? "Loading faults..." : FaultReview.get().problem());
            readout.setText("");
            return;
        }
        String faultId = faultCombo.getText();
        Fault fault = state.get().model().fault(faultId);
        List<ThrowProfile> profiles = state.get().model().throwProfiles(faultId);
        if (profiles.isEmpty()) {
            plot.showMessage("Fault " + faultId + " has no cut-offs to measure throw from.");
            return;
        }
        ThrowProfile profile = profiles.get(0);
        List<PlotSeries> series = new ArrayList<>();
        series.add(new PlotSeries("throw, " + profile.horizon(), profile.validU(), profile.validThrows(), DATA,
                PlotSeries.Style.LINE));
        String fitText = fitSeries(profile, series);
        List<QcFinding> findings = state.get().findings().stream().filter(f -> f.faultId().equals(faultId)).toList();
        double[] at = findings.stream().mapToDouble(QcFinding::u).filter(Double::isFinite).toArray();
        if (at.length > 0) {
            series.add(new PlotSeries("QC finding", at, new double[at.length], FINDING,
                    PlotSeries.Style.VERTICAL_MARKERS));
        }
        if (Double.isFinite(pickedU)) {
            series.add(new PlotSeries("selected", new double[] { pickedU }, new double[] { 0 }, PICKED,
                    PlotSeries.Style.VERTICAL_MARKERS));
        }
        DisplayUnits units = DisplayUnits.current();
        double min = Math.min(0, min(profile.validThrows()));
        double max = Math.max(0, max(profile.validThrows()));
        plot.show(PlotAxis.linear("distance along strike (" + units.lengthSymbol() + ")", 0, units.length(fault.length())),
                PlotAxis.linear("throw (" + units.lengthSymbol() + ")", units.length(min), units.length(max)), false,
                series.stream().map(p -> inDisplayUnits(p, units)).toList());
        readout.setText(Labels.escape(fault.name() + ": length " + units.lengthText(fault.length(), 0) + ", max |throw| "
                + units.lengthText(profile.maxAbsThrow(), 1) + ". " + fitText + "  " + findings.size()
                + " QC finding(s)" + (findings.isEmpty() ? "." : ": " + findings.get(0).message())));
        readout.getParent().layout(true);
    }

    private static String fitText(ProfileFit fit) {
        DisplayUnits units = DisplayUnits.current();
        return "Best fit: " + fit.model().name() + ", Dmax " + units.lengthText(fit.maxThrow(), 1) + ", tip to tip "
                + units.lengthText(fit.length(), 0) + ".";
    }

    /** Both axes of a throw profile are lengths: the series as shown in the preferred length unit. */
    private static PlotSeries inDisplayUnits(PlotSeries series, DisplayUnits units) {
        return new PlotSeries(series.name(), java.util.Arrays.stream(series.x()).map(units::length).toArray(),
                java.util.Arrays.stream(series.y()).map(units::length).toArray(), series.colour(), series.style());
    }

    private String fitSeries(ThrowProfile profile, List<PlotSeries> series) {
        try {
            ProfileFit fit = new ThrowProfileFitter().bestFit(profile, ThrowProfileModel.builtIns());
            int n = 120;
            double[] u = new double[n];
            double[] t = new double[n];
            for (int i = 0; i < n; i++) {
                u[i] = profile.minU() + (profile.maxU() - profile.minU()) * i / (n - 1);
                t[i] = fit.throwAt(u[i]);
            }
            series.add(new PlotSeries("fit: " + fit.model().name(), u, t, MODEL, PlotSeries.Style.DASHED_LINE));
            return fitText(fit);
        } catch (IllegalArgumentException e) {
            return "No model fits: " + e.getMessage();
        }
    }

    /** The plotted series, for tests. */
    public List<PlotSeries> plottedSeries() {
        return plot.series();
    }

    public String readoutText() {
        return readout.getText();
    }

    private static double parse(String text) {
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            m = Math.min(m, x);
        }
        return m;
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }

    @Override
    public void setFocus() {
        faultCombo.setFocus();
    }

    @Override
    public void dispose() {
        FaultReview.get().removeListener(reviewListener);
        ActiveStudy.get().removeListener(studyListener);
        getSite().getPage().removeSelectionListener(markerListener);
        super.dispose();
    }
}
