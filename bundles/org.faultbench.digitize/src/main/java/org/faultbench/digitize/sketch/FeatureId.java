package org.faultbench.digitize.sketch;

/**
 * Stable identity of a feature on a {@link MapSheet}: kept when the feature is edited, so that undo records,
 * selections and topology problems keep pointing at it.
 *
 * @param value positive number, unique on its sheet
 */
public record FeatureId(long value) {

    public FeatureId {
        if (value < 1) {
            throw new IllegalArgumentException("feature id must be a number >= 1, was " + value);
        }
    }

    @Override
    public String toString() {
        return "#" + value;
    }
}
