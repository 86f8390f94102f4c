package org.faultbench.report;

import java.util.List;

/** A report as plain content, independent of the output format. */
public record Report(String title, List<Section> sections) {
}
