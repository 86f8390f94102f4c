package org.faultbench.strat.ui;

import java.util.function.Function;

import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;

/** A text column of a table of rows of one type, optionally editable. */
final class TableColumns {

    private TableColumns() {
    }

    /** @param editing how the cell is edited, or null for a read-only column */
    static <R> void add(TableViewer table, Class<R> rowType, String title, int width, Function<R, String> text,
            EditingSupport editing) {
        TableViewerColumn c = new TableViewerColumn(table, SWT.LEFT);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply(rowType.cast(element));
            }
        });
        if (editing != null) {
            c.setEditingSupport(editing);
        }
    }
}
