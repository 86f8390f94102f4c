package org.faultbench.sim;

/**
 * Share of realisations in which each (u, z) cell of a fault plane leaks: a reservoir/reservoir contact of a
 * compartment reservoir unit whose supported free-water level lies above that unit's spill depth, i.e. a point that
 * lets hydrocarbons through before the trap fills to spill.
 *
 * @param faultId the fault
 * @param u along-strike position of each column centre, m
 * @param zTop depth of the top of the first row, m
 * @param cellHeight row height, m
 * @param rows number of rows
 * @param probability row-major (row · columns + column) leak probability in [0, 1]
 */
public record LeakProbabilityMap(String faultId, double[] u, double zTop, double cellHeight, int rows,
        double[] probability) {

    public int columns() {
        return u.length;
    }

    public double probability(int column, int row) {
        return probability[row * u.length + column];
    }

    /** Highest leak probability anywhere on the fault. */
    public double maximum() {
        double max = 0;
        for (double p : probability) {
            max = Math.max(max, p);
        }
        return max;
    }
}
