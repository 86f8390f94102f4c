package org.faultbench.report.chart;

/** A well to mark on the map: name, map position (m) and status text such as "producer". */
public record MapWell(String name, double x, double y, String status) {
}
