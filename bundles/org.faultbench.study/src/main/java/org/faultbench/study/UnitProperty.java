package org.faultbench.study;

import org.faultbench.core.uncertain.Bounds;
import org.faultbench.strat.StratUnit;
import org.faultbench.core.uncertain.UncertainValue;

/**
 * The editable numeric properties of a stratigraphic unit, with the analysis-file key, the label shown to users and
 * the bounds the model enforces (thickness &ge; 0, fractions in [0, 1], Bo &ge; 1).
 */
public enum UnitProperty {
    THICKNESS("thickness", "Thickness (m)", Bounds.NON_NEGATIVE, false),
    VCL("vcl", "Vcl", Bounds.FRACTION, false),
    NET_TO_GROSS("ntg", "N/G", Bounds.FRACTION, true),
    POROSITY("porosity", "Porosity", Bounds.FRACTION, true),
    WATER_SATURATION("sw", "Sw", Bounds.FRACTION, true),
    OIL_VOLUME_FACTOR("bo", "Bo (rm3/sm3)", StratUnit.FORMATION_VOLUME_FACTOR, true);

    private final String key;
    private final String label;
    private final Bounds bounds;
    private final boolean reservoirOnly;

    UnitProperty(String key, String label, Bounds bounds, boolean reservoirOnly) {
        this.key = key;
        this.label = label;
        this.bounds = bounds;
        this.reservoirOnly = reservoirOnly;
    }

    /** Key of the property in a unit object of the analysis file. */
    public String key() {
        return key;
    }

    public String label() {
        return label;
    }

    public Bounds bounds() {
        return bounds;
    }

    /** True for the volumetric properties that only reservoir units carry. */
    public boolean reservoirOnly() {
        return reservoirOnly;
    }

    /** The unit's current value of this property. */
    public UncertainValue of(StratUnit unit) {
        return switch (this) {
        case THICKNESS -> unit.thickness();
        case VCL -> unit.clayFraction();
        case NET_TO_GROSS -> unit.netToGross();
        case POROSITY -> unit.porosity();
        case WATER_SATURATION -> unit.waterSaturation();
        case OIL_VOLUME_FACTOR -> unit.oilFormationVolumeFactor();
        };
    }
}
