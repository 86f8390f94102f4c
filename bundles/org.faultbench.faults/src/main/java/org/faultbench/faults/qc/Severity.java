package org.faultbench.faults.qc;

/**
 * How sure a QC finding is that something is wrong. Findings never block an analysis; they tell the geologist where
 * to look first.
 */
public enum Severity {
    /** Unusual for a single well-mapped fault but geologically possible; check it. */
    WARNING,
    /** The geometry contradicts itself (e.g. crossing cut-off lines); the analysis will be wrong until it is fixed. */
    ERROR
}
