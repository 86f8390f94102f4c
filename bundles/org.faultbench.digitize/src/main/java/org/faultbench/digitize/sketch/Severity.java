package org.faultbench.digitize.sketch;

/** How serious a topology problem is. */
public enum Severity {
    /** The sheet contradicts itself; gridding or juxtaposition from it would be wrong. */
    ERROR,
    /** Against common practice; worth a look but may be intended. */
    WARNING
}
