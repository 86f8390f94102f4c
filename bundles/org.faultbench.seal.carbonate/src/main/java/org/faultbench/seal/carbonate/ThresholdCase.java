package org.faultbench.seal.carbonate;

import java.util.Locale;

/** Which value of a tabulated (min, mode, max) threshold range the criterion uses. */
public enum ThresholdCase {
    MIN, MODE, MAX;

    /** @throws IllegalArgumentException unless the text is "min", "mode" or "max" */
    public static ThresholdCase ofKey(String text) {
        try {
            return valueOf(text.trim().toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException | NullPointerException e) {
            throw new IllegalArgumentException("expected \"min\", \"mode\" or \"max\", found \"" + text + "\"");
        }
    }

    /** The case named by an optional text, or the fallback when there is none. */
    static ThresholdCase ofKeyOr(java.util.Optional<String> text, ThresholdCase fallback) {
        return text.map(ThresholdCase::ofKey).orElse(fallback);
    }
}
