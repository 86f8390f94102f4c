package org.faultbench.strat;

import org.faultbench.core.column.ReservoirProperties;
import org.apache.commons.math3.random.RandomGenerator;
import org.faultbench.core.LithologyClass;
import org.faultbench.core.uncertain.Bounds;
import org.faultbench.core.uncertain.UncertainValue;

/**
 * One unit of the stratigraphic template with every numeric property uncertain. Construction restricts each value to
 * its physical range (see {@link UncertainValue#within}): thickness &ge; 0; clay fraction, net-to-gross, porosity and
 * water saturation in [0, 1]; oil formation volume factor Bo &ge; 1 (common practice: oil shrinks on the way to
 * the stock tank). Normal and lognormal inputs are truncated to these ranges, anything else outside them is rejected
 * with a message naming the unit and the field.
 *
 * @param name unit name, unique within its stratigraphy
 * @param lithology lithology class (decides where clay-based seal rules apply)
 * @param reservoir whether the unit may hold and pass hydrocarbons
 * @param thickness true vertical thickness, m
 * @param clayFraction clay (shale) volume fraction Vcl
 * @param netToGross net-to-gross ratio
 * @param porosity porosity of the net rock
 * @param waterSaturation water saturation Sw of the net pore volume
 * @param oilFormationVolumeFactor Bo, reservoir volume per stock-tank volume
 */
public record StratUnit(String name, LithologyClass lithology, boolean reservoir, UncertainValue thickness,
        UncertainValue clayFraction, UncertainValue netToGross, UncertainValue porosity,
        UncertainValue waterSaturation, UncertainValue oilFormationVolumeFactor) {

    /** Bo of at least 1: a stock-tank barrel never occupies more than its reservoir volume (common practice). */
    public static final Bounds FORMATION_VOLUME_FACTOR = Bounds.atLeast(1);

    public StratUnit {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("unit name is empty");
        }
        if (lithology == null) {
            throw new IllegalArgumentException("unit '" + name + "': lithology is missing");
        }
        thickness = bounded(thickness, Bounds.NON_NEGATIVE, name, "thickness");
        clayFraction = bounded(clayFraction, Bounds.FRACTION, name, "clay fraction");
        netToGross = bounded(netToGross, Bounds.FRACTION, name, "net-to-gross");
        porosity = bounded(porosity, Bounds.FRACTION, name, "porosity");
        waterSaturation = bounded(waterSaturation, Bounds.FRACTION, name, "water saturation");
        oilFormationVolumeFactor = bounded(oilFormationVolumeFactor, FORMATION_VOLUME_FACTOR, name,
                "oil formation volume factor");
    }

    /**
     * A unit that holds no hydrocarbons (seal, carbonate, evaporite ...): net-to-gross 0, porosity 0, water
     * saturation 1, Bo 1, so it contributes no in-place volume.
     */
    public static StratUnit nonReservoir(String name, LithologyClass lithology, UncertainValue thickness,
            UncertainValue clayFraction) {
        return new StratUnit(name, lithology, false, thickness, clayFraction, UncertainValue.fixed(0),
                UncertainValue.fixed(0), UncertainValue.fixed(1), UncertainValue.fixed(1));
    }

    /** Reservoir properties of the nominal case. */
    public ReservoirProperties nominalReservoirProperties() {
        return new ReservoirProperties(netToGross.nominal(), porosity.nominal(), waterSaturation.nominal(),
                oilFormationVolumeFactor.nominal());
    }

    /** One realisation of the reservoir properties: draws net-to-gross, porosity, Sw, Bo, in that order. */
    public ReservoirProperties sampleReservoirProperties(RandomGenerator rng) {
        double ntg = netToGross.sample(rng);
        double phi = porosity.sample(rng);
        double sw = waterSaturation.sample(rng);
        double bo = oilFormationVolumeFactor.sample(rng);
        return new ReservoirProperties(ntg, phi, sw, bo);
    }

    private static UncertainValue bounded(UncertainValue value, Bounds bounds, String unit, String field) {
        String label = "unit '" + unit + "' " + field;
        if (value == null) {
            throw new IllegalArgumentException(label + " is missing");
        }
        return value.within(bounds, label);
    }
}
