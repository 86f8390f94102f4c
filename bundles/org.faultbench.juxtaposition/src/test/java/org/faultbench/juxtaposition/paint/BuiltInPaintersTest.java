package org.faultbench.juxtaposition.paint;

import static org.faultbench.juxtaposition.JuxtapositionClass.RESERVOIR_RESERVOIR;
import static org.faultbench.juxtaposition.JuxtapositionClass.RESERVOIR_SEAL;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Optional;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.juxtaposition.JuxtapositionClass;
import org.junit.jupiter.api.Test;

/** The Allan diagram's colourings as they were hard-coded in the viewer, now plain painters. */
class BuiltInPaintersTest {

    static final ResolvedColumn COLUMN = new ResolvedColumn(List.of(
            new UnitSlice("sand A", LithologyClass.RESERVOIR, true, 50, 0.1),
            new UnitSlice("shale", LithologyClass.SEAL, false, 30, 0.9)));
    static final PaintScene SGR_AFTER_RUN = new PaintScene(COLUMN, Optional.of("SGR [%]"), true);
    static final PaintScene JUXTAPOSITION_ONLY = new PaintScene(COLUMN, Optional.empty(), false);

    static FaultPlaneCell cell(JuxtapositionClass c, double sealAttribute, double leakProbability) {
        return new FaultPlaneCell(150, 1085, c, 2, 0, 60, sealAttribute, leakProbability);
    }

    @Test
    void rgbPacksAndBlendsChannels() {
        assertEquals(0xD95F02, Rgb.of(217, 95, 2));
        assertEquals(217, Rgb.red(0xD95F02));
        assertEquals(95, Rgb.green(0xD95F02));
        assertEquals(2, Rgb.blue(0xD95F02));
        // halfway between black and white: 127.5 rounds up to 128 in every channel (Math.round, half up)
        assertEquals(Rgb.of(128, 128, 128), Rgb.blend(0, Rgb.WHITE, 0.5));
        assertEquals(Rgb.WHITE, Rgb.blend(0, Rgb.WHITE, 7));
        assertThrows(IllegalArgumentException.class, () -> Rgb.of(256, 0, 0));
    }

    @Test
    void juxtapositionPainterShowsClassesBlendedTowardsLeaks() {
        AttributePainter painter = new BuiltInPainters.Juxtaposition();
        assertEquals(BuiltInPainters.RESERVOIR_RESERVOIR, painter.rgb(cell(RESERVOIR_RESERVOIR, Double.NaN, 0),
                SGR_AFTER_RUN));
        // p = 1: 85 % of the way from burnt orange (217, 95, 2) to violet (117, 52, 160): (132, 58.45, 136.3)
        assertEquals(Rgb.of(132, 58, 136), painter.rgb(cell(RESERVOIR_RESERVOIR, Double.NaN, 1), SGR_AFTER_RUN));
        assertEquals(List.of("reservoir/reservoir window", "reservoir/seal", "seal/seal", "leak probability (0\u2013100 %)"),
                painter.legend(SGR_AFTER_RUN).stream().map(LegendEntry::label).toList());
        assertEquals("leak probability (after a run)", painter.legend(JUXTAPOSITION_ONLY).get(3).label());
    }

    @Test
    void sealAttributePainterRampsToSixtyPercent() {
        AttributePainter painter = new BuiltInPainters.SealAttribute();
        // 30 of 60: halfway from (250, 250, 240) to (40, 60, 90) = (145, 155, 165)
        assertEquals(Rgb.of(145, 155, 165), painter.rgb(cell(RESERVOIR_SEAL, 30, 0), SGR_AFTER_RUN));
        assertEquals(Rgb.of(40, 60, 90), painter.rgb(cell(RESERVOIR_SEAL, 95, 0), SGR_AFTER_RUN));
        // no attribute: the class colour faded 60 % to white; pale sand (240, 225, 175) -> (249, 243, 223)
        assertEquals(Rgb.of(249, 243, 223), painter.rgb(cell(RESERVOIR_SEAL, Double.NaN, 0), SGR_AFTER_RUN));
        assertEquals("SGR [%] 0 (pale) \u2013 60+ (slate)", painter.legend(SGR_AFTER_RUN).get(3).label());
    }

    @Test
    void leakProbabilityPainterFadesClassesAndPaintsViolet() {
        AttributePainter painter = new BuiltInPainters.LeakProbability();
        assertEquals(BuiltInPainters.LEAK, painter.rgb(cell(RESERVOIR_SEAL, Double.NaN, 1), SGR_AFTER_RUN));
        // p = 0: grey-green (170, 180, 165) faded 70 % to white = (229.5, 232.5, 228) -> (230, 233, 228)
        assertEquals(Rgb.of(230, 233, 228), painter.rgb(cell(JuxtapositionClass.SEAL_SEAL, Double.NaN, 0),
                SGR_AFTER_RUN));
    }
}
