package org.faultbench.report;

/**
 * The sections of a report, in order, with the id each carries in the HTML ({@code <section id>}) and its heading,
 * which the PDF prints as well. Cautions come first and again last, so no reader of a single page misses them.
 */
public enum ReportSection {
    RUN("run", "Run identity"),
    CAUTIONS("cautions", "Cautions"),
    INPUTS("inputs", "Inputs summary"),
    MAP("map", "Map of the reference horizon"),
    THROW_PROFILES("throw-profiles", "Throw profiles"),
    ALLAN_DIAGRAMS("allan-diagrams", "Allan diagrams"),
    RESULTS("results", "Results per reservoir unit"),
    LEAK_PROBABILITY("leak-probability", "Leak probability on the faults"),
    TORNADO("tornado", "Tornado charts"),
    CLOSING_CAUTIONS("closing-cautions", "Cautions (repeated)");

    private final String id;
    private final String title;

    ReportSection(String id, String title) {
        this.id = id;
        this.title = title;
    }

    public String id() {
        return id;
    }

    public String title() {
        return title;
    }
}
