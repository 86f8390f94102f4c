package org.faultbench.juxtaposition.paint;

import java.util.Objects;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.juxtaposition.JuxtapositionRaster;

/** The Allan diagram an overlay draws on: the fault, its juxtaposition raster and the column of both walls. */
public record OverlayScene(String faultId, JuxtapositionRaster raster, ResolvedColumn column) {

    public OverlayScene {
        Objects.requireNonNull(faultId, "faultId");
        Objects.requireNonNull(raster, "raster");
        Objects.requireNonNull(column, "column");
    }
}
