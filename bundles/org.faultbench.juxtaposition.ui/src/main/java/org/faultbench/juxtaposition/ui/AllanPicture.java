package org.faultbench.juxtaposition.ui;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.faults.FaultPlaneSampler;
import org.faultbench.juxtaposition.HungColumns;
import org.faultbench.juxtaposition.JuxtapositionClass;
import org.faultbench.juxtaposition.JuxtapositionRaster;
import org.faultbench.juxtaposition.paint.FaultPlaneCell;
import org.faultbench.juxtaposition.paint.OverlayScene;
import org.faultbench.juxtaposition.paint.PaintScene;
import org.faultbench.seal.ClaySmearPotentialCriterion;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.ShaleGougeRatioCriterion;
import org.faultbench.seal.ShaleSmearFactorCriterion;
import org.faultbench.sim.BoundingFault;
import org.faultbench.sim.LeakProbabilityMap;
import org.faultbench.sim.SealAttributePainter;
import org.faultbench.sim.TrapStudy;

/**
 * What the Allan diagram shows for one bounding fault in the base case (every input at its nominal value): the
 * juxtaposition raster on the unrolled fault plane, the unit boundaries of both walls and, after a run, the leak
 * probability of each cell. Plain data; the canvas draws it.
 */
final class AllanPicture {
    static final double CELL_HEIGHT = 2.5;
    private static final double MARGIN = 30;

    final String faultId;
    final FaultPlaneColumns columns;
    final ResolvedColumn column;
    final int referenceUnit;
    final JuxtapositionRaster raster;
    final LeakProbabilityMap leak;
    /** Name of the seal attribute painted on the raster (e.g. "SGR [%]"); null for juxtaposition only. */
    final String sealAttribute;
    private final TrapStudy study;
    private final java.util.Map<String, String> slots = new java.util.HashMap<>();

