package org.faultbench.report;

import java.time.LocalDate;

import org.faultbench.sim.SimulationResult;
import org.faultbench.study.AnalysisFile;

/**
 * What a report is made from: the analysis file as read (study, echoed document, SHA-256), the run's result, the
 * program version and the report date. Everything the batch run already holds in memory, so the report and
 * results.json speak for the same run.
 */
public record ReportInput(AnalysisFile analysis, SimulationResult result, String programVersion, LocalDate date) {

    public ReportInput {
        if (analysis == null || result == null) {
            throw new IllegalArgumentException("a report needs the analysis file and the simulation result");
        }
        programVersion = programVersion == null ? "unknown" : programVersion;
        date = date == null ? LocalDate.now() : date;
    }
}
