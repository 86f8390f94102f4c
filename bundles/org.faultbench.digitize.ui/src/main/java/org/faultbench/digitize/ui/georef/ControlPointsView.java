package org.faultbench.digitize.ui.georef;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.eclipse.gef.commands.CommandStack;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.CheckboxCellEditor;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.IWorkbenchPart;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.part.ViewPart;
import org.faultbench.digitize.georef.ControlPoint;
import org.faultbench.digitize.georef.FitReport;
import org.faultbench.digitize.georef.TransformKind;
import org.faultbench.digitize.ui.editing.ControlPointCommand;
import org.faultbench.digitize.ui.editing.Georeference;
import org.faultbench.digitize.ui.editing.MapDocument;
import org.faultbench.digitize.ui.editing.ResidualRow;
import org.faultbench.digitize.ui.editing.ResidualTable;
import org.faultbench.digitize.ui.editing.TransformKindCommand;

/**
 * Control points of the scan in the active map editor, with the residuals of the current fit: id, pixel, map
 * position, residual dx, dy and |r|, leave-one-out |r|, the worst point highlighted; the transform kind, the RMS
 * and a tolerance, with a warning when the RMS exceeds it. Map x/y and "on" are edited in the table, through the
 * editor's command stack (so Undo reverts them); the table is rebuilt from the fit after every change.
 */
public final class ControlPointsView extends ViewPart implements Georeference.Listener {
    public static final String ID = "org.faultbench.digitize.ui.controlPoints";
    private static final Color WORST = new Color(255, 215, 200);
    private static final String[] TITLES = { "Id", "On", "Pixel col", "Pixel row", "Map x", "Map y", "dx", "dy",
        "|r|", "Leave-one-out |r|" };

