package org.faultbench.sim.ui;

import java.util.List;
import java.util.Locale;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.sim.AdaptiveHistogram;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFile;
import org.faultbench.trap.Mechanism;
import org.faultbench.ui.CautionBanner;
import org.faultbench.ui.DisplayUnits;
import org.faultbench.ui.NumberText;
import org.faultbench.ui.plot.PlotCanvas;
import org.faultbench.ui.plot.XYPlotFigure;
import org.faultbench.ui.preferences.FaultbenchPreferences;

/**
 * Results of the Monte Carlo run of the active study: per reservoir unit the spill, leak, contact, column, attic and
 * volumes as P90/P50/P10 in the exceedance convention, the mechanism shares, and below, per unit and quantity, the
 * histogram and the exceedance curve with P90/P50/P10 markers, and the tornado of the inputs that move the contact
 * most. Numbers are in the display units of the preferences and follow their changes. The toolbar starts a run as a
 * background job with progress and cancel.
 */
public class ResultsView extends ViewPart {
    public static final String ID = "org.faultbench.sim.ui.results";

    private Label status;
    private Label mechanisms;
    private TableViewer table;
    private TableColumn quantityColumn;
    private Combo unitCombo;
    private Combo quantityCombo;
    private CTabFolder tabs;
    private XYPlotFigure histogram;
    private XYPlotFigure exceedance;
    private TornadoCanvas tornado;
    private final IPropertyChangeListener preferences = e -> {
        if (status != null && !status.isDisposed()) {
            status.getDisplay().asyncExec(this::refresh);
        }
    };
    /** Demonstrations and screenshots: -Dfaultbench.autorun=true runs every study as soon as it is opened. */
    private static final boolean AUTORUN = Boolean.getBoolean("faultbench.autorun");

    private final ActiveStudy.Listener listener = source -> {
        if (status != null && !status.isDisposed()) {
            status.getDisplay().asyncExec(this::refresh);
        }
        if (AUTORUN && source.result().isEmpty()) {
            source.analysis().ifPresent(a -> runSimulation(realisationsFor(a)));
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        CautionBanner.create(parent);
        status = new Label(parent, SWT.WRAP);
        status.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        mechanisms = new Label(parent, SWT.WRAP);
        mechanisms.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        SashForm sash = new SashForm(parent, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        createTable(sash);
        createDistributionPane(sash);
        sash.setWeights(new int[] { 35, 65 });
        // a wide, low view shows the table and the distributions side by side, a tall one stacks them
        sash.addListener(SWT.Resize, e -> {
            int orientation = sash.getSize().x > 1.6 * sash.getSize().y ? SWT.HORIZONTAL : SWT.VERTICAL;
            if (sash.getOrientation() != orientation) {
                sash.setOrientation(orientation);
                sash.setWeights(orientation == SWT.HORIZONTAL ? new int[] { 50, 50 } : new int[] { 35, 65 });
            }
        });
        getViewSite().getActionBars().getToolBarManager().add(new RunAction());
        ActiveStudy.get().addListener(listener);
        FaultbenchPreferences.addListener(preferences);
        refresh();
    }

    /** Unit and quantity choosers above tabs with the histogram, the exceedance curve and the tornado. */
    private void createDistributionPane(Composite parent) {
        Composite pane = new Composite(parent, SWT.NONE);
        pane.setLayout(new GridLayout(4, false));
        new Label(pane, SWT.NONE).setText("Unit:");
        unitCombo = new Combo(pane, SWT.READ_ONLY);
        unitCombo.addListener(SWT.Selection, e -> showDistribution());
        new Label(pane, SWT.NONE).setText("Quantity:");
        quantityCombo = new Combo(pane, SWT.READ_ONLY);
        for (UnitQuantity q : ResultRow.SHOWN) {
            quantityCombo.add(q.label());
        }
        quantityCombo.select(List.of(ResultRow.SHOWN).indexOf(UnitQuantity.CONTACT));
        quantityCombo.addListener(SWT.Selection, e -> showDistribution());
        tabs = new CTabFolder(pane, SWT.BORDER | SWT.BOTTOM);
        tabs.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 4, 1));
        histogram = new XYPlotFigure();
        tab("Histogram", plotCanvas(histogram));
        exceedance = new XYPlotFigure();
        tab("Cumulative (exceedance)", plotCanvas(exceedance));
        tornado = new TornadoCanvas(tabs);
        tab("Tornado", tornado);
        tabs.setSelection(0);
    }

