package org.faultbench.strat.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;

import org.eclipse.core.commands.operations.IUndoContext;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnViewerEditor;
import org.eclipse.jface.viewers.ColumnViewerEditorActivationStrategy;
import org.eclipse.jface.viewers.ComboBoxViewerCellEditor;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerEditor;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.FocusCellOwnerDrawHighlighter;
import org.eclipse.jface.viewers.TableViewerFocusCellManager;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.ISaveablePart;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.operations.UndoRedoActionGroup;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.core.LithologyClass;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.core.uncertain.UncertainValueNotation;
import org.faultbench.strat.Stratigraphy;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.AnalysisFileSaver;
import org.faultbench.study.StudyEdits;
import org.faultbench.study.UnitProperty;

/**
 * The stratigraphy of the active study as an editable table (one row per unit, distributions typed as
 * {@code normal(14, 2)}, {@code triangular(0.2, 0.25, 0.28)} ...) beside the column drawn to scale. Text is checked as
 * it is typed; an accepted edit is an undoable operation on the workbench's history and marks the study unsaved
 * (File &gt; Save writes it back, keeping the previous file as .bak).
 */
public class StratigraphyEditorView extends ViewPart implements ISaveablePart {
    public static final String ID = "org.faultbench.strat.ui.stratigraphyEditor";

    private TableViewer table;
    private StratColumnCanvas column;
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
        hint.setText("Type a number or a distribution: normal(mean, sd), triangular(min, mode, max), uniform(min, max),"
                + " lognormal(median, sigmaLn); add min, max to truncate a normal.");
        hint.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        SashForm sash = new SashForm(parent, SWT.HORIZONTAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        createTable(sash);
        column = new StratColumnCanvas(sash);
        sash.setWeights(new int[] { 68, 32 });
        feedback = new Label(parent, SWT.WRAP);
        feedback.setLayoutData(new GridData(SWT.FILL, SWT.BOTTOM, true, false));
        feedback.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        new UndoRedoActionGroup(getSite(), undoContext, true).fillActionBars(getViewSite().getActionBars());
        ActiveStudy.get().addListener(listener);
        refresh();
    }

    private void createTable(Composite parent) {
        table = new TableViewer(parent, SWT.FULL_SELECTION | SWT.BORDER | SWT.V_SCROLL | SWT.H_SCROLL);
        table.getTable().setHeaderVisible(true);
        table.getTable().setLinesVisible(true);
        table.setContentProvider(ArrayContentProvider.getInstance());
        TableViewerFocusCellManager focus = new TableViewerFocusCellManager(table,
                new FocusCellOwnerDrawHighlighter(table));
        TableViewerEditor.create(table, focus, new ColumnViewerEditorActivationStrategy(table),
                ColumnViewerEditor.TABBING_HORIZONTAL | ColumnViewerEditor.KEYBOARD_ACTIVATION);
        column("Unit", 120, r -> r.unit().name() + (r.index() == referenceIndex() ? " \u25C0" : ""), null);
        column("Lithology", 90, r -> r.unit().lithology().name().toLowerCase(Locale.ROOT), new LithologyEditing());
        for (UnitProperty p : UnitProperty.values()) {
            column(p.label(), p == UnitProperty.THICKNESS ? 150 : 120,
                    r -> r.unit().reservoir() || !p.reservoirOnly()
                            ? UncertainValueNotation.format(p.of(r.unit()), p.bounds()) : "\u2014",
                    new UnitPropertyEditing(table, p, this::showProblem, this::apply));
        }
        table.addSelectionChangedListener(e -> {
            Object first = ((IStructuredSelection) e.getSelection()).getFirstElement();
            column.select(first == null ? -1 : ((UnitRow) first).index());
        });
    }

    private void column(String title, int width, Function<UnitRow, String> text,
            EditingSupport editing) {
        TableColumns.add(table, UnitRow.class, title, width, text, editing);
    }

    /** Lithology is chosen from the classes the model knows. */
    private final class LithologyEditing extends EditingSupport {
        private final ComboBoxViewerCellEditor editor;