    private TableViewer table;
    private Combo kind;
    private Text tolerance;
    private Label summary;
    private Label warning;
    private Georeference georeference;
    private CommandStack commands;
    private final IPartListener2 editorTracker = new IPartListener2() {
        @Override
        public void partActivated(IWorkbenchPartReference ref) {
            follow(ref.getPart(false));
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(4, false));
        new Label(parent, SWT.NONE).setText("Transform:");
        kind = new Combo(parent, SWT.READ_ONLY);
        for (TransformKind k : TransformKind.values()) {
            kind.add(k.label());
        }
        kind.addListener(SWT.Selection, e -> chooseKind());
        new Label(parent, SWT.NONE).setText("RMS tolerance (map units):");
        tolerance = new Text(parent, SWT.BORDER);
        tolerance.setText("5");
        tolerance.setLayoutData(new GridData(80, SWT.DEFAULT));
        tolerance.addListener(SWT.Modify, e -> refresh());
        summary = new Label(parent, SWT.NONE);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 4, 1));
        warning = new Label(parent, SWT.WRAP);
        warning.setForeground(new Color(170, 0, 0));
        warning.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 4, 1));
        table = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION);
        table.getTable().setHeaderVisible(true);
        table.getTable().setLinesVisible(true);
        table.getTable().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 4, 1));
        table.setContentProvider(ArrayContentProvider.getInstance());
        for (int c = 0; c < TITLES.length; c++) {
            column(c);
        }
        getSite().getPage().addPartListener(editorTracker);
        follow(getSite().getPage().getActiveEditor());
    }

    private void column(int index) {
        TableViewerColumn column = new TableViewerColumn(table, SWT.RIGHT);
        column.getColumn().setText(TITLES[index]);
        column.getColumn().setWidth(index == 0 ? 60 : index == 1 ? 40 : 95);
        column.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return cell((ResidualRow) element, index);
            }

            @Override
            public Color getBackground(Object element) {
                return ((ResidualRow) element).worst() ? WORST : null;
            }
        });
        if (index == 1 || index == 4 || index == 5) {
            column.setEditingSupport(new PointEditing(index));
        }
    }

    static String cell(ResidualRow row, int index) {
        ControlPoint p = row.point();
        return switch (index) {
            case 0 -> p.id() + (row.worst() ? " (worst)" : "");
            case 1 -> p.enabled() ? "yes" : "no";
            case 2 -> number(p.col(), 2);
            case 3 -> number(p.row(), 2);
            case 4 -> number(p.x(), 2);
            case 5 -> number(p.y(), 2);
            case 6 -> optional(row.dx());
            case 7 -> optional(row.dy());
            case 8 -> optional(row.magnitude());
            default -> optional(row.leaveOneOut());
        };
    }

    private static String optional(OptionalDouble value) {
        return value.isPresent() ? number(value.getAsDouble(), 3) : "";
    }

    private static String number(double value, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }

    /** Shows the control points of {@code part} if it is a map editor. */
    private void follow(IWorkbenchPart part) {
        if (part == null || part == this) {
            return;
        }
        MapDocument document = part.getAdapter(MapDocument.class);
        CommandStack stack = part.getAdapter(CommandStack.class);
        if (document == null || stack == null || document.georeference() == georeference) {
            return;
        }
        if (georeference != null) {
            georeference.removeListener(this);
        }
        georeference = document.georeference();
        commands = stack;
        georeference.addListener(this);
        refresh();
    }

    @Override
    public void georeferenceChanged(Georeference changed) {
        if (!table.getControl().isDisposed()) {
            refresh();
        }
    }

    /** The rows shown, for tests. */
    @SuppressWarnings("unchecked")
    public List<ResidualRow> rows() {
        Object input = table.getInput();
        return input == null ? List.of() : (List<ResidualRow>) input;
    }

    public String summaryText() {
        return summary.getText();
    }

    public String warningText() {
        return warning.getText();
    }

    private void refresh() {
        if (georeference == null) {
            summary.setText("Open a scanned map in the map editor to see its control points.");
            return;
        }
        kind.select(georeference.kind().ordinal());
        table.setInput(ResidualTable.rows(georeference.points(), georeference.fit()));
        if (georeference.fit().isEmpty()) {
            summary.setText("No fit: " + georeference.problem());
            warning.setText("Until the scan is georeferenced, features are digitized in pixel units.");
        } else {
            FitReport fit = georeference.fit().get();
            summary.setText(String.format(Locale.ROOT, "%s fit to %d points: RMS %.3f map units (%.2f pixels)",
                    fit.transform().kind().label(), fit.residuals().size(), fit.rms(), fit.rmsPixels()));
            warning.setText(String.join("\n", fit.warnings(toleranceValue())));
        }
        summary.getParent().layout();
    }

    private double toleranceValue() {
        try {
            double value = Double.parseDouble(tolerance.getText().strip());
            return value >= 0 && Double.isFinite(value) ? value : Double.MAX_VALUE;
        } catch (NumberFormatException notYet) {
            return Double.MAX_VALUE;
        }
    }

    private void chooseKind() {
        if (georeference != null && kind.getSelectionIndex() >= 0) {
            TransformKind chosen = TransformKind.values()[kind.getSelectionIndex()];
            if (chosen != georeference.kind()) {
                commands.execute(new TransformKindCommand(georeference, chosen));
            }
        }
    }

    @Override
    public void setFocus() {
        table.getControl().setFocus();
    }

    @Override
    public void dispose() {
        getSite().getPage().removePartListener(editorTracker);
        if (georeference != null) {
            georeference.removeListener(this);
        }
        super.dispose();
    }

    /** Edits map x, map y or the "on" flag of a point through the command stack. */
    private final class PointEditing extends EditingSupport {
        private final int index;

        PointEditing(int index) {
            super(table);
            this.index = index;
        }

        @Override
        protected CellEditor getCellEditor(Object element) {
            return index == 1 ? new CheckboxCellEditor(table.getTable()) : new TextCellEditor(table.getTable());
        }

        @Override
        protected boolean canEdit(Object element) {
            return commands != null;
        }

        @Override
        protected Object getValue(Object element) {
            ControlPoint p = ((ResidualRow) element).point();
            return index == 1 ? (Object) p.enabled() : number(index == 4 ? p.x() : p.y(), 3);
        }

        @Override
        protected void setValue(Object element, Object value) {
            ControlPoint p = ((ResidualRow) element).point();
            ControlPoint edited;
            if (index == 1) {
                edited = p.withEnabled((Boolean) value);
            } else {
                double number;
                try {
                    number = Double.parseDouble(String.valueOf(value).strip());
                } catch (NumberFormatException notANumber) {
                    warning.setText("control point '" + p.id() + "': map " + (index == 4 ? "x" : "y")
                            + " must be a number, was '" + value + "'");
                    return;
                }
                edited = new ControlPoint(p.id(), p.col(), p.row(), index == 4 ? number : p.x(),
                        index == 5 ? number : p.y(), p.enabled());
            }
            if (!edited.equals(p)) {
                commands.execute(ControlPointCommand.replacing(georeference, edited));
            }
        }
    }
}
