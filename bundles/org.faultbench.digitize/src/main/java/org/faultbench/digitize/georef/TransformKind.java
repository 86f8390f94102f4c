package org.faultbench.digitize.georef;

/** The pixel-to-map transforms a scanned map can be georeferenced with, from the stiffest to the most flexible. */
public enum TransformKind {
    /** Helmert 4-parameter transform: one scale, one rotation, two shifts; keeps shapes. */
    SIMILARITY("similarity (Helmert)", 4),
    /** 6 parameters: independent scales, rotation and shear; keeps parallel lines parallel. */
    AFFINE("affine", 6),
    /** Second-order polynomial, 6 coefficients per map axis; absorbs smooth paper stretch of a scan. */
    POLYNOMIAL_2("second-order polynomial", 12),
    /** 8-parameter homography; models a map photographed or scanned at an angle (perspective). */
    PROJECTIVE("projective", 8);

    private final String label;
    private final int parameterCount;

    TransformKind(String label, int parameterCount) {
        this.label = label;
        this.parameterCount = parameterCount;
    }

    /** Name shown to the user. */
    public String label() {
        return label;
    }

    /** Number of free parameters of the transform. */
    public int parameterCount() {
        return parameterCount;
    }

    /** Fewest control points that fix the transform: each point gives two equations (x and y). */
    public int minimumPoints() {
        return (parameterCount + 1) / 2;
    }
}
