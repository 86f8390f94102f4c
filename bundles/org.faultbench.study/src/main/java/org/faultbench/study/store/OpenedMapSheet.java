package org.faultbench.study.store;

import org.faultbench.study.MapSheetFile;

/**
 * A map-sheet file as opened.
 *
 * @param mapSheet the sheet and its georeference
 * @param report what recovery was needed, if any
 */
public record OpenedMapSheet(MapSheetFile mapSheet, RecoveryReport report) {
}
