package org.faultbench.juxtaposition.svg;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.faultbench.faults.Wall;
import org.faultbench.juxtaposition.AllanDiagram;
import org.faultbench.juxtaposition.AllanWindow;
import org.faultbench.juxtaposition.HungColumn;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

/**
 * Writes an Allan diagram as a self-contained SVG file, for reports and slides where a vector figure scales better
 * than a screenshot: every unit of both walls as a filled polygon (footwall outlined solid, hanging wall dashed, as on
 * the canvas), the reservoir/reservoir windows outlined on top, labelled depth lines, axes with ticks and a legend.
 * The palette is the canvas's: reservoir sand, seal grey-green, windows burnt orange.
 */
public final class AllanSvgWriter {
    static final String RESERVOIR_FILL = "#e6be64";
    static final String SEAL_FILL = "#96a591";
    static final String WINDOW_FILL = "#d95f02";
    private static final int TICKS = 5;

    private final AllanDiagram diagram;
    private final String faultId;
    private final AllanSvgFrame frame;

    public AllanSvgWriter(AllanDiagram diagram, String faultId, AllanSvgFrame frame) {
        this.diagram = diagram;
        this.faultId = faultId;
        this.frame = frame;
    }

    public AllanSvgFrame frame() {
        return frame;
    }

    /** Writes the SVG document to {@code file} (UTF-8), replacing it. */
    public void write(Path file, List<SvgDepthLine> lines) throws IOException {
        Files.writeString(file, toSvg(lines), StandardCharsets.UTF_8);
    }

    /** The SVG document as text. */
    public String toSvg(List<SvgDepthLine> lines) {
        StringBuilder svg = new StringBuilder();
        svg.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        svg.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(n(AllanSvgFrame.PAGE_WIDTH))
                .append("\" height=\"").append(n(AllanSvgFrame.PAGE_HEIGHT)).append("\" viewBox=\"0 0 ")
                .append(n(AllanSvgFrame.PAGE_WIDTH)).append(' ').append(n(AllanSvgFrame.PAGE_HEIGHT))
                .append("\" font-family=\"sans-serif\" font-size=\"11\">\n");
        svg.append("<title>").append(escape("Allan diagram of fault " + faultId)).append("</title>\n");
        svg.append("<rect width=\"100%\" height=\"100%\" fill=\"#ffffff\"/>\n");
        svg.append("<defs><clipPath id=\"plot\"><rect x=\"").append(n(AllanSvgFrame.LEFT)).append("\" y=\"")
                .append(n(AllanSvgFrame.TOP)).append("\" width=\"").append(n(AllanSvgFrame.PLOT_WIDTH))
                .append("\" height=\"").append(n(AllanSvgFrame.PLOT_HEIGHT)).append("\"/></clipPath></defs>\n");
        svg.append("<g clip-path=\"url(#plot)\">\n");
        units(svg, Wall.FOOTWALL);
        units(svg, Wall.HANGING_WALL);
        windows(svg);
        svg.append("</g>\n");
        depthLines(svg, lines);
        axes(svg);
        legend(svg);
        svg.append("</svg>\n");
        return svg.toString();
    }

    private void units(StringBuilder svg, Wall wall) {
        HungColumn column = diagram.walls().wall(wall);
        String side = wall == Wall.FOOTWALL ? "footwall" : "hanging-wall";
        svg.append("<g class=\"").append(side).append("\">\n");
        for (int unit = 0; unit < column.size(); unit++) {
            Geometry outline = diagram.unitOutline(wall, unit);
            String fill = column.isReservoir(unit) ? RESERVOIR_FILL : SEAL_FILL;
            for (int part = 0; part < outline.getNumGeometries(); part++) {
                Polygon polygon = (Polygon) outline.getGeometryN(part);
                svg.append("<polygon class=\"unit\" data-wall=\"").append(side).append("\" data-unit=\"")
                        .append(escape(column.unitName(unit))).append("\" points=\"").append(points(polygon))
                        .append("\" fill=\"").append(fill).append("\" fill-opacity=\"0.45\" stroke=\"#000000\"")
                        .append(" stroke-width=\"0.8\"").append(wall == Wall.FOOTWALL ? "" : " stroke-dasharray=\"5 3\"")
                        .append("><title>").append(escape(side + " " + column.unitName(unit))).append("</title></polygon>\n");
            }
        }
        svg.append("</g>\n");
    }

