package org.faultbench.example.inhouse;

import static org.faultbench.core.extension.ElementStub.element;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.core.extension.ElementStub;
import org.faultbench.juxtaposition.JuxtapositionClass;
import org.faultbench.juxtaposition.paint.AttributePainterCatalog;
import org.faultbench.juxtaposition.paint.AttributePainterContributions;
import org.faultbench.juxtaposition.paint.FaultPlaneCell;
import org.faultbench.juxtaposition.paint.LegendEntry;
import org.faultbench.juxtaposition.paint.PaintScene;
import org.junit.jupiter.api.Test;

class LowSgrPainterTest {

    private static final ResolvedColumn COLUMN = new ResolvedColumn(List.of(
            new UnitSlice("sand", LithologyClass.RESERVOIR, true, 40, 0.1),
            new UnitSlice("shale", LithologyClass.SEAL, false, 20, 0.9)));
    private static final PaintScene SGR = new PaintScene(COLUMN, Optional.of("SGR [%]"), false);

    private static FaultPlaneCell cell(double sgr) {
        return new FaultPlaneCell(100, 1500, JuxtapositionClass.RESERVOIR_RESERVOIR, 0, 0, 30, sgr, 0);
    }

    @Test
    void cellsBelowEighteenPercentAreHighlighted() {
        LowSgrPainter painter = new LowSgrPainter();
        // SGR 15–20 % as the band between leaking and sealing fault rock (Yielding et al. 1997); 18 % chosen here
        assertEquals(LowSgrPainter.LOW_SGR, painter.rgb(cell(17.9), SGR));
        assertEquals(LowSgrPainter.SGR_AT_OR_ABOVE, painter.rgb(cell(18), SGR));
        assertEquals(LowSgrPainter.SGR_AT_OR_ABOVE, painter.rgb(cell(45), SGR));
        assertEquals(List.of("SGR < 18 %", "SGR >= 18 %"), painter.legend(SGR).stream().map(LegendEntry::label)
                .toList());
    }

    @Test
    void otherCriteriaShowJuxtapositionOnly() {
        LowSgrPainter painter = new LowSgrPainter();
        PaintScene ssf = new PaintScene(COLUMN, Optional.of("SSF"), false);
        assertNotEquals(LowSgrPainter.LOW_SGR, painter.rgb(cell(2), ssf));
        assertTrue(painter.legend(ssf).get(0).label().contains("no SGR"));
    }

    @Test
    void pluginXmlEntryLoadsIntoTheViewerCatalog() throws Exception {
        String pluginXml = Files.readString(Path.of("plugin.xml"));
        assertTrue(pluginXml.contains("<painter id=\"example.low-sgr\" name=\"SGR below 18 % highlighted\""));
        AttributePainterCatalog catalog = AttributePainterCatalog.withBuiltIns();
        assertEquals(List.of(), AttributePainterContributions.readInto(catalog, ElementStub.all(
                element("painter").by("org.faultbench.example.inhouse").with("id", "example.low-sgr")
                        .with("name", "SGR below 18 % highlighted").creates("class", new LowSgrPainter()))));
        assertEquals("example.low-sgr", catalog.ids().get(catalog.ids().size() - 1));
    }
}
