package org.faultbench.digitize.gridding;

/** A method that turns digitised data into a depth grid that honours fault barriers. */
public interface SurfaceGridder {

    /** Grids {@code input}; never interpolates across a fault trace or through a fault polygon. */
    GriddingResult grid(GriddingInput input);
}
