package org.faultbench.digitize.ui.map;

import java.math.BigDecimal;

/** Contour values as a geologist writes them on a map: 1500, 1502.5 (no trailing zeros, no exponent). */
final class ContourLabels {

    private ContourLabels() {
    }

    static String text(double depth) {
        return BigDecimal.valueOf(depth).stripTrailingZeros().toPlainString();
    }
}
