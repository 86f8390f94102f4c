package org.faultbench.digitize.las;

/**
 * One header line of a LAS file, {@code MNEM.UNIT  VALUE : DESCRIPTION} (CWLS LAS 2.0).
 *
 * @param mnemonic e.g. {@code STRT}, {@code WELL}, {@code GR}
 * @param unit as written right after the dot, empty when none
 * @param value text between the unit and the last colon, trimmed; for curves the optional API code
 * @param description text after the last colon, trimmed
 */
public record LasItem(String mnemonic, String unit, String value, String description) {

    public LasItem {
        if (mnemonic == null || mnemonic.isBlank()) {
            throw new IllegalArgumentException("LAS item needs a mnemonic");
        }
        if (unit == null || value == null || description == null) {
            throw new IllegalArgumentException("LAS item '" + mnemonic + "': unit, value and description may be "
                    + "empty but not missing");
        }
    }
}
