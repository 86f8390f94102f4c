package org.faultbench.juxtaposition.paint;

/**
 * The seal attributes computed at one fault-plane cell, by key: {@code "sgr"}, {@code "ssf"}, {@code "csp"} (the
 * clay-based attributes, whatever criterion the study uses) and {@code "threshold"} (the study criterion's threshold
 * pressure, Pa). NaN where the attribute was not computed (e.g. the throw window leaves the column).
 */
@FunctionalInterface
public interface CellAttributes {
    CellAttributes NONE = key -> Double.NaN;

    double value(String key);
}
