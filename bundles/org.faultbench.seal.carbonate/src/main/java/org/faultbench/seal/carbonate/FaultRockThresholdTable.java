package org.faultbench.seal.carbonate;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Fault-rock threshold pressures of carbonate hosts by facies and porosity band, read from a user-editable CSV file.
 * The bundle ships a seed table ({@link #bundled()}); an analysis file can name its own. Format: one header line
 * {@value #HEADER}, then one row per facies and porosity band; thresholds in bar, all three empty for "no seal credit
 * (juxtaposition only)"; the source is the rest of the line and may contain commas; '#' starts a comment line.
 */
public final class FaultRockThresholdTable {

    static final String HEADER = "facies,porosity_min,porosity_max,threshold_min_bar,threshold_mode_bar,"
            + "threshold_max_bar,source";
    static final String BUNDLED = "carbonate-fault-rock-thresholds.csv";
    private static final int FIELDS = 7;
    private static final double PA_PER_BAR = 1e5;

    private final List<FaultRockThresholdRow> rows;
    private final String sourceName;

    private FaultRockThresholdTable(List<FaultRockThresholdRow> rows, String sourceName) {
        this.rows = List.copyOf(rows);
        this.sourceName = sourceName;
    }

    /** The seed table shipped in this bundle. */
    public static FaultRockThresholdTable bundled() {
        try (InputStream in = FaultRockThresholdTable.class.getResourceAsStream(BUNDLED)) {
            if (in == null) {
                throw new IllegalStateException("the bundled table " + BUNDLED + " is missing from the bundle");
            }
            return read(new InputStreamReader(in, StandardCharsets.UTF_8), BUNDLED);
        } catch (IOException e) {
            throw new UncheckedIOException("the bundled table " + BUNDLED + " cannot be read", e);
        }
    }

    /**
     * @throws IOException when the file cannot be read
     * @throws IllegalArgumentException naming the file, line and field of the first problem
     */
    public static FaultRockThresholdTable read(Path file) throws IOException {
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(in, file.toString());
        }
    }

    /** @throws IllegalArgumentException naming the source, line and field of the first problem */
    public static FaultRockThresholdTable read(Reader in, String sourceName) throws IOException {
        BufferedReader lines = new BufferedReader(in);
        List<FaultRockThresholdRow> rows = new ArrayList<>();
        boolean headerSeen = false;
        int number = 0;
        for (String line = lines.readLine(); line != null; line = lines.readLine()) {
            number++;
            String trimmed = line.strip();
            if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                continue;
            }
            if (!headerSeen) {
                if (!trimmed.replace(" ", "").equalsIgnoreCase(HEADER)) {
                    throw new IllegalArgumentException(sourceName + ":" + number + ": expected the header line \""
                            + HEADER + "\", found \"" + trimmed + "\"");
                }
                headerSeen = true;
                continue;
            }
            FaultRockThresholdRow row = parseRow(trimmed, sourceName, number);
            for (FaultRockThresholdRow earlier : rows) {
                if (earlier.overlaps(row)) {
                    throw new IllegalArgumentException(sourceName + ":" + number + ": porosity band ["
                            + row.porosityMin() + ", " + row.porosityMax() + ") of " + row.facies().key()
                            + " overlaps the band of line " + earlier.line());
                }
            }
            rows.add(row);
        }
        if (!headerSeen) {
            throw new IllegalArgumentException(sourceName + ": the table is empty; expected the header line \""
                    + HEADER + "\"");
        }
        return new FaultRockThresholdTable(rows, sourceName);
    }

    private static FaultRockThresholdRow parseRow(String line, String sourceName, int number) {
        String[] f = line.split(",", FIELDS);
        String at = sourceName + ":" + number + ": ";
        if (f.length < FIELDS) {
            throw new IllegalArgumentException(at + "expected " + FIELDS + " fields (" + HEADER + "), found "
                    + f.length);
        }
        CarbonateFacies facies;
        try {
            facies = CarbonateFacies.ofKey(f[0]);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(at + "facies: " + e.getMessage(), e);
        }
        double porosityMin = number(f[1], at, "porosity_min");
        double porosityMax = number(f[2], at, "porosity_max");
        Optional<ThresholdRange> range = range(f, at);
        try {
            return new FaultRockThresholdRow(facies, porosityMin, porosityMax, range, unquoted(f[6]), number);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(at + (f[6].isBlank() ? "source: a source is required" : e.getMessage()),
                    e);
        }
    }

    private static Optional<ThresholdRange> range(String[] f, String at) {
        boolean empty = f[3].isBlank() && f[4].isBlank() && f[5].isBlank();
        if (empty) {
            return Optional.empty();
        }
        double min = number(f[3], at, "threshold_min_bar");
        double mode = number(f[4], at, "threshold_mode_bar");
        double max = number(f[5], at, "threshold_max_bar");
        try {
            return Optional.of(new ThresholdRange(min * PA_PER_BAR, mode * PA_PER_BAR, max * PA_PER_BAR));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(at + "thresholds: expected 0 <= min <= mode <= max bar, found " + min
                    + ", " + mode + ", " + max, e);
        }
    }

    private static String unquoted(String text) {
        String s = text.strip();
        return s.length() >= 2 && s.startsWith("\"") && s.endsWith("\"") ? s.substring(1, s.length() - 1) : s;
    }

    private static double number(String text, String at, String field) {
        try {
            double value = Double.parseDouble(text.strip());
            if (Double.isFinite(value)) {
                return value;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException(at + field + ": expected a number, found \"" + text.strip() + "\"");
    }

    public List<FaultRockThresholdRow> rows() {
        return rows;
    }

    /** Name of the file the table came from, for reports. */
    public String sourceName() {
        return sourceName;
    }

    /** The row for a host facies and porosity; empty when the table has none (no seal credit). */
    public Optional<FaultRockThresholdRow> lookup(HostRock host) {
        return rows.stream().filter(row -> row.facies() == host.facies() && row.covers(host.porosity())).findFirst();
    }

    /** The threshold (Pa) the table gives a host, or empty when its fault rock earns no seal credit. */
    public Optional<Double> threshold(HostRock host, ThresholdCase which) {
        return lookup(host).flatMap(FaultRockThresholdRow::range).map(range -> range.value(which));
    }
}