    private void windows(StringBuilder svg) {
        svg.append("<g class=\"reservoir-windows\">\n");
        for (AllanWindow window : diagram.reservoirWindows()) {
            String name = diagram.walls().footwall().unitName(window.footwallUnit()) + " (footwall) against "
                    + diagram.walls().hangingWall().unitName(window.hangingWallUnit()) + " (hanging wall)";
            for (int part = 0; part < window.outline().getNumGeometries(); part++) {
                Polygon polygon = (Polygon) window.outline().getGeometryN(part);
                svg.append("<polygon class=\"window\" points=\"").append(points(polygon)).append("\" fill=\"")
                        .append(WINDOW_FILL).append("\" fill-opacity=\"0.8\" stroke=\"#7a3300\" stroke-width=\"1.5\">")
                        .append("<title>").append(escape(name)).append("</title></polygon>\n");
            }
        }
        svg.append("</g>\n");
    }

    private String points(Polygon polygon) {
        StringBuilder points = new StringBuilder();
        Coordinate[] ring = polygon.getExteriorRing().getCoordinates();
        for (int i = 0; i < ring.length - 1; i++) { // the closing point repeats the first
            if (i > 0) {
                points.append(' ');
            }
            points.append(n(frame.x(ring[i].x))).append(',').append(n(frame.y(ring[i].y)));
        }
        return points.toString();
    }

    private void depthLines(StringBuilder svg, List<SvgDepthLine> lines) {
        int labelled = 0;
        for (SvgDepthLine line : lines) {
            if (!frame.containsDepth(line.z())) {
                continue;
            }
            String colour = String.format(Locale.ROOT, "#%06x", line.rgb() & 0xFFFFFF);
            String label = line.label() + " " + String.format(Locale.ROOT, "%.1f", line.z()) + " m";
            double y = frame.y(line.z());
            // labels alternate between the left and right ends so neighbouring lines stay readable
            boolean left = labelled++ % 2 == 0;
            svg.append("<g class=\"depth-line\" data-label=\"").append(escape(line.label())).append("\">")
                    .append("<line x1=\"").append(n(AllanSvgFrame.LEFT)).append("\" y1=\"").append(n(y))
                    .append("\" x2=\"").append(n(AllanSvgFrame.LEFT + AllanSvgFrame.PLOT_WIDTH)).append("\" y2=\"")
                    .append(n(y)).append("\" stroke=\"").append(colour).append("\" stroke-width=\"2\"")
                    .append(line.dashed() ? " stroke-dasharray=\"8 4\"" : "").append("/>")
                    .append("<text x=\"").append(n(left ? AllanSvgFrame.LEFT + 4 : AllanSvgFrame.LEFT + AllanSvgFrame.PLOT_WIDTH - 4))
                    .append("\" y=\"").append(n(y - 4)).append("\" text-anchor=\"").append(left ? "start" : "end")
                    .append("\" fill=\"").append(colour).append("\" stroke=\"#ffffff\" stroke-width=\"3\"")
                    .append(" paint-order=\"stroke\">").append(escape(label)).append("</text></g>\n");
        }
    }

