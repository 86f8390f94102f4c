package org.faultbench.study;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;

import org.faultbench.sim.SimulationResult;

/**
 * The study the workbench is working on and its latest simulation result, shared by the views. Views register a
 * listener and redraw when either changes. Model code only: listeners are called on the thread that made the change,
 * so UI listeners hop to the display thread themselves.
 */
public final class ActiveStudy {
    private static final ActiveStudy INSTANCE = new ActiveStudy();

    /** Told when the study or its result changes. */
    @FunctionalInterface
    public interface Listener {
        void changed(ActiveStudy source);
    }

    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private volatile AnalysisFile analysis;
    private volatile SimulationResult result;
    private volatile boolean dirty;

    public static ActiveStudy get() {
        return INSTANCE;
    }

    public Optional<AnalysisFile> analysis() {
        return Optional.ofNullable(analysis);
    }

    public Optional<SimulationResult> result() {
        return Optional.ofNullable(result);
    }

    /** Makes {@code newAnalysis} the active study; its old result is dropped. */
    public void open(AnalysisFile newAnalysis) {
        analysis = newAnalysis;
        result = null;
        dirty = false;
        fire();
    }

    /**
     * Replaces the study by an edited version of it (or, on undo, by an earlier one). The result of the old inputs
     * no longer describes the study, so it is dropped; the study is marked as having unsaved changes.
     */
    public void edit(AnalysisFile edited) {
        analysis = edited;
        result = null;
        dirty = true;
        fire();
    }

    /** Records that {@code saved} was written to its file; clears the unsaved-changes mark if it is still active. */
    public void saved(AnalysisFile saved) {
        if (saved == analysis) {
            dirty = false;
            fire();
        }
    }

    /** True when the active study has edits not yet written to its file. */
    public boolean isDirty() {
        return dirty;
    }

    /** Records a result, if it belongs to the study that is still active. */
    public void publish(AnalysisFile of, SimulationResult newResult) {
        if (of != analysis) {
            return;
        }
        result = newResult;
        fire();
    }

    public void addListener(Listener listener) {
        listeners.add(listener);
    }

    public void removeListener(Listener listener) {
        listeners.remove(listener);
    }

    private void fire() {
        for (Listener listener : listeners) {
            listener.changed(this);
        }
    }
}
