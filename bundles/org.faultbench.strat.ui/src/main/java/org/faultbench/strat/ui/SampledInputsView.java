package org.faultbench.strat.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.eclipse.core.commands.operations.IUndoContext;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.CheckboxCellEditor;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.operations.UndoRedoActionGroup;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.core.uncertain.UncertainValueNotation;
import org.faultbench.sim.ContributedInput;
import org.faultbench.sim.SampledInput;
import org.faultbench.sim.SampledInputContributions;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.StudyEdits;

/**
 * The uncertain inputs installed plug-ins offer (extension point {@code org.faultbench.sim.sampledInputs}) and
 * whether the active study draws them: tick Use to draw one in every realisation, type a distribution to replace the
 * plug-in's own. Inputs the study draws come first, in draw order. Edits are undoable study edits, as in the
 * stratigraphy table.
 */
public class SampledInputsView extends ViewPart {
    public static final String ID = "org.faultbench.strat.ui.sampledInputs";
    private static final int USE = 0;
    private static final int DISTRIBUTION = 4;

    /** One installed input and, when the study draws it, how. */
    record InputRow(SampledInput input, ContributedInput drawn) {
        UncertainValue distribution() {
            return drawn == null ? input.distribution() : drawn.distribution();
        }
    }

    private TableViewer table;
    private Label feedback;
    private IUndoContext undoContext;
    private final ActiveStudy.Listener listener = source -> {
        if (table != null && !table.getControl().isDisposed()) {
            table.getControl().getDisplay().asyncExec(this::refresh);
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        undoContext = PlatformUI.getWorkbench().getOperationSupport().getUndoContext();
        parent.setLayout(new GridLayout(1, false));
        Label hint = new Label(parent, SWT.WRAP);
        hint.setText("Uncertain inputs offered by installed plug-ins. Tick Use to draw one in every realisation (after"
                + " the built-in inputs, in this order); type a distribution to replace the plug-in's own.");
        hint.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        table = new TableViewer(parent, SWT.FULL_SELECTION | SWT.BORDER | SWT.V_SCROLL);
        table.getTable().setHeaderVisible(true);
        table.getTable().setLinesVisible(true);
        table.getTable().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        table.setContentProvider(ArrayContentProvider.getInstance());
        column("Use", 50, r -> r.drawn() != null ? "\u2611" : "\u2610", new UseEditing());
        column("Input", 180, r -> r.input().name(), null);
        column("Id", 170, r -> r.input().id(), null);
        column("Acts on", 190, r -> r.input().target().description(), null);
        column("Distribution", 190, r -> UncertainValueNotation.format(r.distribution(), r.input().bounds())
                + (r.drawn() == null ? " (plug-in default)" : ""), new DistributionEditing());
        feedback = new Label(parent, SWT.WRAP);
        feedback.setLayoutData(new GridData(SWT.FILL, SWT.BOTTOM, true, false));
        feedback.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        new UndoRedoActionGroup(getSite(), undoContext, true).fillActionBars(getViewSite().getActionBars());
        ActiveStudy.get().addListener(listener);
        refresh();
    }

    private void column(String title, int width, Function<InputRow, String> text,
            EditingSupport editing) {
        TableColumns.add(table, InputRow.class, title, width, text, editing);
    }

    /** Ticking includes the input with the plug-in's distribution; unticking leaves it out. */
    private final class UseEditing extends EditingSupport {
        private final CheckboxCellEditor editor = new CheckboxCellEditor(table.getTable());

        UseEditing() {
            super(table);
        }

        @Override
        protected CellEditor getCellEditor(Object element) {
            return editor;
        }

        @Override
        protected boolean canEdit(Object element) {
            return ActiveStudy.get().analysis().isPresent();
        }

        @Override
        protected Object getValue(Object element) {
            return ((InputRow) element).drawn() != null;
        }

        @Override
        protected void setValue(Object element, Object value) {
            InputRow row = (InputRow) element;
            boolean use = Boolean.TRUE.equals(value);
            if (use != (row.drawn() != null)) {
                apply((use ? "Draw " : "Stop drawing ") + row.input().name(), row, use, null);
            }
        }
    }

    /** A typed distribution includes the input with it; an empty cell goes back to the plug-in's own. */
    private final class DistributionEditing extends EditingSupport {
        private InputRow editing;
        private final TextCellEditor editor = NotationCellEditor.create(table.getTable(),
                text -> editing == null ? null : problem(editing, text), SampledInputsView.this::showProblem);

        DistributionEditing() {
            super(table);
        }

        @Override
        protected CellEditor getCellEditor(Object element) {
            editing = (InputRow) element;
            return editor;
        }

        @Override
        protected boolean canEdit(Object element) {
            return ActiveStudy.get().analysis().isPresent();
        }

        @Override
        protected Object getValue(Object element) {
            InputRow row = (InputRow) element;
            return row.drawn() == null ? "" : UncertainValueNotation.format(row.distribution(), row.input().bounds());
        }

        @Override
        protected void setValue(Object element, Object value) {
            InputRow row = (InputRow) element;
            String text = value == null ? "" : value.toString().strip();
            if (problem(row, text) != null) {
                return;
            }
            UncertainValue typed = text.isEmpty() ? null
                    : UncertainValueNotation.parse(text, row.input().bounds(), row.input().name());
            if (row.drawn() == null || typed == null || !typed.equals(row.distribution())) {
                apply("Set distribution of " + row.input().name(), row, true, typed);
            }
        }
    }

    /** An empty cell is valid: it means the plug-in's own distribution. */
    private static String problem(InputRow row, String text) {
        return text.isBlank() ? null : NotationCellEditor.problem(text, row.input().bounds(), row.input().name());
    }

    private void apply(String label, InputRow row, boolean use, UncertainValue distribution) {
        ActiveStudy.get().analysis().ifPresent(before -> showProblem(StudyEditRunner.run(label, undoContext, before,
                () -> StudyEdits.withSampledInput(before, row.input(), use, distribution))));
    }

    private void showProblem(String message) {
        if (!feedback.isDisposed()) {
            feedback.setText(message == null ? "" : message);
            feedback.getParent().layout(new org.eclipse.swt.widgets.Control[] { feedback });
        }
    }

    /** Drawn inputs first in draw order, then the other installed inputs in registration order. */
    static List<InputRow> rows(AnalysisFile analysis, Map<String, SampledInput> installed) {
        List<InputRow> rows = new ArrayList<>();
        List<ContributedInput> drawn = analysis == null ? List.of() : analysis.study().contributedInputs();
        for (ContributedInput c : drawn) {
            rows.add(new InputRow(installed.getOrDefault(c.id(), c.input()), c));
        }
        for (SampledInput input : installed.values()) {
            if (drawn.stream().noneMatch(c -> c.id().equals(input.id()))) {
                rows.add(new InputRow(input, null));
            }
        }
        return rows;
    }

    private void refresh() {
        if (table.getControl().isDisposed()) {
            return;
        }
        table.setInput(rows(ActiveStudy.get().analysis().orElse(null), SampledInputContributions.platformInputs()));
    }

    /** Ids of the rows shown, in order, for tests. */
    public List<String> inputIds() {
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < table.getTable().getItemCount(); i++) {
            ids.add(((InputRow) table.getElementAt(i)).input().id());
        }
        return ids;
    }

    /** The text shown in row {@code row}'s Use or Distribution cell, for tests. */
    public String cellText(int row, boolean useColumn) {
        return table.getTable().getItem(row).getText(useColumn ? USE : DISTRIBUTION);
    }

    /** Opens the Use (toggles it) or Distribution cell editor of row {@code row}, as a click would. */
    public void editCell(int row, boolean useColumn) {
        table.editElement(table.getElementAt(row), useColumn ? USE : DISTRIBUTION);
    }

    /** The table viewer, so tests can reach the cell editors as a user would. */
    public TableViewer tableViewer() {
        return table;
    }

    public String problemText() {
        return feedback.getText();
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
}
