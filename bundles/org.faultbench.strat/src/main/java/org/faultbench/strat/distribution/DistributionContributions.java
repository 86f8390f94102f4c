package org.faultbench.strat.distribution;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point: {@code <distribution id name parameters class>}, parameters a
 * comma-separated list of names, the class a {@link DistributionFactory}. An analysis file then writes
 * {@code {"<id>": {"<parameter>": number, ...}}} wherever an uncertain value is expected. Without a registry the
 * catalog holds the built-ins.
 */
public final class DistributionContributions {

    public static final String POINT = "org.faultbench.strat.distributions";
    private static final ContributionReader READER = new ContributionReader("distribution", "distribution");
    private static DistributionCatalog platformCatalog;

    private DistributionContributions() {
    }

    public static synchronized DistributionCatalog platformCatalog() {
        if (platformCatalog == null) {
            if (!ContributionReader.registryAvailable()) {
                platformCatalog = DistributionCatalog.withBuiltIns();
            } else {
                DistributionCatalog catalog = new DistributionCatalog();
                ContributionReader.log(DistributionContributions.class,
                        readInto(catalog, ContributionReader.platformElements(POINT)));
                platformCatalog = catalog;
            }
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(DistributionCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            String name = c.requiredAttribute("name");
            List<String> parameters = c.listAttribute("parameters");
            if (parameters.isEmpty()) {
                throw new IllegalArgumentException("attribute 'parameters' is missing (e.g. \"p90,p10\")");
            }
            for (String parameter : parameters) {
                if (!parameter.matches("[A-Za-z][A-Za-z0-9]*")) {
                    throw new IllegalArgumentException("parameter name '" + parameter
                            + "' must be letters and digits (a JSON key), e.g. 'mostLikely'");
                }
            }
            DistributionFactory factory = c.create("class", DistributionFactory.class);
            catalog.register(new DistributionType(c.id(), name, parameters, factory));
        });
    }
}
