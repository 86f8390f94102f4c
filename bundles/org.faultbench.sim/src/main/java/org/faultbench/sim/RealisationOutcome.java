package org.faultbench.sim;

import java.util.Arrays;

import org.faultbench.trap.Mechanism;

/** The per-unit results of one realisation, for the reservoir units in column order. */
final class RealisationOutcome {
    final double[][] values;
    final Mechanism[] mechanism;
    final LeakLocation[] leakLocation;

    RealisationOutcome(int reservoirUnits) {
        values = new double[reservoirUnits][UnitQuantity.values().length];
        for (double[] row : values) {
            Arrays.fill(row, Double.NaN);
        }
        mechanism = new Mechanism[reservoirUnits];
        leakLocation = new LeakLocation[reservoirUnits];
    }

    double get(int unitSlot, UnitQuantity q) {
        return values[unitSlot][q.ordinal()];
    }

    void set(int unitSlot, UnitQuantity q, double value) {
        values[unitSlot][q.ordinal()] = value;
    }
}
