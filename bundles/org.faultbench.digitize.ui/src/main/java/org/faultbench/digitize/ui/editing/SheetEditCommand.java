package org.faultbench.digitize.ui.editing;

import java.util.Objects;

import org.eclipse.gef.commands.Command;
import org.faultbench.digitize.sketch.MapSheet;
import org.faultbench.digitize.sketch.MapSheetEdit;
import org.faultbench.digitize.sketch.SheetFeature;

/**
 * A change to the sheet on the editor's command stack: applies a {@link MapSheetEdit} and reverts it on undo. The
 * edit checks that the sheet still holds what it starts from, so undo after an out-of-band change fails loudly
 * instead of losing work.
 */
public final class SheetEditCommand extends Command {
    private final MapSheet sheet;
    private final MapSheetEdit edit;

    public SheetEditCommand(MapSheet sheet, MapSheetEdit edit) {
        super(capitalised(edit.label()));
        this.sheet = Objects.requireNonNull(sheet, "sheet");
        this.edit = edit;
    }

    /** Adds a feature drawn by a tool. */
    public static SheetEditCommand adding(MapSheet sheet, SheetFeature feature) {
        return new SheetEditCommand(sheet, MapSheetEdit.adding(feature));
    }

    /** Deletes the feature. */
    public static SheetEditCommand removing(MapSheet sheet, SheetFeature feature) {
        return new SheetEditCommand(sheet, MapSheetEdit.removing(feature));
    }

    /** Replaces the feature with the same id by {@code after}. */
    public static SheetEditCommand replacing(MapSheet sheet, SheetFeature after) {
        return new SheetEditCommand(sheet, MapSheetEdit.replacing(sheet.require(after.id()), after));
    }

    public MapSheetEdit edit() {
        return edit;
    }

    @Override
    public boolean canExecute() {
        return Objects.equals(sheet.find(edit.featureId()).orElse(null), edit.before());
    }

    @Override
    public void execute() {
        edit.apply(sheet);
    }

    @Override
    public void undo() {
        edit.revert(sheet);
    }

    @Override
    public void redo() {
        execute();
    }

    private static String capitalised(String label) {
        return Character.toUpperCase(label.charAt(0)) + label.substring(1);
    }
}
