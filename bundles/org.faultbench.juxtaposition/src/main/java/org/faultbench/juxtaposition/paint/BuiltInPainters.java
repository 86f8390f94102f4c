package org.faultbench.juxtaposition.paint;

import java.util.ArrayList;
import java.util.List;

import org.faultbench.juxtaposition.JuxtapositionClass;

/**
 * The Allan diagram's own colourings, contributed in this bundle's plugin.xml like any painter. Our own palette:
 * reservoir against reservoir in burnt orange, reservoir against seal in pale sand, seal against seal in grey-green,
 * leak probability in violet, a seal attribute on a pale-to-slate ramp.
 */
public final class BuiltInPainters {

    public static final int RESERVOIR_RESERVOIR = Rgb.of(217, 95, 2);
    public static final int RESERVOIR_SEAL = Rgb.of(240, 225, 175);
    public static final int SEAL_SEAL = Rgb.of(170, 180, 165);
    public static final int LEAK = Rgb.of(117, 52, 160);
    static final int RAMP_LOW = Rgb.of(250, 250, 240);
    static final int RAMP_HIGH = Rgb.of(40, 60, 90);
    /** The attribute value at the dark end of the ramp: 60 % suits clay-fraction attributes such as SGR. */
    static final double RAMP_MAXIMUM = 60;

    private BuiltInPainters() {
    }

    /** Colour of a juxtaposition class. */
    public static int classColour(JuxtapositionClass c) {
        return switch (c) {
            case RESERVOIR_RESERVOIR -> RESERVOIR_RESERVOIR;
            case RESERVOIR_SEAL -> RESERVOIR_SEAL;
            case SEAL_SEAL -> SEAL_SEAL;
        };
    }

    /** The three juxtaposition classes as legend swatches. */
    public static List<LegendEntry> classLegend() {
        return List.of(new LegendEntry(RESERVOIR_RESERVOIR, "reservoir/reservoir window"),
                new LegendEntry(RESERVOIR_SEAL, "reservoir/seal"), new LegendEntry(SEAL_SEAL, "seal/seal"));
    }

    private static LegendEntry leakLegend(PaintScene scene) {
        return new LegendEntry(LEAK, scene.leakProbabilityAvailable() ? "leak probability (0\u2013100 %)"
                : "leak probability (after a run)");
    }

    /** Juxtaposition classes, blended towards violet where leaks occurred. */
    public static final class Juxtaposition implements AttributePainter {
        public String id() {
            return "juxtaposition";
        }

        public String name() {
            return "juxtaposition";
        }

        public int rgb(FaultPlaneCell cell, PaintScene scene) {
            return Rgb.blend(classColour(cell.juxtaposition()), LEAK, 0.85 * cell.leakProbability());
        }

        public List<LegendEntry> legend(PaintScene scene) {
            List<LegendEntry> legend = new ArrayList<>(classLegend());
            legend.add(leakLegend(scene));
            return legend;
        }
    }

    /** The seal criterion's attribute on a ramp; cells without one keep a faded class colour. */
    public static final class SealAttribute implements AttributePainter {
        public String id() {
            return "seal-attribute";
        }

        public String name() {
            return "seal attribute";
        }

        public int rgb(FaultPlaneCell cell, PaintScene scene) {
            double value = cell.sealAttribute();
            return Double.isNaN(value) ? Rgb.blend(classColour(cell.juxtaposition()), Rgb.WHITE, 0.6)
                    : Rgb.blend(RAMP_LOW, RAMP_HIGH, value / RAMP_MAXIMUM);
        }

        public List<LegendEntry> legend(PaintScene scene) {
            List<LegendEntry> legend = new ArrayList<>(classLegend());
            scene.sealAttributeName().ifPresentOrElse(
                    name -> legend.add(new LegendEntry(RAMP_HIGH, name + " 0 (pale) \u2013 60+ (slate)")),
                    () -> legend.add(new LegendEntry(RAMP_LOW, "no seal attribute (juxtaposition-only criterion)")));
            return legend;
        }
    }

    /** Leak probability in violet over faded class colours. */
    public static final class LeakProbability implements AttributePainter {
        public String id() {
            return "leak-probability";
        }

        public String name() {
            return "leak probability";
        }

        public int rgb(FaultPlaneCell cell, PaintScene scene) {
            return Rgb.blend(Rgb.blend(classColour(cell.juxtaposition()), Rgb.WHITE, 0.7), LEAK,
                    cell.leakProbability());
        }

        public List<LegendEntry> legend(PaintScene scene) {
            List<LegendEntry> legend = new ArrayList<>(classLegend());
            legend.add(leakLegend(scene));
            return legend;
        }
    }

    /** The built-ins in catalog order. */
    public static List<AttributePainter> painters() {
        return List.of(new Juxtaposition(), new SealAttribute(), new LeakProbability());
    }
}
