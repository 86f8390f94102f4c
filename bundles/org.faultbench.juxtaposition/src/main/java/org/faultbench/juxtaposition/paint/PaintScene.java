package org.faultbench.juxtaposition.paint;

import java.util.Objects;
import java.util.Optional;

import org.faultbench.core.column.ResolvedColumn;

/**
 * What is painted as a whole, for painters whose colours or legend depend on it.
 *
 * @param column the stratigraphic column (unit names, lithologies, Vcl) both walls are hung from
 * @param sealAttributeName name and unit of the seal attribute (e.g. "SGR [%]"), empty for juxtaposition only
 * @param leakProbabilityAvailable whether a run has produced leak probabilities
 */
public record PaintScene(ResolvedColumn column, Optional<String> sealAttributeName, boolean leakProbabilityAvailable) {

    public PaintScene {
        Objects.requireNonNull(column, "column");
        Objects.requireNonNull(sealAttributeName, "sealAttributeName");
    }
}
