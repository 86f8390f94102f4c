package org.faultbench.report;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.pdfbox.pdmodel.graphics.image.LosslessFactory;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;

/**
 * A tiny flow layout on A4 pages: a cursor moving down the page, a new page when the next thing does not fit,
 * wrapped text and simple ruled tables. Standard 14 fonts, so the text stays extractable.
 */
final class PdfLayout implements AutoCloseable {
    static final float MARGIN = 50;
    static final PDFont REGULAR = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    static final PDFont BOLD = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);

    private final PDDocument document;
    private final float width = PDRectangle.A4.getWidth() - 2 * MARGIN;
    private PDPageContentStream content;
    private float y;

    PdfLayout(PDDocument document) {
        this.document = document;
    }

    float width() {
        return width;
    }

    void newPage() throws IOException {
        if (content != null) {
            content.close();
        }
        PDPage page = new PDPage(PDRectangle.A4);
        document.addPage(page);
        content = new PDPageContentStream(document, page);
        y = PDRectangle.A4.getHeight() - MARGIN;
    }

    /** Starts a new page unless {@code height} points still fit above the bottom margin. */
    void need(float height) throws IOException {
        if (content == null || y - height < MARGIN + 14) {
            newPage();
        }
    }

    void space(float points) {
        y -= points;
    }

    /** Wrapped text at {@code indent} from the left margin. */
    void text(String text, PDFont font, float size, float indent) throws IOException {
        float leading = size * 1.3f;
        for (String line : wrap(text, font, size, width - indent)) {
            need(leading);
            y -= leading;
            show(line, font, size, MARGIN + indent, y + size * 0.25f);
        }
    }

    void bullet(String text, float size) throws IOException {
        need(size * 1.3f);
        show("-", REGULAR, size, MARGIN + 4, y - size * 1.3f + size * 0.25f);
        text(text, REGULAR, size, 14);
    }

    /** A table with wrapped cells; the header row repeats on each new page. */
    void table(List<String> headers, List<List<String>> rows, float[] columnWidths, float size) throws IOException {
        row(headers, columnWidths, BOLD, size, true);
        for (List<String> r : rows) {
            if (y - rowHeight(r, columnWidths, REGULAR, size) < MARGIN + 14) {
                newPage();
                row(headers, columnWidths, BOLD, size, true);
            }
            row(r, columnWidths, REGULAR, size, false);
        }
    }

    private float rowHeight(List<String> cells, float[] widths, PDFont font, float size) throws IOException {
        int lines = 1;
        for (int c = 0; c < cells.size(); c++) {
            lines = Math.max(lines, wrap(cells.get(c), font, size, widths[c] - 6).size());
        }
        return lines * size * 1.25f + 4;
    }

    private void row(List<String> cells, float[] widths, PDFont font, float size, boolean header) throws IOException {
        float height = rowHeight(cells, widths, font, size);
        need(height);
        float x = MARGIN;
        if (header) {
            content.setNonStrokingColor(0.93f, 0.95f, 0.96f);
            content.addRect(MARGIN, y - height, sum(widths), height);
            content.fill();
            content.setNonStrokingColor(0f, 0f, 0f);
        }
        content.setLineWidth(0.4f);
        for (int c = 0; c < cells.size(); c++) {
            content.addRect(x, y - height, widths[c], height);
            content.stroke();
            List<String> lines = wrap(cells.get(c), font, size, widths[c] - 6);
            for (int l = 0; l < lines.size(); l++) {
                show(lines.get(l), font, size, x + 3, y - 2 - (l + 1) * size * 1.25f + size * 0.25f);
            }
            x += widths[c];
        }
        y -= height;
    }

    private static float sum(float[] values) {
        float s = 0;
        for (float v : values) {
            s += v;
        }
        return s;
    }

    /** An image scaled to the text width (never enlarged beyond 0.75 pt per pixel). */
    void image(BufferedImage image, float keepBelow) throws IOException {
        PDImageXObject xObject = LosslessFactory.createFromImage(document, image);
        float scale = Math.min(width / image.getWidth(), 0.75f);
        float w = image.getWidth() * scale;
        float h = image.getHeight() * scale;
        float maxHeight = PDRectangle.A4.getHeight() - 2 * MARGIN - 90;
        if (h > maxHeight) {
            w *= maxHeight / h;
            h = maxHeight;
        }
        need(h + 4 + keepBelow);
        y -= h;
        content.drawImage(xObject, MARGIN + (width - w) / 2, y, w, h);
        y -= 4;
    }

    private void show(String text, PDFont font, float size, float x, float baseline) throws IOException {
        content.beginText();
        content.setFont(font, size);
        content.newLineAtOffset(x, baseline);
        content.showText(PdfText.safe(text));
        content.endText();
    }

    /** Greedy word wrap; a word longer than the width is cut. */
    static List<String> wrap(String text, PDFont font, float size, float maxWidth) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : PdfText.safe(text).split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (widthOf(candidate, font, size) <= maxWidth) {
                line.setLength(0);
                line.append(candidate);
                continue;
            }
            if (line.length() > 0) {
                lines.add(line.toString());
                line.setLength(0);
            }
            String rest = word;
            while (widthOf(rest, font, size) > maxWidth && rest.length() > 1) {
                int cut = rest.length() - 1;
                while (cut > 1 && widthOf(rest.substring(0, cut), font, size) > maxWidth) {
                    cut--;
                }
                lines.add(rest.substring(0, cut));
                rest = rest.substring(cut);
            }
            line.append(rest);
        }
        lines.add(line.toString());
        return lines;
    }

    private static float widthOf(String text, PDFont font, float size) throws IOException {
        return font.getStringWidth(text) / 1000 * size;
    }

    /** Writes "page i of n" and the report title at the foot of every page. */
    void pageNumbers(String footer) throws IOException {
        if (content != null) {
            content.close();
            content = null;
        }
        int n = document.getNumberOfPages();
        for (int i = 0; i < n; i++) {
            PDPage page = document.getPage(i);
            try (PDPageContentStream foot = new PDPageContentStream(document, page,
                    PDPageContentStream.AppendMode.APPEND, true, true)) {
                foot.beginText();
                foot.setFont(REGULAR, 8);
                foot.newLineAtOffset(MARGIN, MARGIN / 2);
                String left = PdfText.safe(footer);
                while (left.length() > 4 && widthOf(left, REGULAR, 8) > width - 80) {
                    left = left.substring(0, left.length() - 4) + "...";
                }
                foot.showText(left);
                foot.endText();
                String number = "Page " + (i + 1) + " of " + n;
                foot.beginText();
                foot.setFont(REGULAR, 8);
                foot.newLineAtOffset(MARGIN + width - widthOf(number, REGULAR, 8), MARGIN / 2);
                foot.showText(number);
                foot.endText();
            }
        }
    }

    @Override
    public void close() throws IOException {
        if (content != null) {
            content.close();
            content = null;
        }
    }
}
