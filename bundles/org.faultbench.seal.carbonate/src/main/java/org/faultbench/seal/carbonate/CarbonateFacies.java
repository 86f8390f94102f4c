package org.faultbench.seal.carbonate;

import java.util.Arrays;
import java.util.Locale;

/**
 * Host-rock facies classes of carbonate units, after Dunham's texture classes as used by the fault-rock studies the
 * threshold table cites (Michie et al. 2014, JSG 65: grain- versus micrite-dominated facies control how carbonate
 * fault rock forms). Mudstone and wackestone are grouped, as both are micrite-supported.
 */
public enum CarbonateFacies {
    GRAINSTONE("grainstone"),
    PACKSTONE("packstone"),
    WACKESTONE_MUDSTONE("wackestone-mudstone"),
    BOUNDSTONE("boundstone"),
    DOLOMITE("dolomite");

    private final String key;

    CarbonateFacies(String key) {
        this.key = key;
    }

    /** The key used in table files and analysis files, e.g. "wackestone-mudstone". */
    public String key() {
        return key;
    }

    /** @throws IllegalArgumentException listing the accepted keys */
    public static CarbonateFacies ofKey(String text) {
        String wanted = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(f -> f.key.equals(wanted)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("expected a facies, one of "
                        + Arrays.stream(values()).map(CarbonateFacies::key).toList() + "; found '" + text + "'"));
    }
}
