package org.faultbench.sim;

import org.faultbench.core.column.ResolvedColumn;
import org.faultbench.faults.FaultPlaneColumns;
import org.faultbench.juxtaposition.JuxtapositionRaster;
import org.faultbench.seal.FaultPointContext;
import org.faultbench.seal.SealCriterion;
import org.faultbench.seal.SealEvaluation;

/**
 * Paints a seal criterion onto a juxtaposition raster: at every cell centre inside the stratigraphic column on both
 * walls, the criterion's attribute (e.g. SGR in %) and its threshold pressure (Pa) go into two attribute slots, so
 * viewers can colour the fault plane by either. Cells whose throw window leaves the column stay NaN.
 */
public final class SealAttributePainter {
    /** Slot name of the threshold pressures. */
    public static final String THRESHOLD = "threshold pressure [Pa]";

    private SealAttributePainter() {
    }

    /**
     * @return the name of the attribute slot (the criterion's attribute name and unit, e.g. "SGR [%]")
     */
    public static String paint(JuxtapositionRaster raster, FaultPlaneColumns columns, ResolvedColumn column,
            int referenceUnit, SealCriterion criterion, double burialDepth) {
        String name = null;
        double[] attribute = null;
        double[] threshold = raster.attributeNames().contains(THRESHOLD) ? raster.attribute(THRESHOLD)
                : raster.addAttribute(THRESHOLD);
        for (int k = 0; k < raster.columnCount(); k++) {
            if (!columns.hasData(k)) {
                continue;
            }
            double zFw = columns.footwallDepth(k);
            double zHw = columns.hangingWallDepth(k);
            double faultThrow = zHw - zFw;
            double refTop = column.top(referenceUnit);
            for (int row = 0; row < raster.rowCount(); row++) {
                double z = raster.rowDepth(row);
                // the upthrown wall plays the footwall of the throw-window construction
                double position = faultThrow >= 0 ? z - zFw + refTop : z - zHw + refTop;
                double throwMagnitude = Math.abs(faultThrow);
                if (position < 0 || position > column.thickness() || position - throwMagnitude < 0) {
                    continue;
                }
                SealEvaluation e = criterion.evaluate(new FaultPointContext(z, throwMagnitude, position, column,
                        burialDepth));
                if (attribute == null) {
                    name = e.attributeName() + (e.attributeUnit().isEmpty() ? "" : " [" + e.attributeUnit() + "]");
                    attribute = raster.attributeNames().contains(name) ? raster.attribute(name) : raster.addAttribute(name);
                }
                int cell = raster.cellIndex(k, row);
                attribute[cell] = e.attributeValue();
                threshold[cell] = e.thresholdPressure();
            }
        }
        return name;
    }
}
