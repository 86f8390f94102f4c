package org.faultbench.strat.ui;

import org.faultbench.strat.StratUnit;

/** A row of the unit table: the unit and its position in the stratigraphy, shallowest first. */
record UnitRow(int index, StratUnit unit) {
}
