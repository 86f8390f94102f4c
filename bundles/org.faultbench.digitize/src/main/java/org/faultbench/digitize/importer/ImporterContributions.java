package org.faultbench.digitize.importer;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point: {@code <importer id name extensions kind class>}, extensions a
 * comma-separated list without dots, kind one of grid, points, lines, tops, log, the class an {@link Importer}. In
 * the product the built-ins arrive through this bundle's plugin.xml; without a registry the catalog holds them.
 */
public final class ImporterContributions {

    public static final String POINT = "org.faultbench.digitize.importers";
    private static final ContributionReader READER = new ContributionReader("importer", "importer");
    private static ImporterCatalog platformCatalog;

    private ImporterContributions() {
    }

    public static synchronized ImporterCatalog platformCatalog() {
        if (platformCatalog == null) {
            if (!ContributionReader.registryAvailable()) {
                platformCatalog = ImporterCatalog.withBuiltIns();
            } else {
                ImporterCatalog catalog = new ImporterCatalog();
                ContributionReader.log(ImporterContributions.class,
                        readInto(catalog, ContributionReader.platformElements(POINT)));
                platformCatalog = catalog;
            }
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(ImporterCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            String name = c.requiredAttribute("name");
            List<String> extensions = c.listAttribute("extensions").stream()
                    .map(e -> e.toLowerCase(java.util.Locale.ROOT).replaceFirst("^\\.", "")).toList();
            if (extensions.isEmpty()) {
                throw new IllegalArgumentException("attribute 'extensions' is missing (e.g. \"asc,grd\")");
            }
            DataKind kind = c.enumAttribute("kind", DataKind.class);
            Importer importer = c.create("class", Importer.class);
            catalog.register(new ImporterType(c.id(), name, extensions, kind, importer));
        });
    }
}
