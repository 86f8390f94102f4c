package org.faultbench.strat.ui;

import org.eclipse.core.commands.operations.AbstractOperation;
import org.eclipse.core.commands.operations.IUndoContext;
import org.eclipse.core.runtime.IAdaptable;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFile;

/**
 * One accepted edit of the study (its stratigraphy or its plug-in inputs), undoable through the workbench's operation history: it swaps the active
 * study between the version before and the version after the edit. Both versions are complete, validated values.
 */
final class StudyEditOperation extends AbstractOperation {
    private final AnalysisFile before;
    private final AnalysisFile after;

    StudyEditOperation(String label, IUndoContext context, AnalysisFile before, AnalysisFile after) {
        super(label);
        addContext(context);
        this.before = before;
        this.after = after;
    }

    @Override
    public IStatus execute(IProgressMonitor monitor, IAdaptable info) {
        ActiveStudy.get().edit(after);
        return Status.OK_STATUS;
    }

    @Override
    public IStatus redo(IProgressMonitor monitor, IAdaptable info) {
        return execute(monitor, info);
    }

    @Override
    public IStatus undo(IProgressMonitor monitor, IAdaptable info) {
        ActiveStudy.get().edit(before);
        return Status.OK_STATUS;
    }

    @Override
    public boolean canUndo() {
        return ActiveStudy.get().analysis().orElse(null) == after;
    }

    @Override
    public boolean canRedo() {
        return ActiveStudy.get().analysis().orElse(null) == before;
    }
}
