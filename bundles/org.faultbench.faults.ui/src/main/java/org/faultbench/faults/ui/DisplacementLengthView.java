package org.faultbench.faults.ui;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.faults.profile.EllipticalProfile;
import org.faultbench.faults.scaling.DisplacementLengthData;
import org.faultbench.faults.scaling.DisplacementLengthPoint;
import org.faultbench.faults.scaling.ScalingEnvelope;
import org.faultbench.faults.scaling.ScalingLaw;
import org.faultbench.ui.NumberText;
import org.faultbench.ui.plot.PlotAxis;
import org.faultbench.ui.plot.PlotCanvas;
import org.faultbench.ui.plot.PlotSeries;
import org.faultbench.ui.plot.XYPlotFigure;

/**
 * Maximum displacement against length for every fault of the review, on log-log axes, against the usual band of
 * normal-fault populations. A fault far outside the band was probably mis-measured or over-correlated.
 */
public class DisplacementLengthView extends ViewPart {
    public static final String ID = "org.faultbench.faults.ui.displacementLength";
    private static final RGB INSIDE = new RGB(20, 60, 140);
    private static final RGB OUTSIDE = new RGB(200, 30, 30);
    private static final RGB BAND = new RGB(120, 120, 120);

    private XYPlotFigure plot;
    private Label readout;
    private final FaultReview.Listener listener = () -> {
        if (readout != null && !readout.isDisposed()) {
            readout.getDisplay().asyncExec(this::draw);
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        readout = new Label(parent, SWT.WRAP);
        readout.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        plot = new XYPlotFigure();
        PlotCanvas.create(parent, plot).setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        FaultReview.get().addListener(listener);
        draw();
    }

    private void draw() {
        if (readout.isDisposed()) {
            return;
        }
        var state = FaultReview.get().state();
        if (state.isEmpty()) {
            plot.showMessage(FaultReview.get().problem().isEmpty() ? "Loading faults..." : FaultReview.get().problem());
            return;
        }
        DisplacementLengthData data = DisplacementLengthData.collect(state.get().model().throwProfilesByFault(),
                new EllipticalProfile());
        List<DisplacementLengthPoint> points = data.points();
        if (points.isEmpty()) {
            plot.showMessage("No fault profile could be fitted: " + data.skipped());
            return;
        }
        ScalingEnvelope band = ScalingEnvelope.NORMAL_FAULTS;
        List<PlotSeries> series = new ArrayList<>();
        List<DisplacementLengthPoint> inside = points.stream()
                .filter(p -> band.contains(p.maxDisplacement(), p.length())).toList();
        List<DisplacementLengthPoint> outside = points.stream()
                .filter(p -> !band.contains(p.maxDisplacement(), p.length())).toList();
        double lMin = points.stream().mapToDouble(DisplacementLengthPoint::length).min().orElse(100) / 3;
        double lMax = points.stream().mapToDouble(DisplacementLengthPoint::length).max().orElse(1000) * 3;
        PlotAxis x = PlotAxis.log("fault length L (m)", lMin, lMax);
        series.add(line(band.lower(), x));
        series.add(line(band.upper(), x));
        series.add(points("faults inside the band", inside, INSIDE));
        series.add(points("faults outside the band", outside, OUTSIDE));
        double dMin = Math.min(band.minRatio() * x.min(), points.stream()
                .mapToDouble(DisplacementLengthPoint::maxDisplacement).min().orElse(1));
        double dMax = Math.max(band.maxRatio() * x.max(), points.stream()
                .mapToDouble(DisplacementLengthPoint::maxDisplacement).max().orElse(10));
        plot.show(x, PlotAxis.log("max displacement D (m)", dMin, dMax), false, series);
        StringBuilder text = new StringBuilder();
        for (DisplacementLengthPoint p : points) {
            text.append(p.faultId()).append(": D/L ").append(NumberText.of(p.ratio(), 3)).append("   ");
        }
        text.append("Band: ").append(band.source());
        readout.setText(Labels.escape(text.toString()));
        readout.getParent().layout(true);
    }

    private static PlotSeries line(ScalingLaw law, PlotAxis x) {
        return new PlotSeries(law.name(), new double[] { x.min(), x.max() },
                new double[] { law.displacementAt(x.min()), law.displacementAt(x.max()) }, BAND,
                PlotSeries.Style.DASHED_LINE);
    }

    private static PlotSeries points(String name, List<DisplacementLengthPoint> points, RGB colour) {
        return new PlotSeries(points.isEmpty() ? "" : name,
                points.stream().mapToDouble(DisplacementLengthPoint::length).toArray(),
                points.stream().mapToDouble(DisplacementLengthPoint::maxDisplacement).toArray(), colour,
                PlotSeries.Style.POINTS);
    }

    public List<PlotSeries> plottedSeries() {
        return plot.series();
    }

    @Override
    public void setFocus() {
        readout.setFocus();
    }

    @Override
    public void dispose() {
        FaultReview.get().removeListener(listener);
        super.dispose();
    }
}
