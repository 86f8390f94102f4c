package org.faultbench.strat.lithology;

import java.util.Objects;

import org.faultbench.core.LithologyClass;

/**
 * A named lithology a geologist picks for a unit: its broad class (which decides which seal criteria apply), default
 * Vcl and porosity ranges, and a pattern key the UI maps to an ornament.
 *
 * @param pattern key of the ornament, e.g. "sand-dots"; the UI shows a plain fill for a key it does not know
 */
public record LithologyEntry(String id, String name, LithologyClass lithologyClass, FractionRange vcl,
        FractionRange porosity, String pattern) {

    public LithologyEntry {
        if (id == null || id.isBlank() || name == null || name.isBlank()) {
            throw new IllegalArgumentException("a lithology needs an id and a name");
        }
        Objects.requireNonNull(lithologyClass, "lithologyClass");
        Objects.requireNonNull(vcl, "vcl");
        Objects.requireNonNull(porosity, "porosity");
        Objects.requireNonNull(pattern, "pattern");
    }
}
