package org.faultbench.sim.ui;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.faultbench.sim.MonteCarloSimulator;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.SimulationSettings;
import org.faultbench.study.ActiveStudy;
import org.faultbench.study.AnalysisFile;

/** Runs the Monte Carlo analysis of the active study in the background, with progress and cancel. */
public final class SimulationJob extends Job {
    private final AnalysisFile analysis;
    private final SimulationSettings settings;

    public SimulationJob(AnalysisFile analysis, SimulationSettings settings) {
        super("Monte Carlo: " + analysis.study().name());
        this.analysis = analysis;
        this.settings = settings;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        try {
            SimulationResult result = new MonteCarloSimulator().run(analysis.study(), settings, monitor);
            ActiveStudy.get().publish(analysis, result);
            return result.complete() ? Status.OK_STATUS : Status.CANCEL_STATUS;
        } catch (IllegalArgumentException e) {
            return Status.error("The study cannot be simulated: " + e.getMessage(), e);
        }
    }
}