    private Control plotCanvas(XYPlotFigure figure) {
        return PlotCanvas.create(tabs, figure);
    }

    private void tab(String title, Control control) {
        CTabItem item = new CTabItem(tabs, SWT.NONE);
        item.setText(title);
        item.setControl(control);
    }

    private void createTable(Composite parent) {
        table = new TableViewer(parent, SWT.FULL_SELECTION | SWT.BORDER | SWT.V_SCROLL | SWT.H_SCROLL);
        Table t = table.getTable();
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        column("Unit", 110, r -> r.unit());
        quantityColumn = column("Quantity", 260, r -> r.quantity());
        column("P90 (low)", 90, r -> NumberText.of(r.p90(), 1));
        column("P50", 90, r -> NumberText.of(r.p50(), 1));
        column("P10 (high)", 90, r -> NumberText.of(r.p10(), 1));
        column("Mean", 90, r -> NumberText.of(r.mean(), 1));
        column("Base case", 90, r -> NumberText.of(r.baseCase(), 1));
        table.setContentProvider(ArrayContentProvider.getInstance());
    }

    private TableColumn column(String title, int width, java.util.function.Function<ResultRow, String> text) {
        TableViewerColumn c = new TableViewerColumn(table, SWT.LEFT);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((ResultRow) element);
            }
        });
        return c.getColumn();
    }

    private void refresh() {
        if (status.isDisposed()) {
            return;
        }
        ActiveStudy active = ActiveStudy.get();
        SimulationResult result = active.result().orElse(null);
        DisplayUnits units = DisplayUnits.current();
        quantityColumn.setText("Quantity (lengths in " + units.lengthSymbol() + ", volumes in " + units.volumeSymbol()
                + ")");
        if (result == null) {
            status.setText(active.analysis().map(a -> "Study '" + a.study().name() + "': press Run to simulate "
                    + realisationsFor(a) + " realisations. " + ExceedanceLevel.CONVENTION + ".")
                    .orElse("No study is open. Per-unit spill, leak, contact and column appear here as P90/P50/P10 "
                            + "(exceedance convention) after a Monte Carlo run."));
            mechanisms.setText("");
            table.setInput(List.of());
            unitCombo.setItems(new String[0]);
            histogram.showMessage("The histogram of the chosen unit and quantity appears here after a run.");
            exceedance.showMessage("The probability of exceeding each value appears here after a run.");
            tornado.show("", Double.NaN, List.of());
        } else {
            status.setText(String.format(Locale.ROOT, "%s: %d realisations, seed %d%s. %s.", result.studyName(),
                    result.realisationsRun(), result.settings().seed(), result.complete() ? "" : " (cancelled: partial)",
                    ExceedanceLevel.CONVENTION));
            mechanisms.setText(mechanismText(result));
            table.setInput(ResultRow.of(result, units));
            String selected = unitCombo.getText();
            unitCombo.setItems(result.units().stream().map(UnitSummary::unitName).toArray(String[]::new));
            int index = unitCombo.indexOf(selected);
            unitCombo.select(Math.max(0, index));
            showDistribution();
        }
        status.getParent().layout(true, true);
    }

    private static String mechanismText(SimulationResult result) {
        StringBuilder text = new StringBuilder("Controlled by: ");
        for (UnitSummary unit : result.units()) {
            text.append(unit.unitName()).append(" \u2014 ");
            for (Mechanism m : Mechanism.values()) {
                double share = unit.mechanismFractions().get(m);
                if (share > 0) {
                    text.append(m.name().toLowerCase(Locale.ROOT)).append(' ').append(NumberText.percent(share))
                            .append(' ');
                }
            }
            text.append("; ");
        }
        result.warnings().forEach(w -> text.append("\nWARNING: ").append(w));
        return text.toString();
    }

    private UnitSummary selectedUnit(SimulationResult result) {
        String unit = unitCombo.getText();
        return result.units().stream().filter(u -> u.unitName().equals(unit)).findFirst().orElse(null);
    }

    /** Redraws the histogram, exceedance curve and tornado of the chosen unit and quantity. */
    private void showDistribution() {
        SimulationResult result = ActiveStudy.get().result().orElse(null);
        UnitSummary summary = result == null ? null : selectedUnit(result);
        if (summary == null) {
            return;
        }
        UnitQuantity q = ResultRow.SHOWN[Math.max(0, quantityCombo.getSelectionIndex())];
        AdaptiveHistogram h = summary.histogram(q);
        DisplayUnits units = DisplayUnits.current();
        if (h == null || h.finiteCount() == 0) {
            String why = summary.unitName() + ": no realisation gave a " + q.label() + ".";
            histogram.showMessage(why);
            exceedance.showMessage(why);
        } else {
            HistogramPlots.Plot bars = HistogramPlots.histogram(q, h, summary.statistics(q), units);
            histogram.show(bars.x(), bars.y(), false, bars.series());
            HistogramPlots.Plot curve = HistogramPlots.exceedance(q, h, summary.statistics(q), units);
            exceedance.show(curve.x(), curve.y(), false, curve.series());
        }
        tornado.show(summary.unitName(), summary.baseCase().get(UnitQuantity.CONTACT),
                result.tornado().getOrDefault(summary.unitName(), List.of()));
    }

    /** Chooses the unit and quantity of the histogram and exceedance tabs (tests, scripts). */
    public void showDistribution(String unit, UnitQuantity quantity) {
        unitCombo.select(unitCombo.indexOf(unit));
        quantityCombo.select(List.of(ResultRow.SHOWN).indexOf(quantity));
        showDistribution();
    }

    /** The histogram figure (tests). */
    public XYPlotFigure histogramFigure() {
        return histogram;
    }

    /** The exceedance-curve figure (tests). */
    public XYPlotFigure exceedanceFigure() {
        return exceedance;
    }

    /** The header of the quantity column, naming the display units. */
    public String quantityHeader() {
        return quantityColumn.getText();
    }

    /**
     * Realisations of a run from the toolbar: the analysis file's simulation.realisations when it gives one, else the
     * default of the preferences.
     */
    static int realisationsFor(AnalysisFile analysis) {
        var document = analysis.document();
        boolean given = document != null && document.has("simulation") && document.get("simulation").isJsonObject()
                && document.getAsJsonObject("simulation").has("realisations");
        return given ? analysis.realisations() : FaultbenchPreferences.defaultRealisations();
    }

    /** The text the view currently shows in its status line. */
    public String summaryText() {
        return status.getText();
    }

    /** The rows of the results table (for tests and export). */
    @SuppressWarnings("unchecked")
    public List<ResultRow> rows() {
        Object input = table.getInput();
        return input == null ? List.of() : (List<ResultRow>) input;
    }

    /** Starts a run of the active study; returns the job, or null when no study is open. */
    public SimulationJob runSimulation(int realisations) {
        AnalysisFile analysis = ActiveStudy.get().analysis().orElse(null);
        if (analysis == null) {
            return null;
        }
        SimulationJob job = new SimulationJob(analysis, new SimulationSettings(realisations, analysis.seed(),
                Runtime.getRuntime().availableProcessors(), analysis.cellHeight()));
        job.schedule();
        return job;
    }

    @Override
    public void setFocus() {
        table.getControl().setFocus();
    }

    @Override
    public void dispose() {
        ActiveStudy.get().removeListener(listener);
        FaultbenchPreferences.removeListener(preferences);
        super.dispose();
    }

    private final class RunAction extends Action {
        RunAction() {
            super("Run Monte Carlo");
            setToolTipText("Run the Monte Carlo analysis of the open study in the background (cancel from the progress"
                    + " bar); realisations from the study file, else from Window > Preferences > Faultbench");
        }

        @Override
        public void run() {
            ActiveStudy.get().analysis().ifPresent(a -> runSimulation(realisationsFor(a)));
        }
    }
}
