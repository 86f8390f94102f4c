package org.faultbench.juxtaposition.paint;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point: {@code <painter id name class>}, the class an {@link AttributePainter}
 * reporting the extension's id. Without a registry the catalog holds the built-ins.
 */
public final class AttributePainterContributions {

    public static final String POINT = "org.faultbench.juxtaposition.attributePainters";
    private static final ContributionReader READER = new ContributionReader("attribute painter", "painter");
    private static AttributePainterCatalog platformCatalog;

    private AttributePainterContributions() {
    }

    public static synchronized AttributePainterCatalog platformCatalog() {
        if (platformCatalog == null) {
            if (!ContributionReader.registryAvailable()) {
                platformCatalog = AttributePainterCatalog.withBuiltIns();
            } else {
                AttributePainterCatalog catalog = new AttributePainterCatalog();
                ContributionReader.log(AttributePainterContributions.class,
                        readInto(catalog, ContributionReader.platformElements(POINT)));
                platformCatalog = catalog;
            }
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(AttributePainterCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            c.requiredAttribute("name");
            catalog.register(c.createWithId(AttributePainter.class, AttributePainter::id));
        });
    }
}
