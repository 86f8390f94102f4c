package org.faultbench.digitize.ui.editing;

import java.util.Objects;

import org.eclipse.gef.commands.Command;
import org.faultbench.digitize.georef.ControlPoint;

/**
 * Adds, moves, edits or removes one control point on the editor's command stack, so georeferencing is undone with
 * the same Undo as digitizing. Every change refits the transform.
 */
public final class ControlPointCommand extends Command {
    private final Georeference georeference;
    private final ControlPoint before;
    private final ControlPoint after;
    private int index;

    private ControlPointCommand(String label, Georeference georeference, ControlPoint before, ControlPoint after) {
        super(label);
        this.georeference = Objects.requireNonNull(georeference, "georeference");
        this.before = before;
        this.after = after;
    }

    public static ControlPointCommand adding(Georeference georeference, ControlPoint point) {
        return new ControlPointCommand("Add control point " + point.id(), georeference, null, point);
    }

    public static ControlPointCommand removing(Georeference georeference, ControlPoint point) {
        return new ControlPointCommand("Delete control point " + point.id(), georeference, point, null);
    }

    /** Replaces the point with the same id (moved pixel, typed map position, switched on or off). */
    public static ControlPointCommand replacing(Georeference georeference, ControlPoint point) {
        ControlPoint current = georeference.find(point.id())
                .orElseThrow(() -> new IllegalArgumentException("no control point '" + point.id() + "'"));
        return new ControlPointCommand("Edit control point " + point.id(), georeference, current, point);
    }

    @Override
    public boolean canExecute() {
        return before == null ? georeference.find(after.id()).isEmpty()
                : georeference.find(before.id()).filter(before::equals).isPresent();
    }

    @Override
    public void execute() {
        if (before == null) {
            index = georeference.points().size();
            georeference.add(index, after);
        } else if (after == null) {
            index = georeference.remove(before.id());
        } else {
            georeference.replace(after);
        }
    }

    @Override
    public void undo() {
        if (before == null) {
            georeference.remove(after.id());
        } else if (after == null) {
            georeference.add(index, before);
        } else {
            georeference.replace(before);
        }
    }

    @Override
    public void redo() {
        execute();
    }
}
