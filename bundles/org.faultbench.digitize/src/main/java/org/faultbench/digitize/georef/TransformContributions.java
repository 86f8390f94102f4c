package org.faultbench.digitize.georef;

import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point: {@code <transform id name minimumPoints class>}, the class a
 * {@link TransformEstimator}. In the product the built-in kinds arrive through this bundle's own plugin.xml like any
 * contribution; without a registry (plain Java, unit tests) the catalog holds the built-ins.
 */
public final class TransformContributions {

    public static final String POINT = "org.faultbench.digitize.transforms";
    private static final ContributionReader READER = new ContributionReader("georeference transform", "transform");
    private static TransformCatalog platformCatalog;

    private TransformContributions() {
    }

    public static synchronized TransformCatalog platformCatalog() {
        if (platformCatalog == null) {
            if (!ContributionReader.registryAvailable()) {
                platformCatalog = TransformCatalog.withBuiltIns();
            } else {
                TransformCatalog catalog = new TransformCatalog();
                ContributionReader.log(TransformContributions.class,
                        readInto(catalog, ContributionReader.platformElements(POINT)));
                platformCatalog = catalog;
            }
        }
        return platformCatalog;
    }

    /**
     * Registers every valid contribution; returns one message per skipped contribution. A contribution with the id
     * of a built-in kind must name the built-in estimator class (the plugin.xml of this bundle does), so a plug-in
     * cannot replace the fit behind "affine" in map-sheet files.
     */
    public static List<String> readInto(TransformCatalog catalog, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            String name = c.requiredAttribute("name");
            int minimumPoints = c.integerAttribute("minimumPoints", 1);
            TransformEstimator estimator = c.create("class", TransformEstimator.class);
            TransformType type = new TransformType(c.id(), name, minimumPoints, estimator);
            type.builtInKind().ifPresent(kind -> {
                if (estimator.getClass() != BuiltInTransforms.estimatorClass(kind)) {
                    throw new IllegalArgumentException("id '" + c.id() + "' is the built-in " + kind.label()
                            + " transform; choose another id");
                }
                if (minimumPoints != kind.minimumPoints()) {
                    throw new IllegalArgumentException("the built-in kind '" + c.id() + "' needs "
                            + kind.minimumPoints() + " control points, attribute 'minimumPoints' says " + minimumPoints);
                }
            });
            catalog.register(type);
        });
    }
}
