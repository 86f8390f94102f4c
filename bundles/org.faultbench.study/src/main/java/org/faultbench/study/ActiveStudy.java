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
        fire();
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
