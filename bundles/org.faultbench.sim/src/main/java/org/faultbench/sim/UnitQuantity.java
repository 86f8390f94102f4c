package org.faultbench.sim;

/** The per-unit results of a realisation; depths in m TVDSS (positive down), columns in m, volumes in m³. */
public enum UnitQuantity {
    CREST("crest depth", "m"),
    SPILL_DEPTH("spill depth", "m"),
    LEAK_DEPTH("leak depth (free-water level the faults support)", "m"),
    CONTACT("contact (controlling depth)", "m"),
    COLUMN("column height", "m"),
    CONNECTION_DEPTH("shallowest connection to the drained block", "m"),
    ATTIC_CONTACT("contact after depletion", "m"),
    ATTIC_COLUMN("attic column", "m"),
    STOIIP("STOIIP, original", "m3"),
    ATTIC_STOIIP("STOIIP, attic", "m3");

    private final String label;
    private final String unit;

    UnitQuantity(String label, String unit) {
        this.label = label;
        this.unit = unit;
    }

    public String label() {
        return label;
    }

    public String unit() {
        return unit;
    }
}