        LithologyEditing() {
            super(table);
            editor = new ComboBoxViewerCellEditor(table.getTable(), SWT.READ_ONLY);
            editor.setContentProvider(ArrayContentProvider.getInstance());
            editor.setLabelProvider(new LabelProvider() {
                @Override
                public String getText(Object element) {
                    return ((LithologyClass) element).name().toLowerCase(Locale.ROOT);
                }
            });
            editor.setInput(LithologyClass.values());
        }

        @Override
        protected CellEditor getCellEditor(Object element) {
            return editor;
        }

        @Override
        protected boolean canEdit(Object element) {
            return true;
        }

        @Override
        protected Object getValue(Object element) {
            return ((UnitRow) element).unit().lithology();
        }

        @Override
        protected void setValue(Object element, Object value) {
            UnitRow row = (UnitRow) element;
            if (value instanceof LithologyClass lithology && lithology != row.unit().lithology()) {
                ActiveStudy.get().analysis().ifPresent(a -> execute("Change lithology of " + row.unit().name(), a,
                        () -> StudyEdits.withUnitLithology(a, row.index(), lithology)));
            }
        }
    }

    private void apply(UnitRow row, UnitProperty property, UncertainValue value) {
        ActiveStudy.get().analysis().ifPresent(a -> execute("Edit " + property.label() + " of " + row.unit().name(),
                a, () -> StudyEdits.withUnitProperty(a, row.index(), property, value)));
    }

    /** Runs an edit as an undoable operation, or reports why the study would not accept it. */
    private void execute(String label, AnalysisFile before, StudyEditRunner.Edit edit) {
        showProblem(StudyEditRunner.run(label, undoContext, before, edit));
    }

    private void showProblem(String message) {
        if (!feedback.isDisposed()) {
            feedback.setText(message == null ? "" : message);
            feedback.getParent().layout(new org.eclipse.swt.widgets.Control[] { feedback });
        }
    }

    private int referenceIndex() {
        return ActiveStudy.get().analysis().map(a -> a.study().stratigraphy().referenceUnitIndex()).orElse(-1);
    }

    private void refresh() {
        if (table.getControl().isDisposed()) {
            return;
        }
        List<UnitRow> rows = new ArrayList<>();
        ActiveStudy.get().analysis().ifPresent(a -> {
            Stratigraphy strat = a.study().stratigraphy();
            for (int i = 0; i < strat.units().size(); i++) {
                rows.add(new UnitRow(i, strat.units().get(i)));
            }
            column.show(strat.units(), strat.referenceUnitIndex());
        });
        table.setInput(rows);
        setPartName(isDirty() ? "*Stratigraphy" : "Stratigraphy");
        firePropertyChange(PROP_DIRTY);
    }

    /** The rows shown, for tests and the column plot. */
    public List<String> unitNames() {
        List<String> names = new ArrayList<>();
        for (int i = 0; i < table.getTable().getItemCount(); i++) {
            names.add(((UnitRow) table.getElementAt(i)).unit().name());
        }
        return names;
    }

    /** The text of the message line under the table; empty when the last entry was valid. */
    public String problemText() {
        return feedback.getText();
    }

    /** The table viewer, so tests can drive the cell editors as a user would. */
    public TableViewer tableViewer() {
        return table;
    }

    @Override
    public void doSave(IProgressMonitor monitor) {
        ActiveStudy.get().analysis().ifPresent(a -> {
            try {
                new AnalysisFileSaver().save(a);
                // the saved file holds exactly a's content, so a stays the active study and undo keeps working
                ActiveStudy.get().saved(a);
            } catch (Exception e) {
                showProblem("Could not save " + a.file() + ": " + e.getMessage());
            }
        });
    }

    @Override
    public void doSaveAs() {
        // one file per study; copies are made in the file system
    }

    @Override
    public boolean isDirty() {
        return ActiveStudy.get().isDirty();
    }

    @Override
    public boolean isSaveAsAllowed() {
        return false;
    }

    @Override
    public boolean isSaveOnCloseNeeded() {
        return isDirty();
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
