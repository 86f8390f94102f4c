package org.faultbench.example.inhouse;

import java.util.List;

import org.faultbench.juxtaposition.paint.AttributePainter;
import org.faultbench.juxtaposition.paint.BuiltInPainters;
import org.faultbench.juxtaposition.paint.FaultPlaneCell;
import org.faultbench.juxtaposition.paint.LegendEntry;
import org.faultbench.juxtaposition.paint.PaintScene;
import org.faultbench.juxtaposition.paint.Rgb;

/**
 * Highlights fault-plane cells whose shale gouge ratio is below 18 %, a screening rule of thumb: SGR around 15–20 %
 * separates fault rock with little capillary threshold pressure from fault rock that seals (Yielding et al. 1997;
 * the 18 % within that band is this example's own choice). With a criterion other than SGR it shows juxtaposition
 * only and says so in the legend.
 */
public final class LowSgrPainter implements AttributePainter {

    /** SGR in % below which a cell is highlighted. */
    public static final double THRESHOLD_PERCENT = 18;
    static final int LOW_SGR = Rgb.of(200, 30, 60);
    static final int SGR_AT_OR_ABOVE = Rgb.of(235, 235, 235);

    @Override
    public String id() {
        return "example.low-sgr";
    }

    @Override
    public String name() {
        return "SGR below 18 % highlighted";
    }

    @Override
    public int rgb(FaultPlaneCell cell, PaintScene scene) {
        if (!isSgr(scene) || Double.isNaN(cell.sealAttribute())) {
            return Rgb.blend(BuiltInPainters.classColour(cell.juxtaposition()), Rgb.WHITE, 0.6);
        }
        return cell.sealAttribute() < THRESHOLD_PERCENT ? LOW_SGR : SGR_AT_OR_ABOVE;
    }

    @Override
    public List<LegendEntry> legend(PaintScene scene) {
        if (!isSgr(scene)) {
            return List.of(new LegendEntry(SGR_AT_OR_ABOVE, "no SGR: choose the sgr seal criterion"));
        }
        return List.of(new LegendEntry(LOW_SGR, "SGR < 18 %"), new LegendEntry(SGR_AT_OR_ABOVE, "SGR >= 18 %"));
    }

    private static boolean isSgr(PaintScene scene) {
        return scene.sealAttributeName().filter(name -> name.startsWith("SGR")).isPresent();
    }
}
