package org.faultbench.juxtaposition.paint;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point: {@code <overlay id name class>}, the class an {@link Overlay} reporting
 * the extension's id. Without a registry the catalog holds the built-in overlay.
 */
public final class OverlayContributions {

    public static final String POINT = "org.faultbench.juxtaposition.overlays";
    private static final ContributionReader READER = new ContributionReader("overlay", "overlay");
    private static OverlayCatalog platformCatalog;

    private OverlayContributions() {
    }

    public static synchronized OverlayCatalog platformCatalog() {
        if (platformCatalog == null) {
            if (!ContributionReader.registryAvailable()) {
                platformCatalog = OverlayCatalog.withBuiltIns();
            } else {
                OverlayCatalog catalog = new OverlayCatalog();
                ContributionReader.log(OverlayContributions.class,
                        readInto(catalog, ContributionReader.platformElements(POINT)));
                platformCatalog = catalog;
            }
        }
        return platformCatalog;
    }

    /** Registers every valid contribution; returns one message per skipped contribution. */
    public static List<String> readInto(OverlayCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            c.requiredAttribute("name");
            catalog.register(c.createWithId(Overlay.class, Overlay::id));
        });
    }
}
