package org.faultbench.faults.qc;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point into a {@link QcRuleCatalog}. A bad contribution (missing id, class
 * that cannot be created or is no FaultQcRule, id already taken, object reporting another id) is logged with the
 * contributing bundle's id and skipped: one broken plug-in never takes the others down.
 */
public final class QcRuleContributions {

    public static final String POINT = "org.faultbench.faults.qcRules";
    private static final ContributionReader READER = new ContributionReader("fault QC rule", "rule");
    private static QcRuleCatalog platformCatalog;

    private QcRuleContributions() {
    }

    /**
     * The catalog the application uses: the built-ins plus every valid contribution in the running platform's
     * extension registry (just the built-ins outside OSGi, e.g. in plain unit tests).
     */
    public static synchronized QcRuleCatalog platformCatalog() {
        if (platformCatalog == null) {
            QcRuleCatalog catalog = QcRuleCatalog.withBuiltIns();
            ContributionReader.log(QcRuleContributions.class, readInto(catalog, ContributionReader.platformElements(POINT)));
            platformCatalog = catalog;
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(QcRuleCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> catalog.register(c.createWithId(FaultQcRule.class, FaultQcRule::id)));
    }
}
