package org.faultbench.digitize.importer;

import java.util.Objects;

import org.faultbench.digitize.io.DepthSign;
import org.faultbench.digitize.io.FileUnits;

/**
 * What the user states on import because exchange files cannot say it: the length units and the depth sign.
 * Importers of formats that carry their own units or signs ignore what does not apply.
 */
public record ImportSettings(FileUnits units, DepthSign depthSign) {

    /** Metres, depths positive downward (TVDSS). */
    public static final ImportSettings METRES_POSITIVE_DOWN = new ImportSettings(FileUnits.METRES,
            DepthSign.POSITIVE_DOWN);

    public ImportSettings {
        Objects.requireNonNull(units, "units");
        Objects.requireNonNull(depthSign, "depthSign");
    }
}
