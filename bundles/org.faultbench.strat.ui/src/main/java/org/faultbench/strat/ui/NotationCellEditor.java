package org.faultbench.strat.ui;

import java.util.function.Consumer;
import java.util.function.Function;

import org.eclipse.jface.viewers.ICellEditorListener;
import org.eclipse.jface.viewers.TextCellEditor;
import org.eclipse.swt.widgets.Composite;
import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValueNotation;

/**
 * A text cell for a value in the notation of {@link UncertainValueNotation}: every keystroke is checked, and the
 * message of the first problem goes to {@code feedback} (null when the text is valid), so errors show as the user
 * types and an invalid value is never applied.
 */
final class NotationCellEditor {

    private NotationCellEditor() {
    }

    /** @param problem the message for a text, or null when it may be applied */
    static TextCellEditor create(Composite parent, Function<String, String> problem, Consumer<String> feedback) {
        TextCellEditor editor = new TextCellEditor(parent);
        editor.setValidator(value -> problem.apply(value.toString()));
        editor.addListener(new ICellEditorListener() {
            @Override
            public void editorValueChanged(boolean oldValidState, boolean newValidState) {
                feedback.accept(editor.getErrorMessage());
            }

            @Override
            public void cancelEditor() {
                feedback.accept(null);
            }

            @Override
            public void applyEditorValue() {
                feedback.accept(null);
            }
        });
        return editor;
    }

    /** Why {@code text} is no value within {@code bounds}, or null when it parses. */
    static String problem(String text, Bounds bounds, String field) {
        try {
            UncertainValueNotation.parse(text, bounds, field);
            return null;
        } catch (IllegalArgumentException e) {
            return e.getMessage();
        }
    }
}
