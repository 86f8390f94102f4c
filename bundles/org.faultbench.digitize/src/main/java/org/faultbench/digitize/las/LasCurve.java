package org.faultbench.digitize.las;

/**
 * One log curve of a LAS file, one value per depth step; null values of the file are NaN.
 *
 * @param definition the curve's line in the ~C section (mnemonic, unit, API code, description)
 * @param values curve values in the file's unit, copied
 */
public record LasCurve(LasItem definition, double[] values) {

    public LasCurve {
        if (definition == null || values == null) {
            throw new IllegalArgumentException("LAS curve needs its definition and values");
        }
        values = values.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    public String mnemonic() {
        return definition.mnemonic();
    }

    public String unit() {
        return definition.unit();
    }
}
