package org.faultbench.sim;

import java.util.List;
import java.util.Map;

/**
 * The outcome of a Monte Carlo run.
 *
 * @param studyName the study
 * @param settings realisations, seed, threads and cell height as requested
 * @param realisationsRun realisations actually run (fewer when cancelled)
 * @param complete false when the run was cancelled
 * @param units statistics per reservoir unit, in column order
 * @param leakMaps leak probability per bounding fault, in study order
 * @param tornado per unit name, the inputs ranked by their effect on its contact depth, largest first
 * @param warnings applicability warnings met during the base case (e.g. a clay-based rule on carbonates)
 */
public record SimulationResult(String studyName, SimulationSettings settings, int realisationsRun, boolean complete,
        List<UnitSummary> units, List<LeakProbabilityMap> leakMaps, Map<String, List<TornadoBar>> tornado,
        List<String> warnings) {
}
