package org.faultbench.strat.ui;

import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.commands.operations.IUndoContext;
import org.eclipse.ui.PlatformUI;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.StudyFormatException;

/** Runs a study edit as an undoable operation on the workbench history, or says why the study refuses it. */
final class StudyEditRunner {
    /** Makes the edited study; the model and file format checks run here. */
    interface Edit {
        AnalysisFile make() throws StudyFormatException;
    }

    private StudyEditRunner() {
    }

    /** @return null when the edit was applied, else the message to show the user */
    static String run(String label, IUndoContext context, AnalysisFile before, Edit edit) {
        try {
            AnalysisFile after = edit.make();
            PlatformUI.getWorkbench().getOperationSupport().getOperationHistory()
                    .execute(new StudyEditOperation(label, context, before, after), null, null);
            return null;
        } catch (StudyFormatException | ExecutionException e) {
            return e.getMessage();
        }
    }
}
