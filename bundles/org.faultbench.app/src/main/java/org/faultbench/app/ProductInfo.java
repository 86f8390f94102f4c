package org.faultbench.app;

import org.faultbench.study.ResultsWriter;
import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;
import org.osgi.framework.Version;

/** Product name, version and the cautions shown wherever results can drive a well or storage decision. */
public final class ProductInfo {
    public static final String PRODUCT_NAME = "Faultbench";

    /** The cautions, one per line: the same list the result files and the batch run carry. */
    public static final String CAUTIONS = String.join("\n", ResultsWriter.CAUTIONS);

    private ProductInfo() {
    }

    /** Version of the workbench bundle, e.g. "0.1.0.202612020300"; "unknown" outside OSGi. */
    public static String version() {
        Bundle bundle = FrameworkUtil.getBundle(ProductInfo.class);
        Version v = bundle == null ? null : bundle.getVersion();
        return v == null ? "unknown" : v.toString();
    }

    public static String windowTitle() {
        return PRODUCT_NAME + " " + shortVersion(version()) + " \u2014 fault-seal and trap analysis";
    }

    /** "0.1.0.qualifier" becomes "0.1.0". */
    static String shortVersion(String full) {
        String[] parts = full.split("\\.");
        return parts.length >= 3 ? parts[0] + "." + parts[1] + "." + parts[2] : full;
    }

    public static String aboutText() {
        return PRODUCT_NAME + " " + version() + "\n"
                + "An open-source workbench for fault-seal and trap analysis: juxtaposition, fault-rock seal,\n"
                + "spill and leak points, column heights and attic volumes with Monte Carlo uncertainty.\n\n"
                + "Java " + System.getProperty("java.version") + "\n\n"
                + CAUTIONS;
    }
}
