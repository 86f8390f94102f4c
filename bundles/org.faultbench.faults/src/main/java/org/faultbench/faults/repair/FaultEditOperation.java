package org.faultbench.faults.repair;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.commands.operations.AbstractOperation;
import org.eclipse.core.runtime.IAdaptable;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;

/**
 * A repair that replaces some faults of a {@link FaultModel} by edited ones. Execute computes the edit and swaps the
 * records; undo and redo swap them back and forth, each fault returning to its former place in the model.
 */
abstract class FaultEditOperation extends AbstractOperation {

    private final FaultModel model;
    private final List<String> editedIds;
    private List<FaultModel.Placed> before = List.of();
    private List<FaultModel.Placed> after = List.of();

    FaultEditOperation(String label, FaultModel model, List<String> editedIds) {
        super(label);
        this.model = model;
        this.editedIds = List.copyOf(editedIds);
        addContext(model.undoContext());
    }

    /**
     * The faults that replace {@code originals}.
     *
     * @throws IllegalArgumentException with a message for the geologist when the edit is not possible
     */
    abstract List<FaultRecord> edit(List<FaultRecord> originals);

    @Override
    public IStatus execute(IProgressMonitor monitor, IAdaptable info) throws ExecutionException {
        List<FaultRecord> edited;
        try {
            edited = edit(editedIds.stream().map(model::record).toList());
            model.checkIdsFree(edited, editedIds);
        } catch (IllegalArgumentException e) {
            throw new ExecutionException(getLabel() + ": " + e.getMessage(), e);
        }
        before = model.remove(editedIds);
        after = new ArrayList<>();
        int index = before.get(0).index();
        for (FaultRecord record : edited) {
            after.add(new FaultModel.Placed(index++, record));
        }
        model.insert(after);
        return Status.OK_STATUS;
    }

    @Override
    public IStatus undo(IProgressMonitor monitor, IAdaptable info) {
        model.remove(after.stream().map(placed -> placed.record().id()).toList());
        model.insert(before);
        return Status.OK_STATUS;
    }

    @Override
    public IStatus redo(IProgressMonitor monitor, IAdaptable info) {
        model.remove(editedIds);
        model.insert(after);
        return Status.OK_STATUS;
    }
}
