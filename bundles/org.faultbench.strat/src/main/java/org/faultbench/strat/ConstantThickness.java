package org.faultbench.strat;

import org.faultbench.core.uncertain.UncertainValue;

/** Each unit keeps its own thickness everywhere (layer-cake stratigraphy). */
public enum ConstantThickness implements ThicknessModel {
    INSTANCE;

    @Override
    public UncertainValue thicknessOf(StratUnit unit) {
        return unit.thickness();
    }
}
