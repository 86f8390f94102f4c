package org.faultbench.report.chart;

import java.awt.Color;

/**
 * The report's own colours. Categories use the Okabe &amp; Ito (2008) colour-blind-safe set; continuous values use
 * ramps whose lightness changes monotonically, so they still read in grey or with a colour-vision deficiency.
 */
public final class Palette {
    public static final Color INK = new Color(0x20, 0x20, 0x20);
    public static final Color GRID_LINE = new Color(0xD8, 0xD8, 0xD8);
    public static final Color NO_DATA = new Color(0xF2, 0xF2, 0xF2);
    public static final Color BLUE = new Color(0x00, 0x72, 0xB2);
    public static final Color ORANGE = new Color(0xE6, 0x9F, 0x00);
    public static final Color VERMILLION = new Color(0xD5, 0x5E, 0x00);
    public static final Color GREEN = new Color(0x00, 0x9E, 0x73);
    public static final Color PURPLE = new Color(0xCC, 0x79, 0xA7);
    public static final Color SKY = new Color(0x56, 0xB4, 0xE9);

    /** Footwall reservoir, hanging-wall reservoir and non-reservoir fills of the Allan diagram. */
    public static final Color FOOTWALL_SAND = new Color(0xF0, 0xCF, 0x6A, 150);
    public static final Color HANGING_WALL_SAND = new Color(0x56, 0xB4, 0xE9, 120);
    public static final Color SEAL = new Color(0xB8, 0xB8, 0xB8, 90);

    /** Depth ramp: shallow pale yellow to deep dark blue. */
    private static final Color[] DEPTH = { new Color(0xF6, 0xEC, 0xB8), new Color(0xB5, 0xD8, 0x8F),
            new Color(0x5F, 0xAE, 0x9A), new Color(0x35, 0x78, 0x9A), new Color(0x2A, 0x3D, 0x6E) };
    /** Probability ramp: 0 pale cream to 1 dark brown-red. */
    private static final Color[] PROBABILITY = { new Color(0xFF, 0xF5, 0xE0), new Color(0xF9, 0xC7, 0x7E),
            new Color(0xE8, 0x7A, 0x32), new Color(0xB2, 0x3A, 0x1A), new Color(0x5C, 0x14, 0x0C) };

    private Palette() {
    }

    /** Colour of a depth within [shallow, deep]; clamped outside. */
    public static Color depth(double z, double shallow, double deep) {
        return ramp(DEPTH, deep > shallow ? (z - shallow) / (deep - shallow) : 0);
    }

    /** Colour of a probability in [0, 1]; clamped outside. */
    public static Color probability(double p) {
        return ramp(PROBABILITY, p);
    }

    static Color ramp(Color[] stops, double t) {
        double s = Math.max(0, Math.min(1, Double.isNaN(t) ? 0 : t)) * (stops.length - 1);
        int i = Math.min((int) s, stops.length - 2);
        double f = s - i;
        Color a = stops[i];
        Color b = stops[i + 1];
        return new Color(mix(a.getRed(), b.getRed(), f), mix(a.getGreen(), b.getGreen(), f),
                mix(a.getBlue(), b.getBlue(), f));
    }

    private static int mix(int a, int b, double f) {
        return (int) Math.round(a + (b - a) * f);
    }
}
