package org.faultbench.headless;

import java.io.PrintStream;
import java.util.Locale;

import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.StreamingSummary;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.study.ResultsWriter;
import org.faultbench.trap.Mechanism;

/** The per-unit summary printed at the end of a batch run. */
final class ResultTable {
    private static final UnitQuantity[] SHOWN = { UnitQuantity.CONTACT, UnitQuantity.COLUMN, UnitQuantity.ATTIC_COLUMN,
            UnitQuantity.STOIIP, UnitQuantity.ATTIC_STOIIP };

    private final PrintStream out;

    ResultTable(PrintStream out) {
        this.out = out;
    }

    void print(SimulationResult result) {
        out.printf(Locale.ROOT, "%n%s: %d realisations, seed %d%s%n", result.studyName(), result.realisationsRun(),
                result.settings().seed(), result.complete() ? "" : " (cancelled: partial result)");
        out.println(ExceedanceLevel.CONVENTION);
        out.printf(Locale.ROOT, "%-12s %-34s %12s %12s %12s  %s%n", "unit", "quantity", "P90 (low)", "P50",
                "P10 (high)", "controlled by");
        for (UnitSummary unit : result.units()) {
            for (UnitQuantity q : SHOWN) {
                StreamingSummary s = unit.statistics(q);
                if (s.finiteFraction() == 0) {
                    continue;
                }
                out.printf(Locale.ROOT, "%-12s %-34s %12s %12s %12s  %s%n", unit.unitName(),
                        q.label() + " [" + q.unit() + "]", format(s.level(ExceedanceLevel.P90)),
                        format(s.level(ExceedanceLevel.P50)), format(s.level(ExceedanceLevel.P10)),
                        q == UnitQuantity.CONTACT ? mechanisms(unit) : "");
            }
        }
        for (String warning : result.warnings()) {
            out.println("WARNING: " + warning);
        }
        ResultsWriter.CAUTIONS.forEach(c -> out.println("CAUTION: " + c));
    }

    private static String mechanisms(UnitSummary unit) {
        StringBuilder text = new StringBuilder();
        for (Mechanism m : Mechanism.values()) {
            double share = unit.mechanismFractions().get(m);
            if (share > 0) {
                text.append(text.length() == 0 ? "" : ", ")
                        .append(String.format(Locale.ROOT, "%s %.0f %%", m.name().toLowerCase(Locale.ROOT), 100 * share));
            }
        }
        return text.toString();
    }

    private static String format(double value) {
        if (!Double.isFinite(value)) {
            return "-";
        }
        return Math.abs(value) >= 1e5 ? String.format(Locale.ROOT, "%.3e", value) : String.format(Locale.ROOT, "%.1f", value);
    }
}
