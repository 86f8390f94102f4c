package org.faultbench.strat.lithology;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/** A named list of lithologies, e.g. a company's or a basin's standard legend. Entry ids are unique within it. */
public record LithologyCatalogue(String id, String name, List<LithologyEntry> entries) {

    public LithologyCatalogue {
        if (id == null || id.isBlank() || name == null || name.isBlank()) {
            throw new IllegalArgumentException("a lithology catalogue needs an id and a name");
        }
        entries = List.copyOf(entries);
        if (entries.isEmpty()) {
            throw new IllegalArgumentException("lithology catalogue '" + id + "' has no lithology");
        }
        Set<String> ids = new HashSet<>();
        for (LithologyEntry entry : entries) {
            if (!ids.add(entry.id())) {
                throw new IllegalArgumentException("lithology catalogue '" + id + "' lists '" + entry.id() + "' twice");
            }
        }
    }

    public Optional<LithologyEntry> entry(String entryId) {
        return entries.stream().filter(e -> e.id().equals(entryId)).findFirst();
    }
}
