package org.faultbench.sim.ui;

import java.util.List;
import java.util.Locale;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFile;
import org.faultbench.trap.Mechanism;
import org.faultbench.ui.CautionBanner;
import org.faultbench.ui.NumberText;

/**
 * Results of the Monte Carlo run of the active study: per reservoir unit the spill, leak, contact, column, attic and
 * volumes as P90/P50/P10 in the exceedance convention, the mechanism shares, and a tornado of the inputs that move
 * the contact most. The toolbar starts a run as a background job with progress and cancel.
 */
public class ResultsView extends ViewPart {
    public static final String ID = "org.faultbench.sim.ui.results";

    private Label status;
    private Label mechanisms;
    private TableViewer table;
    private Combo tornadoUnit;
    private TornadoCanvas tornado;
    /** Demonstrations and screenshots: -Dfaultbench.autorun=true runs every study as soon as it is opened. */
    private static final boolean AUTORUN = Boolean.getBoolean("faultbench.autorun");

    private final ActiveStudy.Listener listener = source -> {
        if (status != null && !status.isDisposed()) {
            status.getDisplay().asyncExec(this::refresh);
        }
        if (AUTORUN && source.result().isEmpty()) {
            source.analysis().ifPresent(a -> runSimulation(a.realisations()));
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
        Composite tornadoPane = new Composite(sash, SWT.NONE);
        tornadoPane.setLayout(new GridLayout(1, false));
        tornadoUnit = new Combo(tornadoPane, SWT.READ_ONLY);
        tornadoUnit.addListener(SWT.Selection, e -> showTornado());
        tornado = new TornadoCanvas(tornadoPane);
        tornado.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        sash.setWeights(new int[] { 60, 40 });
        getViewSite().getActionBars().getToolBarManager().add(new RunAction());
        ActiveStudy.get().addListener(listener);
        refresh();
    }

    private void createTable(Composite parent) {
        table = new TableViewer(parent, SWT.FULL_SELECTION | SWT.BORDER | SWT.V_SCROLL | SWT.H_SCROLL);
        Table t = table.getTable();
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        column("Unit", 110, r -> r.unit());
        column("Quantity", 260, r -> r.quantity());
        column("P90 (low)", 90, r -> NumberText.of(r.p90(), 1));
        column("P50", 90, r -> NumberText.of(r.p50(), 1));
        column("P10 (high)", 90, r -> NumberText.of(r.p10(), 1));
        column("Mean", 90, r -> NumberText.of(r.mean(), 1));
        column("Base case", 90, r -> NumberText.of(r.baseCase(), 1));
        table.setContentProvider(ArrayContentProvider.getInstance());
    }

    private void column(String title, int width, java.util.function.Function<ResultRow, String> text) {
        TableViewerColumn c = new TableViewerColumn(table, SWT.LEFT);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((ResultRow) element);
            }
        });
    }

    private void refresh() {
        if (status.isDisposed()) {
            return;
        }
        ActiveStudy active = ActiveStudy.get();
        SimulationResult result = active.result().orElse(null);
        if (result == null) {
            status.setText(active.analysis().map(a -> "Study '" + a.study().name() + "': press Run to simulate "
                    + a.realisations() + " realisations. " + ExceedanceLevel.CONVENTION + ".")
                    .orElse("No study is open. Per-unit spill, leak, contact and column appear here as P90/P50/P10 "
                            + "(exceedance convention) after a Monte Carlo run."));
            mechanisms.setText("");
            table.setInput(List.of());
            tornado.show("", Double.NaN, List.of());
        } else {
            status.setText(String.format(Locale.ROOT, "%s: %d realisations, seed %d%s. %s.", result.studyName(),
                    result.realisationsRun(), result.settings().seed(), result.complete() ? "" : " (cancelled: partial)",
                    ExceedanceLevel.CONVENTION));
            mechanisms.setText(mechanismText(result));
            table.setInput(ResultRow.of(result));
            String selected = tornadoUnit.getText();
            tornadoUnit.setItems(result.tornado().keySet().toArray(String[]::new));
            int index = tornadoUnit.indexOf(selected);
            tornadoUnit.select(Math.max(0, index));
            showTornado();
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

    private void showTornado() {
        SimulationResult result = ActiveStudy.get().result().orElse(null);
        String unit = tornadoUnit.getText();
        if (result == null || unit.isEmpty()) {
            return;
        }
        UnitSummary summary = result.units().stream().filter(u -> u.unitName().equals(unit)).findFirst().orElse(null);
        double base = summary == null ? Double.NaN : summary.baseCase().get(UnitQuantity.CONTACT);
        tornado.show(unit, base, result.tornado().getOrDefault(unit, List.of()));
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
        super.dispose();
    }

    private final class RunAction extends Action {
        RunAction() {
            super("Run Monte Carlo");
            setToolTipText("Run the Monte Carlo analysis of the open study in the background (cancel from the progress bar)");
        }

        @Override
        public void run() {
            ActiveStudy.get().analysis().ifPresent(a -> runSimulation(a.realisations()));
        }
    }
}
