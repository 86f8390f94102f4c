package org.faultbench.juxtaposition.paint;

import java.util.List;

import org.faultbench.juxtaposition.JuxtapositionClass;
import org.faultbench.juxtaposition.JuxtapositionRaster;

/**
 * The top of the shallowest reservoir/reservoir window: with a juxtaposition-only criterion this is where the fault
 * leaks first (Allan 1989), so the line is the juxtaposition leak point's depth on this fault.
 */
public final class ShallowestWindowOverlay implements Overlay {

    public String id() {
        return "shallowest-window";
    }

    public String name() {
        return "shallowest reservoir/reservoir window";
    }

    public List<OverlayMark> marks(OverlayScene scene) {
        JuxtapositionRaster raster = scene.raster();
        for (int row = 0; row < raster.rowCount(); row++) {
            for (int k = 0; k < raster.columnCount(); k++) {
                if (raster.hasData(k, row)
                        && raster.juxtapositionClass(k, row) == JuxtapositionClass.RESERVOIR_RESERVOIR) {
                    double top = raster.top() + row * raster.dz();
                    return List.of(OverlayMark.depthLine("shallowest reservoir/reservoir window", top,
                            BuiltInPainters.RESERVOIR_RESERVOIR, true));
                }
            }
        }
        return List.of();
    }
}