    AllanPicture(TrapStudy study, BoundingFault fault, LeakProbabilityMap leak) {
        this.faultId = fault.id();
        this.columns = new FaultPlaneSampler(fault.columns()).sample(fault.fault(), fault.footwallCutOff(),
                fault.hangingWallCutOff());
        this.column = study.stratigraphy().nominal();
        this.referenceUnit = study.stratigraphy().referenceUnitIndex();
        HungColumns walls = new HungColumns(column, column, referenceUnit);
        double top = Double.POSITIVE_INFINITY;
        double base = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < columns.count(); k++) {
            if (columns.hasData(k)) {
                top = Math.min(top, Math.min(columns.footwallDepth(k), columns.hangingWallDepth(k)));
                base = Math.max(base, Math.max(columns.footwallDepth(k), columns.hangingWallDepth(k)));
            }
        }
        top -= column.top(referenceUnit) + MARGIN;
        base += column.thickness() - column.top(referenceUnit) + MARGIN;
        this.raster = JuxtapositionRaster.paint(columns, walls, top, base, CELL_HEIGHT);
        this.leak = leak;
        this.sealAttribute = study.seal().juxtapositionOnly() ? null
                : SealAttributePainter.paint(raster, columns, column, referenceUnit, study.seal().criterion(),
                        study.seal().burialDepth());
        this.study = study;
    }

    /**
     * The raster slot holding attribute {@code key} ("sgr", "ssf", "csp", "threshold"), painted the first time a
     * painter asks for it, so the diagram's default colouring costs nothing extra; null when none could be painted.
     */
    private String slot(String key) {
        return slots.computeIfAbsent(key, k -> {
            SealCriterion criterion = switch (k) {
            case "sgr" -> new ShaleGougeRatioCriterion();
            case "ssf" -> new ShaleSmearFactorCriterion();
            case "csp" -> new ClaySmearPotentialCriterion();
            case "threshold" -> study.seal().criterion();
            default -> null;
            };
            if (criterion == null) {
                return null;
            }
            String attribute = SealAttributePainter.paint(raster, columns, column, referenceUnit, criterion,
                    study.seal().burialDepth());
            if (k.equals("threshold")) {
                return SealAttributePainter.THRESHOLD;
            }
            // painting writes the threshold slot too: give it back to the study's criterion
            SealAttributePainter.paint(raster, columns, column, referenceUnit, study.seal().criterion(),
                    study.seal().burialDepth());
            return attribute;
        });
    }

    /** Attribute {@code key} at (column k, row), NaN where it was not computed. */
    private double attribute(String key, int k, int row) {
        String name = slot(key);
        return name == null ? Double.NaN : raster.attribute(name)[raster.cellIndex(k, row)];
    }

    double uMin() {
        return columns.u(0) - columns.width() / 2;
    }

    double uMax() {
        return columns.u(columns.count() - 1) + columns.width() / 2;
    }

    double zTop() {
        return raster.top();
    }

    double zBase() {
        return raster.top() + raster.rowCount() * raster.dz();
    }

    /** Depth of the top of {@code unit} on {@code footwall ? footwall : hanging wall} at column k. */
    double unitTop(int k, int unit, boolean footwall) {
        double cutOff = footwall ? columns.footwallDepth(k) : columns.hangingWallDepth(k);
        return cutOff - column.top(referenceUnit) + column.top(unit);
    }

    /** Leak probability at (column k, depth z); 0 before a run or outside the counted frame. */
    double leakProbability(int k, double z) {
        if (leak == null || k >= leak.columns()) {
            return 0;
        }
        int row = (int) Math.floor((z - leak.zTop()) / leak.cellHeight());
        return row < 0 || row >= leak.rows() ? 0 : leak.probability(k, row);
    }

    String describe(int k, double z) {
        int row = (int) Math.floor((z - raster.top()) / raster.dz());
        if (k < 0 || k >= raster.columnCount() || row < 0 || row >= raster.rowCount() || !raster.hasData(k, row)) {
            return "";
        }
        JuxtapositionClass c = raster.juxtapositionClass(k, row);
        String attribute = sealAttribute == null ? ""
                : String.format(java.util.Locale.ROOT, ", %s %.1f", sealAttribute, attributeAt(k, row));
        org.faultbench.ui.DisplayUnits units = org.faultbench.ui.DisplayUnits.current();
        return String.format(java.util.Locale.ROOT, "u %s, z %s: footwall %s | hanging wall %s \u2014 %s,"
                + " throw %s%s, leak probability %.0f %%", units.lengthText(columns.u(k), 0), units.lengthText(z, 1),
                unitName(raster.footwallUnit(k, row)), unitName(raster.hangingWallUnit(k, row)),
                c.name().toLowerCase(java.util.Locale.ROOT).replace('_', '/'), units.lengthText(raster.throwAt(k, row), 1),
                attribute, 100 * leakProbability(k, z));
    }

    /** What painters know of the whole diagram. */
    PaintScene paintScene() {
        return new PaintScene(column, java.util.Optional.ofNullable(sealAttribute), leak != null);
    }

    /** What painters know of a cell with data. */
    FaultPlaneCell cell(int k, int row) {
        double z = raster.rowDepth(row);
        return new FaultPlaneCell(columns.u(k), z, raster.juxtapositionClass(k, row), raster.footwallUnit(k, row),
                raster.hangingWallUnit(k, row), raster.throwAt(k, row), attributeAt(k, row), leakProbability(k, z),
                key -> attribute(key, k, row));
    }

    OverlayScene overlayScene() {
        return new OverlayScene(faultId, raster, column);
    }

    /** The painted seal attribute of a cell; NaN where none was painted. */
    double attributeAt(int k, int row) {
        return sealAttribute == null ? Double.NaN : raster.attribute(sealAttribute)[raster.cellIndex(k, row)];
    }

    private String unitName(int unit) {
        if (unit < 0) {
            return "overburden";
        }
        return unit >= column.size() ? "underburden" : column.unit(unit).name();
    }
}
