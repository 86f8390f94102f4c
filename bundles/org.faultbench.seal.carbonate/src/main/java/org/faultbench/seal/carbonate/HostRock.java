package org.faultbench.seal.carbonate;

/**
 * Facies and porosity of a carbonate unit, which the stratigraphy does not carry: the analysis file gives them per
 * unit in the criterion's parameters.
 *
 * @param facies host facies
 * @param porosity host porosity used to pick the table's band, fraction
 */
public record HostRock(CarbonateFacies facies, double porosity) {

    public HostRock {
        if (facies == null) {
            throw new IllegalArgumentException("facies is missing");
        }
        if (!(porosity >= 0 && porosity <= 1)) {
            throw new IllegalArgumentException("porosity must be a fraction in [0, 1], was " + porosity);
        }
    }
}
