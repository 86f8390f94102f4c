package org.faultbench.digitize.las;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

import org.faultbench.digitize.io.FormatException;

/**
 * Reads the ~A section into one column per curve. WRAP NO: one depth step per line, one value per curve. WRAP YES:
 * the depth stands alone on its line and the step's other values follow on as many lines as needed (CWLS LAS 2.0).
 * Values equal to the file's NULL value become NaN; a null depth is an error.
 */
final class LasData {
    /** Plain decimal numbers only; LAS 2.0 forbids exponents but they are read when present. */
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private final String fileName;
    private final List<LasItem> curves;
    private final double nullValue;
    private final List<double[]> steps = new ArrayList<>();

    private LasData(String fileName, List<LasItem> curves, double nullValue) {
        this.fileName = fileName;
        this.curves = curves;
        this.nullValue = nullValue;
    }

    /** Columns of the data section, one array per curve of {@code curves}, index curve first. */
    static double[][] read(String fileName, LasSection data, List<LasItem> curves, double nullValue, boolean wrapped)
            throws FormatException {
        LasData reader = new LasData(fileName, curves, nullValue);
        if (wrapped) {
            reader.readWrapped(data.lines());
        } else {
            reader.readUnwrapped(data.lines());
        }
        return reader.columns();
    }

    private void readUnwrapped(List<LasSection.NumberedLine> lines) throws FormatException {
        for (LasSection.NumberedLine line : lines) {
            String[] tokens = line.text().strip().split("\\s+");
            if (tokens.length != curves.size()) {
                throw new FormatException(fileName, line.number(), 0, "expected " + curves.size()
                        + " values (one per curve in ~C), found " + tokens.length);
            }
            double[] step = new double[curves.size()];
            for (int c = 0; c < tokens.length; c++) {
                step[c] = value(tokens[c], line.number(), c + 1, c);
            }
            steps.add(step);
        }
    }

    private void readWrapped(List<LasSection.NumberedLine> lines) throws FormatException {
        double[] step = null;
        int filled = 0;
        int lastLine = 0;
        for (LasSection.NumberedLine line : lines) {
            String[] tokens = line.text().strip().split("\\s+");
            lastLine = line.number();
            int first = 0;
            if (step == null) {
                if (tokens.length != 1) {
                    throw new FormatException(fileName, line.number(), 2, "in wrap mode (WRAP YES) the depth stands "
                            + "alone on its line, found " + tokens.length + " values");
                }
                step = new double[curves.size()];
                step[0] = value(tokens[0], line.number(), 1, 0);
                filled = 1;
                first = 1;
            }
            for (int t = first; t < tokens.length; t++) {
                if (filled == curves.size()) {
                    throw new FormatException(fileName, line.number(), t + 1, "more values than the " + curves.size()
                            + " curves in ~C before the next depth");
                }
                step[filled] = value(tokens[t], line.number(), t + 1, filled);
                filled++;
            }
            if (filled == curves.size()) {
                steps.add(step);
                step = null;
            }
        }
        if (step != null) {
            throw new FormatException(fileName, lastLine, 0, "the data end inside a depth step: " + filled + " of "
                    + curves.size() + " values");
        }
    }

    /** Value of curve {@code curve} from {@code token}; NaN for the null value, which the depth may not be. */
    private double value(String token, int line, int field, int curve) throws FormatException {
        String what = curves.get(curve).mnemonic();
        if (!DECIMAL.matcher(token).matches()) {
            throw new FormatException(fileName, line, field, "expected a number for curve " + what + ", found '"
                    + token + "'");
        }
        double value = Double.parseDouble(token);
        if (!Double.isFinite(value)) {
            throw new FormatException(fileName, line, field, "number too large for curve " + what + ": " + token);
        }
        if (value == nullValue && curve == 0) {
            throw new FormatException(fileName, line, field, "the depth (" + what + ") is the NULL value " + token);
        }
        return value == nullValue ? Double.NaN : value;
    }

    private double[][] columns() {
        double[][] columns = new double[curves.size()][steps.size()];
        for (int s = 0; s < steps.size(); s++) {
            for (int c = 0; c < curves.size(); c++) {
                columns[c][s] = steps.get(s)[c];
            }
        }
        return columns;
    }

    /** Whether {@code token} is a number in the form the data section allows. */
    static boolean isNumber(String token) {
        return DECIMAL.matcher(token).matches() && Double.isFinite(Double.parseDouble(token));
    }
}
