package org.faultbench.report;

import java.util.Locale;

/** HTML anchor from a name: "Sand A" becomes "sand-a". */
public final class Slug {
    private Slug() {
    }

    public static String of(String name) {
        String s = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
        return s.isEmpty() ? "x" : s;
    }
}
