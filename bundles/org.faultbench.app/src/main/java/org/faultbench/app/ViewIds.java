package org.faultbench.app;

/**
 * Ids of the views the perspectives arrange. Referenced by id, not by class, so the application does not depend on
 * the UI bundles that contribute them; a view whose bundle is absent shows as a placeholder.
 */
final class ViewIds {
    static final String MAP_SHEET = "org.faultbench.digitize.ui.mapSheet";
    static final String CONTROL_POINTS = "org.faultbench.digitize.ui.controlPoints";
    static final String THROW_PROFILES = "org.faultbench.faults.ui.throwProfiles";
    static final String DISPLACEMENT_LENGTH = "org.faultbench.faults.ui.displacementLength";
    static final String STRATIGRAPHY = "org.faultbench.strat.ui.stratigraphyEditor";
    static final String SAMPLED_INPUTS = "org.faultbench.strat.ui.sampledInputs";
    static final String ALLAN = "org.faultbench.juxtaposition.ui.allanDiagram";
    static final String RESULTS = "org.faultbench.sim.ui.results";
    static final String PROBLEMS = "org.eclipse.ui.views.ProblemView";
    static final String PROPERTIES = "org.eclipse.ui.views.PropertySheet";

    private ViewIds() {
    }
}
