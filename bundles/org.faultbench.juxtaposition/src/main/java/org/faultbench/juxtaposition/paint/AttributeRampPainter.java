package org.faultbench.juxtaposition.paint;

import java.util.ArrayList;
import java.util.List;

/**
 * Colours cells by one seal attribute on a pale-to-slate ramp between two fixed values, so diagrams of different
 * faults and studies compare at a glance; cells without the attribute keep a faded juxtaposition colour.
 * Built-in subclasses paint SGR, SSF, CSP and threshold pressure.
 */
public abstract class AttributeRampPainter implements AttributePainter {
    private static final int LOW = 0xF2EFE6;
    private static final int HIGH = 0x3B4A5C;
    private final String id;
    private final String name;
    private final String key;
    private final double low;
    private final double high;
    private final String rangeText;

    protected AttributeRampPainter(String id, String name, String key, double low, double high, String rangeText) {
        this.id = id;
        this.name = name;
        this.key = key;
        this.low = low;
        this.high = high;
        this.rangeText = rangeText;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public int rgb(FaultPlaneCell cell, PaintScene scene) {
        double value = cell.attributes().value(key);
        if (Double.isNaN(value)) {
            return Rgb.blend(BuiltInPainters.classColour(cell.juxtaposition()), Rgb.WHITE, 0.6);
        }
        double f = Math.max(0, Math.min(1, (value - low) / (high - low)));
        return Rgb.blend(LOW, HIGH, f);
    }

    @Override
    public List<LegendEntry> legend(PaintScene scene) {
        List<LegendEntry> legend = new ArrayList<>();
        legend.add(new LegendEntry(LOW, name + " low"));
        legend.add(new LegendEntry(HIGH, name + " " + rangeText + " (pale to slate)"));
        return legend;
    }

    /** Shale gouge ratio on 0-60 % (display range; common practice). */
    public static final class Sgr extends AttributeRampPainter {
        public Sgr() {
            super("sgr", "SGR", "sgr", 0, 60, "0 \u2013 60+ %");
        }
    }

    /** Shale smear factor on 0-8; smears are usually taken as continuous below about 4 (Lindsay et al. 1993, from memory). */
    public static final class Ssf extends AttributeRampPainter {
        public Ssf() {
            super("ssf", "SSF", "ssf", 0, 8, "0 \u2013 8+");
        }
    }

    /** Clay smear potential on 0-30 (display range; common practice). */
    public static final class Csp extends AttributeRampPainter {
        public Csp() {
            super("csp", "CSP", "csp", 0, 30, "0 \u2013 30+");
        }
    }

    /** Threshold pressure of the study's criterion, 0-20 bar (2 MPa). */
    public static final class ThresholdPressure extends AttributeRampPainter {
        public ThresholdPressure() {
            super("threshold-pressure", "threshold pressure", "threshold", 0, 2.0e6, "0 \u2013 20+ bar");
        }
    }
}
