package org.faultbench.sim;

/**
 * The petroleum exceedance convention (SPE/WPC/AAPG/SPEE Petroleum Resources Management System): P90 is the low
 * case that the true value equals or exceeds with 90 % probability, i.e. the 10th percentile of the cumulative
 * distribution; P10 is the high case, the 90th percentile. This is the reverse of the statistical "Pxx = xx-th
 * percentile" habit, so every label says which convention it uses.
 */
public enum ExceedanceLevel {
    P90(0.10, "P90 (low case, 90 % exceedance)"),
    P50(0.50, "P50 (median)"),
    P10(0.90, "P10 (high case, 10 % exceedance)");

    /** One line stating the convention, for table headers and result summaries. */
    public static final String CONVENTION = "P90 = low case (90 % exceedance), P10 = high case (10 % exceedance)";

    private final double cumulativeProbability;
    private final String label;

    ExceedanceLevel(double cumulativeProbability, String label) {
        this.cumulativeProbability = cumulativeProbability;
        this.label = label;
    }

    /** Non-exceedance probability F(x) at which this level sits: 0.10 for P90. */
    public double cumulativeProbability() {
        return cumulativeProbability;
    }

    /** Label for tables, plots and reports, naming the convention. */
    public String label() {
        return label;
    }
}
