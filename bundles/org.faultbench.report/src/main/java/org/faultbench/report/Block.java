package org.faultbench.report;

import java.awt.image.BufferedImage;
import java.util.List;

/** One piece of a report section; the HTML and PDF writers each know how to lay out every kind. */
public sealed interface Block {

    /** A sub-heading inside a section; {@code id} is its HTML anchor. */
    record Heading(String id, String text) implements Block {
    }

    record Paragraph(String text) implements Block {
    }

    record Bullets(List<String> items) implements Block {
    }

    /**
     * A table; headers carry the units ("depth [m]"). {@code id} is its HTML anchor; {@code firstColumnShare} is the
     * share of the width given to the first column in the PDF, the rest being split evenly.
     */
    record Table(String id, String caption, List<String> headers, List<List<String>> rows, double firstColumnShare)
            implements Block {
    }

    record Figure(String id, String caption, BufferedImage image) implements Block {
    }
}
