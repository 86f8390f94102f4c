package org.faultbench.faults.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;

import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.QcRuleContributions;
import org.faultbench.faults.repair.FaultModel;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.FaultModelLoader;
import org.faultbench.study.StudyFormatException;
import org.faultbench.study.WorkspaceLocator;
import org.faultbench.study.store.ProjectStore;

/**
 * The fault model under review and its QC findings, shared by the throw-profile and displacement-length views.
 * Built from the active study's workspace: the fault traces of the first fault file its project lists, with cut-offs
 * sampled from the study's reference horizon grid. Model work only; views listen and redraw on their own thread.
 */
final class FaultReview {
    private static final FaultReview INSTANCE = new FaultReview();

    interface Listener {
        void changed();
    }

    /** A loaded review: the model, the horizon it was sampled on and what QC found. */
    record State(FaultModel model, String horizon, List<QcFinding> findings, String source) {
    }

    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private volatile State state;
    private volatile String problem = "No study is open.";

    static FaultReview get() {
        return INSTANCE;
    }

    Optional<State> state() {
        return Optional.ofNullable(state);
    }

    /** Why there is no state, for the views to show. */
    String problem() {
        return problem;
    }

    /** Loads the faults of {@code analysis}'s workspace and checks them with every installed QC rule. */
    void load(AnalysisFile analysis) {
        try {
            Path faultsFile = faultsFile(analysis.file());
            String horizon = "Top " + analysis.study().stratigraphy().referenceUnit().name();
            FaultModel model = new FaultModelLoader().load(faultsFile,
                    List.of(new FaultModelLoader.Horizon(horizon, analysis.study().referenceTop())));
            List<QcFinding> findings = model.check(QcRuleContributions.platformCatalog(), null);
            state = new State(model, horizon, findings, faultsFile.toString());
            problem = "";
        } catch (IOException | StudyFormatException | RuntimeException e) {
            state = null;
            problem = "Fault review not available: " + e.getMessage();
        }
        listeners.forEach(Listener::changed);
    }

    /** The first fault file the study's workspace lists in its project file. */
    static Path faultsFile(Path studyFile) throws IOException, StudyFormatException {
        Path workspace = WorkspaceLocator.workspaceOf(studyFile)
                .orElseThrow(() -> new IOException("no Faultbench workspace (faultbench-project.json) holds " + studyFile));
        List<String> faults = new ProjectStore().open(workspace).project().faults();
        if (faults.isEmpty()) {
            throw new IOException("the project " + ProjectStore.projectFile(workspace) + " lists no fault files");
        }
        return workspace.resolve(faults.get(0));
    }

    void addListener(Listener listener) {
        listeners.add(listener);
    }

    void removeListener(Listener listener) {
        listeners.remove(listener);
    }
}
