package org.faultbench.report;

import java.util.List;

/** A report section: which one, and its content in reading order. */
public record Section(ReportSection kind, List<Block> blocks) {
}
