package org.faultbench.faults.profile;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point. In the product the built-in shapes arrive through this bundle's own
 * plugin.xml like any contribution; without a registry (plain Java, unit tests) the catalog holds the built-ins.
 */
public final class ThrowProfileModelContributions {

    public static final String POINT = "org.faultbench.faults.throwProfileModels";
    private static final ContributionReader READER = new ContributionReader("throw-profile model", "model");
    private static ThrowProfileModelCatalog platformCatalog;

    private ThrowProfileModelContributions() {
    }

    public static synchronized ThrowProfileModelCatalog platformCatalog() {
        if (platformCatalog == null) {
            if (!ContributionReader.registryAvailable()) {
                platformCatalog = ThrowProfileModelCatalog.withBuiltIns();
            } else {
                ThrowProfileModelCatalog catalog = new ThrowProfileModelCatalog();
                ContributionReader.log(ThrowProfileModelContributions.class,
                        readInto(catalog, ContributionReader.platformElements(POINT)));
                platformCatalog = catalog;
            }
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(ThrowProfileModelCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            c.requiredAttribute("name");
            ThrowProfileModel model = c.create("class", ThrowProfileModel.class);
            double centre = model.value(0);
            if (!(Math.abs(centre - 1) < 1e-9)) {
                throw new IllegalArgumentException("the shape must be 1 at the centre (r = 0), is " + centre);
            }
            catalog.register(c.id(), model);
        });
    }
}
