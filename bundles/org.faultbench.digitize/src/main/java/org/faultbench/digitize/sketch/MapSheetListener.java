package org.faultbench.digitize.sketch;

/** Told of every change to a {@link MapSheet}, e.g. by an editor that redraws or an undo history that records. */
@FunctionalInterface
public interface MapSheetListener {

    /** {@code edit} has just been applied to {@code sheet}; reverting it undoes the change. */
    void sheetChanged(MapSheet sheet, MapSheetEdit edit);
}
