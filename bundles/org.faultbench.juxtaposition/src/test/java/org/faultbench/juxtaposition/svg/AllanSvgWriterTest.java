package org.faultbench.juxtaposition.svg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.core.io.SafeXml;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.Wall;
import org.faultbench.juxtaposition.AllanDiagram;
import org.faultbench.juxtaposition.HungColumns;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class AllanSvgWriterTest {
    @TempDir
    Path dir;

    /** Sand A 50 m, shale 30 m, sand B 50 m on both walls; ten 100 m columns, footwall at 1000 m, 60 m throw. */
    private static AllanDiagram diagram(double... throwPerColumn) {
        ResolvedColumn column = new ResolvedColumn(List.of(
                new UnitSlice("sand A", LithologyClass.RESERVOIR, true, 50, 0.1),
                new UnitSlice("shale & silt", LithologyClass.SEAL, false, 30, 0.9),
                new UnitSlice("sand B", LithologyClass.RESERVOIR, true, 50, 0.1)));
        int n = throwPerColumn.length;
        double[] u = new double[n];
        double[] zero = new double[n];
        double[] footwall = new double[n];
        double[] hangingWall = new double[n];
        for (int k = 0; k < n; k++) {
            u[k] = 50 + 100 * k;
            footwall[k] = 1000;
            hangingWall[k] = 1000 + throwPerColumn[k];
        }
        FaultPlaneColumns columns = new FaultPlaneColumns("F1", "top sand A", 100, u, u, zero, footwall, hangingWall);
        return AllanDiagram.of(columns, new HungColumns(column, column, 0));
    }

    private static final double[] CONSTANT_60 = { 60, 60, 60, 60, 60, 60, 60, 60, 60, 60 };

    private Document writeAndParse(AllanSvgWriter writer, List<SvgDepthLine> lines) throws IOException {
        Path file = dir.resolve("allan.svg");
        writer.write(file, lines);
        return SafeXml.parse(file); // throws on anything that is not well-formed XML
    }

    @Test
    void writesWellFormedSvgWithOnePolygonPerUnitPolygon() throws IOException {
        AllanDiagram diagram = diagram(CONSTANT_60);
        AllanSvgWriter writer = new AllanSvgWriter(diagram, "F<1>", new AllanSvgFrame(0, 1000, 950, 1250));
        Document svg = writeAndParse(writer, List.of());
        assertEquals("svg", svg.getDocumentElement().getTagName());
        assertEquals("http://www.w3.org/2000/svg", svg.getDocumentElement().getAttribute("xmlns"));
        int expected = 0;
        for (Wall wall : Wall.values()) {
            for (int unit = 0; unit < 3; unit++) {
                expected += diagram.unitOutline(wall, unit).getNumGeometries();
            }
        }
        assertEquals(6, expected, "three units on two walls, no gaps");
        assertEquals(expected, elementsWithClass(svg, "polygon", "unit").size());
        // one window, sand B (footwall) against sand A (hanging wall), 30 m x 1000 m (common-practice window formula)
        assertEquals(1, elementsWithClass(svg, "polygon", "window").size());
    }

    @Test
    void aGapInTheColumnsSplitsAUnitIntoTwoPolygons() throws IOException {
        AllanDiagram diagram = diagram(CONSTANT_60);
        // the same walls, but sampled with a column without data in the middle: each unit in two parts
        ResolvedColumn column = diagram.walls().footwall().column();
        double[] u = { 50, 150, 250, 350, 450 };
        double nan = Double.NaN;
        FaultPlaneColumns gappy = new FaultPlaneColumns("F1", "top sand A", 100, u, u, new double[5],
                new double[] { 1000, 1000, nan, 1000, 1000 }, new double[] { 1060, 1060, nan, 1060, 1060 });
        AllanDiagram split = AllanDiagram.of(gappy, new HungColumns(column, column, 0));
        assertEquals(2, split.unitOutline(Wall.FOOTWALL, 0).getNumGeometries());
        Document svg = writeAndParse(new AllanSvgWriter(split, "F1", new AllanSvgFrame(0, 500, 950, 1250)), List.of());
        assertEquals(12, elementsWithClass(svg, "polygon", "unit").size());
    }

    @Test
    void depthLinesSitWhereTheDepthTransformPutsThem() throws IOException {
        AllanSvgFrame frame = new AllanSvgFrame(0, 1000, 950, 1250);
        AllanSvgWriter writer = new AllanSvgWriter(diagram(CONSTANT_60), "F1", frame);
        Document svg = writeAndParse(writer, List.of(new SvgDepthLine("sand A contact P90 (low)", 1040, 0x78aadc, true),
                new SvgDepthLine("sand A contact P50", 1067.5, 0x1e5ab4, false),
                new SvgDepthLine("outside the diagram", 2000, 0, false)));
        List<Element> groups = elementsWithClass(svg, "g", "depth-line");
        assertEquals(2, groups.size(), "a line below the diagram is left out");
        Element p50 = groups.stream().filter(g -> g.getAttribute("data-label").endsWith("P50")).findFirst().orElseThrow();
        Element line = (Element) p50.getElementsByTagName("line").item(0);
        // y = TOP + HEIGHT (z - zTop) / (zBase - zTop) = 40 + 440 x 117.5 / 300 = 212.333 (hand calculation)
        assertEquals(212.333, frame.y(1067.5), 0.001);
        assertEquals(frame.y(1067.5), Double.parseDouble(line.getAttribute("y1")), 0.005);
        assertEquals(frame.y(1067.5), Double.parseDouble(line.getAttribute("y2")), 0.005);
        assertTrue(p50.getTextContent().contains("1067.5 m"));
    }

    @Test
    void polygonCornersFollowTheTransform() throws IOException {
        AllanSvgFrame frame = new AllanSvgFrame(0, 1000, 950, 1250);
        Document svg = writeAndParse(new AllanSvgWriter(diagram(CONSTANT_60), "F1", frame), List.of());
        Element footwallSandA = elementsWithClass(svg, "polygon", "unit").get(0);
        assertEquals("footwall", footwallSandA.getAttribute("data-wall"));
        assertEquals("sand A", footwallSandA.getAttribute("data-unit"));
        // its first corner is (u 0, z 1000): the left end of the footwall cut-off
        String first = footwallSandA.getAttribute("points").split(" ")[0];
        assertEquals(AllanSvgWriter.n(frame.x(0)) + "," + AllanSvgWriter.n(frame.y(1000)), first);
    }

    private static List<Element> elementsWithClass(Document document, String tag, String cssClass) {
        NodeList nodes = document.getElementsByTagName(tag);
        List<Element> found = new java.util.ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            Element e = (Element) nodes.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(cssClass)) {
                found.add(e);
            }
        }
        return found;
    }
}
