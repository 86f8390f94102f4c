package org.faultbench.faults.ui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.stream.Stream;

import org.faultbench.faults.qc.QcFinding;
import org.faultbench.faults.qc.QcRuleContributions;
import org.faultbench.faults.repair.FaultModel;
import org.faultbench.study.AnalysisFile;
import org.faultbench.study.FaultModelLoader;
import org.faultbench.study.StudyFormatException;

/**
 * The fault model under review and its QC findings, shared by the throw-profile and displacement-length views.
 * Built from the active study's workspace: every fault trace in its {@code faults/*.geojson} files, with cut-offs
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

    /** The first fault file of the workspace the study belongs to (the study's folder or its parent). */
    static Path faultsFile(Path studyFile) throws IOException {
        Path folder = studyFile.toAbsolutePath().getParent();
        List<Path> candidates = new ArrayList<>();
        for (Path root : new Path[] { folder, folder.getParent() }) {
            Path faults = root == null ? null : root.resolve("faults");
            if (faults != null && Files.isDirectory(faults)) {
                try (Stream<Path> files = Files.list(faults)) {
                    files.filter(p -> p.toString().endsWith(".geojson")).sorted().forEach(candidates::add);
                }
            }
        }
        if (candidates.isEmpty()) {
            throw new IOException("no faults/*.geojson beside " + studyFile);
        }
        return candidates.get(0);
    }

    void addListener(Listener listener) {
        listeners.add(listener);
    }

    void removeListener(Listener listener) {
        listeners.remove(listener);
    }
}
