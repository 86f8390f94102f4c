package org.faultbench.digitize.ui.editing;

import java.util.Objects;

import org.eclipse.gef.commands.Command;
import org.faultbench.digitize.georef.TransformKind;

/** Switches the transform the control points are fitted with; undoable because every feature is redrawn with it. */
public final class TransformKindCommand extends Command {
    private final Georeference georeference;
    private final TransformKind after;
    private TransformKind before;

    public TransformKindCommand(Georeference georeference, TransformKind after) {
        super("Fit " + after.label() + " transform");
        this.georeference = Objects.requireNonNull(georeference, "georeference");
        this.after = Objects.requireNonNull(after, "transform kind");
    }

    @Override
    public boolean canExecute() {
        return georeference.kind() != after;
    }

    @Override
    public void execute() {
        before = georeference.kind();
        georeference.setKind(after);
    }

    @Override
    public void undo() {
        georeference.setKind(before);
    }
}
