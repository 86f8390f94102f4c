package org.faultbench.strat;

import org.faultbench.core.column.ReservoirProperties;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.commons.math3.random.RandomGenerator;
import org.faultbench.core.column.ResolvedColumn;

/**
 * The stratigraphic template: units ordered shallowest first, with the unit whose top is the mapped reference
 * horizon. It resolves to a {@link ResolvedColumn} for the nominal case or for one Monte Carlo realisation.
 *
 * <p>Sampling order is fixed so that a seed reproduces a run: {@link #sample} walks the units shallowest first and
 * draws, for each unit, thickness then clay fraction; {@link #sampleReservoirProperties} walks the units shallowest
 * first and draws net-to-gross, porosity, water saturation, Bo. Every field takes exactly one draw, fixed ones too.
 *
 * @param units the units, shallowest first; names unique (ignoring case and surrounding blanks)
 * @param referenceUnitIndex index of the unit whose top is the mapped reference horizon
 * @param thicknessModel where unit thicknesses come from
 */
public record Stratigraphy(List<StratUnit> units, int referenceUnitIndex, ThicknessModel thicknessModel) {

    public Stratigraphy {
        if (units == null || units.isEmpty()) {
            throw new IllegalArgumentException("stratigraphy needs at least one unit");
        }
        units = List.copyOf(units);
        requireUniqueNames(units);
        if (referenceUnitIndex < 0 || referenceUnitIndex >= units.size()) {
            throw new IllegalArgumentException("stratigraphy: reference unit index must be in 0.." + (units.size() - 1)
                    + ", was " + referenceUnitIndex);
        }
        if (thicknessModel == null) {
            throw new IllegalArgumentException("stratigraphy: thickness model is missing");
        }
    }

    /** Layer-cake stratigraphy: every unit keeps its own thickness ({@link ConstantThickness}). */
    public Stratigraphy(List<StratUnit> units, int referenceUnitIndex) {
        this(units, referenceUnitIndex, ConstantThickness.INSTANCE);
    }

    public Stratigraphy withThicknessModel(ThicknessModel model) {
        return new Stratigraphy(units, referenceUnitIndex, model);
    }

    public StratUnit referenceUnit() {
        return units.get(referenceUnitIndex);
    }

    /**
     * The column with every property at its nominal value; with isochores, each at its mean thickness (a column for
     * displays: {@link #nominalDraw()} resolves the column of a position).
     */
    public ResolvedColumn nominal() {
        return nominalDraw().representative();
    }

    /** Every draw at its nominal value (an isochore's scale factor at its nominal value). */
    public ColumnDraw nominalDraw() {
        double[] thickness = new double[units.size()];
        double[] clay = new double[units.size()];
        for (int i = 0; i < thickness.length; i++) {
            thickness[i] = thicknessModel.thicknessOf(units.get(i)).nominal();
            clay[i] = units.get(i).clayFraction().nominal();
        }
        return new ColumnDraw(this, thickness, clay);
    }

    /**
     * One realisation of the column: per unit, shallowest first, one draw for thickness then one for clay fraction.
     * With isochores, the representative column of {@link #sampleDraw}.
     */
    public ResolvedColumn sample(RandomGenerator rng) {
        return sampleDraw(rng).representative();
    }

    /**
     * One realisation's draws, in the order of {@link #sample}: per unit its thickness (for an isochore unit, the scale
     * factor of its grid) then its clay fraction. Resolve the column of a position with {@link ColumnDraw#columnAt}.
     */
    public ColumnDraw sampleDraw(RandomGenerator rng) {
        double[] thickness = new double[units.size()];
        double[] clay = new double[units.size()];
        for (int i = 0; i < thickness.length; i++) {
            thickness[i] = thicknessModel.thicknessOf(units.get(i)).sample(rng);
            clay[i] = units.get(i).clayFraction().sample(rng);
        }
        return new ColumnDraw(this, thickness, clay);
    }

    /** Nominal reservoir properties, one per unit in column order. */
    public List<ReservoirProperties> nominalReservoirProperties() {
        return units.stream().map(StratUnit::nominalReservoirProperties).toList();
    }

    /** One realisation of the reservoir properties, one per unit in column order (see the class comment for order). */
    public List<ReservoirProperties> sampleReservoirProperties(RandomGenerator rng) {
        List<ReservoirProperties> properties = new ArrayList<>(units.size());
        for (StratUnit unit : units) {
            properties.add(unit.sampleReservoirProperties(rng));
        }
        return List.copyOf(properties);
    }

    /** Index of the unit called {@code name} (ignoring case and surrounding blanks), or -1. */
    public int indexOf(String name) {
        for (int i = 0; i < units.size(); i++) {
            if (key(units.get(i).name()).equals(key(name))) {
                return i;
            }
        }
        return -1;
    }

    /**
     * Checks observed tops (e.g. well tops, depth positive down) against the unit order: a unit's top may not be
     * shallower than the top of a unit above it. Units without an observed top are skipped.
     *
     * @throws IllegalArgumentException naming both units when they are out of order, or naming an unknown unit
     */
    public void validateTopsOrder(Map<String, Double> topDepths) {
        double[] tops = new double[units.size()];
        Arrays.fill(tops, Double.NaN);
        for (Map.Entry<String, Double> top : topDepths.entrySet()) {
            int index = indexOf(top.getKey());
            if (index < 0) {
                throw new IllegalArgumentException("top of unknown unit '" + top.getKey() + "'");
            }
            if (top.getValue() == null || !Double.isFinite(top.getValue())) {
                throw new IllegalArgumentException("unit '" + top.getKey() + "' top depth must be a finite number, was "
                        + top.getValue());
            }
            if (!Double.isNaN(tops[index])) {
                throw new IllegalArgumentException("unit '" + units.get(index).name() + "' has two observed tops");
            }
            tops[index] = top.getValue();
        }
        int above = -1;
        for (int i = 0; i < tops.length; i++) {
            if (Double.isNaN(tops[i])) {
                continue;
            }
            if (above >= 0 && tops[i] < tops[above]) {
                throw new IllegalArgumentException("units out of order: top of unit '" + units.get(i).name() + "' at "
                        + tops[i] + " m is shallower than top of unit '" + units.get(above).name() + "' at "
                        + tops[above] + " m, which lies above it in the stratigraphy");
            }
            above = i;
        }
    }

    private static void requireUniqueNames(List<StratUnit> units) {
        Map<String, Integer> seen = new HashMap<>();
        for (int i = 0; i < units.size(); i++) {
            if (units.get(i) == null) {
                throw new IllegalArgumentException("stratigraphy: unit at position " + (i + 1) + " is missing");
            }
            Integer earlier = seen.putIfAbsent(key(units.get(i).name()), i);
            if (earlier != null) {
                throw new IllegalArgumentException("stratigraphy: unit name '" + units.get(i).name()
                        + "' is used twice (positions " + (earlier + 1) + " and " + (i + 1) + ")");
            }
        }
    }

    private static String key(String name) {
        return name == null ? "" : name.strip().toLowerCase(Locale.ROOT);
    }
}
