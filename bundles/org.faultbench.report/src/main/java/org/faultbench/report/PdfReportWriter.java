package org.faultbench.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;

/** The report as an A4 PDF (PDFBox): headings, wrapped text, ruled tables, images, page numbers. */
public final class PdfReportWriter {
    private static final float BODY = 9.5f;

    public byte[] write(Report report) throws IOException {
        try (PDDocument document = new PDDocument()) {
            PDDocumentInformation info = document.getDocumentInformation();
            info.setTitle(report.title());
            info.setCreator("Faultbench");
            try (PdfLayout layout = new PdfLayout(document)) {
                layout.newPage();
                layout.text(report.title(), PdfLayout.BOLD, 16, 0);
                layout.space(6);
                for (Section section : report.sections()) {
                    section(layout, section);
                }
                layout.pageNumbers(report.title());
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            document.save(out);
            return out.toByteArray();
        }
    }

    private static void section(PdfLayout layout, Section section) throws IOException {
        boolean figures = section.blocks().stream().anyMatch(b -> b instanceof Block.Figure);
        if (figures) {
            layout.newPage();
        } else {
            layout.need(80);
            layout.space(10);
        }
        layout.text(section.kind().title(), PdfLayout.BOLD, 13, 0);
        layout.space(4);
        for (Block block : section.blocks()) {
            block(layout, block);
        }
    }

    private static void block(PdfLayout layout, Block block) throws IOException {
        if (block instanceof Block.Heading h) {
            layout.need(120);
            layout.space(6);
            layout.text(h.text(), PdfLayout.BOLD, 11, 0);
            layout.space(2);
        } else if (block instanceof Block.Paragraph p) {
            layout.text(p.text(), PdfLayout.REGULAR, BODY, 0);
            layout.space(5);
        } else if (block instanceof Block.Bullets b) {
            for (String item : b.items()) {
                layout.bullet(item, BODY);
            }
            layout.space(5);
        } else if (block instanceof Block.Table t) {
            layout.need(40);
            layout.text(t.caption(), PdfLayout.BOLD, BODY, 0);
            layout.space(2);
            layout.table(t.headers(), t.rows(), widths(layout.width(), t), 8f);
            layout.space(8);
        } else if (block instanceof Block.Figure f) {
            layout.image(f.image(), 3 * 8.5f * 1.3f);
            layout.text(f.caption(), PdfLayout.REGULAR, 8.5f, 0);
            layout.space(10);
        }
    }

    private static float[] widths(float total, Block.Table t) {
        int n = t.headers().size();
        float[] widths = new float[n];
        widths[0] = n == 1 ? total : (float) (total * t.firstColumnShare());
        for (int c = 1; c < n; c++) {
            widths[c] = (total - widths[0]) / (n - 1);
        }
        return widths;
    }
}
