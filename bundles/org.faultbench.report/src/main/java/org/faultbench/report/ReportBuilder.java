package org.faultbench.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.faultbench.core.units.VolumeUnit;
import org.faultbench.report.chart.TornadoChart;
import org.faultbench.sim.ExceedanceLevel;
import org.faultbench.sim.LeakLocation;
import org.faultbench.sim.SimulationResult;
import org.faultbench.sim.StreamingSummary;
import org.faultbench.sim.TornadoBar;
import org.faultbench.sim.UnitQuantity;
import org.faultbench.sim.UnitSummary;
import org.faultbench.study.ResultsWriter;
import org.faultbench.trap.Mechanism;

/** Assembles the sections of {@link ReportSection} from a run, in their order. */
public final class ReportBuilder {

    /** Headers of the per-unit results table; the P columns follow the exceedance convention. */
    public static final List<String> RESULT_HEADERS = List.of("quantity", "unit", ExceedanceLevel.P90.label(),
            ExceedanceLevel.P50.label(), ExceedanceLevel.P10.label(), "mean", "finite share");

    public Report build(ReportInput input) {
        SimulationResult result = input.result();
        StudyFigures figures = new StudyFigures(input.analysis(), result);
        List<Section> sections = new ArrayList<>();
        sections.add(new Section(ReportSection.RUN, run(input)));
        sections.add(new Section(ReportSection.CAUTIONS, cautions(result)));
        sections.add(new Section(ReportSection.INPUTS, InputsSummary.blocks(input.analysis())));
        sections.add(new Section(ReportSection.MAP, figures.map()));
        sections.add(new Section(ReportSection.THROW_PROFILES, figures.throwProfiles()));
        sections.add(new Section(ReportSection.ALLAN_DIAGRAMS, figures.allanDiagrams()));
        sections.add(new Section(ReportSection.RESULTS, results(result)));
        sections.add(new Section(ReportSection.LEAK_PROBABILITY, figures.leakProbability()));
        sections.add(new Section(ReportSection.TORNADO, tornado(result)));
        sections.add(new Section(ReportSection.CLOSING_CAUTIONS, cautions(result)));
        return new Report("Faultbench trap analysis: " + result.studyName(), sections);
    }

    private static List<Block> run(ReportInput input) {
        SimulationResult r = input.result();
        List<List<String>> rows = List.of(
                List.of("study", r.studyName()),
                List.of("analysis file", input.analysis().file().getFileName().toString()),
                List.of("input SHA-256", input.analysis().sha256()),
                List.of("date", input.date().toString()),
                List.of("program", "Faultbench " + input.programVersion()),
                List.of("seed", Long.toString(r.settings().seed())),
                List.of("realisations", r.realisationsRun() + " of " + r.settings().realisations()
                        + (r.complete() ? "" : " (cancelled: partial result)")),
                List.of("threads", r.settings().threads() + " (results do not depend on it)"));
        return List.of(new Block.Table("run-table", "Run identity", List.of("item", "value"), rows, 0.25),
                new Block.Paragraph("The same analysis file, seed and realisations give the same numbers."));
    }

    private static List<Block> cautions(SimulationResult result) {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Bullets(ResultsWriter.CAUTIONS));
        blocks.add(new Block.Paragraph("Percentiles: " + ExceedanceLevel.CONVENTION + "."));
        if (!result.warnings().isEmpty()) {
            blocks.add(new Block.Paragraph("Warnings of this run:"));
            blocks.add(new Block.Bullets(result.warnings()));
        }
        return blocks;
    }

    private static List<Block> results(SimulationResult result) {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Paragraph("Monte Carlo statistics of " + result.realisationsRun()
                + " realisations. Exceedance convention: " + ExceedanceLevel.CONVENTION
                + ". Depths in m TVDSS, columns in m, STOIIP in stock-tank m3 and barrels (1 m3 = 6.2898 bbl)."
                + " The finite share is the share of realisations a statistic speaks for (e.g. with a leak point)."));
        for (UnitSummary unit : result.units()) {
            String slug = Slug.of(unit.unitName());
            blocks.add(new Block.Heading("results-" + slug + "-heading", unit.unitName()));
            blocks.add(new Block.Table("results-" + slug, unit.unitName() + ": contacts, columns and volumes",
                    RESULT_HEADERS, rows(unit), 0.3));
            blocks.add(new Block.Paragraph(controls(unit)));
        }
        return blocks;
    }

    /** One row per quantity; volumes also in barrels. */
    public static List<List<String>> rows(UnitSummary unit) {
        List<List<String>> rows = new ArrayList<>();
        for (UnitQuantity q : UnitQuantity.values()) {
            StreamingSummary s = unit.statistics(q);
            rows.add(row(q.label(), q.unit(), s, false));
            if ("m3".equals(q.unit())) {
                rows.add(row(q.label(), "stb", s, true));
            }
        }
        return rows;
    }

    /** A row of statistics; with {@code barrels} converted as results.json's stockTankBarrels, so they agree. */
    private static List<String> row(String label, String unit, StreamingSummary s, boolean barrels) {
        List<String> row = new ArrayList<>(List.of(label, unit));
        for (ExceedanceLevel level : ExceedanceLevel.values()) {
            row.add(format(s.level(level), unit, barrels));
        }
        row.add(format(s.mean(), unit, barrels));
        row.add(ReportNumbers.percent(s.finiteFraction()));
        return row;
    }

    private static String format(double value, String unit, boolean barrels) {
        return barrels ? ReportNumbers.volume(VolumeUnit.BARREL.fromCubicMetres(value))
                : ReportNumbers.quantity(value, unit);
    }

    private static String controls(UnitSummary unit) {
        List<String> shares = new ArrayList<>();
        for (Mechanism m : Mechanism.values()) {
            Double share = unit.mechanismFractions().get(m);
            shares.add(m.name().toLowerCase(Locale.ROOT).replace('_', ' ') + "-controlled "
                    + ReportNumbers.percent(share == null ? 0 : share));
        }
        LeakLocation at = unit.baseLeakLocation();
        String location = at == null ? "no fault point limits the base case"
                : "the base case leaks on " + at.faultId() + " at u = " + ReportNumbers.metres(at.u()) + " m, z = "
                        + ReportNumbers.metres(at.z()) + " m";
        return "Realisations: " + String.join(", ", shares) + ". Base case controlled by "
                + unit.baseMechanism().name().toLowerCase(Locale.ROOT).replace('_', ' ') + "; controlling location: "
                + location + ".";
    }

    private static List<Block> tornado(SimulationResult result) {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Block.Paragraph("Each bar shows a unit's contact with one input at its P90 (low case) or P10"
                + " (high case) value and every other input at its median; the inputs with the largest swing come"
                + " first."));
        for (UnitSummary unit : result.units()) {
            List<TornadoBar> bars = result.tornado().getOrDefault(unit.unitName(), List.of());
            double base = unit.baseCase().getOrDefault(UnitQuantity.CONTACT, Double.NaN);
            if (bars.isEmpty() || !Double.isFinite(base)) {
                blocks.add(new Block.Paragraph(unit.unitName() + ": no tornado (no finite base-case contact)."));
                continue;
            }
            blocks.add(new Block.Figure("tornado-" + Slug.of(unit.unitName()), "Tornado of the " + unit.unitName()
                    + " contact; base case " + ReportNumbers.metres(base) + " m.",
                    TornadoChart.render("Contact of " + unit.unitName(), base, bars)));
        }
        return blocks;
    }
}