    private void axes(StringBuilder svg) {
        double left = AllanSvgFrame.LEFT;
        double top = AllanSvgFrame.TOP;
        double bottom = top + AllanSvgFrame.PLOT_HEIGHT;
        svg.append("<g class=\"axes\" fill=\"#000000\">\n");
        svg.append("<rect x=\"").append(n(left)).append("\" y=\"").append(n(top)).append("\" width=\"")
                .append(n(AllanSvgFrame.PLOT_WIDTH)).append("\" height=\"").append(n(AllanSvgFrame.PLOT_HEIGHT))
                .append("\" fill=\"none\" stroke=\"#000000\"/>\n");
        for (int i = 0; i <= TICKS; i++) {
            double z = frame.zTop() + i * (frame.zBase() - frame.zTop()) / TICKS;
            double y = frame.y(z);
            svg.append("<line x1=\"").append(n(left - 4)).append("\" y1=\"").append(n(y)).append("\" x2=\"")
                    .append(n(left)).append("\" y2=\"").append(n(y)).append("\" stroke=\"#000000\"/>")
                    .append("<text x=\"").append(n(left - 6)).append("\" y=\"").append(n(y + 4))
                    .append("\" text-anchor=\"end\">").append(String.format(Locale.ROOT, "%.0f", z)).append("</text>\n");
            double u = frame.uMin() + i * (frame.uMax() - frame.uMin()) / TICKS;
            double x = frame.x(u);
            svg.append("<line x1=\"").append(n(x)).append("\" y1=\"").append(n(bottom)).append("\" x2=\"").append(n(x))
                    .append("\" y2=\"").append(n(bottom + 4)).append("\" stroke=\"#000000\"/>")
                    .append("<text x=\"").append(n(x)).append("\" y=\"").append(n(bottom + 16))
                    .append("\" text-anchor=\"middle\">").append(String.format(Locale.ROOT, "%.0f", u)).append("</text>\n");
        }
        svg.append("<text x=\"").append(n(left + AllanSvgFrame.PLOT_WIDTH / 2)).append("\" y=\"").append(n(bottom + 34))
                .append("\" text-anchor=\"middle\">").append(escape("distance along strike u [m] \u2014 fault " + faultId
                        + " seen from the hanging wall"))
                .append("</text>\n");
        svg.append("<text x=\"").append(n(16)).append("\" y=\"").append(n(top + AllanSvgFrame.PLOT_HEIGHT / 2))
                .append("\" text-anchor=\"middle\" transform=\"rotate(-90 16 ").append(n(top + AllanSvgFrame.PLOT_HEIGHT / 2))
                .append(")\">depth [m TVDSS]</text>\n");
        svg.append("<text x=\"").append(n(left)).append("\" y=\"").append(n(top - 14)).append("\" font-size=\"14\">")
                .append(escape("Allan diagram \u2014 fault " + faultId)).append("</text>\n");
        svg.append("</g>\n");
    }

    private void legend(StringBuilder svg) {
        double y = AllanSvgFrame.TOP + AllanSvgFrame.PLOT_HEIGHT + 56;
        double x = AllanSvgFrame.LEFT;
        svg.append("<g class=\"legend\">\n");
        x = swatch(svg, x, y, RESERVOIR_FILL, "0.45", null, "reservoir unit");
        x = swatch(svg, x, y, SEAL_FILL, "0.45", null, "seal unit");
        swatch(svg, x, y, WINDOW_FILL, "0.8", null, "reservoir/reservoir window");
        y += 22;
        x = AllanSvgFrame.LEFT;
        x = swatch(svg, x, y, "#ffffff", "0", null, "footwall unit (solid outline)");
        swatch(svg, x, y, "#ffffff", "0", "5 3", "hanging-wall unit (dashed outline)");
        svg.append("</g>\n");
    }

    private static double swatch(StringBuilder svg, double x, double y, String fill, String opacity, String dash,
            String label) {
        svg.append("<rect x=\"").append(n(x)).append("\" y=\"").append(n(y - 10)).append("\" width=\"16\" height=\"12\"")
                .append(" fill=\"").append(fill).append("\" fill-opacity=\"").append(opacity)
                .append("\" stroke=\"#000000\"").append(dash == null ? "" : " stroke-dasharray=\"" + dash + "\"")
                .append("/><text x=\"").append(n(x + 22)).append("\" y=\"").append(n(y)).append("\">")
                .append(escape(label)).append("</text>\n");
        return x + 40 + 6.5 * label.length();
    }

    /** A coordinate with two decimals, always with a point. */
    static String n(double value) {
        return String.format(Locale.ROOT, "%.2f", value);
    }

    static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (char c : text.toCharArray()) {
            switch (c) {
            case '&' -> out.append("&amp;");
            case '<' -> out.append("&lt;");
            case '>' -> out.append("&gt;");
            case '"' -> out.append("&quot;");
            case '\'' -> out.append("&apos;");
            default -> out.append(c < 0x20 && c != '\t' && c != '\n' && c != '\r' ? ' ' : c);
            }
        }
        return out.toString();
    }
}
