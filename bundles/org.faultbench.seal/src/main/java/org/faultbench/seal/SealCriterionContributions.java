package org.faultbench.seal;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point into a {@link SealCriterionCatalog}. A bad contribution (missing id,
 * class that cannot be created or is no SealCriterion, id already taken, object reporting another id) is logged with
 * the contributing bundle's id and skipped: one broken plug-in never takes the others down.
 */
public final class SealCriterionContributions {
    public static final String POINT = "org.faultbench.seal.sealCriteria";
    private static final ContributionReader READER = new ContributionReader("seal criterion", "criterion");
    private static SealCriterionCatalog platformCatalog;

    private SealCriterionContributions() {
    }

    /**
     * The catalog the application uses: the built-ins plus every valid contribution in the running platform's
     * extension registry (just the built-ins outside OSGi, e.g. in plain unit tests).
     */
    public static synchronized SealCriterionCatalog platformCatalog() {
        if (platformCatalog == null) {
            SealCriterionCatalog catalog = SealCriterionCatalog.withBuiltIns();
            ContributionReader.log(SealCriterionContributions.class,
                    readInto(catalog, ContributionReader.platformElements(POINT)));
            platformCatalog = catalog;
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(SealCriterionCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> catalog.register(c.createWithId(SealCriterion.class, SealCriterion::id)));
    }
}
