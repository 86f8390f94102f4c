package org.faultbench.strat.ui;

import java.util.function.Consumer;

import org.eclipse.jface.viewers.CellEditor;
import org.eclipse.jface.viewers.ColumnViewer;
import org.eclipse.jface.viewers.EditingSupport;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.widgets.Composite;
import org.faultbench.core.uncertain.UncertainValue;
import org.faultbench.core.uncertain.UncertainValueNotation;
import org.faultbench.strat.StratUnit;
import org.faultbench.study.UnitProperty;

/**
 * Cell editing of one numeric unit property in the notation of {@link UncertainValueNotation}. Every keystroke is
 * parsed; the message of the first problem goes to {@code feedback} (null when the text is valid), so errors show as
 * the user types and an invalid value is never applied.
 */
final class UnitPropertyEditing extends EditingSupport {
    /** Receives an accepted value for a unit row. */
    interface Sink {
        void accept(UnitRow row, UnitProperty property, UncertainValue value);
    }

    private final UnitProperty property;
    private final TextCellEditor editor;
    private final Sink sink;

    UnitPropertyEditing(ColumnViewer viewer, UnitProperty property, Consumer<String> feedback, Sink sink) {
        super(viewer);
        this.property = property;
        this.sink = sink;
        this.editor = NotationCellEditor.create((Composite) viewer.getControl(),
                text -> NotationCellEditor.problem(text, property.bounds(), property.label()), feedback);
    }

    @Override
    protected CellEditor getCellEditor(Object element) {
        return editor;
    }

    @Override
    protected boolean canEdit(Object element) {
        StratUnit unit = ((UnitRow) element).unit();
        return unit.reservoir() || !property.reservoirOnly();
    }

    @Override
    protected Object getValue(Object element) {
        return UncertainValueNotation.format(property.of(((UnitRow) element).unit()), property.bounds());
    }

    @Override
    protected void setValue(Object element, Object value) {
        if (value == null) {
            return;
        }
        UncertainValue parsed = UncertainValueNotation.parse(value.toString(), property.bounds(), property.label());
        if (!parsed.equals(property.of(((UnitRow) element).unit()))) {
            sink.accept((UnitRow) element, property, parsed);
        }
    }
}
