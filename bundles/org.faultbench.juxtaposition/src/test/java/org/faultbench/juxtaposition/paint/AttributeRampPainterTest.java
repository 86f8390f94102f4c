package org.faultbench.juxtaposition.paint;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.faultbench.juxtaposition.JuxtapositionClass;
import org.junit.jupiter.api.Test;

class AttributeRampPainterTest {

    private static FaultPlaneCell cell(Map<String, Double> values) {
        return new FaultPlaneCell(10, 1500, JuxtapositionClass.RESERVOIR_RESERVOIR, 1, 1, 20, Double.NaN, 0,
                key -> values.getOrDefault(key, Double.NaN));
    }

    @Test
    void theRampRunsFromPaleToSlateOverItsRangeAndClampsBeyond() {
        AttributeRampPainter sgr = new AttributeRampPainter.Sgr();
        int low = sgr.rgb(cell(Map.of("sgr", 0.0)), null);
        int mid = sgr.rgb(cell(Map.of("sgr", 30.0)), null);
        int high = sgr.rgb(cell(Map.of("sgr", 60.0)), null);
        assertEquals(0xF2EFE6, low);
        assertEquals(0x3B4A5C, high);
        assertEquals(high, sgr.rgb(cell(Map.of("sgr", 95.0)), null), "values above the range take the end colour");
        // halfway: each channel halfway between the ends (linear blend)
        assertEquals(((0xF2 + 0x3B) / 2), (mid >> 16) & 0xFF, 1);
    }

    @Test
    void eachPainterReadsItsOwnAttributeAndFadesCellsWithoutIt() {
        FaultPlaneCell onlySsf = cell(Map.of("ssf", 8.0));
        assertEquals(0x3B4A5C, new AttributeRampPainter.Ssf().rgb(onlySsf, null));
        int faded = new AttributeRampPainter.Csp().rgb(onlySsf, null);
        assertNotEquals(0x3B4A5C, faded);
        assertEquals(Rgb.blend(BuiltInPainters.classColour(JuxtapositionClass.RESERVOIR_RESERVOIR), Rgb.WHITE, 0.6),
                faded, "no CSP at the cell: the faded juxtaposition colour");
        // threshold pressure in Pa: 20 bar = 2e6 Pa is the top of the ramp
        assertEquals(0x3B4A5C, new AttributeRampPainter.ThresholdPressure().rgb(cell(Map.of("threshold", 2.0e6)), null));
        assertTrue(new AttributeRampPainter.ThresholdPressure().legend(null).get(1).label().contains("bar"));
    }
}
