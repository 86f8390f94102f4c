package org.faultbench.strat.lithology;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.faultbench.core.LithologyClass;

/** Every lithology catalogue of the platform, by id, in registration order. */
public final class LithologyCatalogues {

    /** Id of the built-in catalogue. */
    public static final String BASIC = "basic";

    private final Map<String, LithologyCatalogue> catalogues = new LinkedHashMap<>();

    /**
     * The built-in catalogue as this bundle's plugin.xml contributes it. Ranges are broad defaults for a first
     * model, to be replaced by the study's own logs: common practice, not a published table.
     */
    public static LithologyCatalogues withBuiltIns() {
        LithologyCatalogues all = new LithologyCatalogues();
        all.register(new LithologyCatalogue(BASIC, "Basic lithologies", List.of(
                entry("clean-sandstone", "Clean sandstone", LithologyClass.RESERVOIR, 0, 0.15, 0.15, 0.30, "sand-dots"),
                entry("shaly-sandstone", "Shaly sandstone", LithologyClass.RESERVOIR, 0.15, 0.35, 0.08, 0.22,
                        "shaly-sand"),
                entry("siltstone", "Siltstone", LithologyClass.SEAL, 0.35, 0.6, 0.05, 0.15, "silt-dashes"),
                entry("shale", "Shale / mudstone", LithologyClass.SEAL, 0.6, 0.9, 0.02, 0.12, "shale-lines"),
                entry("limestone", "Limestone", LithologyClass.CARBONATE, 0, 0.1, 0.02, 0.25, "limestone-bricks"),
                entry("salt", "Salt / anhydrite", LithologyClass.EVAPORITE, 0, 0.05, 0, 0.01, "salt-crosses"))));
        return all;
    }

    private static LithologyEntry entry(String id, String name, LithologyClass c, double vclMin, double vclMax,
            double phiMin, double phiMax, String pattern) {
        return new LithologyEntry(id, name, c, new FractionRange(vclMin, vclMax), new FractionRange(phiMin, phiMax),
                pattern);
    }

    /** @throws IllegalArgumentException when the id is already taken */
    public synchronized void register(LithologyCatalogue catalogue) {
        if (catalogues.containsKey(catalogue.id())) {
            throw new IllegalArgumentException("lithology catalogue id '" + catalogue.id()
                    + "' is already registered by " + catalogues.get(catalogue.id()).name());
        }
        catalogues.put(catalogue.id(), catalogue);
    }

    public synchronized Optional<LithologyCatalogue> find(String id) {
        return Optional.ofNullable(catalogues.get(id));
    }

    /** A lithology by catalogue id and entry id. */
    public synchronized Optional<LithologyEntry> entry(String catalogueId, String entryId) {
        return find(catalogueId).flatMap(c -> c.entry(entryId));
    }

    public synchronized List<LithologyCatalogue> list() {
        return List.copyOf(catalogues.values());
    }

    public synchronized List<String> ids() {
        return List.copyOf(catalogues.keySet());
    }
}
