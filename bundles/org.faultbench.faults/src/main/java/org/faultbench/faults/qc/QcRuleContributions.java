package org.faultbench.faults.qc;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.RegistryFactory;

/**
 * Reads the {@value #POINT} extension point into a {@link QcRuleCatalog}. A bad contribution (missing id, class
 * that cannot be created or is no FaultQcRule, id already taken, object reporting another id) is logged with the
 * contributing bundle's id and skipped: one broken plug-in never takes the others down.
 */
public final class QcRuleContributions {

    public static final String POINT = "org.faultbench.faults.qcRules";
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
            IExtensionRegistry registry = RegistryFactory.getRegistry();
            if (registry != null) {
                for (String problem : readInto(catalog, registry.getConfigurationElementsFor(POINT))) {
                    ILog.of(QcRuleContributions.class).warn(problem);
                }
            }
            platformCatalog = catalog;
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(QcRuleCatalog catalog, IConfigurationElement[] elements) {
        List<String> problems = new ArrayList<>();
        for (IConfigurationElement element : elements) {
            String contributor = element.getContributor() == null ? "?" : element.getContributor().getName();
            String id = element.getAttribute("id");
            String where = "fault QC rule '" + id + "' contributed by " + contributor + ": ";
            if (!"rule".equals(element.getName()) || id == null || id.isBlank()) {
                problems.add(where + "an element <rule> with an id is expected");
                continue;
            }
            try {
                Object created = element.createExecutableExtension("class");
                if (!(created instanceof FaultQcRule rule)) {
                    problems.add(where + "class " + created.getClass().getName() + " does not implement FaultQcRule");
                } else if (!id.equals(rule.id())) {
                    problems.add(where + "the object reports id '" + rule.id() + "'");
                } else {
                    catalog.register(rule);
                }
            } catch (CoreException | RuntimeException | LinkageError e) {
                problems.add(where + "skipped: " + e.getMessage());
            }
        }
        return problems;
    }
}
