package org.faultbench.seal.carbonate;

import java.io.IOException;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Supplier;

import org.faultbench.core.LithologyClass;
import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.core.column.UnitSlice;
import org.faultbench.seal.CriterionParameters;
import org.faultbench.seal.FaultPointContext;
import org.faultbench.seal.SealBasis;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.SealEvaluation;

/**
 * Fault seal in carbonates without clay-based rules, whose fault rocks form by cataclasis, brecciation and
 * cementation rather than clay mixing (Michie et al. 2014, JSG 65). Rules at a fault point:
 * <ul>
 * <li>reservoir against non-reservoir seals by juxtaposition (+infinity; the capillary capacity of the juxtaposed
 * seal unit is the top-seal limit, as for any juxtaposition seal: Watts 1987, Mar. Pet. Geol. 4);</li>
 * <li>reservoir against reservoir with zero throw leaks (0 Pa): there is no fault rock;</li>
 * <li>carbonate reservoir against carbonate reservoir: the fault-rock threshold of the table for each wall's host
 * facies and porosity, the lower of the two walls (the weaker host controls); a wall without a table value
 * (facies not given, or a row without seal credit) makes it juxtaposition only (0 Pa), the conservative rule;</li>
 * <li>any other reservoir against reservoir (e.g. a sandstone wall): juxtaposition only (0 Pa); the applicability
 * warning flags the clastic unit.</li>
 * </ul>
 * Parameters ({@code seal.parameters}): {@code "units": {"name": {"facies": "grainstone", "porosity": 0.2}}},
 * {@code "table": "file.csv"} (default: the bundled seed table), {@code "thresholdCase": "min" | "mode" | "max"}
 * (default mode). The uncertainty within a range is sampled through {@code seal.calibrationShift}.
 */
public final class CarbonateFaultRockCriterion implements SealCriterion {

    public static final String ID = "carbonate-fault-rock";
    static final List<String> PARAMETERS = List.of("units", "table", "thresholdCase");
    private static final Set<LithologyClass> VALID_FOR = Set.copyOf(EnumSet.of(LithologyClass.CARBONATE,
            LithologyClass.EVAPORITE, LithologyClass.SEAL));

    private final FaultRockThresholdTable table;
    private final Map<String, HostRock> hosts;
    private final ThresholdCase thresholdCase;

    /** The registered default: bundled table, no unit facies (juxtaposition only until configured). */
    public CarbonateFaultRockCriterion() {
        this(FaultRockThresholdTable.bundled(), Map.of(), ThresholdCase.MODE);
    }

    public CarbonateFaultRockCriterion(FaultRockThresholdTable table, Map<String, HostRock> hostsByUnit,
            ThresholdCase thresholdCase) {
        if (table == null || hostsByUnit == null || thresholdCase == null) {
            throw new IllegalArgumentException("carbonate criterion: table, unit hosts and threshold case are required");
        }
        this.table = table;
        this.hosts = Map.copyOf(hostsByUnit);
        this.thresholdCase = thresholdCase;
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String name() {
        return "Carbonate fault rock (facies and porosity table)";
    }

    /**
     * Carbonates; and evaporites and fine-grained seal units, which only enter through juxtaposition, a rule valid
     * for any lithology (common practice: salt and anhydrite seal by juxtaposition, they flow into faults). Clastic
     * reservoir units are not covered: the table says nothing about sandstone fault rock.
     */
    @Override
    public Set<LithologyClass> validFor() {
        return VALID_FOR;
    }

    public FaultRockThresholdTable table() {
        return table;
    }

    public Map<String, HostRock> hosts() {
        return hosts;
    }

    @Override
    public SealEvaluation evaluate(FaultPointContext ctx) {
        if (!ctx.reservoirAgainstReservoir()) {
            return SealEvaluation.juxtaposition(false);
        }
        if (ctx.faultThrow() == 0) {
            return SealEvaluation.juxtaposition(true);
        }
        ResolvedColumn column = ctx.footwallColumn();
        UnitSlice footwall = column.unit(column.unitAt(ctx.footwallPosition()));
        UnitSlice hangingWall = column.unit(column.unitAt(ctx.hangingWallPosition()));
        Optional<Double> threshold = threshold(footwall).flatMap(fw -> threshold(hangingWall).map(hw -> Math.min(fw,
                hw)));
        return threshold.map(pa -> new SealEvaluation("carbonate fault rock", "bar", pa / 1e5, pa,
                SealBasis.FAULT_ROCK)).orElseGet(() -> SealEvaluation.juxtaposition(true));
    }

    private Optional<Double> threshold(UnitSlice unit) {
        if (unit.lithology() != LithologyClass.CARBONATE) {
            return Optional.empty();
        }
        return Optional.ofNullable(hosts.get(unit.name())).flatMap(host -> table.threshold(host, thresholdCase));
    }

    @Override
    public SealCriterion configured(CriterionParameters parameters) {
        parameters.requireOnly(PARAMETERS);
        FaultRockThresholdTable chosen = table;
        Optional<Path> file = parameters.path("table");
        if (file.isPresent()) {
            try {
                chosen = FaultRockThresholdTable.read(file.get());
            } catch (IOException e) {
                throw new IllegalArgumentException("table: cannot read " + file.get() + ": " + e.getMessage(), e);
            }
        }
        ThresholdCase which = field("thresholdCase",
                () -> ThresholdCase.ofKeyOr(parameters.text("thresholdCase"), thresholdCase));
        Map<String, HostRock> units = new LinkedHashMap<>(hosts);
        Optional<CriterionParameters> unitsNode = parameters.object("units");
        if (unitsNode.isPresent()) {
            for (String unit : unitsNode.get().keys()) {
                units.put(unit, CriterionParameters.within("units." + unit, () -> host(unitsNode.get(), unit)));
            }
        }
        return new CarbonateFaultRockCriterion(chosen, units, which);
    }

    private static HostRock host(CriterionParameters units, String unit) {
        CriterionParameters node = units.object(unit).orElseThrow();
        node.requireOnly(List.of("facies", "porosity"));
        String faciesKey = node.text("facies")
                .orElseThrow(() -> new IllegalArgumentException("facies: required field is missing"));
        CarbonateFacies facies = field("facies", () -> CarbonateFacies.ofKey(faciesKey));
        double porosity = node.number("porosity")
                .orElseThrow(() -> new IllegalArgumentException("porosity: required field is missing"));
        return field("porosity", () -> new HostRock(facies, porosity));
    }

    /** Runs the read of one field and starts its error message with the field's key. */
    private static <T> T field(String key, Supplier<T> read) {
        try {
            return read.get();
        } catch (IllegalArgumentException e) {
            String message = e.getMessage();
            throw new IllegalArgumentException(message.startsWith(key + ":") ? message : key + ": " + message, e);
        }
    }
}
