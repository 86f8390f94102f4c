package org.faultbench.digitize.ui.editing;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Collectors;

import org.faultbench.digitize.io.WellTop;
import org.faultbench.digitize.sketch.WellFeature;

/**
 * A well's tops as one line of text a geologist types in the Properties view: {@code Top A = 1523.5; Top B = 1610}
 * (surface = depth in metres TVDSS, separated by semicolons). A surface already on the well keeps its own position
 * and measured depth (a deviated well's pick); a new one is placed at the well's posted location, without MD.
 */
public final class WellTopsText {

    private WellTopsText() {
    }

    public static String format(List<WellTop> tops) {
        return tops.stream().map(t -> t.surface() + " = " + number(t.tvdss())).collect(Collectors.joining("; "));
    }

    /** The tops {@code text} gives {@code well}; an empty text removes them all. */
    public static List<WellTop> parse(String text, WellFeature well) {
        List<WellTop> tops = new ArrayList<>();
        Set<String> surfaces = new LinkedHashSet<>();
        for (String entry : text.split(";")) {
            if (entry.isBlank()) {
                continue;
            }
            int equals = entry.lastIndexOf('=');
            if (equals < 0) {
                throw new IllegalArgumentException("well " + well.name() + ": '" + entry.strip()
                        + "' is not 'surface = depth'; write the tops as Top A = 1523.5; Top B = 1610");
            }
            String surface = entry.substring(0, equals).strip();
            double tvdss = depth(well, surface, entry.substring(equals + 1).strip());
            if (surface.isEmpty()) {
                throw new IllegalArgumentException("well " + well.name() + ": a top at " + number(tvdss)
                        + " m has no surface name");
            }
            if (!surfaces.add(surface)) {
                throw new IllegalArgumentException("well " + well.name() + ": surface '" + surface
                        + "' is given twice");
            }
            List<WellTop> before = well.topsOn(surface);
            tops.add(before.isEmpty() ? new WellTop(well.name(), surface, well.x(), well.y(), tvdss, Double.NaN)
                    : new WellTop(well.name(), surface, before.get(0).x(), before.get(0).y(), tvdss,
                            before.get(0).md()));
        }
        return tops;
    }

    private static double depth(WellFeature well, String surface, String text) {
        String digits = text.toLowerCase(Locale.ROOT).endsWith("m") ? text.substring(0, text.length() - 1).strip()
                : text;
        try {
            double depth = Double.parseDouble(digits);
            if (Double.isFinite(depth)) {
                return depth;
            }
        } catch (NumberFormatException notANumber) {
            // reported below
        }
        throw new IllegalArgumentException("well " + well.name() + ": depth of '" + surface
                + "' must be a number of metres TVDSS, was '" + text + "'");
    }

    private static String number(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? Long.toString((long) value)
                : Double.toString(value);
    }
}
