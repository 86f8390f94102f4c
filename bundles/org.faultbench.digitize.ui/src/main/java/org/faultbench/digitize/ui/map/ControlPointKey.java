package org.faultbench.digitize.ui.map;

/** Model of a control-point edit part: the point's id, stable while the point is moved or edited. */
public record ControlPointKey(String id) {
}
