package org.faultbench.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.awt.image.BufferedImage;
import java.util.Base64;
import java.util.List;

import javax.imageio.ImageIO;

/**
 * The report as one self-contained HTML file: images are embedded as PNG data: URIs, so report.html can be mailed
 * or archived alone. Each section is a {@code <section id>} with an {@code <h2>}; tables and figures carry ids too.
 */
public final class HtmlReportWriter {
    private static final String STYLE = "body{font-family:sans-serif;max-width:62rem;margin:2rem auto;padding:0 1rem;"
            + "color:#202020;line-height:1.4}table{border-collapse:collapse;margin:.6rem 0 1rem;font-size:.9rem}"
            + "th,td{border:1px solid #bbb;padding:.2rem .5rem;text-align:left;vertical-align:top}"
            + "td.n{text-align:right;white-space:nowrap}th{background:#eef2f5}caption{text-align:left;font-weight:bold;"
            + "padding:.2rem 0}figure{margin:1rem 0}img{max-width:100%;border:1px solid #ddd}"
            + "figcaption{font-size:.9rem}section#cautions,section#closing-cautions{background:#fff6e5;"
            + "border-left:4px solid #d55e00;padding:.2rem 1rem}";

    public String write(Report report) {
        StringBuilder html = new StringBuilder();
        html.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(escape(report.title())).append("</title>\n<style>").append(STYLE)
                .append("</style>\n</head>\n<body>\n<h1>").append(escape(report.title())).append("</h1>\n");
        for (Section section : report.sections()) {
            html.append("<section id=\"").append(section.kind().id()).append("\">\n<h2>")
                    .append(escape(section.kind().title())).append("</h2>\n");
            for (Block block : section.blocks()) {
                block(html, block);
            }
            html.append("</section>\n");
        }
        return html.append("</body>\n</html>\n").toString();
    }

    private static void block(StringBuilder html, Block block) {
        if (block instanceof Block.Heading h) {
            html.append("<h3 id=\"").append(h.id()).append("\">").append(escape(h.text())).append("</h3>\n");
        } else if (block instanceof Block.Paragraph p) {
            html.append("<p>").append(escape(p.text())).append("</p>\n");
        } else if (block instanceof Block.Bullets b) {
            html.append("<ul>\n");
            b.items().forEach(item -> html.append("<li>").append(escape(item)).append("</li>\n"));
            html.append("</ul>\n");
        } else if (block instanceof Block.Table t) {
            table(html, t);
        } else if (block instanceof Block.Figure f) {
            html.append("<figure id=\"").append(f.id()).append("\">\n<img alt=\"").append(escape(f.caption()))
                    .append("\" src=\"data:image/png;base64,").append(Base64.getEncoder().encodeToString(png(f.image())))
                    .append("\">\n<figcaption>").append(escape(f.caption())).append("</figcaption>\n</figure>\n");
        }
    }

    private static void table(StringBuilder html, Block.Table t) {
        html.append("<table id=\"").append(t.id()).append("\">\n<caption>").append(escape(t.caption()))
                .append("</caption>\n<thead><tr>");
        t.headers().forEach(h -> html.append("<th scope=\"col\">").append(escape(h)).append("</th>"));
        html.append("</tr></thead>\n<tbody>\n");
        for (List<String> row : t.rows()) {
            html.append("<tr>");
            for (String cell : row) {
                html.append(numeric(cell) ? "<td class=\"n\">" : "<td>").append(escape(cell)).append("</td>");
            }
            html.append("</tr>\n");
        }
        html.append("</tbody>\n</table>\n");
    }

    private static boolean numeric(String cell) {
        return cell.matches("-?[0-9][0-9,]*(\\.[0-9]+)?( %)?");
    }

    static byte[] png(BufferedImage image) {
        try {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            ImageIO.write(image, "png", out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot encode a report image as PNG", e);
        }
    }

    static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
