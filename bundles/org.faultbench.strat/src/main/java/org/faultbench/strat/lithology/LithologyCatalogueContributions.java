package org.faultbench.strat.lithology;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.IConfigurationElement;
import org.faultbench.core.LithologyClass;
import org.faultbench.core.extension.Contribution;
import org.faultbench.core.extension.ContributionReader;

/**
 * Reads the {@value #POINT} extension point: {@code <catalogue id name>} holding {@code <lithology id name
 * lithologyClass vclMin vclMax porosityMin porosityMax pattern>} elements. A catalogue with one bad lithology is
 * skipped whole, so a legend never appears half-loaded. Without a registry the built-in catalogue is used.
 */
public final class LithologyCatalogueContributions {

    public static final String POINT = "org.faultbench.strat.lithologyCatalogues";
    private static final ContributionReader READER = new ContributionReader("lithology catalogue", "catalogue");
    private static LithologyCatalogues platformCatalogues;

    private LithologyCatalogueContributions() {
    }

    public static synchronized LithologyCatalogues platformCatalogues() {
        if (platformCatalogues == null) {
            if (!ContributionReader.registryAvailable()) {
                platformCatalogues = LithologyCatalogues.withBuiltIns();
            } else {
                LithologyCatalogues all = new LithologyCatalogues();
                ContributionReader.log(LithologyCatalogueContributions.class,
                        readInto(all, ContributionReader.platformElements(POINT)));
                platformCatalogues = all;
            }
        }
        return platformCatalogues;
    }

    /** Registers every valid catalogue; returns one message per skipped catalogue. */
    public static List<String> readInto(LithologyCatalogues catalogues, IConfigurationElement[] elements) {
        return READER.read(elements, c -> {
            String name = c.requiredAttribute("name");
            List<LithologyEntry> entries = new ArrayList<>();
            for (Contribution l : c.children("lithology", "lithology")) {
                entries.add(entry(l));
            }
            catalogues.register(new LithologyCatalogue(c.id(), name, entries));
        });
    }

    private static LithologyEntry entry(Contribution l) {
        String id = l.requiredAttribute("id");
        try {
            return new LithologyEntry(id, l.requiredAttribute("name"),
                    l.enumAttribute("lithologyClass", LithologyClass.class),
                    new FractionRange(l.numberAttribute("vclMin"), l.numberAttribute("vclMax")),
                    new FractionRange(l.numberAttribute("porosityMin"), l.numberAttribute("porosityMax")),
                    l.attribute("pattern", "plain"));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("lithology '" + id + "': " + e.getMessage(), e);
        }
    }
}
