package org.faultbench.study;

import java.util.List;

/**
 * The history of the analysis file format. Version 1 is current, so the chain has no step yet; when the format
 * changes, add a {@link FormatMigration} from the old version here and raise
 * {@link AnalysisFileReader#FORMAT_VERSION}.
 */
final class AnalysisFileMigrations {
    static final MigrationChain CHAIN = new MigrationChain("formatVersion", AnalysisFileReader.FORMAT_VERSION,
            List.of());

    private AnalysisFileMigrations() {
    }
}
