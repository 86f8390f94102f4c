package org.faultbench.seal;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.RegistryFactory;

/**
 * Reads the {@value #POINT} extension point into a {@link SealCriterionCatalog}. A bad contribution (missing id,
 * class that cannot be created or is no SealCriterion, id already taken, object reporting another id) is logged with
 * the contributing bundle's id and skipped: one broken plug-in never takes the others down.
 */
public final class SealCriterionContributions {
    public static final String POINT = "org.faultbench.seal.sealCriteria";
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
            IExtensionRegistry registry = RegistryFactory.getRegistry();
            if (registry != null) {
                for (String problem : readInto(catalog, registry.getConfigurationElementsFor(POINT))) {
                    ILog.of(SealCriterionContributions.class).warn(problem);
                }
            }
            platformCatalog = catalog;
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(SealCriterionCatalog catalog, IConfigurationElement[] elements) {
        List<String> problems = new ArrayList<>();
        for (IConfigurationElement element : elements) {
            String contributor = element.getContributor() == null ? "?" : element.getContributor().getName();
            String id = element.getAttribute("id");
            String where = "seal criterion '" + id + "' contributed by " + contributor + ": ";
            if (!"criterion".equals(element.getName()) || id == null || id.isBlank()) {
                problems.add(where + "an element <criterion> with an id is expected");
                continue;
            }
            try {
                Object created = element.createExecutableExtension("class");
                if (!(created instanceof SealCriterion criterion)) {
                    problems.add(where + "class " + created.getClass().getName() + " does not implement SealCriterion");
                } else if (!id.equals(criterion.id())) {
                    problems.add(where + "the object reports id '" + criterion.id() + "'");
                } else {
                    catalog.register(criterion);
                }
            } catch (CoreException | RuntimeException | LinkageError e) {
                problems.add(where + "skipped: " + e.getMessage());
            }
        }
        return problems;
    }
}
